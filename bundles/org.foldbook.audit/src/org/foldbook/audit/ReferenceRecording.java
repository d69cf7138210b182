package org.foldbook.audit;

import org.foldbook.dsp.filter.FrequencyResponse;

/**
 * A higher-rate recording of the same sensor, used to tell what really lies above the audited channel's
 * Nyquist frequency.
 *
 * @param label      which channel it is, for people
 * @param spectrum   its spectrum
 * @param protection its own chain's protection at its rate (divided out to reach the sensor)
 */
public record ReferenceRecording(String label, ChannelSpectrum spectrum, FrequencyResponse protection) {

    /** Density at the sensor near {@code hz}; NaN beyond its Nyquist or where its own chain removes > 40 dB. */
    double sensorDensity(double hz) {
        if (hz > spectrum.rateHz() / 2 * 0.98) {
            return Double.NaN;
        }
        double m = protection.magnitude(hz);
        if (!(m > 0.01)) {
            return Double.NaN;
        }
        return spectrum.densityNear(hz, 2) / (m * m);
    }

    /** True when its spectrum rises at least {@code prominenceDb} above the neighbourhood ±8 bins around. */
    boolean hasPeakNear(double hz, double prominenceDb) {
        double here = spectrum.densityNear(hz, 2);
        double k0 = hz / spectrum.binHz();
        double low = Double.POSITIVE_INFINITY;
        for (int d : new int[] {-8, -7, -6, 6, 7, 8}) {
            int k = (int) Math.round(k0) + d;
            if (k >= 0 && k < spectrum.bins()) {
                low = Math.min(low, spectrum.psd()[k]);
            }
        }
        return here > 0 && low < Double.POSITIVE_INFINITY && 10 * Math.log10(here / Math.max(low, 1e-300)) >= prominenceDb;
    }
}
