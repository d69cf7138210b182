package org.foldbook.dsp.window;

/**
 * Which of the two usual sampled forms of a window function is built (the convention of
 * {@code scipy.signal.get_window}, {@code sym=False} / {@code sym=True}).
 */
public enum Symmetry {
    /**
     * For spectral analysis: the first n samples of the symmetric window of length n + 1, so the window
     * is periodic in n and its DFT of a cosine-sum window has only a few non-zero bins.
     */
    PERIODIC,
    /** For filter design: {@code w[j] = w[n-1-j]}, both end points included. */
    SYMMETRIC
}
