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

class KaiserPolyphaseResamplerTest {

    @ParameterizedTest(name = "{0}/{1} equals scipy.signal.resample_poly with default arguments (poly_{0}_{1}.txt)")
    @CsvSource({"1,2", "2,3", "3,7", "1,50", "7,5", "556,571", "19,1000", "5,1"})
    void matchesScipyResamplePoly(int up, int down) {
        String name = "poly_" + up + "_" + down + ".txt";
        double[] expected = ReferenceVectors.column(name);
        double[] x = ReferenceVectors.inputFor(name);
        KaiserPolyphaseResampler r = KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(up, down));
        double[] y = r.apply(x);
        assertEquals(expected.length, y.length);
        for (int m = 0; m < y.length; m++) {
            assertEquals(expected[m], y[m], 1e-12, "output " + m);
        }
    }

    @Test
    void costIsAboutTwentyTapsPerInputSample() {
        // scipy's design: 20·max(up,down)+1 prototype taps, so ≈ 20·down/up taps per output (docs/REFERENCES.md, scipy resample_poly default design)
        // (1001 for 1/50, run padded with zeros to a multiple of 4: 1004 multiply-adds per output)
        assertEquals(1004, KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(1, 50)).tapsPerOutput());
        // 765/1000 uses 27-28 taps per phase, stored padded with zeros to a multiple of 4
        assertEquals(28, KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(765, 1000)).tapsPerOutput());
        // 3/8: 161-tap prototype at 3·fs0, phases span k = -27 .. 26 (20·8/3 + 1 ≈ 54), padded to 56
        assertEquals(56, KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(3, 8)).tapsPerOutput());
    }

    @Test
    @DisplayName("1/1 is a plain copy, as scipy.signal.resample_poly returns for up == down")
    void unitRatioIsCopy() {
        double[] x = ReferenceVectors.column("input.txt");
        KaiserPolyphaseResampler r = KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(7, 7));
        assertArrayEquals(x, r.apply(x), 0.0);
        double[] part = new double[10];
        r.evaluate(x, 5, part, 0, 10);
        assertArrayEquals(java.util.Arrays.copyOfRange(x, 5, 15), part, 0.0);
    }

    @Test
    @DisplayName("magnitude() equals scipy.signal.freqz of resample_poly's filter, R = 20 (poly_response_R20.txt)")
    void magnitudeAsScipyFreqz() {
        KaiserPolyphaseResampler r = KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(1, 20));
        double fs = 1.0 / 20;
        for (String[] row : ReferenceVectors.rows("poly_response_R20.txt")) {
            double frac = Double.parseDouble(row[0]);
            assertEquals(Double.parseDouble(row[1]), 20 * Math.log10(r.magnitude(frac * fs)), 1e-6, "at " + frac + "·fs");
        }
        // the tone through the resampler gets that gain (a tone at 0.45·fs stays below the new Nyquist)
        double f = 0.45 * fs;
        double[] x = new double[40_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.cos(2 * Math.PI * f * i);   // synthetic input
        }
        double[] y = r.apply(x);
        double peak = 0;
        for (int m = 100; m < y.length - 100; m++) {
            peak = Math.max(peak, Math.abs(y[m]));
        }
        assertEquals(r.magnitude(f), peak, 2e-3);
        assertEquals(1.0, KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(2, 2)).magnitude(0.3), 0.0);
    }

    @Test
    void streamingEqualsWhole() {
        Random rnd = new Random(3);
        double[] x = new double[30_000];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();   // synthetic input
        }
        for (RateRatio q : new RateRatio[] {RateRatio.of(556, 571), RateRatio.of(1, 50), RateRatio.of(7, 5)}) {
            KaiserPolyphaseResampler s = KaiserPolyphaseResampler.resamplePolyDefaults(q);
            double[] whole = s.apply(x);
            double[] got = new double[whole.length];
            int[] pos = {0};
            ResampleRun run = s.start((b, o, l) -> {
                System.arraycopy(b, o, got, pos[0], l);
                pos[0] += l;
            });
            for (int i = 0; i < x.length; i += 4093) {
                run.push(x, i, Math.min(4093, x.length - i));
            }
            run.finish();
            assertEquals(whole.length, pos[0]);
            assertArrayEquals(whole, got, 0.0, q.toString());
        }
    }

    @Test
    void rejectsBadInput() {
        KaiserPolyphaseResampler s = KaiserPolyphaseResampler.resamplePolyDefaults(RateRatio.of(2, 3));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> s.apply(new double[] {Double.NaN}))
                .getMessage().contains("samples[0]"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> s.apply(new double[0])).getMessage().contains("empty"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> KaiserPolyphaseResampler.firwinKaiser(10, 0.5, 5))
                .getMessage().contains("odd"));
    }
}
