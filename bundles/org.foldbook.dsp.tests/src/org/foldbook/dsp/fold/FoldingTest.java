package org.foldbook.dsp.fold;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

class FoldingTest {

    @Test
    @DisplayName("common practice: a 1.5 Hz tone sampled at 1.9 S/s appears at 0.4 Hz")
    void slowTone() {
        assertEquals(0.4, Folding.apparentHz(1.5, 1.9), 1e-12);
        assertEquals(-0.4, Folding.signedApparentHz(1.5, 1.9), 1e-12); // from above fs/2: mirrored
        assertEquals(2, Folding.nyquistZone(1.5, 1.9));
    }

    @Test
    @DisplayName("common practice: at 20 kS/s Nyquist is 10 kHz and 10–40 kHz folds into 0–10 kHz")
    void twentyKiloSamples() {
        double fs = 20_000;
        for (double f = 10_000; f <= 40_000; f += 250) {
            double a = Folding.apparentHz(f, fs);
            assertTrue(a >= 0 && a <= 10_000, f + " -> " + a);
        }
        assertEquals(10_000, Folding.apparentHz(10_000, fs), 0);
        assertEquals(7_000, Folding.apparentHz(13_000, fs), 1e-9);
        assertEquals(3_000, Folding.apparentHz(23_000, fs), 1e-9);
        assertEquals(0, Folding.apparentHz(40_000, fs), 1e-9);
        assertEquals(5, Folding.nyquistZone(40_000, fs));
        // and every true frequency up to 40 kHz that shows at 3 kHz
        assertArrayEquals(new double[] {3_000, 17_000, 23_000, 37_000}, Folding.trueFrequencies(3_000, fs, 40_000), 1e-9);
        assertArrayEquals(new double[] {10_000, 30_000}, Folding.trueFrequencies(10_000, fs, 40_000), 1e-9);
        assertArrayEquals(new double[] {0, 20_000, 40_000}, Folding.trueFrequencies(0, fs, 40_000), 1e-9);
    }

    @Test
    @DisplayName("sampling identity (Oppenheim & Schafer ch. 4): cos(2πf·n/fs) equals cos(2π·apparent·n/fs) for all n")
    void samplesAreIdentical() {
        Random rnd = new Random(3); // synthetic tones
        for (int t = 0; t < 200; t++) {
            double fs = 100 + 10_000 * rnd.nextDouble();
            double f = 50 * fs * rnd.nextDouble();
            double a = Folding.signedApparentHz(f, fs);
            assertTrue(a >= -fs / 2 && a < fs / 2);
            for (int n = 0; n < 50; n++) {
                double ph = 2 * Math.PI * n / fs;
                // complex exponential: both real and imaginary parts agree, so the sign is right
                assertEquals(Math.cos(ph * f), Math.cos(ph * a), 1e-9, "f=" + f + " fs=" + fs + " n=" + n);
                assertEquals(Math.sin(ph * f), Math.sin(ph * a), 1e-9, "f=" + f + " fs=" + fs + " n=" + n);
            }
            // the inverse contains the tone itself
            double[] back = Folding.trueFrequencies(Math.abs(a), fs, f + 1);
            boolean found = false;
            for (double b : back) {
                found |= Math.abs(b - f) < 1e-6 * f;
                assertEquals(Math.abs(a), Folding.apparentHz(b, fs), 1e-6);
            }
            assertTrue(found, "tone " + f + " among " + back.length);
        }
    }

    @Test
    @DisplayName("Nyquist zones: [(z−1)·fs/2, z·fs/2), even zones mirrored")
    void zones() {
        assertEquals(1, Folding.nyquistZone(0, 1000));
        assertEquals(1, Folding.nyquistZone(499.999, 1000));
        assertEquals(2, Folding.nyquistZone(500, 1000));
        assertEquals(3, Folding.nyquistZone(1200, 1000));
        assertTrue(Folding.isMirroredZone(2));
        assertFalse(Folding.isMirroredZone(3));
        // in a mirrored zone the apparent frequency falls as the true one rises
        assertTrue(Folding.apparentHz(610, 1000) < Folding.apparentHz(600, 1000));
        assertTrue(Folding.apparentHz(1210, 1000) > Folding.apparentHz(1200, 1000));
    }

