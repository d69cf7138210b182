package org.foldbook.dsp.spectrum;

import org.foldbook.dsp.Check;

/** Levels in dB relative to a reference in the same unit. */
public final class Decibels {
    /** Power values at or below this floor read as {@code 10 log10(1e-300) = -3000 dB}, never -infinity. */
    public static final double POWER_FLOOR = 1e-300;

    private Decibels() {
    }

    /** {@code 10 log10(max(power, 1e-300) / reference)} for powers (unit², unit²/Hz). */
    public static double power(double power, double reference) {
        Check.positive("reference", reference);
        return 10 * Math.log10(Math.max(power, POWER_FLOOR) / reference);
    }

    /** {@code 20 log10(max(amplitude, 1e-150) / reference)} for amplitudes (unit, unit rms). */
    public static double amplitude(double amplitude, double reference) {
        Check.positive("reference", reference);
        return 20 * Math.log10(Math.max(amplitude, 1e-150) / reference);
    }

    /** Power in place: {@code levels[k] = 10 log10(max(power[k], 1e-300))}, k < count (dB re 1 unit). */
    public static void powerToDb(double[] power, double[] levels, int count) {
        for (int k = 0; k < count; k++) {
            levels[k] = 10 * Math.log10(Math.max(power[k], POWER_FLOOR));
        }
    }
}
