package org.foldbook.dsp.resample;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class RateRatioTest {

    @Test
    @DisplayName("nearest() equals Python fractions.Fraction(r).limit_denominator(d) (limit_denominator.txt)")
    void matchesPythonLimitDenominator() {
        List<String[]> rows = ReferenceVectors.rows("limit_denominator.txt");
        assertTrue(rows.size() > 50);
        for (String[] r : rows) {
            double ratio = Double.parseDouble(r[0]);
            RateRatio got = RateRatio.nearest(ratio, Long.parseLong(r[1]));
            assertEquals(r[2] + "/" + r[3], got.toString(), "ratio " + r[0] + " max_den " + r[1]);
        }
    }

    @Test
    @DisplayName("Python docstring examples of limit_denominator: pi -> 22/7 (10), 311/99 (100)")
    void pythonDocExamples() {
        // Values from the docstring of fractions.Fraction.limit_denominator (CPython 3.11).
        assertEquals(RateRatio.of(22, 7), RateRatio.nearest(3.141592653589793, 10));
        assertEquals(RateRatio.of(311, 99), RateRatio.nearest(3.141592653589793, 100));
        assertEquals(RateRatio.of(4321, 8765), RateRatio.nearest(4321.0 / 8765.0, 10000));
    }

    @Test
    @DisplayName("the peer's default grid of 100 rates: same up/down and effective rate (rate_grid_default.txt)")
    void peerGrid() {
        List<String[]> rows = ReferenceVectors.rows("rate_grid_default.txt");
        assertEquals(100, rows.size());
        int integer = 0;
        for (String[] r : rows) {
            RateRatio q = RateRatio.nearest(Double.parseDouble(r[4]), 1000);
            assertEquals(Long.parseLong(r[1]), q.up(), "index " + r[0]);
            assertEquals(Long.parseLong(r[2]), q.down(), "index " + r[0]);
            assertEquals(Double.parseDouble(r[3]), q.effectiveRate(100000.0), 5e-9, "index " + r[0]);
            integer += q.isIntegerDecimation() ? 1 : 0;
        }
        assertEquals(2, integer, "docs/REFERENCES.md (reference pipeline): 2 integer ratios (1/1 and 1/50) in the default grid");
    }

    @Test
    @DisplayName("output count ceil(N·up/down) equals scipy.signal.resample_poly's output lengths")
    void outputLengthAsScipy() {
        for (String name : new String[] {"poly_1_2.txt", "poly_2_3.txt", "poly_3_7.txt", "poly_1_50.txt",
                "poly_7_5.txt", "poly_556_571.txt", "poly_19_1000.txt", "poly_5_1.txt"}) {
            String[] ud = name.substring(5, name.length() - 4).split("_");
            RateRatio q = RateRatio.of(Long.parseLong(ud[0]), Long.parseLong(ud[1]));
            assertEquals(ReferenceVectors.column(name).length, q.outputLength(ReferenceVectors.inputFor(name).length), name);
        }
    }

    @Test
    void reducesAndOrders() {
        RateRatio a = RateRatio.of(500, 1000);
        assertEquals(1, a.up());
        assertEquals(2, a.down());
        assertTrue(a.isIntegerDecimation());
        assertEquals(RateRatio.of(1, 2), a);
        assertEquals(RateRatio.of(1, 2).hashCode(), a.hashCode());
        assertTrue(RateRatio.of(2, 3).compareTo(RateRatio.of(3, 4)) < 0);
        assertTrue(RateRatio.of(Long.MAX_VALUE / 2, Long.MAX_VALUE / 2 - 1).compareTo(RateRatio.of(1, 1)) > 0);
        assertEquals(0, RateRatio.of(4, 6).compareTo(RateRatio.of(2, 3)));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.0, -0.5, Double.NaN, Double.POSITIVE_INFINITY})
    void rejectsBadRatio(double r) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> RateRatio.nearest(r, 1000));
        assertTrue(e.getMessage().contains("ratio") && e.getMessage().contains(String.valueOf(r)), e.getMessage());
    }

    @Test
    void rejectsBadParts() {
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RateRatio.nearest(0.5, 0)).getMessage()
                .contains("maxDenominator"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RateRatio.of(0, 3)).getMessage().contains("up"));
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RateRatio.of(3, -1)).getMessage().contains("down"));
        // 1e-5 with denominators <= 1000 rounds to 0/1 (Python gives Fraction(0, 1)): no rate
        assertTrue(assertThrows(IllegalArgumentException.class, () -> RateRatio.nearest(1e-5, 1000)).getMessage()
                .contains("1.0E-5"));
        assertThrows(IllegalArgumentException.class, () -> RateRatio.of(1, 2).effectiveRate(Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> RateRatio.of(1, 2).outputLength(-1));
    }
}
