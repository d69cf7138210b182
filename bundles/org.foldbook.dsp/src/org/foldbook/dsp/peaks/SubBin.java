package org.foldbook.dsp.peaks;

/** How the finder estimates a peak's frequency and level between bins. */
public enum SubBin {
    /** Bin centre and bin level. */
    NONE,
    /**
     * Parabola through the three dB levels around the peak (Gaussian interpolation: M. Gasior, J. L.
     * Gonzalez, "Improving FFT frequency measurement resolution by parabolic and Gaussian interpolation",
     * CERN AB-Note-2004-021); the vertex gives frequency and level. Works for any smooth main lobe; its bias
     * depends on the window (measured for a lone Hann-windowed tone: below 0.02 bin and 0.35 dB).
     */
    GAUSSIAN,
    /**
     * Window-specific: the ratio of the two highest bins is matched to {@code |W(1-d)|/|W(d)|} of the window's
     * own transform, which gives the offset d; the level is corrected by {@code -20 log10(|W(d)|/W(0)}}. Exact
     * for a lone tone apart from the leakage of its negative-frequency image and of other tones (measured with
     * Hann: below 1e-3 bin and 0.01 dB for tones 10 bins or more from DC and Nyquist).
     */
    WINDOW_KERNEL
}
