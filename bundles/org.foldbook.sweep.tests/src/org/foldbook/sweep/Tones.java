package org.foldbook.sweep;

import java.util.Random;

/** Clearly synthetic test input: sums of sines plus seeded white noise. */
final class Tones {
    private Tones() {
    }

    /** {@code n} samples at {@code fs} of sum a_i sin(2 pi f_i t + i), plus Gaussian noise of std {@code noise}. */
    static double[] of(int n, double fs, double[] freqs, double[] amps, double noise, long seed) {
        double[] x = new double[n];
        Random rnd = new Random(seed);
        for (int j = 0; j < n; j++) {
            double t = j / fs;
            double v = 0;
            for (int i = 0; i < freqs.length; i++) {
                v += amps[i] * Math.sin(2 * Math.PI * freqs[i] * t + i);
            }
            x[j] = v + noise * rnd.nextGaussian();
        }
        return x;
    }
}