    @Test
    @DisplayName("fold map: vertices exactly at fs = 2f/m, linear between (checked at interior points)")
    void foldMapIsExactPolyline() {
        double f = 1234.5;
        FoldSeries s = FoldMap.series(f, 100, 5000);
        double[] r = s.rateHz();
        double[] a = s.apparentHz();
        assertEquals(100, r[0]);
        assertEquals(5000, r[r.length - 1]);
        // m from ceil(2f/5000)=1 to floor(2f/100)=24 → 24 vertices + 2 ends
        assertEquals(26, s.size());
        for (int i = 1; i + 1 < r.length; i++) {
            double m = 2 * f / r[i];
            assertEquals(Math.rint(m), m, 1e-9, "vertex at 2f/m");
            assertEquals(Folding.apparentHz(f, r[i]), a[i], 1e-9);
        }
        Random rnd = new Random(11);
        for (int i = 0; i + 1 < r.length; i++) {
            for (int j = 0; j < 20; j++) {
                double t = rnd.nextDouble();
                double fs = r[i] + t * (r[i + 1] - r[i]);
                double linear = a[i] + t * (a[i + 1] - a[i]);
                assertEquals(Folding.apparentHz(f, fs), linear, 1e-8, "between vertices at " + fs);
            }
        }
        // above 2f the tone is below Nyquist: no fold
        FoldSeries high = FoldMap.series(f, 2 * f, 10 * f);
        assertEquals(2, high.size());
        assertEquals(f, high.apparentHz()[1], 1e-9);
        assertEquals(3, FoldMap.series(new double[] {1, 2, 3}, 1, 10).size());
    }

    @Test
    @DisplayName("common practice: film at 60 frames/s can show a rotating pattern standing still or turning backwards")
    void wagonWheel() {
        // 12 spokes at 5 rev/s = 60 repeats/s: one repeat per frame
        RotationSeenByCamera still = RotationSeenByCamera.of(12, 5, 60);
        assertEquals(ApparentMotion.STANDS_STILL, still.motion());
        assertEquals(0, still.apparentRevolutionsPerSecond(), 0);
        // 12 spokes at 4.75 rev/s = 57 repeats/s: each frame the pattern is 3/60 s behind → −3 Hz
        RotationSeenByCamera back = RotationSeenByCamera.of(12, 4.75, 60);
        assertEquals(ApparentMotion.TURNS_BACKWARD, back.motion());
        assertEquals(-3, back.apparentPatternHz(), 1e-9);
        assertEquals(-0.25, back.apparentRevolutionsPerSecond(), 1e-9);
        // slightly faster than one repeat per frame: slowly forwards
        RotationSeenByCamera fwd = RotationSeenByCamera.of(12, 5.25, 60);
        assertEquals(ApparentMotion.TURNS_FORWARD, fwd.motion());
        assertEquals(0.25, fwd.apparentRevolutionsPerSecond(), 1e-9);
        // reversed true rotation, same rule mirrored
        assertEquals(ApparentMotion.TURNS_BACKWARD, RotationSeenByCamera.of(12, -4.75, 60).motion());
        assertEquals(0.25, RotationSeenByCamera.of(12, -4.75, 60).apparentRevolutionsPerSecond(), 1e-9);
        // half the frame rate: two alternating images
        assertEquals(ApparentMotion.FLICKERS_WITHOUT_DIRECTION, RotationSeenByCamera.of(1, 30, 60).motion());
        // slow enough: seen as it is
        RotationSeenByCamera slow = RotationSeenByCamera.of(3, 2, 60);
        assertEquals(ApparentMotion.TURNS_FORWARD, slow.motion());
        assertEquals(2, slow.apparentRevolutionsPerSecond(), 1e-12);
    }

    @Test
    @DisplayName("bad input names the parameter and the value")
    void badInput() {
        assertMessage(() -> Folding.apparentHz(1, 0), "sampleRateHz", "0.0");
        assertMessage(() -> Folding.apparentHz(Double.NaN, 1), "frequencyHz", "NaN");
        assertMessage(() -> Folding.trueFrequencies(600, 1000, 5000), "observedHz", "600.0");
        assertMessage(() -> Folding.nyquistZone(-1, 1000), "frequencyHz", "-1.0");
        assertMessage(() -> FoldMap.series(100, 50, 40), "maxRateHz", "40.0");
        assertMessage(() -> FoldMap.series(1e9, 1e-3, 1), "vertices");
        assertMessage(() -> FoldMap.series(new double[] {1, Double.NaN}, 1, 2), "tonesHz[1]", "NaN");
        assertMessage(() -> RotationSeenByCamera.of(0, 1, 60), "repeatsPerRevolution", "0");
        assertMessage(() -> RotationSeenByCamera.of(1, 1, -60), "frameRateHz", "-60.0");
    }

    static void assertMessage(Executable e, String... parts) {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, e);
        for (String p : parts) {
            assertTrue(x.getMessage().contains(p), () -> "message '" + x.getMessage() + "' should contain '" + p + "'");
        }
    }
}
