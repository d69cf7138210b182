package org.foldbook.dsp.resample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Random;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * The 16-tap kernel of {@link BareSampler#forDoubledSeries} against releng/reference/doubled_kernel_vectors.py
 * (Debian numpy/scipy: numpy.sinc, scipy.special.i0, the continuous response by scipy.integrate.quad,
 * scipy.signal.kaiserord), and the exact bare mode it serves against the formula cos(2πf·t).
 */
class DoubledSeriesKernelTest {

    static final double FS0 = 100_000;

    @Test
    @DisplayName("taps h(τ) equal numpy.sinc · scipy.special.i0 (doubled_kernel_taps.txt)")
    void tapsMatchScipy() {
        BareSampler s = BareSampler.forDoubledSeries(RateRatio.of(3, 7));
        assertEquals(8, s.halfWidth());
        for (String[] r : ReferenceVectors.rows("doubled_kernel_taps.txt")) {
            double tau = Double.parseDouble(r[0]);
            double want = Double.parseDouble(r[1]);
            assertEquals(want, s.kernelValue(tau), 2e-16 + 1e-14 * Math.abs(want), "h(" + tau + ")");
        }
    }

    @Test
    @DisplayName("16 taps is what Kaiser's rule asks for these edges: scipy.signal.kaiserord(117 dB, 0.98) gives order 16")
    void lengthIsKaisersRule() {
        for (String[] r : ReferenceVectors.rows("doubled_kernel_design.txt")) {
            if (r[0].equals("117")) {
                // numtaps = order + 1; a continuous kernel of half width W spans 2W samples, its order
                assertEquals(2 * BareSampler.DOUBLED_HALF_WIDTH, Integer.parseInt(r[1]) - 1);
                // β near Kaiser's empirical 0.1102·(A − 8.7) = 11.93 (tuned by the measured response)
                assertEquals(Double.parseDouble(r[2]), BareSampler.DOUBLED_BETA, 0.5);
                return;
            }
        }
        throw new AssertionError("no A = 117 row in doubled_kernel_design.txt");
    }

    /** RMS error re the tone, dB, of a tone at {@code f} cycles per sample through {@code s}, ends left out. */
    static double toneErrorDb(BareSampler s, double f, int n, int guard) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.cos(2 * Math.PI * f * i + 0.4);   // synthetic input
        }
        double[] y = s.apply(x);
        double step = (double) s.ratio().down() / s.ratio().up();
        double e2 = 0;
        int count = 0;
        for (int m = 0; m < y.length; m++) {
            double t = m * step;
            if (t > guard && t < n - 1 - guard) {
                double d = y[m] - Math.cos(2 * Math.PI * f * t + 0.4);
                e2 += d * d;
                count++;
            }
        }
        return 10 * Math.log10(e2 / count / 0.5);
    }

    @ParameterizedTest(name = "ratio {0}/{1} of the series' rate: measured tone error = the continuous response's prediction")
    @CsvSource({"521,1084", "556,1142", "13,100", "999,1001"})
    void toneErrorIsTheResponsesPrediction(int up, int down) {
        BareSampler s = BareSampler.forDoubledSeries(RateRatio.of(up, down));
        List<String[]> rows = ReferenceVectors.rows("doubled_kernel_response.txt");
        for (String[] r : rows) {
            double f = Double.parseDouble(r[0]);
            double predicted = Double.parseDouble(r[2]);
            if (f == 0 || f > 0.255) {
                continue;     // DC: the RMS over instants is no longer a sum of distinct tones; 0.3: outside
            }
            // distinct error tones (pass band deviation, images at k ± f) add in power over a long series;
            // 1.5 dB leaves room for what is left of their beats over 40 000 samples
            double got = toneErrorDb(s, f, 40_000, 40);
            assertEquals(predicted, got, 1.5, up + "/" + down + " at f = " + f);
        }
    }

    @Test
    @DisplayName("the response holds the band: within -115 dB up to 0.245 of the rate (0.49·fs0), cut beyond 0.3 (scipy quad)")
    void responseOfTheDesign() {
        for (String[] r : ReferenceVectors.rows("doubled_kernel_response.txt")) {
            double f = Double.parseDouble(r[0]);
            double err = Double.parseDouble(r[2]);
            if (f <= 0.245) {
                assertTrue(err < -115, "f = " + f + ": " + err + " dB");
            }
        }
    }

    @ParameterizedTest(name = "exact bare mode, tone at {0}·fs0: error vs cos(2πf·t) below -100 dB, no image of ours")
    @ValueSource(doubles = {0.01, 0.1337, 0.25, 0.39, 0.42, 0.45, 0.47, 0.485, 0.49})
    void exactBareModeToTheBandEdge(double fRel) {
        ExactChainFilter exact = ExactChainFilter.of(ModelledChannel.none(), FS0);
        int n = 60_000;
        int guard = exact.kernelLength();     // the filter's fade at either end, in 2·fs0 samples: ample in fs0 ones
        for (RateRatio q : new RateRatio[] {RateRatio.of(521, 542), RateRatio.of(13, 50), RateRatio.of(999, 1000)}) {
            ModelledChannelResampler r = ModelledChannelResampler.of(q, FS0, ModelledChannel.none());
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = Math.cos(2 * Math.PI * fRel * i + 0.4);   // synthetic input
            }
            double[] y = r.apply(x);
            double step = (double) q.down() / q.up();
            double e2 = 0;
            int count = 0;
            for (int m = 0; m < y.length; m++) {
                double t = m * step;
                if (t > guard && t < n - 1 - guard) {
                    double d = y[m] - Math.cos(2 * Math.PI * fRel * t + 0.4);
                    e2 += d * d;
                    count++;
                }
            }
            // issue 10: every component up to 0.49·fs0 within -100 dB; the error holds any image at fs0 − f too
            double db = 10 * Math.log10(e2 / count / 0.5);
            assertTrue(db < -100, q + " at " + fRel + "·fs0: " + db + " dB");
        }
    }

    @Test
    @DisplayName("16-tap rows: block-by-block runs and random access give exactly the whole-array result")
    void splitsGiveTheSameBits() {
        Random rnd = new Random(11);
        double[] x = new double[70_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();   // synthetic input
        }
        for (RateRatio q : new RateRatio[] {RateRatio.of(521, 1084), RateRatio.of(1, 7), RateRatio.of(7, 3),
                RateRatio.of(3, 700), RateRatio.of(999, 2000)}) {
            BareSampler s = BareSampler.forDoubledSeries(q);
            double[] whole = s.apply(x);
            double[] streamed = new double[whole.length];
            int[] pos = {0};
            ResampleRun run = s.start((b, o, l) -> {
                System.arraycopy(b, o, streamed, pos[0], l);
                pos[0] += l;
            });
            for (int i = 0; i < x.length; i += 6007) {
                run.push(x, i, Math.min(6007, x.length - i));
            }
            run.finish();
            assertEquals(whole.length, pos[0], q.toString());
            assertArrayEquals(whole, streamed, 0.0, q + " streamed");
            double[] pieces = new double[whole.length];
            for (int first = 0; first < whole.length; first += 1237) {
                int c = Math.min(1237, whole.length - first);
                s.evaluate(x, first, pieces, first, c);
            }
            assertArrayEquals(whole, pieces, 0.0, q + " random access");
        }
    }
}
