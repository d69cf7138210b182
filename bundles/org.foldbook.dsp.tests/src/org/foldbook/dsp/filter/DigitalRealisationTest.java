package org.foldbook.dsp.filter;

import static org.foldbook.dsp.filter.AnalogLowPassTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import java.util.Random;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class DigitalRealisationTest {

    private static SecondOrderSections design(ReferenceCsv cases, String[] row) {
        return cases.design(row).toDigital(cases.num(row, "fs_hz"));
    }

    @Test
    @DisplayName("digital magnitude equals scipy.signal butter/bessel/cheby1/ellip(fs=…, output='sos') + sosfreqz")
    void magnitudeMatchesScipy() {
        ReferenceCsv cases = ReferenceCsv.load("digital_cases.csv");
        ReferenceCsv resp = ReferenceCsv.load("digital_response.csv");
        Map<Integer, List<String[]>> byCase = resp.byCase();
        for (String[] c : cases.rows) {
            SecondOrderSections d = design(cases, c);
            assertTrue(d.isStable());
            for (String[] r : byCase.get(Integer.parseInt(cases.get(c, "case")))) {
                double f = resp.num(r, "f_hz");
                double ref = resp.num(r, "magnitude");
                assertEquals(ref, d.magnitude(f), 1e-12 + 1e-9 * ref, "case " + cases.get(c, "case") + " at " + f + " Hz");
            }
        }
    }

    @Test
    @DisplayName("SosFilter output equals scipy.signal.sosfilt, from rest and from sosfilt_zi steady state (synthetic input)")
    void outputMatchesSosfilt() {
        ReferenceCsv cases = ReferenceCsv.load("digital_cases.csv");
        ReferenceCsv out = ReferenceCsv.load("digital_output.csv");
        Map<Integer, List<String[]>> byCase = out.byCase();
        for (String[] c : cases.rows) {
            SecondOrderSections d = design(cases, c);
            List<String[]> rows = byCase.get(Integer.parseInt(cases.get(c, "case")));
            double[] x = rows.stream().mapToDouble(r -> out.num(r, "x")).toArray();
            double[] yRest = rows.stream().mapToDouble(r -> out.num(r, "y_from_rest")).toArray();
            double[] ySteady = rows.stream().mapToDouble(r -> out.num(r, "y_from_steady_state")).toArray();

            double[] y = x.clone();
            d.newFilter().filterInPlace(y);
            assertArrayEquals(yRest, y, 1e-10, "from rest, case " + cases.get(c, "case"));

            SosFilter primed = d.newFilter();
            primed.primeForConstantInput(x[0]);
            double[] y2 = new double[x.length];
            primed.filter(x, 0, y2, 0, x.length);
            assertArrayEquals(ySteady, y2, 1e-10, "steady state, case " + cases.get(c, "case"));
        }
    }

    @Test
    @DisplayName("streaming: blocks of any size give the same output as one call and as sample by sample")
    void streamingEqualsOneGo() {
        SecondOrderSections d = AnalogLowPass.elliptic(6, 0.5, 70, 3000).toDigital(48000);
        Random rnd = new Random(7); // synthetic input
        double[] x = new double[5000];
        for (int i = 0; i < x.length; i++) {
            x[i] = rnd.nextGaussian();
        }
        double[] whole = x.clone();
        d.newFilter().filterInPlace(whole);

        SosFilter f = d.newFilter();
        double[] blocks = new double[x.length + 10];
        int pos = 0;
        while (pos < x.length) {
            int n = Math.min(x.length - pos, 1 + rnd.nextInt(700));
            f.filter(x, pos, blocks, pos + 10, n);
            pos += n;
        }
        SosFilter g = d.newFilter();
        for (int i = 0; i < x.length; i++) {
            assertEquals(whole[i], blocks[i + 10], 0.0, "block output " + i);
            assertEquals(whole[i], g.filterSample(x[i]), 1e-12, "per-sample output " + i);
        }
        f.reset();
        double[] again = x.clone();
        f.filterInPlace(again);
        assertArrayEquals(whole, again, 0.0);
    }

    @Test
    @DisplayName("silence after an impulse decays to exact zeros (no endless subnormal tail)")
    void silenceBecomesZero() {
        SecondOrderSections d = AnalogLowPass.elliptic(6, 0.1, 90, 1000).toDigital(10_000);
        double[] v = new double[200_000];
        v[0] = 1;
        d.newFilter().filterInPlace(v);
        for (int i = 100_000; i < v.length; i++) {
            assertEquals(0.0, v[i], 0.0, "sample " + i);
        }
        assertTrue(Math.abs(v[10]) > 1e-3, "the impulse response itself is there");
    }

    @Test
    @DisplayName("bilinear warping: digital attenuation at f = analog at fc·tan(πf/fs)/tan(πfc/fs) (Oppenheim & Schafer §7.1)")
    void frequencyWarping() {
        double fc = 1000;
        double fs = 4000; // deliberately low: strong warping
        for (AnalogFilter a : new AnalogFilter[] {AnalogLowPass.butterworth(5, fc), AnalogLowPass.chebyshev1(4, 1, fc),
                AnalogLowPass.bessel(4, fc, BesselNormalization.MAGNITUDE), AnalogLowPass.elliptic(4, 0.5, 50, fc)}) {
            SecondOrderSections d = a.toDigital(fs);
            for (double f = 0; f < 0.499 * fs; f += 37) {
                double fa = fc * Math.tan(Math.PI * f / fs) / Math.tan(Math.PI * fc / fs);
                double expected = a.attenuationDb(fa);
                if (expected < 200) {
                    assertEquals(expected, d.attenuationDb(f), 1e-7 * Math.max(1, expected), a + " at " + f);
                }
            }
            assertEquals(a.attenuationDb(fc), d.attenuationDb(fc), 1e-9, "pre-warped: exact at the cutoff");
        }
    }

    @Test
    @DisplayName("validity: error small when fs/2 ≫ fc, large when the cutoff is near Nyquist")
    void magnitudeErrorReport() {
        AnalogFilter a = AnalogLowPass.butterworth(4, 1000);
        RealisationError fine = DigitalRealisation.magnitudeError(a, a.toDigital(100_000), 1000);
        assertTrue(fine.maxErrorDb() < 0.01, fine.toString());
        assertTrue(DigitalRealisation.magnitudeError(a, a.toDigital(100_000), 2000).maxErrorDb() < 0.05);
        RealisationError coarse = DigitalRealisation.magnitudeError(a, a.toDigital(2500), 1200);
        assertTrue(coarse.maxErrorDb() > 3, coarse.toString());
        assertTrue(coarse.atHz() > 1000, coarse.toString());
        // faithful-up-to is consistent with the error report
        SecondOrderSections d = a.toDigital(20_000);
        double upTo = DigitalRealisation.faithfulUpToHz(a, d, 0.1);
        assertTrue(upTo > 1000 && upTo < 10_000, "faithful up to " + upTo);
        assertTrue(DigitalRealisation.magnitudeError(a, d, upTo).maxErrorDb() <= 0.1);
        assertTrue(DigitalRealisation.magnitudeError(a, d, Math.min(10_000, upTo * 1.1)).maxErrorDb() > 0.1);
    }

    @Test
    @DisplayName("cascade of stages realised section by section")
    void cascadeRealisation() {
        AnalogFilter a = AnalogLowPass.butterworth(3, 2000);
        AnalogFilter b = AnalogLowPass.rc(5000);
        SecondOrderSections d = DigitalRealisation.of(List.of(a, b), 48000);
        assertEquals(3, d.sectionCount());
        for (double f : new double[] {100, 2000, 9000}) {
            assertEquals(a.toDigital(48000).attenuationDb(f) + b.toDigital(48000).attenuationDb(f), d.attenuationDb(f), 1e-9);
        }
    }

    @Test
    @DisplayName("bad input names the parameter and the value")
    void badInput() {
        AnalogFilter a = AnalogLowPass.butterworth(4, 1000);
        assertMessage(() -> a.toDigital(2000), "prewarpHz", "1000.0");
        assertMessage(() -> a.toDigital(0), "sampleRateHz", "0.0");
        assertMessage(() -> DigitalRealisation.of(a, 8000, -3), "prewarpHz", "-3.0");
        SosFilter f = a.toDigital(8000).newFilter();
        assertMessage(() -> f.filterInPlace(new double[] {1, 2, Double.NaN}), "in[2]", "NaN");
        assertMessage(() -> f.filter(new double[4], 2, new double[4], 0, 3), "in", "offset 2");
        assertMessage(() -> new SecondOrderSections(new double[][] {{1, 0, 0, 0, 0, 0}}, 1000), "a0");
        assertMessage(() -> DigitalRealisation.magnitudeError(a, a.toDigital(8000), 5000), "upToHz", "5000.0");
        assertMessage(() -> DigitalRealisation.magnitudeError(a, a.toDigital(8000), 3000, 0), "floorDb", "0.0");
    }

    private static void assertArrayEquals(double[] e, double[] a, double tol) {
        assertArrayEquals(e, a, tol, "");
    }

    private static void assertArrayEquals(double[] e, double[] a, double tol, String what) {
        assertEquals(e.length, a.length, what);
        for (int i = 0; i < e.length; i++) {
            assertEquals(e[i], a[i], tol, what + " [" + i + "]");
        }
    }
}
