package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.sweep.ObservedPeak;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SourceFate;
import org.foldbook.sweep.SourcePeak;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo's survey channel, simulated from the notebook as a user would: its stored plan down to the
 * everyday 25.6 kS/s, bare and through the everyday chain. Where the scenario's components land is
 * checked against the fold formula |f − k·fs| (Oppenheim &amp; Schafer ch. 4) and LP-A's attenuation
 * against the Butterworth closed form 10·log10(1 + (f/fc)^8).
 */
class DemoSurveyTest {
    @TempDir
    static Path dir;
    static SweepResult bare;
    static SweepResult filtered;
    static final double EVERYDAY = 25600;

    @BeforeAll
    static void simulate() throws IOException {
        Notebook nb = NotebookStore.load(GearboxDemo.write(dir));
        Channel survey = nb.getExperiments().get(2).getChannels().get(0);
        ChannelData data = ChannelReader.read(survey, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        try (SweepEngine engine = new SweepEngine(2)) {
            bare = ChannelSimulation.run(data, ChannelSimulation.setup(survey, SimulationMode.BARE, data.rateHz()),
                    engine, SweepProgress.NONE);
            filtered = ChannelSimulation.run(data, ChannelSimulation.setup(survey, SimulationMode.MODELLED, data.rateHz()),
                    engine, SweepProgress.NONE);
        }
        for (SweepResult r : new SweepResult[] {bare, filtered}) {
            RateResult last = last(r);
            System.out.printf(Locale.ROOT, "%s at %.1f S/s%n", r.mode(), last.step().effectiveRate());
            for (SourceFate f : last.fates()) {
                SourcePeak p = r.sources().get(f.sourcePeak());
                System.out.printf(Locale.ROOT, "  %10.2f Hz %7.1f dB -> %-10s at %9.2f Hz gain %6.1f dB%n", p.frequency(),
                        p.levelDb(), f.verdict().key(), f.apparentFrequency(), f.gainDb());
            }
        }
    }

    static RateResult last(SweepResult r) {
        RateResult last = r.rates().get(r.rates().size() - 1);
        assertEquals(EVERYDAY, last.step().effectiveRate(), 1e-6);
        return last;
    }

    static Optional<ObservedPeak> seenNear(SweepResult r, double hz) {
        RateResult last = last(r);
        return last.observed().stream().filter(p -> Math.abs(p.frequency() - hz) <= 2 * last.binWidth()).findFirst();
    }

    static double levelAt(SweepResult r, double hz) {
        return seenNear(r, hz).orElseThrow(() -> new AssertionError("no peak near " + hz + " Hz")).levelDb();
    }

    @Test
    void meshTonesSurviveAtTheirTrueFrequency() {
        assertTrue(seenNear(bare, GearboxDemo.MESH_HZ_FOR_TESTS).isPresent());
        assertTrue(seenNear(filtered, GearboxDemo.MESH_HZ_FOR_TESTS).isPresent());
    }

    @Test
    void theBearingToneFoldsIntoTheBandEvenThroughTheEverydayFilter() {
        double lands = Folding.apparentHz(22100, EVERYDAY);
        assertEquals(3500, lands, 1e-9);
        double drop = levelAt(bare, lands) - levelAt(filtered, lands);
        assertEquals(10 * Math.log10(1 + Math.pow(2.21, 8)), drop, 1.0); // 27.6 dB
    }

    @Test
    void theInverterFoldsBareButTheEverydayFilterRemovesIt() {
        double lands = Folding.apparentHz(60000, EVERYDAY);
        assertEquals(8800, lands, 1e-9);
        assertTrue(seenNear(bare, lands).isPresent(), "bare: 60 kHz seen at 8.8 kHz");
        assertTrue(seenNear(filtered, lands).isEmpty(), "through LP-A: nothing at 8.8 kHz");
    }
}
