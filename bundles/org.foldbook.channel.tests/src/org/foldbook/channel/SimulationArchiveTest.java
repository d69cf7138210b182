package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;

import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.SimulationRun;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Kept simulations: written beside the notebook, referred to from the experiment, read back after the
 * notebook is reopened to the same result (the JSON the sweep writes, compared member by member by
 * Jackson's tree equality), and stale once the recording's checksum or a chain setting changes.
 */
class SimulationArchiveTest {
    @TempDir
    Path dir;

    private Notebook nb;
    private Channel channel;
    private SimulationSetup setup;
    private ChannelData data;
    private SweepResult result;

    @BeforeEach
    void run() throws IOException {
        nb = TestNotebooks.write(dir);
        channel = TestNotebooks.channel(nb, 0);
        data = ChannelReader.read(channel, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        setup = ChannelSimulation.setup(channel, SimulationMode.MODELLED, data.rateHz()).withBand(0, 1000);
        try (SweepEngine engine = new SweepEngine(1)) {
            result = ChannelSimulation.run(data, setup, engine, SweepProgress.NONE);
        }
    }

    private SimulationRun keep() throws IOException {
        SimulationRun run = SimulationArchive.save(channel, setup, data, result, Instant.parse("2026-12-03T10:15:30Z"));
        ((org.foldbook.model.Experiment) channel.eContainer()).getSimulations().add(run);
        return run;
    }

    @Test
    void keptRunSurvivesReopening() throws IOException {
        SimulationRun run = keep();
        assertEquals("simulations/run1-channel1-modelled.json", run.getPath());
        assertTrue(Files.isRegularFile(dir.resolve(run.getPath())));
        Path file = dir.resolve("test.foldbook");
        NotebookStore.save(nb, file);

        Notebook again = NotebookStore.load(file);
        Channel c = TestNotebooks.channel(again, 0);
        SimulationRun back = SimulationArchive.latest(c, SimulationMode.MODELLED).orElseThrow();
        assertEquals(Optional.empty(), SimulationArchive.staleness(back));
        assertEquals(data.sha256(), back.getSourceSha256());
        SimulationArchive.Kept kept = SimulationArchive.load(back);
        assertEquals(Instant.parse("2026-12-03T10:15:30Z"), kept.finishedOn());
        assertEquals(setup.signature(), kept.setupSignature());
        ObjectMapper m = new ObjectMapper();
        JsonNode expected = m.readTree(result.toJson());
        JsonNode actual = m.readTree(kept.result().toJson());
        assertEquals(expected, actual);
        // the band summary and the per-peak summaries come back with the result (recomputed from the rates)
        assertEquals(result.band(), kept.result().band());
        assertEquals(result.peakSummaries(), kept.result().peakSummaries());
        assertTrue(SimulationArchive.latest(c, SimulationMode.BARE).isEmpty());
    }

    @Test
    void staleWhenRecordingOrChainChanges() throws IOException {
        SimulationRun run = keep();
        assertFalse(SimulationArchive.staleness(run).isPresent());
        AntiAliasFilter lp = nb.getDevices().stream().filter(AntiAliasFilter.class::isInstance)
                .map(AntiAliasFilter.class::cast).findFirst().orElseThrow();
        double cutoff = lp.getCutoffHz();
        lp.setCutoffHz(cutoff * 2);
        assertTrue(SimulationArchive.staleness(run).orElseThrow().contains("chain changed"));
        lp.setCutoffHz(cutoff);
        assertFalse(SimulationArchive.staleness(run).isPresent());
        channel.getRecording().setSha256("00".repeat(32));
        assertTrue(SimulationArchive.staleness(run).orElseThrow().contains("recording changed"));
    }

    @Test
    void damagedOrMissingFileNamesItself() throws IOException {
        SimulationRun run = keep();
        Path file = SimulationArchive.resolve(run);
        Files.writeString(file, "{\"format\":\"something else\"}");
        ChannelDataException e = assertThrows(ChannelDataException.class, () -> SimulationArchive.load(run));
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        Files.delete(file);
        e = assertThrows(ChannelDataException.class, () -> SimulationArchive.load(run));
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    }
}
