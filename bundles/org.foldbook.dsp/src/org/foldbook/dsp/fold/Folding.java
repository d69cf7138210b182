package org.foldbook.dsp.fold;

import java.util.Arrays;

import org.foldbook.dsp.Check;

/**
 * Where a tone lands after sampling (Oppenheim &amp; Schafer, ch. 4). Sampling at fs cannot tell f from
 * f − k·fs, so a tone f appears at the signed frequency {@code f − k·fs}, k = round(f/fs), which lies
 * in [−fs/2, fs/2]; a spectrum of real samples shows its magnitude {@code |f − k·fs|} in [0, fs/2].
 * The sign matters for rotation (a phasor turning backwards) and tells whether the tone came from
 * just below or just above a multiple of fs.
 */
public final class Folding {

    private Folding() {
    }

    /** The apparent frequency |f − k·fs|, k = round(f/fs), in [0, fs/2]. */
    public static double apparentHz(double frequencyHz, double sampleRateHz) {
        return Math.abs(signedApparentHz(frequencyHz, sampleRateHz));
    }

    /**
     * The signed apparent frequency f − k·fs, k = round(f/fs), in [−fs/2, fs/2). A tone exactly at an
     * odd multiple of fs/2 is reported at −fs/2 (its direction cannot be seen).
     */
    public static double signedApparentHz(double frequencyHz, double sampleRateHz) {
        Check.finite("frequencyHz", frequencyHz);
        Check.positive("sampleRateHz", sampleRateHz);
        double k = Math.floor(frequencyHz / sampleRateHz + 0.5);
        double a = frequencyHz - k * sampleRateHz;
        // guard the rounding of k·fs for huge ratios
        if (a >= 0.5 * sampleRateHz) {
            a -= sampleRateHz;
        } else if (a < -0.5 * sampleRateHz) {
            a += sampleRateHz;
        }
        return a;
    }

    /**
     * The Nyquist zone of a frequency f ≥ 0: zone z covers [(z−1)·fs/2, z·fs/2). Zone 1 is the baseband;
     * content in odd zones keeps its orientation, content in even zones appears mirrored.
     */
    public static long nyquistZone(double frequencyHz, double sampleRateHz) {
        Check.nonNegative("frequencyHz", frequencyHz);
        Check.positive("sampleRateHz", sampleRateHz);
        return (long) Math.floor(frequencyHz / (0.5 * sampleRateHz)) + 1;
    }

    /** True when a tone in this zone appears mirrored (frequency axis reversed): the even zones. */
    public static boolean isMirroredZone(long zone) {
        if (zone < 1) {
            throw new IllegalArgumentException("zone must be >= 1, was " + zone);
        }
        return zone % 2 == 0;
    }

    /**
     * Every true frequency in [0, maxHz] that appears at {@code observedHz} when sampled at fs: the
     * values k·fs ± observed, ascending, without duplicates.
     *
     * @param observedHz apparent frequency, in [0, fs/2]
     * @param maxHz      the highest frequency the sensor passes
     */
    public static double[] trueFrequencies(double observedHz, double sampleRateHz, double maxHz) {
        Check.positive("sampleRateHz", sampleRateHz);
        Check.inRange("observedHz", Check.finite("observedHz", observedHz), 0, 0.5 * sampleRateHz);
        Check.nonNegative("maxHz", maxHz);
        long kMax = (long) Math.floor((maxHz + observedHz) / sampleRateHz);
        if (kMax > 10_000_000) {
            throw new IllegalArgumentException("maxHz / sampleRateHz is too large (" + (maxHz / sampleRateHz)
                    + " images; at most 1e7 are listed), maxHz was " + maxHz);
        }
        double[] out = new double[(int) (2 * kMax + 2)];
        int n = 0;
        for (long k = 0; k <= kMax; k++) {
            double c = k * sampleRateHz;
            double lo = c - observedHz;
            double hi = c + observedHz;
            if (lo >= 0 && lo <= maxHz && (n == 0 || lo > out[n - 1])) {
                out[n++] = lo;
            }
            if (hi <= maxHz && hi != lo && (n == 0 || hi > out[n - 1])) {
                out[n++] = hi;
            }
        }
        return Arrays.copyOf(out, n);
    }
}
