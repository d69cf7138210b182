package org.foldbook.audit;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.HexFormat;
import java.util.List;
import java.util.function.IntToDoubleFunction;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Channel;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Recording;
import org.foldbook.model.RecordingFormat;
import org.foldbook.model.Rig;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.persistence.NotebookStore;

/**
 * CLEARLY SYNTHETIC notebooks for the audit tests: one sensor (usable to a stated maximum), chains of our
 * choosing, recordings written as 16-bit PCM WAV by the JDK's javax.sound.sampled (an outside writer).
 */
final class SyntheticRig {
    static final NotebookFactory F = NotebookFactory.eINSTANCE;
    final Notebook nb = F.createNotebook();
    final Sensor sensor = F.createSensor();
    final Rig rig = F.createRig();
    private final Path dir;

    SyntheticRig(Path dir, double sensorMaxHz) {
        this.dir = dir;
        nb.setTitle("audit test (synthetic)");
        sensor.setId("S1");
        sensor.setUsableMaxHz(sensorMaxHz);
        nb.getDevices().add(sensor);
        rig.setId("R1");
        nb.getRigs().add(rig);
    }

    /** A chain sensor → [Butterworth of {@code order} at {@code cutoffHz} when order > 0] → 16-bit digitizer. */
    SignalChain chain(String id, double rateHz, int order, double cutoffHz) {
        SignalChain c = F.createSignalChain();
        c.setId(id);
        c.getStages().add(stage(sensor));
        if (order > 0) {
            AntiAliasFilter lp = F.createAntiAliasFilter();
            lp.setId("LP-" + id);
            lp.setFamily(FilterFamily.BUTTERWORTH);
            lp.setOrder(order);
            lp.setCutoffHz(cutoffHz);
            nb.getDevices().add(lp);
            c.getStages().add(stage(lp));
        }
        Digitizer d = F.createDigitizer();
        d.setId("D-" + id);
        d.setResolutionBits(16);
        d.setMaxRateHz(rateHz);
        nb.getDevices().add(d);
        Stage ds = stage(d);
        ds.setRateHz(rateHz);
        c.getStages().add(ds);
        rig.getChains().add(c);
        return c;
    }

    private static Stage stage(Device d) {
        Stage s = F.createStage();
        s.setDevice(d);
        return s;
    }

    /** An experiment on {@code date} with one channel through {@code chain}, its samples from {@code pcm}. */
    Channel channel(String name, SignalChain chain, double rateHz, int frames, LocalDate date, IntToDoubleFunction x)
            throws IOException {
        Path wav = dir.resolve("data").resolve(name + ".wav");
        Files.createDirectories(wav.getParent());
        writeWav(wav, rateHz, frames, x);
        Experiment e = F.createExperiment();
        e.setName("run " + name);
        e.setRig(rig);
        e.setDate(Date.from(date.atStartOfDay(ZoneOffset.UTC).toInstant()));
        Recording r = F.createRecording();
        r.setId("REC-" + name);
        r.setPath("data/" + name + ".wav");
        r.setFormat(RecordingFormat.WAV);
        r.setDeclaredRateHz(rateHz);
        r.setChannelCount(1);
        r.setSha256(sha256(wav));
        e.getRecordings().add(r);
        Channel c = F.createChannel();
        c.setName(name);
        c.setChain(chain);
        c.setRecording(r);
        e.getChannels().add(c);
        nb.getExperiments().add(e);
        return c;
    }

    /** Saves the notebook and loads it back, so recording paths resolve against its folder. */
    Notebook saved() throws IOException {
        Path file = dir.resolve("audit-test.foldbook");
        NotebookStore.save(nb, file);
        return NotebookStore.load(file);
    }

    static Channel find(Notebook nb, String name) {
        return nb.getExperiments().stream().flatMap(e -> e.getChannels().stream())
                .filter(c -> c.getName().equals(name)).findFirst().orElseThrow();
    }

    /** Values in full-scale fractions, rounded to 16 bits and limited to the rails as a PCM digitizer would. */
    static void writeWav(Path wav, double rate, int frames, IntToDoubleFunction x) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(frames * 2).order(ByteOrder.LITTLE_ENDIAN);
        for (int n = 0; n < frames; n++) {
            b.putShort(pcm(x.applyAsDouble(n)));
        }
        AudioFormat fmt = new AudioFormat((float) rate, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(b.array()), fmt, frames)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, wav.toFile());
        }
    }

    static short pcm(double v) {
        return (short) Math.max(-32768, Math.min(32767, Math.round(v * 32768)));
    }

    /** SHA-256 by the JDK's MessageDigest. */
    static String sha256(Path file) throws IOException {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }

    static List<Finding> of(ChannelAudit a, AuditKind kind) {
        return a.findings().stream().filter(f -> f.kind() == kind).toList();
    }
}
