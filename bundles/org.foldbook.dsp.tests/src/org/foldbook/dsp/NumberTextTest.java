package org.foldbook.dsp;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** Typed numbers: the values are those of Double.parseDouble (the JDK's parser) on the same text. */
class NumberTextTest {

    @Test
    void parsesWhatPeopleType() {
        assertEquals(25600, NumberText.positive("sampling rate", " 25600 "), 0);
        assertEquals(-30, NumberText.finite("level", "\u221230"), 0); // typographic minus
        assertEquals(Double.parseDouble("1e4"), NumberText.positive("cutoff", "1e4"), 0);
        assertArrayEquals(new double[] {906.5, 1813, 2719.5}, NumberText.positiveList("tone", "906.5, 1813;2719.5"), 0);
        assertEquals(20, NumberText.atLeast("steps", "20", 1));
    }

    @Test
    void errorsNameWhatWasAskedAndQuoteTheText() {
        assertEquals("Sampling rate is not a number: 'fast'.",
                assertThrows(IllegalArgumentException.class, () -> NumberText.positive("sampling rate", "fast")).getMessage());
        assertEquals("Filter cutoff must be a positive number, was '-5'.",
                assertThrows(IllegalArgumentException.class, () -> NumberText.positive("filter cutoff", "-5")).getMessage());
        assertEquals("Level must be a finite number, was 'Infinity'.",
                assertThrows(IllegalArgumentException.class, () -> NumberText.finite("level", "Infinity")).getMessage());
        assertEquals("Steps must be at least 1, was '0'.",
                assertThrows(IllegalArgumentException.class, () -> NumberText.atLeast("steps", "0", 1)).getMessage());
        assertThrows(IllegalArgumentException.class, () -> NumberText.positiveList("tone", " , "));
    }
}
