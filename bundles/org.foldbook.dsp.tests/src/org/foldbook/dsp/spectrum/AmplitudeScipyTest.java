package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Stream;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Amplitude spectra against scipy.signal.periodogram(x, fs, window, detrend, scaling='spectrum'), whose
 * one-sided power spectrum is the squared rms amplitude of each bin (vectors from
 * releng/reference/spectra_vectors.py, index periodogram-cases.txt).
 */
class AmplitudeScipyTest {

    static Stream<String> cases() {
        return ReferenceVectors.lines("periodogram-cases.txt").stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void rmsSquaredIsScipyPowerSpectrum(String line) {
        String[] c = line.trim().split("\\s+");
        double fs = Double.parseDouble(c[2]);
        double[] x = ReferenceVectors.column("periodogram-" + c[0] + "-input.txt", 0);
        assertEquals(Integer.parseInt(c[1]), x.length);
        double[] f = ReferenceVectors.column("periodogram-" + c[0] + ".txt", 0);
        double[] p = ReferenceVectors.column("periodogram-" + c[0] + ".txt", 1);
        Detrend detrend = Detrend.valueOf(c[4].toUpperCase(Locale.ROOT));
        AmplitudeEstimator rms = AmplitudeEstimator.of(WelchScipyTest.shape(c[3]).periodic(x.length),
                AmplitudeScale.RMS, detrend);
        AmplitudeEstimator peak = AmplitudeEstimator.of(WelchScipyTest.shape(c[3]).periodic(x.length),
                AmplitudeScale.PEAK, detrend);
        AmplitudeSpectrum r = rms.amplitude(x, fs, Unit.VOLT);
        AmplitudeSpectrum a = peak.amplitude(x, fs, Unit.VOLT);
        assertEquals(p.length, r.bins());
        double max = Arrays.stream(p).max().orElseThrow();
        int n = x.length;
        for (int k = 0; k < p.length; k++) {
            assertEquals(f[k], r.frequency(k), 1e-12 * fs);
            double v = r.value(k);
            assertEquals(p[k], v * v, 1e-9 * p[k] + 1e-15 * max, c[0] + " bin " + k);
            boolean doubled = k > 0 && !(n % 2 == 0 && k == n / 2);
            assertEquals(doubled ? Math.sqrt(2) * v : v, a.value(k), 1e-12 * (v + 1e-300), "peak/rms, bin " + k);
        }
    }
}
