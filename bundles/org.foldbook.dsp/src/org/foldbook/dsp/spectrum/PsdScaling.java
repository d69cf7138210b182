package org.foldbook.dsp.spectrum;

/**
 * Scaling of a Welch estimate (Heinzel, Rüdiger, Schilling 2002, sections 9-10; {@code scipy.signal.welch}
 * {@code scaling=}).
 */
public enum PsdScaling {
    /**
     * Power spectral density, unit²/Hz: {@code |X|^2 / (fs S2)}, {@code S2 = sum(w^2)}. Its integral over
     * frequency is the mean square of the (detrended) signal; right for noise.
     */
    DENSITY,
    /**
     * Power spectrum, unit²: {@code |X|^2 / S1^2}, {@code S1 = sum(w)}. A bin-centred tone of peak amplitude
     * A reads {@code A^2 / 2} (its mean square); right for tones.
     */
    SPECTRUM
}
