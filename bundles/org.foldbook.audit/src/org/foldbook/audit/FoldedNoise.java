package org.foldbook.audit;

import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.peaks.NoiseFloor;

/**
 * How many dB the broadband noise the front end passes above Nyquist, times the chain's attenuation,
 * raises the floor in 0..fs/2 once it folds: 10·log10(1 + folded / in-band) with both powers taken
 * through the chain's protection |H(f)|².
 *
 * <ul>
 * <li>From the model: the noise at the sensor taken as white up to the front end's upper edge, so the
 * ratio is ∫ |H|² over (fs/2, upper] against ∫ |H|² over [0, fs/2] (midpoint rule).</li>
 * <li>From the data: the broadband floor (running median of 31 bins, tones left out) of a higher-rate
 * recording of the same sensor, its own chain divided out, in place of the white assumption.</li>
 * </ul>
 *
 * @param riseDb the estimated rise of the floor
 * @param source "model" or "data"
 * @param basis  what it rests on, in words
 */
public record FoldedNoise(double riseDb, String source, String basis) {
    static final int STEPS = 20_000;

    static FoldedNoise fromModel(FrequencyResponse h, double rate, double upperHz) {
        return fromModel(h, rate, upperHz, "the front end's upper edge");
    }

    static FoldedNoise fromModel(FrequencyResponse h, double rate, double upperHz, String upperIs) {
        double nyq = rate / 2;
        double inband = integral(h, 0, nyq);
        double folded = upperHz > nyq ? integral(h, nyq, upperHz) : 0;
        return new FoldedNoise(10 * Math.log10(1 + folded / inband), "model",
                "white noise at the sensor up to " + org.foldbook.model.derived.Quantities.hz(upperHz)
                        + " (" + upperIs + "), through the chain's modelled protection");
    }

    /** Empty-handed (NaN rise) when the reference does not reach above this channel's Nyquist. */
    static FoldedNoise fromData(FrequencyResponse h, double rate, double upperHz, ReferenceRecording ref) {
        ChannelSpectrum sp = ref.spectrum();
        double[] floor = NoiseFloor.runningMedian(sp.psd(), sp.bins(), 31);
        double nyq = rate / 2;
        double top = Math.min(upperHz > 0 ? upperHz : Double.POSITIVE_INFINITY, sp.rateHz() / 2 * 0.98);
        double inband = 0, folded = 0;
        for (int k = 1; k < sp.bins(); k++) {
            double f = k * sp.binHz();
            if (f > top) {
                break;
            }
            double m = ref.protection().magnitude(f);
            if (!(m > 0.01)) {
                continue;
            }
            double g = h.magnitude(f);
            double p = floor[k] / (m * m) * g * g;
            if (f <= nyq) {
                inband += p;
            } else {
                folded += p;
            }
        }
        if (!(top > nyq) || inband <= 0) {
            return new FoldedNoise(Double.NaN, "data", ref.label() + " does not reach above this channel's Nyquist");
        }
        return new FoldedNoise(10 * Math.log10(1 + folded / inband), "data",
                "the broadband floor of " + ref.label() + " up to "
                        + org.foldbook.model.derived.Quantities.hz(top) + ", its own chain divided out, through this chain");
    }

    private static double integral(FrequencyResponse h, double a, double b) {
        double step = (b - a) / STEPS;
        double s = 0;
        for (int i = 0; i < STEPS; i++) {
            double m = h.magnitude(a + (i + 0.5) * step);
            s += m * m;
        }
        return s * step;
    }
}
