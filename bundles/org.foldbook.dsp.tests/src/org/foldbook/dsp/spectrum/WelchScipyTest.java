package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.stream.Stream;

import org.foldbook.dsp.window.WindowShape;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Welch estimates against scipy.signal.welch on the same input (releng/reference/spectra_vectors.py writes
 * input, parameters and scipy's Pxx; index in welch-cases.txt).
 */
class WelchScipyTest {

    static Stream<String> cases() {
        return ReferenceVectors.lines("welch-cases.txt").stream();
    }

    static WindowShape shape(String name) {
        return switch (name) {
            case "hann" -> WindowShape.HANN;
            case "hamming" -> WindowShape.HAMMING;
            case "blackmanharris" -> WindowShape.BLACKMAN_HARRIS_4;
            case "flattop" -> WindowShape.FLAT_TOP;
            case "boxcar" -> WindowShape.RECTANGULAR;
            default -> {
                if (name.startsWith("kaiser-")) {
                    yield WindowShape.kaiser(Double.parseDouble(name.substring(7)));
                }
                throw new IllegalArgumentException(name);
            }
        };
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void matchesScipyWelch(String line) {
        String[] c = line.trim().split("\\s+");
        String name = c[0];
        double fs = Double.parseDouble(c[2]);
        int nperseg = Integer.parseInt(c[4]);
        Welch welch = Welch.builder(nperseg).overlap(Integer.parseInt(c[5])).window(shape(c[3]))
                .detrend(Detrend.valueOf(c[6].toUpperCase(java.util.Locale.ROOT)))
                .scaling(PsdScaling.valueOf(c[7].toUpperCase(java.util.Locale.ROOT))).build();
        double[] x = ReferenceVectors.column("welch-" + name + "-input.txt", 0);
        assertEquals(Integer.parseInt(c[1]), x.length);
        double[] f = ReferenceVectors.column("welch-" + name + "-psd.txt", 0);
        double[] p = ReferenceVectors.column("welch-" + name + "-psd.txt", 1);
        PowerSpectrum s = welch.psd(x, fs, Unit.VOLT);
        assertEquals(p.length, s.bins());
        double max = Arrays.stream(p).max().orElseThrow();
        for (int k = 0; k < p.length; k++) {
            assertEquals(f[k], s.frequency(k), 1e-12 * fs, "f, bin " + k);
            // relative 1e-9, plus a floor far below the noise (scipy's own rounding at 1e-16 of the peak)
            assertEquals(p[k], s.value(k), 1e-9 * p[k] + 1e-15 * max, name + " bin " + k);
        }

        // zero-allocation path on a slice inside a larger array gives the identical numbers
        double[] padded = new double[x.length + 37];
        System.arraycopy(x, 0, padded, 17, x.length);
        double[] out = new double[welch.bins() + 3];
        Welch.Workspace ws = new Welch.Workspace(nperseg + 10);
        int k = welch.psdInto(padded, 17, x.length, fs, ws, out);
        assertEquals(s.segments(), k);
        for (int b = 0; b < s.bins(); b++) {
            assertEquals(s.value(b), out[b], 0.0);
        }
    }
}
