package org.foldbook.dsp.spectrum;

/** What an amplitude spectrum reads for a bin-centred tone {@code A sin(2 pi f t + phi)}. */
public enum AmplitudeScale {
    /** A (peak amplitude); DC reads the mean. */
    PEAK,
    /** {@code A / sqrt(2)} (root mean square); DC reads the mean, the Nyquist bin its |value|. */
    RMS
}
