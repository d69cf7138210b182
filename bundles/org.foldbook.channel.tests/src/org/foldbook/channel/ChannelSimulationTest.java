package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.RateSpacing;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.model.SweepPlan;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChannelSimulationTest {

    @TempDir
    Path dir;

    private static SweepPlan plan(double max, double min, int count) {
        SweepPlan p = NotebookFactory.eINSTANCE.createSweepPlan();
        p.setMaxRateHz(max);
        p.setMinRateHz(min);
        p.setRateCount(count);
        p.setSpacing(RateSpacing.LINEAR);
        p.setSegmentLength(4096);
        return p;
    }

    @Test
    void theStoredPlanBecomesTheLadder() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Channel c = TestNotebooks.channel(nb, 0);
        c.setSweepPlan(plan(8000, 2000, 4));
        SimulationSetup s = ChannelSimulation.setup(c, SimulationMode.BARE, TestNotebooks.RATE);
        assertEquals(4, s.ladder().size());
        // linear 8000, 6000, 4000, 2000 S/s: exact ratios of 8000
        double[] want = {8000, 6000, 4000, 2000};
        for (int i = 0; i < 4; i++) {
            assertEquals(want[i], s.ladder().steps().get(i).effectiveRate(), 1e-9);
        }
        c.getSweepPlan().setMinRateHz(9000);
        assertThrows(IllegalArgumentException.class,
                () -> ChannelSimulation.setup(c, SimulationMode.BARE, TestNotebooks.RATE));
    }

    @Test
    void bareSweepFoldsTheToneWhereTheFoldFormulaSays() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Channel c = TestNotebooks.channel(nb, 1); // 1250 Hz
        c.setSweepPlan(plan(8000, 2000, 4));
        ChannelData d = ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        SimulationSetup s = ChannelSimulation.setup(c, SimulationMode.BARE, d.rateHz());
        try (SweepEngine engine = new SweepEngine(2)) {
            SweepResult r = ChannelSimulation.run(d, s, engine, SweepProgress.NONE);
            RateResult at2000 = r.rates().get(3);
            assertEquals(2000, at2000.step().effectiveRate(), 1e-9);
            // fold formula |f − k·fs|, k = round(f/fs) (Oppenheim & Schafer ch. 4): 1250 Hz at 2000 S/s → 750 Hz
            double expected = Folding.apparentHz(TestNotebooks.F1, 2000);
            assertEquals(750, expected, 1e-12);
            assertTrue(at2000.observed().stream().anyMatch(p -> Math.abs(p.frequency() - 750) < 2 * 2000.0 / 4096),
                    "a peak near 750 Hz at 2000 S/s: " + at2000.observed());
        }
    }

    @Test
    void filteredModeTakesTheThroughChainAndSaysWhatItSkips() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Channel c = TestNotebooks.channel(nb, 0);
        SimulationSetup own = ChannelSimulation.setup(c, SimulationMode.MODELLED, TestNotebooks.RATE);
        // the recording already passed the channel's own low-pass: it is not applied twice
        assertTrue(own.notes().stream().anyMatch(n -> n.contains("not applied again")), own.notes().toString());
        assertTrue(own.signature().contains("Butterworth"), own.signature());
        assertEquals(3, ChannelSimulation.plannedModes(c).size());
    }
}
