package org.foldbook.channel;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Channel;
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
 * A small notebook for the channel tests, CLEARLY SYNTHETIC: one chain (sensor → 4-pole Butterworth
 * low-pass at 1 kHz → 16-bit digitizer at 8 kS/s), one recording at 8 kS/s written by the JDK's
 * javax.sound.sampled (an outside WAV writer), two channels of pure sines.
 */
final class TestNotebooks {
    static final double RATE = 8000;
    static final int FRAMES = 16384;
    /** Channel 0: 500 Hz at 0.5 of full scale; channel 1: 1250 Hz at 0.25. */
    static final double F0 = 500, A0 = 0.5, F1 = 1250, A1 = 0.25;

    private TestNotebooks() {
    }

    /** Writes notebook + WAV into {@code dir} and loads the notebook back from its file. */
    static Notebook write(Path dir) throws IOException {
        Path wav = dir.resolve("data").resolve("sines.wav");
        java.nio.file.Files.createDirectories(wav.getParent());
        writeWav(wav);
        NotebookFactory f = NotebookFactory.eINSTANCE;
        Notebook nb = f.createNotebook();
        nb.setTitle("channel test (synthetic)");
        Sensor s = f.createSensor();
        s.setId("S1");
        s.setUsableMaxHz(3000.0);
        AntiAliasFilter lp = f.createAntiAliasFilter();
        lp.setId("LP1");
        lp.setFamily(FilterFamily.BUTTERWORTH);
        lp.setOrder(4);
        lp.setCutoffHz(1000);
        Digitizer d = f.createDigitizer();
        d.setId("D1");
        d.setResolutionBits(16);
        d.setMaxRateHz(RATE);
        nb.getDevices().addAll(java.util.List.of(s, lp, d));
        Rig rig = f.createRig();
        rig.setId("R1");
        SignalChain chain = f.createSignalChain();
        chain.setId("C1");
        for (org.foldbook.model.Device dev : java.util.List.of(s, lp, d)) {
            Stage st = f.createStage();
            st.setDevice(dev);
            chain.getStages().add(st);
        }
        rig.getChains().add(chain);
        nb.getRigs().add(rig);
        Experiment e = f.createExperiment();
        e.setName("E1");
        e.setRig(rig);
        Recording r = f.createRecording();
        r.setId("REC1");
        r.setPath("data/sines.wav");
        r.setFormat(RecordingFormat.WAV);
        r.setDeclaredRateHz(RATE);
        r.setChannelCount(2);
        r.setSha256(sha256(wav));
        e.getRecordings().add(r);
        for (int i = 0; i < 2; i++) {
            Channel c = f.createChannel();
            c.setName("ch" + i);
            c.setChain(chain);
            c.setRecording(r);
            c.setChannelIndex(i);
            e.getChannels().add(c);
        }
        nb.getExperiments().add(e);
        Path file = dir.resolve("test.foldbook");
        NotebookStore.save(nb, file);
        return NotebookStore.load(file);
    }

    static Channel channel(Notebook nb, int index) {
        return nb.getExperiments().get(0).getChannels().get(index);
    }

    static void writeWav(Path wav) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(FRAMES * 4).order(ByteOrder.LITTLE_ENDIAN);
        for (int n = 0; n < FRAMES; n++) {
            b.putShort((short) Math.round(32767 * A0 * Math.sin(2 * Math.PI * F0 * n / RATE)));
            b.putShort((short) Math.round(32767 * A1 * Math.sin(2 * Math.PI * F1 * n / RATE)));
        }
        AudioFormat fmt = new AudioFormat((float) RATE, 16, 2, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(b.array()), fmt, FRAMES)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, wav.toFile());
        }
    }

    /** SHA-256 of the file by the JDK's MessageDigest (the outside reference for our streamed one). */
    static String sha256(Path file) throws IOException {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(java.nio.file.Files.readAllBytes(file)));
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException(e);
        }
    }
}
