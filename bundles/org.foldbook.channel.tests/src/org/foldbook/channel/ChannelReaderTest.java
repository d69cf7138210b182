package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.util.concurrent.CancellationException;

import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.RecordingFormat;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChannelReaderTest {

    @TempDir
    Path dir;

    @Test
    void readsTheChannelTheNotebookNames() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Path wav = dir.resolve("data/sines.wav");
        FileTime before = Files.getLastModifiedTime(wav);
        byte[] bytes = Files.readAllBytes(wav);
        ChannelData d = ChannelReader.read(TestNotebooks.channel(nb, 1), ChannelReader.ReadRequest.STRICT,
                ReadProgress.NONE);
        assertEquals(TestNotebooks.RATE, d.rateHz());
        assertEquals(TestNotebooks.FRAMES, d.samples().length);
        // the samples javax.sound.sampled wrote: round(32767·A·sin(2πfn/fs)) / 32768
        for (int n = 0; n < 100; n++) {
            double expected = Math.round(32767 * TestNotebooks.A1 * Math.sin(2 * Math.PI * TestNotebooks.F1 * n
                    / TestNotebooks.RATE)) / 32768.0;
            assertEquals(expected, d.samples()[n], 1e-12, "sample " + n);
        }
        assertEquals(TestNotebooks.sha256(wav), d.sha256(), "JDK MessageDigest SHA-256 of the file");
        assertFalse(d.checksumChanged());
        // read-only: bytes and modification time untouched
        assertArrayEquals(bytes, Files.readAllBytes(wav));
        assertEquals(before, Files.getLastModifiedTime(wav));
    }

    @Test
    void aChangedFileIsAnErrorUnlessAccepted() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Path wav = dir.resolve("data/sines.wav");
        byte[] b = Files.readAllBytes(wav);
        b[b.length - 1] ^= 1; // one bit of the last sample
        Files.write(wav, b, StandardOpenOption.TRUNCATE_EXISTING);
        Channel c = TestNotebooks.channel(nb, 0);
        ChannelDataException e = assertThrows(ChannelDataException.class,
                () -> ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE));
        assertTrue(e.getMessage().startsWith(wav.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("changed since it was logged"), e.getMessage());
        ChannelData d = ChannelReader.read(c, new ChannelReader.ReadRequest(true), ReadProgress.NONE);
        assertTrue(d.checksumChanged());
    }

    @Test
    void aFileOfAnotherFormatThanLoggedIsNamed() throws IOException {
        // the javax.sound WAV logged as raw binary: the readers find a WAV, the notebook says otherwise
        Notebook nb = TestNotebooks.write(dir);
        Channel c = TestNotebooks.channel(nb, 0);
        c.getRecording().setFormat(RecordingFormat.RAW_BINARY);
        ChannelDataException e = assertThrows(ChannelDataException.class,
                () -> ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE));
        assertTrue(e.getMessage().startsWith(dir.resolve("data/sines.wav").toString()), e.getMessage());
        assertTrue(e.getMessage().contains("as RAW_BINARY, but the file is WAV"), e.getMessage());
    }

    @Test
    void missingCorruptAndDisagreeingFilesAreNamed() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Path wav = dir.resolve("data/sines.wav");
        Channel c = TestNotebooks.channel(nb, 0);
        Files.write(wav, "RIFF this is no wave".getBytes(java.nio.charset.StandardCharsets.US_ASCII));
        ChannelDataException corrupt = assertThrows(ChannelDataException.class,
                () -> ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE));
        assertTrue(corrupt.getMessage().startsWith(wav.toString()), corrupt.getMessage());
        Files.delete(wav);
        ChannelDataException missing = assertThrows(ChannelDataException.class,
                () -> ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE));
        assertTrue(missing.getMessage().contains("missing"), missing.getMessage());
        assertEquals(wav, missing.file());
        TestNotebooks.writeWav(wav);
        c.getRecording().setDeclaredRateHz(9600);
        ChannelDataException rate = assertThrows(ChannelDataException.class,
                () -> ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE));
        assertTrue(rate.getMessage().contains("9600"), rate.getMessage());
    }

    @Test
    void cancelStopsTheRead() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        ReadProgress stop = new ReadProgress() {
            @Override
            public boolean cancelled() {
                return true;
            }
        };
        assertThrows(CancellationException.class,
                () -> ChannelReader.read(TestNotebooks.channel(nb, 0), ChannelReader.ReadRequest.STRICT, stop));
    }
}
