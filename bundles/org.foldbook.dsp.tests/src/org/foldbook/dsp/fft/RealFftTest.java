package org.foldbook.dsp.fft;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RealFftTest {

    private static double[] randomSignal(int n, long seed) {
        Random r = new Random(seed); // synthetic test input
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = r.nextGaussian() + 0.3;
        }
        return x;
    }

    /** Direct DFT by the definition, in long double-free but exact-phase form (index products mod n). */
    private static double[][] directDft(double[] x) {
        int n = x.length;
        double[][] out = new double[2][n / 2 + 1];
        for (int k = 0; k <= n / 2; k++) {
            double re = 0;
            double im = 0;
            for (int j = 0; j < n; j++) {
                long m = ((long) j * k) % n;
                double a = -2 * Math.PI * m / n;
                re += x[j] * Math.cos(a);
                im += x[j] * Math.sin(a);
            }
            out[0][k] = re;
            out[1][k] = im;
        }
        return out;
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 7, 8, 9, 12, 15, 16, 17, 31, 45, 97, 100, 127, 243, 255, 301, 1000,
        211, 422, 1031}) // the last three: prime factor >= 211, Bluestein inside the library
    @DisplayName("one-sided bins equal the direct DFT (definition X[k] = sum x[j] e^{-2 pi i jk/n})")
    void matchesDirectDft(int n) {
        double[] x = randomSignal(n, n);
        double[][] ref = directDft(x);
        RealFft fft = RealFft.of(n);
        ComplexSpectrum s = fft.forward(x);
        assertEquals(n / 2 + 1, s.bins());
        double scale = Math.sqrt(n) * 4;
        for (int k = 0; k < s.bins(); k++) {
            assertEquals(ref[0][k], s.re(k), 1e-12 * scale, "re, bin " + k);
            assertEquals(ref[1][k], s.im(k), 1e-12 * scale, "im, bin " + k);
        }
        double[] re = new double[s.bins()];
        double[] im = new double[s.bins()];
        double[] pw = new double[s.bins()];
        double[] work = x.clone();
        fft.forwardInPlace(work, re, im);
        work = x.clone();
        fft.powerInPlace(work, pw);
        for (int k = 0; k < s.bins(); k++) {
            assertEquals(s.re(k), re[k], 0.0);
            assertEquals(s.im(k), im[k], 0.0);
            assertEquals(s.power(k), pw[k], 1e-12 * s.power(k) + 1e-20, "power, bin " + k);
        }
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1, 2, 3, 4, 5, 8, 9, 16, 17, 100, 127, 211, 422, 1031, 4096})
    @DisplayName("inverse: x[j] = (1/n) sum_k X[k] e^{+2 pi i jk/n} over all n bins, by the definition")
    void inverseMatchesDefinition(int n) {
        Random r = new Random(77 + n); // synthetic one-sided spectrum
        int bins = n / 2 + 1;
        double[] re = new double[bins];
        double[] im = new double[bins];
        for (int k = 0; k < bins; k++) {
            re[k] = r.nextGaussian();
            im[k] = (k == 0 || (n % 2 == 0 && k == n / 2)) ? 0 : r.nextGaussian();
        }
        double[] out = new double[n];
        RealFft.of(n).inverseInPlace(re, im, out);
        for (int j = 0; j < n; j++) {
            double sum = 0;
            for (int k = 0; k < n; k++) {
                int kk = k <= n / 2 ? k : n - k;              // X[n-k] = conj(X[k])
                double xr = re[kk];
                double xi = k <= n / 2 ? im[kk] : -im[kk];
                double a = 2 * Math.PI * (((long) j * k) % n) / n;
                sum += xr * Math.cos(a) - xi * Math.sin(a);
            }
            assertEquals(sum / n, out[j], 1e-13 * Math.sqrt(n) + 1e-15, "sample " + j);
        }
        // and it undoes the forward transform
        double[] x = randomSignal(n, 5 + n);
        double[] work = x.clone();
        RealFft.of(n).forwardInPlace(work, re, im);
        RealFft.of(n).inverseInPlace(re, im, out);
        for (int j = 0; j < n; j++) {
            assertEquals(x[j], out[j], 1e-13 * Math.sqrt(n), "round trip " + j);
        }
    }

    @ParameterizedTest(name = "n = 2^{0}")
    @ValueSource(ints = {1, 2, 4, 8, 10, 12, 14, 16, 18})
    @DisplayName("powers of two equal Apache Commons Math FastFourierTransformer (STANDARD, FORWARD)")
    void matchesCommonsMath(int log2) {
        int n = 1 << log2;
        double[] x = randomSignal(n, 1000 + log2);
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(x, TransformType.FORWARD);
        ComplexSpectrum s = RealFft.of(n).forward(x);
        double tol = 1e-12 * Math.sqrt(n) * log2 + 1e-13;
        for (int k = 0; k < s.bins(); k++) {
            assertEquals(ref[k].getReal(), s.re(k), tol, "re, bin " + k);
            assertEquals(ref[k].getImaginary(), s.im(k), tol, "im, bin " + k);
        }
    }

    @Test
    @DisplayName("offset slice and input left unchanged; accumulate adds")
    void sliceAndAccumulate() {
        double[] x = randomSignal(50, 5);
        double[] copy = x.clone();
        RealFft fft = RealFft.of(20);
        ComplexSpectrum s = fft.forward(x, 13);
        assertTrue(java.util.Arrays.equals(copy, x));
        double[] part = java.util.Arrays.copyOfRange(x, 13, 33);
        assertEquals(fft.forward(part), s);
        double[] sum = new double[fft.bins()];
        java.util.Arrays.fill(sum, 1.0);
        fft.accumulatePowerInPlace(part.clone(), sum);
        for (int k = 0; k < sum.length; k++) {
            assertEquals(1.0 + s.power(k), sum[k], 1e-12 * (1 + s.power(k)));
        }
    }

    @Test
    @DisplayName("bad input names the parameter and value")
    void badInput() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RealFft.of(0));
        assertTrue(e.getMessage().contains("n") && e.getMessage().contains("0"), e.getMessage());
        RealFft fft = RealFft.of(8);
        double[] x = new double[8];
        x[3] = Double.NaN;
        e = assertThrows(IllegalArgumentException.class, () -> fft.forward(x));
        assertTrue(e.getMessage().contains("x[3]") && e.getMessage().contains("NaN"), e.getMessage());
        double[] y = new double[10];
        y[9] = Double.POSITIVE_INFINITY;
        e = assertThrows(IllegalArgumentException.class, () -> fft.forward(y, 2));
        assertTrue(e.getMessage().contains("x[9]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> fft.forward(new double[7]));
        assertTrue(e.getMessage().contains("7"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> fft.forward(new double[10], 3));
        assertTrue(e.getMessage().contains("offset 3"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> fft.powerInPlace(new double[8], new double[4]));
        assertTrue(e.getMessage().contains("power.length"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> fft.forward(new double[0]));
        assertTrue(e.getMessage().contains("empty"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> RealFft.configureThreads(0));
        assertTrue(e.getMessage().contains("threads"), e.getMessage());
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {2, 3, 8, 45, 97, 1024, 4096, 4099})
    @DisplayName("in-place paths reject a NaN or infinity at any position (detected from the DC bin)")
    void inPlaceRejectsNonFinite(int n) {
        RealFft fft = RealFft.of(n);
        double[] p = new double[fft.bins()];
        double[] re = new double[fft.bins()];
        double[] im = new double[fft.bins()];
        double[] bads = {Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY};
        for (int pos : new int[] {0, 1, n / 3, n / 2, n - 1}) {
            for (double bad : bads) {
                double[] x = randomSignal(n, pos);
                x[pos] = bad;
                IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                        () -> fft.accumulatePowerInPlace(x.clone(), p), "pos " + pos + " " + bad);
                assertTrue(e.getMessage().contains("work"), e.getMessage());
                assertThrows(IllegalArgumentException.class, () -> fft.forwardInPlace(x.clone(), re, im));
            }
        }
    }

    @Test
    @DisplayName("configureThreads: split transforms equal one-thread ones; the library's threads are daemons")
    void threadConfiguration() {
        int before = org.visnow.jlargearrays.ConcurrencyUtils.getNumberOfThreads();
        try {
            int n = 1 << 16; // above the library's 8192-sample threshold for splitting
            double[] x = randomSignal(n, 9);
            RealFft fft = RealFft.of(n);
            RealFft.configureThreads(1);
            double[] one = new double[fft.bins()];
            fft.powerInPlace(x.clone(), one);
            RealFft.configureThreads(2);
            double[] two = new double[fft.bins()];
            fft.powerInPlace(x.clone(), two);
            for (int k = 0; k < one.length; k++) {
                assertEquals(one[k], two[k], 1e-12 * (one[k] + 1), "bin " + k);
            }
            boolean sawWorker = false;
            for (Thread t : Thread.getAllStackTraces().keySet()) {
                if (t.getName().startsWith("foldbook-fft-")) {
                    sawWorker = true;
                    assertTrue(t.isDaemon(), t.getName());
                }
            }
            assertTrue(sawWorker, "a split transform ran on the configured pool");
        } finally {
            RealFft.configureThreads(before); // leave the library as this JVM had it
        }
    }

    @Test
    @DisplayName("one operator shared by threads gives the same result as on one thread")
    void sharedAcrossThreads() throws Exception {
        RealFft fft = RealFft.of(4096);
        double[] x = randomSignal(4096, 77);
        double[] expected = new double[fft.bins()];
        fft.powerInPlace(x.clone(), expected);
        java.util.concurrent.ExecutorService pool = java.util.concurrent.Executors.newFixedThreadPool(4);
        try {
            java.util.List<java.util.concurrent.Future<Boolean>> results = new java.util.ArrayList<>();
            for (int t = 0; t < 8; t++) {
                results.add(pool.submit(() -> {
                    double[] work = new double[4096];
                    double[] p = new double[fft.bins()];
                    for (int rep = 0; rep < 200; rep++) {
                        System.arraycopy(x, 0, work, 0, 4096);
                        fft.powerInPlace(work, p);
                        if (!java.util.Arrays.equals(p, expected)) {
                            return false;
                        }
                    }
                    return true;
                }));
            }
            for (java.util.concurrent.Future<Boolean> f : results) {
                assertTrue(f.get());
            }
        } finally {
            pool.shutdown();
        }
    }
}
