package org.foldbook.dsp;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The argument checks name the parameter and the value, and let good values through unchanged. */
class CheckTest {

    @Test
    void rejectsNonPositiveRateWithNameAndValue() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Check.positive("sampleRateHz", -2.5));
        assertTrue(e.getMessage().contains("sampleRateHz"), e.getMessage());
        assertTrue(e.getMessage().contains("-2.5"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Check.positive("sampleRateHz", Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Check.positive("sampleRateHz", Double.POSITIVE_INFINITY));
        assertEquals(48000.0, Check.positive("sampleRateHz", 48000.0));
    }

    @Test
    void findsTheFirstNonFiniteSample() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Check.finiteSamples("samples", new double[] {0, 1, Double.NaN}));
        assertTrue(e.getMessage().contains("samples[2]"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Check.finiteSamples("samples", new double[0]));
    }

    @Test
    void rejectsSliceOutsideArray() {
        assertThrows(IllegalArgumentException.class, () -> Check.slice("block", 10, 8, 4));
        Check.slice("block", 10, 6, 4);
    }
}
