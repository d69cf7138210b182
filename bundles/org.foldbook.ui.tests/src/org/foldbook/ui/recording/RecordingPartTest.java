package org.foldbook.ui.recording;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swtchart.ISeries;
import org.foldbook.model.Channel;
import org.foldbook.model.Recording;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.io.Sha256;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.io.TempDir;

/**
 * The recording view in a real SWT shell on the demo notebook, following the selection as the Notebook
 * part sets it (needs a display; the build runs it under Xvfb). Check values come from the demo's own
 * scenario (GearboxDemo: the 906.5 Hz mesh at 0.30 of full scale on the housing channel, 0.20 on the
 * microphone) and outside definitions: a sine of peak A reads 20·log10(A) dBFS (AES17: 0 dBFS is a
 * full-scale sine), its rms is A/√2; levels in dB re 1 µm/s² and re 20 µPa (ISO 1683).
 */
class RecordingPartTest {
    private static final long WAIT_NANOS = 120_000_000_000L;

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private NotebookDocument document;
    private CurrentNotebook current;
    private RecordingPart part;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1300, 850);
        shell.setLayout(new FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        current = new CurrentNotebook();
        current.open(document);
        part = new RecordingPart();
        part.current = current;
        part.createControls(new Composite(shell, SWT.NONE));
        shell.open();
        shell.layout(true, true);
    }

    @AfterEach
    void close() {
        part.dispose();
        shell.dispose();
        document.dispose();
    }

    private Channel channel(String name) {
        for (var e : document.notebook().getExperiments()) {
            for (Channel c : e.getChannels()) {
                if (c.getName().equals(name)) {
                    return c;
                }
            }
        }
        return fail("no channel " + name);
    }

    private String[] peakRowNear(double hz) {
        for (TableItem item : part.peaks.getItems()) {
            if (Math.abs(Double.parseDouble(item.getText(0)) - hz) < 2) {
                return new String[] {item.getText(0), item.getText(1), item.getText(2)};
            }
        }
        return fail("no peak listed near " + hz + " Hz");
    }

    @Test
    void housingChannelShowsEnvelopeAndTheMeshAtItsLevel() {
        current.select(channel("housing Z"));
        waitFor(() -> part.presenter.overview() != null, "reading housing Z");
        ISeries<?>[] env = part.envelope.control().getSeriesSet().getSeries();
        assertEquals(1, env.length);
        // 51 200 samples in 2000 columns of 26 (the last shorter): 1970 columns, min and max each
        assertEquals(2 * 1970, env[0].getXSeries().length);
        String[] mesh = peakRowNear(906.5);
        assertEquals(906.5, Double.parseDouble(mesh[0]), 0.2, "mesh frequency (24.5 Hz × 37 teeth)");
        // 0.30 FS sine: 20·log10(0.30) = −10.46 dBFS
        assertEquals(-10.46, Double.parseDouble(mesh[2]), 0.2, "mesh level, dBFS");
        // rms 0.30/√2 × 10 V / (1.02 pC/(m/s²) × 10 mV/pC) = 207.97 m/s²: 20·log10(207.97 / 1e-6) = 166.36 dB
        assertEquals(166.36, Double.parseDouble(mesh[1]), 0.2, "mesh level, dB re 1 µm/s²");
        // second mesh harmonic 1813 Hz at 0.12 FS: 20·log10(0.12) = −18.42 dBFS
        assertEquals(-18.42, Double.parseDouble(peakRowNear(1813)[2]), 0.2);
        assertTrue(part.header.getText().contains("vibration-run1.wav"), part.header.getText());
        assertEquals("", part.message.getText());

        // linear levels: the rms itself; log frequency axis
        part.levels.select(2);
        part.levels.notifyListeners(SWT.Selection, new Event());
        assertEquals(207.97, Double.parseDouble(peakRowNear(906.5)[1]), 207.97 * 0.025, "mesh rms, m/s²");
        part.logAxis.setSelection(true);
        part.logAxis.notifyListeners(SWT.Selection, new Event());
        assertTrue(part.spectrum.control().getAxisSet().getXAxis(0).isLogScaleEnabled());
        part.cursor.setText(part.presenter.cursorText(906.5));
        assertTrue(part.cursor.getText().contains("906."), part.cursor.getText());
    }

    @Test
    void microphoneLevelsAreInDecibelsReTwentyMicropascal() {
        current.select(channel("sound 0.5 m"));
        waitFor(() -> part.presenter.overview() != null, "reading sound 0.5 m");
        // 0.20 FS × 2 V / 50 mV/Pa = 8 Pa peak, 5.657 Pa rms: 20·log10(5.657 / 20e-6) = 109.03 dB
        String[] mesh = peakRowNear(906.5);
        assertEquals(109.03, Double.parseDouble(mesh[1]), 0.2);
        assertEquals(-13.98, Double.parseDouble(mesh[2]), 0.2, "20·log10(0.20) dBFS");
    }

    @Test
    void missingAndChangedFilesAreNamedInThePart() throws IOException {
        Path wav = folder.resolve("data/vibration-run1.wav");
        Files.move(wav, folder.resolve("elsewhere.wav"));
        current.select(channel("bearing Z"));
        waitFor(() -> !part.reading(), "reading bearing Z");
        assertNull(part.presenter.overview());
        assertTrue(part.message.getText().contains(wav.toString()), part.message.getText());
        assertTrue(part.message.getText().contains("missing"), part.message.getText());

        Files.move(folder.resolve("elsewhere.wav"), wav);
        byte[] b = Files.readAllBytes(wav);
        b[b.length - 2] ^= 4;
        Files.write(wav, b);
        part.reread.notifyListeners(SWT.Selection, new Event());
        waitFor(() -> !part.reading(), "reading the changed file");
        assertTrue(part.message.getText().startsWith(wav.toString()), part.message.getText());
        assertTrue(part.message.getText().contains("changed since it was logged"), part.message.getText());
        assertEquals(0, part.peaks.getItemCount());
    }

    @Test
    void cancelStopsALongRead() throws IOException {
        // SYNTHETIC long recording: 240 s of a 906.5 Hz sine at 48 kS/s, written by javax.sound.sampled
        Channel mic = channel("sound 0.5 m");
        Recording rec = mic.getRecording();
        Path wav = folder.resolve(rec.getPath());
        int frames = 48000 * 240;
        ByteBuffer pcm = ByteBuffer.allocate(frames * 2).order(ByteOrder.LITTLE_ENDIAN);
        for (int n = 0; n < frames; n++) {
            pcm.putShort((short) Math.round(6000 * Math.sin(2 * Math.PI * 906.5 * n / 48000.0)));
        }
        AudioFormat fmt = new AudioFormat(48000f, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(pcm.array()), fmt, frames)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, wav.toFile());
        }
        rec.setSha256(Sha256.ofFile(wav));
        current.select(mic);
        waitFor(() -> part.progress.getSelection() > 0, "the read to start");
        assertTrue(part.cancel.getEnabled());
        part.cancel.notifyListeners(SWT.Selection, new Event());
        waitFor(() -> !part.reading(), "the cancelled read to stop");
        assertNull(part.presenter.overview());
        assertTrue(part.message.getText().contains("cancelled"), part.message.getText());
        assertFalse(part.cancel.getEnabled());
    }

    private void waitFor(BooleanSupplier condition, String what) {
        Widgets.waitFor(display, condition, what, WAIT_NANOS);
    }
}
