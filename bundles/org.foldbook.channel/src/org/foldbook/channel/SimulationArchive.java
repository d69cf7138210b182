package org.foldbook.channel;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Instant;
import java.util.Date;
import java.util.Locale;
import java.util.Optional;

import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.SignalChain;
import org.foldbook.model.SimulationRun;
import org.foldbook.model.SweepMode;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.persistence.RecordingFiles;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SweepResult;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * Finished simulations kept beside the notebook, so reopening shows them without re-running: one JSON file
 * per channel and mode under {@code simulations/} next to the notebook file, holding what the run was made
 * from (recording SHA-256, chain signature, set-up, date) and the result in {@link SweepResult#toJson()}'s
 * form, written and read with Jackson. The notebook refers to it with a {@link SimulationRun}; the run is
 * stale once the recording's logged checksum or the chains' signature no longer match.
 */
public final class SimulationArchive {
    public static final String FORMAT = "foldbook-simulation";
    public static final int VERSION = 1;
    static final String FOLDER = "simulations";
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private SimulationArchive() {
    }

    /** A kept run as read back. */
    public record Kept(SimulationRun run, Path file, SweepResult result, String setupSignature, Instant finishedOn) {
    }

    /**
     * The chains a run of {@code channel} depends on: the recording chain's and the through-chain's
     * {@link ChainModel#signature()}; any change to a setting either applies changes it.
     */
    public static String chainSignature(Channel channel) {
        SignalChain own = channel.getChain();
        SignalChain through = ChannelSimulation.throughChain(channel);
        String a = own == null ? "no chain" : ChainModel.of(own).signature();
        String b = through == null || through == own ? "same" : ChainModel.of(through).signature();
        return "recorded: " + a + " || through: " + b;
    }

    /** The file a run of {@code channel} in {@code mode} is kept in. */
    public static Path fileFor(Channel channel, SimulationMode mode) {
        Path folder = RecordingFiles.notebookFolder(channel.eResource()).resolve(FOLDER);
        Experiment e = experimentOf(channel);
        int ei = e.eContainer() == null ? 0 : ((org.foldbook.model.Notebook) e.eContainer()).getExperiments().indexOf(e);
        int ci = e.getChannels().indexOf(channel);
        String name = String.format(Locale.ROOT, "run%d-channel%d-%s.json", ei + 1, ci + 1, mode.word());
        return folder.resolve(name);
    }

    /**
     * Writes the run's file (atomically: a temporary file, then a move) and returns a new, unattached
     * {@link SimulationRun} describing it; the caller adds it to the experiment (an undoable command).
     */
    public static SimulationRun save(Channel channel, SimulationSetup setup, ChannelData data, SweepResult result,
            Instant finishedOn) throws IOException {
        Path file = fileFor(channel, setup.mode());
        String chains = chainSignature(channel);
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT).put("version", VERSION).put("channel", channel.getName())
                .put("mode", setup.mode().word()).put("sourceSha256", data.sha256())
                .put("chainSignature", chains).put("setupSignature", setup.signature())
                .put("finishedOn", finishedOn.toString());
        var notes = root.putArray("notes");
        setup.notes().forEach(notes::add);
        root.set("result", MAPPER.readTree(result.toJson()));
        Files.createDirectories(file.getParent());
        Path tmp = Files.createTempFile(file.getParent(), file.getFileName().toString(), ".tmp");
        try {
            Files.writeString(tmp, MAPPER.writeValueAsString(root), StandardCharsets.UTF_8);
            Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        } finally {
            Files.deleteIfExists(tmp);
        }
        SimulationRun run = NotebookFactory.eINSTANCE.createSimulationRun();
        run.setChannel(channel);
        run.setMode(NotebookModes.stored(setup.mode()));
        run.setPath(RecordingFiles.relativeTo(notebookFile(channel), file));
        run.setSourceSha256(data.sha256());
        run.setChainSignature(chains);
        run.setFinishedOn(Date.from(finishedOn));
        return run;
    }

    /** Reads a kept run; a missing or damaged file raises an error naming it. */
    public static Kept load(SimulationRun run) throws ChannelDataException {
        Path file = resolve(run);
        try {
            JsonNode root = MAPPER.readTree(Files.readString(file, StandardCharsets.UTF_8));
            if (!FORMAT.equals(root.path("format").asText())) {
                throw new ChannelDataException(file, "not a kept simulation (format '" + root.path("format").asText()
                        + "', expected '" + FORMAT + "')");
            }
            SweepResult result = SweepResultJson.read(root.path("result"));
            return new Kept(run, file, result, root.path("setupSignature").asText(),
                    Instant.parse(root.path("finishedOn").asText()));
        } catch (ChannelDataException e) {
            throw e;
        } catch (IOException | RuntimeException e) {
            throw new ChannelDataException(file, "kept simulation cannot be read: " + e.getMessage(), e);
        }
    }

    /** Why {@code run} no longer describes its channel, in words; empty while it is current. */
    public static Optional<String> staleness(SimulationRun run) {
        Channel channel = run.getChannel();
        if (channel == null) {
            return Optional.of("its channel is gone from the notebook");
        }
        String logged = channel.getRecording() == null ? null : channel.getRecording().getSha256();
        if (logged == null || !logged.equalsIgnoreCase(run.getSourceSha256())) {
            return Optional.of("the recording changed since the run (SHA-256 logged now " + logged + ", run on "
                    + run.getSourceSha256() + ")");
        }
        if (!chainSignature(channel).equals(run.getChainSignature())) {
            return Optional.of("the chain changed since the run (a device or stage setting differs)");
        }
        return Optional.empty();
    }

    /** The latest run of {@code channel} in {@code mode} its experiment refers to, if any. */
    public static Optional<SimulationRun> latest(Channel channel, SimulationMode mode) {
        SweepMode stored = NotebookModes.stored(mode);
        SimulationRun best = null;
        for (SimulationRun r : experimentOf(channel).getSimulations()) {
            if (r.getChannel() == channel && r.getMode() == stored && (best == null || (r.getFinishedOn() != null
                    && best.getFinishedOn() != null && r.getFinishedOn().after(best.getFinishedOn())))) {
                best = r;
            }
        }
        return Optional.ofNullable(best);
    }

    /** The kept file of {@code run}, resolved against the notebook's folder. */
    public static Path resolve(SimulationRun run) {
        Path p = Path.of(run.getPath());
        return p.isAbsolute() ? p : RecordingFiles.notebookFolder(run.eResource()).resolve(p).normalize();
    }

    static Experiment experimentOf(Channel channel) {
        EObject c = channel.eContainer();
        if (c instanceof Experiment e) {
            return e;
        }
        throw new IllegalArgumentException("channel '" + channel.getName() + "' belongs to no experiment");
    }

    private static Path notebookFile(Channel channel) {
        return Path.of(channel.eResource().getURI().toFileString());
    }
}
