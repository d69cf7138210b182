package org.foldbook.audit;

/** How a long audit reports and is stopped; called on the auditing thread. */
public interface AuditProgress {
    AuditProgress NONE = new AuditProgress() {
    };

    /** Now working on {@code what}; {@code done} of {@code total} channels finished. */
    default void channel(String what, int done, int total) {
    }

    /** {@code done} of {@code total} frames of the current channel read. */
    default void frames(long done, long total) {
    }

    /** Polled between blocks: true stops the audit with a {@link java.util.concurrent.CancellationException}. */
    default boolean cancelled() {
        return false;
    }
}
