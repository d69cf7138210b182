package org.foldbook.sweep;

/**
 * Progress and cancel for a running sweep; our own small interface, so the DSP core needs no UI or
 * Eclipse types (a UI job wraps its monitor in one of these). Calls come from the sweep's worker threads,
 * so implementations must be thread-safe.
 */
public interface SweepProgress {

    /** Does nothing and never cancels. */
    SweepProgress NONE = new SweepProgress() {
    };

    /** One rate is done: {@code done} of {@code total} rates finished so far (in no particular order). */
    default void rateDone(RateResult result, int done, int total) {
    }

    /**
     * Polled between blocks of samples; once it returns true the sweep stops as soon as every worker
     * notices and {@link SweepEngine#run} throws {@link java.util.concurrent.CancellationException}.
     */
    default boolean isCancelled() {
        return false;
    }
}
