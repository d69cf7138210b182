package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.io.Sha256;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Recording;
import org.foldbook.model.RecordingFormat;
import org.foldbook.model.persistence.NotebookStore;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A CSV written by Python's csv module and an HDF5 file written by h5py (releng/reference/cli_recordings.py;
 * CLEARLY SYNTHETIC: 3000 Hz and 700 Hz tones at 8000 S/s), logged in a notebook and read the way the
 * workbench reads a channel (ChannelReader whole, ChannelScan block by block). Both files hold the same
 * numpy array, the CSV in Python's round-trip repr, so the two readings must agree bit for bit.
 */
class OutsideRecordingsTest {
    @TempDir
    Path dir;

    private Channel channel(Path file, RecordingFormat format) throws IOException {
        NotebookFactory f = NotebookFactory.eINSTANCE;
        Notebook nb = f.createNotebook();
        Experiment e = f.createExperiment();
        e.setName("outside");
        Recording r = f.createRecording();
        r.setId("R");
        r.setPath(file.getFileName().toString());
        r.setFormat(format);
        r.setDeclaredRateHz(8000);
        r.setChannelCount(format == RecordingFormat.CSV ? 2 : 1);
        r.setSha256(Sha256.ofFile(file));
        e.getRecordings().add(r);
        Channel c = f.createChannel();
        c.setName("accel");
        c.setRecording(r);
        c.setChannelIndex(0);
        e.getChannels().add(c);
        nb.getExperiments().add(e);
        Path nbFile = dir.resolve(format.getLiteral() + ".foldbook");
        NotebookStore.save(nb, nbFile);
        return NotebookStore.load(nbFile).getExperiments().get(0).getChannels().get(0);
    }

    private Path copy(String name) throws IOException {
        Path out = dir.resolve(name);
        try (InputStream in = getClass().getResourceAsStream("/org/foldbook/channel/recordings/" + name)) {
            Files.copy(in, out);
        }
        return out;
    }

    @Test
    void csvAndHdf5ReadTheSameSamplesWholeAndStreamed() throws IOException {
        Channel csv = channel(copy("two-tones.csv"), RecordingFormat.CSV);
        Channel h5 = channel(copy("two-tones.h5"), RecordingFormat.HDF5);
        ChannelData a = ChannelReader.read(csv, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        ChannelData b = ChannelReader.read(h5, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        // rate and length as the script wrote them (fs = 8000, n = 8192)
        assertEquals(8000, a.rateHz(), 1e-9);
        assertEquals(8000, b.rateHz(), 0);
        assertEquals(8192, a.samples().length);
        assertArrayEquals(b.samples(), a.samples(), 0.0);
        double[] streamed = new double[8192];
        int[] at = {0};
        ChannelScan.Scan s = ChannelScan.scan(h5, ChannelReader.ReadRequest.STRICT, (samples, count) -> {
            System.arraycopy(samples, 0, streamed, at[0], count);
            at[0] += count;
        }, ReadProgress.NONE);
        assertEquals(8192, s.frames());
        assertArrayEquals(b.samples(), streamed, 0.0);
    }
}
