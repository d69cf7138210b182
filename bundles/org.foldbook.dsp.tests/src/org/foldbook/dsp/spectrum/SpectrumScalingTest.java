package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.foldbook.dsp.window.Window;
import org.foldbook.dsp.window.WindowShape;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Scaling of amplitude spectra and Welch estimates against G. Heinzel, A. Rüdiger, R. Schilling, "Spectrum
 * and spectral density estimation by the DFT..." (MPI für Gravitationsphysik, 2002), sections 9-10:
 * linear spectrum {@code 2|X|/S1} gives a tone's amplitude, power spectrum {@code 2|X|^2/S1^2} its mean
 * square, density {@code 2|X|^2/(fs S2)} the noise's mean square per Hz; and Parseval (P. D. Welch 1967):
 * the integral of the one-sided density is the mean square. Inputs are synthetic tones and seeded noise.
 */
class SpectrumScalingTest {
    private static final double FS = 1000.0;

    private static double[] tone(int n, double cyclesPerBlock, double amplitude, double phase, double offset) {
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = offset + amplitude * Math.sin(2 * Math.PI * cyclesPerBlock * j / n + phase);
        }
        return x;
    }

    private static double[] noise(int n, double sigma, long seed) {
        Random r = new Random(seed);
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = sigma * r.nextGaussian();
        }
        return x;
    }

    static WindowShape[] shapes() {
        return new WindowShape[] {WindowShape.RECTANGULAR, WindowShape.HANN, WindowShape.HAMMING,
                WindowShape.BLACKMAN_HARRIS_4, WindowShape.FLAT_TOP, WindowShape.HFT95, WindowShape.kaiser(9)};
    }

    @ParameterizedTest(name = "n = {0}")
    @ValueSource(ints = {1024, 1001})
    @DisplayName("bin-centred tone: peak amplitude A, rms A/sqrt2, for every window (Heinzel 2002 sec. 9)")
    void toneAmplitude(int n) {
        double a = 3.5;
        double[] x = tone(n, 100, a, 0.4, 0.75);
        for (WindowShape shape : shapes()) {
            Window w = shape.periodic(n);
            AmplitudeSpectrum peak = AmplitudeEstimator.of(w, AmplitudeScale.PEAK, Detrend.NONE).amplitude(x, FS, Unit.VOLT);
            AmplitudeSpectrum rms = AmplitudeEstimator.of(w, AmplitudeScale.RMS, Detrend.NONE).amplitude(x, FS, Unit.VOLT);
            // cosine-sum windows: the image at -100 bins leaks exactly nothing; Kaiser(9): its sidelobes, 2e-8
            double tol = shape.kaiserBeta() > 0 ? 1e-7 : 1e-9;
            assertEquals(a, peak.value(100), tol * a, shape + " peak");
            assertEquals(a / Math.sqrt(2), rms.value(100), tol * a, shape + " rms");
            assertEquals(100 * FS / n, peak.frequency(100), 1e-12);
            if (shape != WindowShape.RECTANGULAR && Double.isNaN(shape.kaiserBeta())) {
                // DC: the mean itself (cosine-sum windows leak nothing from bin 100 into bin 0)
                assertEquals(0.75, peak.value(0), 1e-9, shape + " DC");
                assertEquals(0.75, rms.value(0), 1e-9, shape + " DC rms");
            }
        }
    }

    @Test
    @DisplayName("Nyquist and DC bins are not doubled; tone half-way between bins loses the window's scallop loss")
    void edgesAndScalloping() {
        int n = 64;
        double[] x = new double[n];
        for (int j = 0; j < n; j++) {
            x[j] = 2.0 + 0.5 * ((j & 1) == 0 ? 1 : -1); // DC 2 plus a Nyquist tone of amplitude 0.5
        }
        AmplitudeSpectrum s = AmplitudeEstimator.of(WindowShape.RECTANGULAR.periodic(n), AmplitudeScale.PEAK,
                Detrend.NONE).amplitude(x, FS, Unit.VOLT);
        assertEquals(2.0, s.value(0), 1e-12);
        assertEquals(0.5, s.value(n / 2), 1e-12);
        int m = 4096;
        for (WindowShape shape : shapes()) {
            Window w = shape.periodic(m);
            double[] y = tone(m, 300.5, 1.0, 0.0, 0.0);
            AmplitudeSpectrum a = AmplitudeEstimator.of(w, AmplitudeScale.PEAK, Detrend.NONE).amplitude(y, FS, Unit.VOLT);
            double readDb = 20 * Math.log10(Math.max(a.value(300), a.value(301)));
            // leakage of the negative-frequency image 600 bins away: 0.007 dB through the rectangular window's
            // -13 dB sidelobes, below 1e-3 dB for the others
            double tol = shape == WindowShape.RECTANGULAR ? 0.01 : 1e-3;
            assertEquals(-w.scallopLossDb(), readDb, tol, shape + " scallop");
        }
    }

    @Test
    @DisplayName("power spectrum of a bin-centred tone is its mean square A^2/2; density = spectrum / (ENBW fs/n)")
    void powerSpectrumOfTone() {
        int n = 2048;
        double a = 0.8;
        double[] x = tone(8 * n, 8 * 64, a, 1.0, 0.0); // 64 cycles per segment: bin 64
        for (WindowShape shape : shapes()) {
            Welch ps = Welch.builder(n).window(shape).scaling(PsdScaling.SPECTRUM).build();
            Welch psd = Welch.builder(n).window(shape).scaling(PsdScaling.DENSITY).build();
            PowerSpectrum s = ps.psd(x, FS, Unit.VOLT);
            PowerSpectrum d = psd.psd(x, FS, Unit.VOLT);
            assertEquals(a * a / 2, s.value(64), shape.kaiserBeta() > 0 ? 1e-6 : 1e-9, shape + " A^2/2");
            PowerSpectrum d2 = s.toDensity();
            PowerSpectrum s2 = d.toSpectrum();
            for (int k = 0; k < s.bins(); k++) {
                assertEquals(d.value(k), d2.value(k), 1e-12 * (d.value(k) + 1e-30), shape + " density bin " + k);
                assertEquals(s.value(k), s2.value(k), 1e-12 * (s.value(k) + 1e-30), shape + " spectrum bin " + k);
            }
            assertEquals("V²/Hz", d.valueUnit());
            assertEquals("V²", s.valueUnit());
        }
    }

    @Test
    @DisplayName("white noise of variance s^2: one-sided density 2 s^2 / fs on average (Heinzel 2002 sec. 9)")
    void whiteNoiseDensity() {
        double sigma = 0.3;
        double[] x = noise(1 << 18, sigma, 42);
        PowerSpectrum d = Welch.builder(1024).build().psd(x, FS, Unit.VOLT);
        double mean = 0;
        for (int k = 1; k < d.bins() - 1; k++) {
            mean += d.value(k);
        }
        mean /= d.bins() - 2;
        // 511 segments x 511 bins: the average has a relative spread of about 0.3 %
        assertEquals(2 * sigma * sigma / FS, mean, 0.02 * 2 * sigma * sigma / FS);
    }

    @Test
    @DisplayName("Parseval: integral of the one-sided density = mean square of the detrended segments")
    void parseval() {
        double[] x = noise(10_000, 1.7, 7);
        for (int j = 0; j < x.length; j++) {
            x[j] += 0.4 * Math.sin(0.05 * j) + 2.0;
        }
        // rectangular window, no overlap: exact for every segment length, odd or even
        for (int n : new int[] {1000, 999}) {
            Welch w = Welch.builder(n).window(WindowShape.RECTANGULAR).overlap(0).build();
            PowerSpectrum d = w.psd(x, FS, Unit.VOLT);
            double meanSquare = 0;
            int segs = x.length / n;
            for (int s = 0; s < segs; s++) {
                double mean = 0;
                for (int j = 0; j < n; j++) {
                    mean += x[s * n + j];
                }
                mean /= n;
                for (int j = 0; j < n; j++) {
                    double v = x[s * n + j] - mean;
                    meanSquare += v * v;
                }
            }
            meanSquare /= (double) segs * n;
            assertEquals(segs, d.segments());
            assertEquals(meanSquare, d.totalPower(), 1e-12 * meanSquare, "n = " + n);
        }
        // any window: equal in expectation; on stationary noise within a few per cent
        double variance = 1.7 * 1.7 + 0.4 * 0.4 / 2;
        for (WindowShape shape : shapes()) {
            PowerSpectrum d = Welch.builder(500).window(shape).build().psd(x, FS, Unit.VOLT);
            assertEquals(variance, d.totalPower(), 0.05 * variance, shape.name());
            PowerSpectrum s = Welch.builder(500).window(shape).scaling(PsdScaling.SPECTRUM).build()
                    .psd(x, FS, Unit.VOLT);
            assertEquals(d.totalPower(), s.totalPower(), 1e-9 * variance, shape.name() + " spectrum total");
        }
    }

    @Test
    @DisplayName("units: 100 mV/(m/s²) sensor, 0.25 V tone reads 2.5 m/s²; PSD divides by the square; dB re unit")
    void unitsAndDecibels() {
        int n = 1000;
        Sensitivity acc = Sensitivity.millivoltsPer(100, Unit.METRE_PER_SECOND_SQUARED);
        assertEquals(0.1, acc.voltsPerUnit(), 1e-15);
        double[] x = tone(n, 50, 0.25, 0, 0);
        AmplitudeSpectrum volts = AmplitudeEstimator.of(WindowShape.HANN.periodic(n), AmplitudeScale.PEAK,
                Detrend.CONSTANT).amplitude(x, FS, Unit.VOLT);
        AmplitudeSpectrum accel = volts.inQuantity(acc);
        assertEquals(2.5, accel.value(50), 1e-9);
        assertEquals("m/s² peak", accel.valueUnit());
        // 20 log10(2.5 / 1) = 7.9588 dB re 1 m/s²
        assertEquals(7.958800173440752, accel.levelDb(50, 1.0), 1e-9);
        PowerSpectrum pv = Welch.builder(200).build().psd(tone(4000, 200, 0.25, 0, 0), FS, Unit.VOLT);
        PowerSpectrum pa = pv.inQuantity(acc);
        assertEquals(pv.value(10) / 0.01, pa.value(10), 1e-12 * pa.value(10));
        assertEquals("(m/s²)²/Hz", pa.valueUnit());
        assertEquals(10 * Math.log10(pa.value(10)), pa.levelDb(10, 1.0), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> pa.inQuantity(acc));
        assertEquals(-3000.0, Decibels.power(0.0, 1.0), 0.0);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Sensitivity.millivoltsPer(0, Unit.PASCAL));
        assertTrue(e.getMessage().contains("millivolts") && e.getMessage().contains("0"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Unit.of(" "));
    }
}
