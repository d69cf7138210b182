package org.foldbook.dsp.window;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.stream.Stream;

import org.foldbook.dsp.spectrum.ReferenceVectors;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** Window samples against scipy.signal.get_window (vectors from releng/reference/spectra_vectors.py). */
class WindowScipyTest {

    static Stream<Arguments> cases() {
        Stream.Builder<Arguments> b = Stream.builder();
        Object[][] shapes = {{"rectangular", WindowShape.RECTANGULAR}, {"hann", WindowShape.HANN},
                {"hamming", WindowShape.HAMMING}, {"blackman-harris-4", WindowShape.BLACKMAN_HARRIS_4},
                {"flat-top", WindowShape.FLAT_TOP}, {"kaiser-8.6", WindowShape.kaiser(8.6)},
                {"kaiser-0.5", WindowShape.kaiser(0.5)}};
        for (Object[] s : shapes) {
            for (int n : new int[] {64, 65}) {
                for (Symmetry sym : Symmetry.values()) {
                    b.add(Arguments.of(s[0], s[1], n, sym));
                }
            }
        }
        return b.build();
    }

    @ParameterizedTest(name = "{0} n={2} {3}")
    @MethodSource("cases")
    void samplesMatchScipy(String stem, WindowShape shape, int n, Symmetry sym) {
        String file = "window-" + stem + "-" + n + "-" + sym.name().toLowerCase(java.util.Locale.ROOT) + ".txt";
        double[] ref = ReferenceVectors.column(file, 0);
        Window w = shape.create(n, sym);
        assertEquals(ref.length, w.length());
        for (int j = 0; j < n; j++) {
            assertEquals(ref[j], w.get(j), 1e-14, file + " sample " + j);
        }
    }
}
