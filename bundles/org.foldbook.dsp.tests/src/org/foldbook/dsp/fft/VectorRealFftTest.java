package org.foldbook.dsp.fft;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** The Vector API kernel against Apache Commons Math's FFT and against the scalar path (JTransforms). */
class VectorRealFftTest {

    private static double[] randomSignal(int n, long seed) {
        Random r = new Random(seed); // synthetic test input
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = r.nextGaussian() + 0.3;
        }
        return x;
    }

    @Test
    @DisplayName("the test runtime has the vector module (parent pom argLine) and power-of-two Welch lengths use it")
    void kernelChosen() {
        assertTrue(FftKernels.vectorModuleInBootLayer(),
                "the OSGi test runtime must run with --add-modules jdk.incubator.vector (tycho-surefire argLine)");
        assertTrue(FftKernels.vectorAvailable(), "module present but not reachable: Import-Package jdk.incubator.vector");
        assertEquals("vector-api", RealFft.of(4096).kernel());
        assertEquals("vector-api", RealFft.of(VectorRealFft.minimumLength()).kernel());
        assertEquals("jtransforms", RealFft.of(VectorRealFft.minimumLength() / 2).kernel());
        assertEquals("jtransforms", RealFft.of(FftKernels.MAX_VECTOR_LENGTH * 2).kernel());
        assertEquals("jtransforms", RealFft.of(4095).kernel());
        assertEquals("jtransforms", RealFft.libraryOnly(4096).kernel());
    }

    @ParameterizedTest(name = "n = 2^{0}")
    @ValueSource(ints = {7, 8, 9, 10, 11, 12, 13})
    @DisplayName("vector kernel equals Apache Commons Math FastFourierTransformer to 1e-13 of the largest bin")
    void matchesCommonsMath(int log2) {
        int n = 1 << log2;
        if (n < VectorRealFft.minimumLength()) {
            return; // narrower machines start higher; kernelChosen covers the boundary
        }
        double[] x = randomSignal(n, 300 + log2);
        Complex[] ref = new FastFourierTransformer(DftNormalization.STANDARD).transform(x, TransformType.FORWARD);
        VectorRealFft v = new VectorRealFft(n);
        double[] re = new double[n / 2 + 1];
        double[] im = new double[n / 2 + 1];
        v.forward(x, re, im);
        double max = 0;
        for (int k = 0; k <= n / 2; k++) {
            max = Math.max(max, ref[k].abs());
        }
        for (int k = 0; k <= n / 2; k++) {
            assertEquals(ref[k].getReal(), re[k], 1e-13 * max, "re, bin " + k);
            assertEquals(ref[k].getImaginary(), im[k], 1e-13 * max, "im, bin " + k);
        }
        double[] power = new double[n / 2 + 1];
        double dc = v.accumulatePower(x, power);
        assertEquals(ref[0].getReal(), dc, 1e-13 * max);
        for (int k = 0; k <= n / 2; k++) {
            double p = ref[k].getReal() * ref[k].getReal() + ref[k].getImaginary() * ref[k].getImaginary();
            assertEquals(p, power[k], 3e-13 * max * max, "power, bin " + k);
        }
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {128, 256, 512, 1024, 2048, 4096, 8192})
    @DisplayName("both paths of RealFft agree: vector kernel and JTransforms, bins and accumulated power")
    void bothPathsAgree(int n) {
        RealFft fast = RealFft.of(n);
        RealFft scalar = RealFft.libraryOnly(n);
        double[] x = randomSignal(n, n + 1);
        int b = n / 2 + 1;
        double[] re1 = new double[b];
        double[] im1 = new double[b];
        double[] re2 = new double[b];
        double[] im2 = new double[b];
        fast.forwardInPlace(x.clone(), re1, im1);
        scalar.forwardInPlace(x.clone(), re2, im2);
        double[] p1 = new double[b];
        double[] p2 = new double[b];
        for (int seg = 0; seg < 3; seg++) { // accumulation over three segments, as Welch does
            double[] s = randomSignal(n, 40 + seg);
            fast.accumulatePowerInPlace(s.clone(), p1);
            scalar.accumulatePowerInPlace(s.clone(), p2);
        }
        double max = 0;
        double maxP = 0;
        for (int k = 0; k < b; k++) {
            max = Math.max(max, Math.hypot(re2[k], im2[k]));
            maxP = Math.max(maxP, p2[k]);
        }
        for (int k = 0; k < b; k++) {
            assertEquals(re2[k], re1[k], 1e-13 * max, "re, bin " + k);
            assertEquals(im2[k], im1[k], 1e-13 * max, "im, bin " + k);
            assertEquals(p2[k], p1[k], 1e-12 * p2[k] + 1e-13 * maxP, "power, bin " + k);
        }
    }

    @Test
    @DisplayName("one operator shared by threads: every thread gets the one-thread answer bit for bit")
    void sharedAcrossThreads() throws Exception {
        int n = 4096;
        RealFft fft = RealFft.of(n);
        double[] x = randomSignal(n, 8);
        double[] expected = new double[fft.bins()];
        fft.powerInPlace(x.clone(), expected);
        ExecutorService pool = Executors.newFixedThreadPool(3);
        try {
            Future<?>[] f = new Future<?>[6];
            for (int t = 0; t < f.length; t++) {
                f[t] = pool.submit(() -> {
                    double[] p = new double[fft.bins()];
                    for (int rep = 0; rep < 200; rep++) {
                        fft.powerInPlace(x.clone(), p);
                        assertArrayEquals(expected, p);
                    }
                    return null;
                });
            }
            for (Future<?> each : f) {
                each.get();
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
