package org.foldbook.dsp.resample;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class IdealDecimatorTest {

    static final int N = 40_000;

    /** Tone cos(2π f n + φ), f as a fraction of the source rate; synthetic input. */
    static double[] tone(double f, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.cos(2 * Math.PI * f * i + 0.4);
        }
        return x;
    }

    /** Samples within this many input samples of either end see the zero padding; they are left out. */
    static double guard(IdealDecimator d) {
        double g = 0;
        for (IdealDecimator.Stage s : d.stages()) {
            g += (s.prototype().length() / 2.0) / (s.inputRate() * s.ratio().up()) + 2 / s.outputRate();
        }
        return g;
    }

    /** RMS of (y − expected) re the tone's RMS, dB, over outputs away from the ends. */
    static double errorDb(IdealDecimator d, double f, double gain) {
        double[] y = d.apply(tone(f, N));
        double step = d.ratio().down() / (double) d.ratio().up();
        double g = guard(d);
        double e2 = 0;
        int c = 0;
        for (int m = 0; m < y.length; m++) {
            double t = m * step;
            if (t < g || t > N - 1 - g) {
                continue;
            }
            double e = y[m] - gain * Math.cos(2 * Math.PI * f * t + 0.4);
            e2 += e * e;
            c++;
        }
        assertTrue(c > 100, "too few samples away from the ends: " + c);
        return 10 * Math.log10(e2 / c / 0.5);
    }

    @ParameterizedTest(name = "{0}/{1}: pass-band tones come through as the exact cos() at the new instants (≤ -85 dB)")
    @CsvSource({"1,2", "16,769", "521,542", "1,50", "3,7", "7,5", "1,1"})
    void passBandIsTransparent(int up, int down) {
        IdealDecimator d = IdealDecimator.of(RateRatio.of(up, down));
        double band = Math.min(1.0, up / (double) down);
        for (double frac : new double[] {0.0123, 0.2, 0.37, 0.449}) {
            double db = errorDb(d, frac * band, 1.0);
            // 0.001 dB ripple is 1.2e-4 relative (-79 dB); the stages' ripples add up to about -89 dB at worst
            assertTrue(db <= -85, up + "/" + down + " tone at " + frac + "·fs: " + db + " dB");
        }
    }

    @ParameterizedTest(name = "{0}/{1}: tones above the new Nyquist are removed to ≤ -100 dB, wherever they would fold")
    @CsvSource({"1,2", "16,769", "521,542", "1,50", "3,7", "7,5"})
    void stopBandIsRemoved(int up, int down) {
        IdealDecimator d = IdealDecimator.of(RateRatio.of(up, down));
        double band = Math.min(1.0, up / (double) down);
        for (double frac : new double[] {0.5005, 0.53, 0.77, 1.01, 1.499, 2.9, 7.3, 19.9}) {
            double f = frac * band;
            if (f >= 0.5) {
                continue;                      // beyond the source's own band
            }
            double db = errorDb(d, f, 0.0);
            assertTrue(db <= -100, up + "/" + down + " tone at " + frac + "·fs: " + db + " dB");
        }
    }

    @Test
    @DisplayName("the chain's response: flat to 0.001 dB over the pass band, ≥ 100 dB down from the stop edge")
    void magnitudeMeetsSpec() {
        for (RateRatio q : new RateRatio[] {RateRatio.of(16, 769), RateRatio.of(521, 542), RateRatio.of(1, 8)}) {
            IdealDecimator d = IdealDecimator.of(q);
            double fs = q.toDouble();
            for (double f = 0; f <= 0.45 * fs; f += fs / 2000) {
                assertEquals(0, 20 * Math.log10(d.magnitude(f)), 0.001, q + " at " + f);
            }
            for (double f = 0.5 * fs; f <= 0.5; f += Math.max(fs / 2000, 1e-4)) {
                assertTrue(20 * Math.log10(d.magnitude(f)) <= -100, q + " at " + f);
            }
        }
    }

    @Test
    @DisplayName("strong decimation is multi-stage and costs far less than one sharp stage at the source rate")
    void multiStageIsCheap() {
        IdealDecimator d = IdealDecimator.of(RateRatio.of(16, 769));
        assertEquals(6, d.stageCount(), "five halvings then 512/769");
        assertTrue(d.multiplyAddsPerInputSample() < 30, "cost " + d.multiplyAddsPerInputSample());
        assertEquals(0, IdealDecimator.of(RateRatio.of(3, 3)).stageCount());
    }

    @Test
    void streamingEqualsWhole() {
        Random rnd = new Random(11);
        double[] x = new double[20_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();   // synthetic input
        }
        for (RateRatio q : new RateRatio[] {RateRatio.of(16, 769), RateRatio.of(1, 4), RateRatio.of(7, 5), RateRatio.of(1, 1)}) {
            IdealDecimator d = IdealDecimator.of(q);
            double[] whole = d.apply(x);
            assertEquals(q.outputLength(x.length), whole.length);
            double[] got = new double[whole.length];
            int[] pos = {0};
            ResampleRun run = d.start((b, o, l) -> {
                System.arraycopy(b, o, got, pos[0], l);
                pos[0] += l;
            });
            for (int i = 0; i < x.length; i += 1777) {
                run.push(x, i, Math.min(1777, x.length - i));
            }
            run.finish();
            assertEquals(whole.length, pos[0], q.toString());
            assertEquals(whole.length, run.outputCount());
            assertArrayEquals(whole, got, 0.0, q.toString());
        }
    }

    @Test
    void rejectsBadInput() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new IdealDecimator.Spec(0.5, 0.45, 100))
                .getMessage().contains("stopFraction"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> new IdealDecimator.Spec(0.4, 0.5, 300))
                .getMessage().contains("attenuationDb"));
        IdealDecimator d = IdealDecimator.of(RateRatio.of(1, 3));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> d.apply(new double[] {0, Double.NaN}))
                .getMessage().contains("samples[1]"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> d.apply(new double[0])).getMessage().contains("empty"));
    }
}
