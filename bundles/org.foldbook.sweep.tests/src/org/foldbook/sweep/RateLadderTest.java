package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class RateLadderTest {

    @Test
    @DisplayName("geometric ladder = peer grid (numpy.geomspace + Fraction.limit_denominator(1000)), 100 rates")
    void geometricMatchesNumpyGeomspaceAndPythonFractions() throws IOException {
        RateLadder peer = RateLadder.readGrid(TestData.reader("peer_grid_100.txt"), "peer_grid_100.txt", 100_000);
        RateLadder mine = RateLadder.geometric(100_000, 100_000, 2000, 100, 1000);
        assertEquals(peer.size(), mine.size());
        for (int i = 0; i < peer.size(); i++) {
            assertEquals(peer.get(i).up(), mine.get(i).up(), "up at " + i);
            assertEquals(peer.get(i).down(), mine.get(i).down(), "down at " + i);
        }
        // docs/REFERENCES.md (reference pipeline): 100 rates, 2 of them integer ratios (1/1 and 1/50), up <= 765, down <= 1000
        assertEquals(2, mine.steps().stream().filter(RateStep::isIntegerDecimation).count());
        assertTrue(mine.steps().stream().allMatch(s -> s.up() <= 765 && s.down() <= 1000));
    }

    @Test
    @DisplayName("16-rate geometric ladder = the committed peer grid")
    void smallGridMatchesPeer() throws IOException {
        RateLadder peer = RateLadder.readGrid(TestData.reader("peer_grid.txt"), "peer_grid.txt", 100_000);
        RateLadder mine = RateLadder.geometric(100_000, 100_000, 2000, 16, 1000);
        for (int i = 0; i < peer.size(); i++) {
            assertEquals(peer.get(i).ratio(), mine.get(i).ratio(), "ratio at " + i);
        }
        // effective rate reported exactly: 100000*443/575 (peer grid line 1: 77043.478260870)
        assertEquals(77043.478260870, mine.get(1).effectiveRate(), 1e-6);
    }

    @Test
    @DisplayName("linear ladder: numpy.linspace points; duplicates after snapping are dropped")
    void linearAndDuplicates() {
        // 48000 -> 44100 -> ...: 44100/48000 = 147/160 exactly (worked example: CD vs DAT rates)
        RateLadder l = RateLadder.ofRates(48_000, new double[] {48_000, 44_100, 44_100.001, 24_000}, 1000);
        assertEquals(3, l.size());
        assertEquals(147, l.get(1).up());
        assertEquals(160, l.get(1).down());
        assertEquals(2, l.get(2).index());
        double[] pts = RateLadder.linspace(10, 1, 4);
        assertEquals(10, pts[0]);
        assertEquals(7, pts[1], 1e-15);
        assertEquals(1, pts[3]);
    }

    @Test
    @DisplayName("bad input names the parameter or file line")
    void badInput() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RateLadder.ofRates(1000, new double[] {500, 2000}, 100));
        assertTrue(e.getMessage().contains("rates[1]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> RateLadder.readGrid(new StringReader("0 1 1 1000\n1 1 two 500\n"), "g.txt", 1000));
        assertTrue(e.getMessage().contains("g.txt line 2"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> RateLadder.readGrid(new StringReader("0 1 2 400\n"), "g.txt", 1000));
        assertTrue(e.getMessage().contains("does not match"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> RateLadder.readGrid(new StringReader("# nothing\n"), "empty.txt", 1000));
        assertTrue(e.getMessage().contains("empty.txt"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> RateLadder.geometric(1000, 1000, 0, 5, 100));
    }
}
