package org.foldbook.channel;

/** How a long read reports and is stopped; called on the reading thread. */
public interface ReadProgress {
    /** Nothing reported, never cancelled. */
    ReadProgress NONE = new ReadProgress() {
    };

    /** {@code done} of {@code total} frames read so far. */
    default void framesRead(long done, long total) {
    }

    /** Polled between blocks: true stops the read with a {@link java.util.concurrent.CancellationException}. */
    default boolean cancelled() {
        return false;
    }
}
