package org.foldbook.dsp.filter;

/**
 * The magnitude response of one element of an acquisition chain (analog low-pass, a digitizer's
 * built-in digital filter, a camera's exposure, or a cascade of them), as a function of frequency in
 * Hz. Every element of a chain speaks this one interface, so a chain is a {@link Cascade}.
 *
 * <p>Responses are of real systems, so the magnitude is even in frequency; implementations accept any
 * finite frequency and reject NaN/infinity with an {@link IllegalArgumentException}.
 */
public interface FrequencyResponse {

    /** |H(f)|, dimensionless (1 = passes unchanged). */
    double magnitude(double frequencyHz);

    /**
     * Attenuation in dB, {@code -20·log10|H(f)|}: positive where the element attenuates, +∞ at an exact
     * null (e.g. a transmission zero of an elliptic filter, a box-car null).
     */
    default double attenuationDb(double frequencyHz) {
        return -20.0 * Math.log10(magnitude(frequencyHz));
    }

    /**
     * Frequencies (Hz, ≥ 0) near which the attenuation may have a local extremum or change its
     * character: cutoffs, ripple peaks, transmission zeros, lobe peaks, mask edges. Searches over
     * frequency ({@link AttenuationSearch}) always look at these points, so a narrow feature is not
     * missed between grid points. Only points up to {@code upToHz} are needed.
     */
    default double[] landmarksHz(double upToHz) {
        return new double[0];
    }

    /**
     * True when the attenuation is known never to decrease with frequency for f ≥ 0 (RC, Butterworth,
     * Bessel, the digitizer filter mask). Searches use it to take exact shortcuts.
     */
    default boolean attenuationNonDecreasing() {
        return false;
    }

    /** This element followed by {@code next}: the magnitudes multiply. */
    default FrequencyResponse then(FrequencyResponse next) {
        return Cascade.of(this, next);
    }
}
