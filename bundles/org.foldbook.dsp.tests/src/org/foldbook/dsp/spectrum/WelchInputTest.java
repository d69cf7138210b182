package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.foldbook.dsp.window.WindowShape;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;

/** Bad input to Welch and the amplitude estimator: IllegalArgumentException naming parameter and value. */
class WelchInputTest {

    private static void fails(Executable call, String... fragments) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        for (String f : fragments) {
            assertTrue(e.getMessage().contains(f), "'" + e.getMessage() + "' should contain '" + f + "'");
        }
    }

    @Test
    @DisplayName("non-finite samples, rates <= 0, empty, segment longer than data, overlap >= segment")
    void badInput() {
        Welch w = Welch.builder(64).build();
        double[] x = new double[200];
        fails(() -> w.psd(x, 0.0, Unit.VOLT), "sampleRate", "0.0");
        fails(() -> w.psd(x, -5, Unit.VOLT), "sampleRate", "-5");
        fails(() -> w.psd(x, Double.NaN, Unit.VOLT), "sampleRate", "NaN");
        fails(() -> w.psd(new double[0], 1.0, Unit.VOLT), "x", "empty");
        fails(() -> w.psd(new double[63], 1.0, Unit.VOLT), "length", "64", "63");
        double[] bad = new double[200];
        bad[150] = Double.NaN;
        fails(() -> w.psd(bad, 1.0, Unit.VOLT), "x[150]", "NaN");
        bad[150] = 0;
        bad[7] = Double.NEGATIVE_INFINITY;
        fails(() -> Welch.builder(64).detrend(Detrend.NONE).build().psd(bad, 1.0, Unit.VOLT), "x[7]", "Infinity");
        fails(() -> Welch.builder(64).detrend(Detrend.LINEAR).build().psd(bad, 1.0, Unit.VOLT), "x[7]");
        fails(() -> Welch.builder(64).overlap(64), "overlap", "64");
        fails(() -> Welch.builder(64).overlap(-1), "overlap", "-1");
        fails(() -> Welch.builder(0), "segmentLength", "0");
        fails(() -> Welch.builder(64).window(WindowShape.HANN.periodic(65)), "window length", "65");
        fails(() -> Welch.builder(2).window(WindowShape.HANN.symmetric(2)).build(), "positive sum");
        fails(() -> w.psdInto(x, 150, 100, 1.0, new Welch.Workspace(64), new double[33]), "offset 150");
        fails(() -> w.psdInto(x, 0, 100, 1.0, new Welch.Workspace(63), new double[33]), "capacity", "63");
        fails(() -> w.psdInto(x, 0, 100, 1.0, new Welch.Workspace(64), new double[32]), "out.length", "32");
        AmplitudeEstimator a = AmplitudeEstimator.of(WindowShape.HANN.periodic(64), AmplitudeScale.PEAK,
                Detrend.NONE);
        fails(() -> a.amplitude(new double[10], 1.0, Unit.VOLT), "x.length", "10");
        fails(() -> a.amplitude(new double[64], 0.0, Unit.VOLT), "sampleRate");
        double[] y = new double[64];
        y[5] = Double.POSITIVE_INFINITY;
        fails(() -> a.amplitude(y, 1.0, Unit.VOLT), "x[5]");
    }

    @Test
    @DisplayName("segment count: (length - overlap) / step, as scipy; trailing samples unused")
    void segmentCount() {
        Welch w = Welch.builder(100).overlap(30).build();
        assertEquals(1, w.segmentCount(100));
        assertEquals(1, w.segmentCount(169));
        assertEquals(2, w.segmentCount(170));
        assertEquals((1000 - 30) / 70, w.segmentCount(1000));
    }
}
