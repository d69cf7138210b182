package org.foldbook.dsp.spectrum;

/** What is removed from each segment before windowing ({@code scipy.signal.detrend} types). */
public enum Detrend {
    /** Nothing. */
    NONE,
    /** The segment mean. */
    CONSTANT,
    /** The least-squares straight line through the segment. */
    LINEAR
}
