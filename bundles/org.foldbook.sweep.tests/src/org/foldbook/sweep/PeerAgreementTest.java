package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Per-rate peak lists against the peer implementation (numpy 1.24 / scipy 1.10, Debian python3-scipy),
 * written by releng/reference/sweep_vectors.py: the peer's synthetic recording (clearly synthetic: five
 * tones + seeded noise, 16384 samples at 100 kS/s), its 16-rate grid, and its --details peak lists.
 * Expected: the same bins, levels within 0.01 dB (docs/REFERENCES.md: our reference pipeline; same answers first).
 */
class PeerAgreementTest {
    static final double FS0 = 100_000;
    static SweepEngine engine;
    static double[] signal;
    static RateLadder grid;
    static Map<String, Object> details;

    @BeforeAll
    static void load() throws IOException {
        engine = new SweepEngine(2);
        signal = TestData.float64("peer_signal.f64");
        grid = RateLadder.readGrid(TestData.reader("peer_grid.txt"), "peer_grid.txt", FS0);
        details = TestJson.obj(TestJson.parse(TestData.text("peer_details.json")));
    }

    @AfterAll
    static void close() {
        engine.close();
    }

    @Test
    @DisplayName("bare-kernel mode: every rate's peaks = peer mode a (scipy welch + find_peaks), levels within 0.01 dB")
    void bareModeMatchesPeerModeA() {
        SweepResult r = engine.run(signal, grid, Resampling.bareKernel(), SpectrumSettings.PROMINENCE_ONLY, SweepProgress.NONE);
        assertSameAsPeer(r, TestJson.arr(details.get("a")));
    }

    @Test
    @DisplayName("polyphase-default mode: every rate's peaks = peer mode b (scipy.signal.resample_poly defaults)")
    void peerPolyModeMatchesPeerModeB() {
        SweepResult r = engine.run(signal, grid, Resampling.polyphaseDefault(), SpectrumSettings.PROMINENCE_ONLY,
                SweepProgress.NONE);
        assertSameAsPeer(r, TestJson.arr(details.get("b")));
    }

    static void assertSameAsPeer(SweepResult r, List<Object> peer) {
        assertEquals(peer.size(), r.rates().size(), "rate count");
        int compared = 0;
        for (Object o : peer) {
            Map<String, Object> pr = TestJson.obj(o);
            int index = ((Double) pr.get("index")).intValue();
            RateResult mine = r.rates().get(index);
            assertEquals(((Double) pr.get("up")).intValue(), mine.step().up(), "up at rate " + index);
            assertEquals(((Double) pr.get("down")).intValue(), mine.step().down(), "down at rate " + index);
            assertEquals(((Double) pr.get("n_out")).longValue(), mine.outputSamples(), "n_out at rate " + index);
            assertEquals((Double) pr.get("fs") / (Double) pr.get("nperseg"), mine.binWidth(), 1e-9,
                    "bin width at rate " + index);
            List<Object> f = TestJson.arr(pr.get("freqs"));
            List<Object> l = TestJson.arr(pr.get("levels_db"));
            List<Double> myF = new ArrayList<>();
            for (ObservedPeak p : mine.observed()) {
                myF.add(p.frequency());
            }
            assertEquals(f.size(), mine.observed().size(), "peak count at rate " + index + ": peer " + f + " vs " + myF);
            for (int k = 0; k < f.size(); k++) {
                ObservedPeak p = mine.observed().get(k);
                assertEquals((Double) f.get(k), p.frequency(), 1e-6 * mine.binWidth(), "peak " + k + " at rate " + index);
                assertEquals((Double) l.get(k), p.levelDb(), 0.01, "level of peak " + k + " at rate " + index);
                compared++;
            }
        }
        assertTrue(compared > 100, "compared " + compared + " peaks");
    }
}
