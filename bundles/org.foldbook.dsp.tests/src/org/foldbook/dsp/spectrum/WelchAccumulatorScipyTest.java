package org.foldbook.dsp.spectrum;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
        WelchAccumulator acc = new WelchAccumulator(welch, fs);
        int[] blocks = {1, 7, 100, 1000};
        int pos = 0;
        for (int b = 0; pos < x.length; b++) {
            int len = Math.min(blocks[b % blocks.length], x.length - pos);
            acc.add(x, pos, len);
            pos += len;
        }
        PowerSpectrum s = acc.finish(Unit.VOLT);
        assertEquals(welch.segmentCount(x.length), s.segments());
        double max = Arrays.stream(p).max().orElseThrow();
        for (int k = 0; k < p.length; k++) {
            // same tolerance as WelchScipyTest: relative 1e-9 plus a floor at 1e-15 of the peak
            assertEquals(p[k], s.value(k), 1e-9 * p[k] + 1e-15 * max, name + " bin " + k);
        }
    }

    @Test
    void noResultBeforeOneWholeSegment() {
        WelchAccumulator acc = new WelchAccumulator(Welch.builder(64).build(), 1000);
        acc.add(new double[63], 0, 63);
        assertEquals(0, acc.segments());
        assertThrows(IllegalStateException.class, () -> acc.finish(Unit.VOLT));
    }

    /**
     * Within one chunk the accumulator is one {@link Welch#psdInto} to the last bit; beyond it, the result
     * depends only on the samples, not on how they were split into blocks or fed (copied or written in
     * place), and a reset accumulator gives the same bits again. Synthetic input: a seeded random signal.
     */
    @Test
    void sameBitsWhateverTheFeeding() {
        Welch welch = Welch.builder(128).build();
        double[] x = new java.util.Random(13).doubles(128 * 40).toArray();
        int inOneChunk = 128 + (WelchAccumulator.SEGMENTS_PER_CHUNK - 1) * welch.step();
        double[] direct = new double[welch.bins()];
        welch.psdInto(x, 0, inOneChunk, 500, new Welch.Workspace(128), direct);
        double[] one = new double[welch.bins()];
        WelchAccumulator acc = new WelchAccumulator(welch, 500);
        acc.add(x, 0, inOneChunk);
        acc.finish(one);
        assertArrayEquals(direct, one);

        double[] whole = new double[welch.bins()];
        acc.reset(welch, 500);
        acc.add(x, 0, x.length);
        assertEquals(welch.segmentCount(x.length), acc.segments());
        assertEquals(welch.segmentCount(x.length), acc.finish(whole));

        double[] blocks = new double[welch.bins()];
        acc.reset(welch, 500);
        for (int pos = 0, b = 1; pos < x.length; b = b * 3 % 1000 + 1) {
            int len = Math.min(b, x.length - pos);
            acc.add(x, pos, len);
            pos += len;
        }
        acc.finish(blocks);
        assertArrayEquals(whole, blocks);

        double[] inPlace = new double[welch.bins()];
        WelchAccumulator reused = new WelchAccumulator(1024);
        reused.reset(welch, 500);
        for (int pos = 0; pos < x.length; ) {
            int len = Math.min(Math.min(reused.room(), 77), x.length - pos);
            System.arraycopy(x, pos, reused.buffer(), reused.position(), len);
            reused.advance(len);
            pos += len;
        }
        reused.finish(inPlace);
        assertArrayEquals(whole, inPlace);
        assertThrows(IllegalStateException.class, () -> reused.add(x, 0, 1));
    }

    @Test
    void refusesSegmentsLongerThanItsCapacity() {
        WelchAccumulator acc = new WelchAccumulator(64);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> acc.reset(Welch.builder(128).build(), 1000));
        assertTrue(e.getMessage().contains("capacity 64"), e.getMessage());
        assertThrows(IllegalStateException.class, () -> acc.add(new double[1], 0, 1));
    }
}
