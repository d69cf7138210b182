package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.Locale;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The streamed Welch estimate against scipy.signal.welch on the same input (the vectors of
 * {@link WelchScipyTest}, written by releng/reference/spectra_vectors.py), the input fed in uneven blocks
 * of 1, 7, 100 and 1000 samples so that segment boundaries fall inside blocks and between them.
 */
class WelchAccumulatorScipyTest {

    static Stream<String> cases() {
        return WelchScipyTest.cases();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void streamedEstimateMatchesScipy(String line) {
        String[] c = line.trim().split("\\s+");
        String name = c[0];
        double fs = Double.parseDouble(c[2]);
        int nperseg = Integer.parseInt(c[4]);
        Welch welch = Welch.builder(nperseg).overlap(Integer.parseInt(c[5])).window(WelchScipyTest.shape(c[3]))
                .detrend(Detrend.valueOf(c[6].toUpperCase(Locale.ROOT)))
                .scaling(PsdScaling.valueOf(c[7].toUpperCase(Locale.ROOT))).build();
        double[] x = ReferenceVectors.column("welch-" + name + "-input.txt", 0);
        double[] p = ReferenceVectors.column("welch-" + name + "-psd.txt", 1);
        WelchAccumulator acc = new WelchAccumulator(welch, fs, Unit.VOLT);
        int[] blocks = {1, 7, 100, 1000};
        int pos = 0;
        for (int b = 0; pos < x.length; b++) {
            int len = Math.min(blocks[b % blocks.length], x.length - pos);
            acc.add(x, pos, len);
            pos += len;
        }
        PowerSpectrum s = acc.result();
        assertEquals(welch.segmentCount(x.length), s.segments());
        double max = Arrays.stream(p).max().orElseThrow();
        for (int k = 0; k < p.length; k++) {
            // same tolerance as WelchScipyTest: relative 1e-9 plus a floor at 1e-15 of the peak
            assertEquals(p[k], s.value(k), 1e-9 * p[k] + 1e-15 * max, name + " bin " + k);
        }
    }

    @Test
    void noResultBeforeOneWholeSegment() {
        WelchAccumulator acc = new WelchAccumulator(Welch.builder(64).build(), 1000, Unit.VOLT);
        acc.add(new double[63], 0, 63);
        assertThrows(IllegalStateException.class, acc::result);
    }
}
