package org.foldbook.ui.recording;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Arrays;
import java.util.Random;

import org.junit.jupiter.api.Test;

/**
 * The min/max overview against the JDK's own minimum and maximum over each column's slice (SYNTHETIC
 * random input, fixed seed), fed in uneven blocks; its size does not grow with the stream's length.
 */
class MinMaxEnvelopeTest {

    @Test
    void eachColumnHoldsTheExtremesOfItsSlice() {
        double[] x = new Random(7).doubles(10_007, -1, 1).toArray();
        MinMaxEnvelope env = new MinMaxEnvelope(x.length, 100);
        assertEquals(101, env.samplesPerColumn()); // ceil(10007 / 100)
        int pos = 0;
        for (int len : new int[] {1, 333, 4096, 5577}) {
            env.add(Arrays.copyOfRange(x, pos, pos + len), len);
            pos += len;
        }
        assertEquals(x.length, pos);
        assertEquals(100, env.columns()); // ceil(10007 / 101)
        for (int c = 0; c < env.columns(); c++) {
            int from = (int) (c * env.samplesPerColumn());
            int to = (int) Math.min(x.length, from + env.samplesPerColumn());
            assertEquals(Arrays.stream(x, from, to).min().getAsDouble(), env.min(c), 0.0, "column " + c);
            assertEquals(Arrays.stream(x, from, to).max().getAsDouble(), env.max(c), 0.0, "column " + c);
        }
    }

    @Test
    void sizeIsBoundedForAStreamLargerThanMemory() {
        // 10^12 samples (8 TB of doubles): still 2000 columns
        MinMaxEnvelope env = new MinMaxEnvelope(1_000_000_000_000L, RecordingAnalysis.COLUMNS);
        assertEquals(2000, env.columns());
        assertEquals(500_000_000L, env.samplesPerColumn());
        assertThrows(IllegalArgumentException.class, () -> new MinMaxEnvelope(5, 1).add(new double[6], 6));
    }
}
