package org.foldbook.bench.spectrum;

import java.util.Random;

/** Synthetic benchmark input: tones plus seeded Gaussian noise (values do not affect FFT timing). */
final class BenchData {
    private BenchData() {
    }

    static double[] signal(int n) {
        Random r = new Random(12345);
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = Math.sin(2 * Math.PI * 0.01 * j) + 0.5 * Math.sin(2 * Math.PI * 0.047 * j + 0.7)
                    + 0.01 * r.nextGaussian();
        }
        return x;
    }
}
