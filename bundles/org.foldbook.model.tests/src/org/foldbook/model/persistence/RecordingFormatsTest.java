package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Recordings;
import org.foldbook.io.csv.DelimitedTextSettings;
import org.foldbook.io.hdf5.Hdf5Selection;
import org.foldbook.model.RecordingFormat;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * The notebook's format literals against what the readers find. The WAV file is written by the JDK's
 * javax.sound.sampled (an encoder we did not write); the text files are clearly synthetic input.
 */
class RecordingFormatsTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}")
    @EnumSource(RecordingFormat.class)
    @DisplayName("every notebook literal has a reader family, and maps back to itself")
    void everyLiteralMapsBothWays(RecordingFormat logged) {
        org.foldbook.io.RecordingFormat reader = RecordingFormats.readerFormat(logged);
        assertTrue(RecordingFormats.agree(logged, reader));
        String name = logged == RecordingFormat.TSV ? "run.tsv" : "run.csv";
        assertEquals(logged, RecordingFormats.loggedFormat(reader, name));
    }

    @Test
    @DisplayName("the fixed pairs: CSV and TSV are one text reader, RF64 is a WAV, nothing else agrees")
    void fixedPairs() {
        assertEquals(org.foldbook.io.RecordingFormat.DELIMITED_TEXT, RecordingFormats.readerFormat(RecordingFormat.CSV));
        assertEquals(org.foldbook.io.RecordingFormat.DELIMITED_TEXT, RecordingFormats.readerFormat(RecordingFormat.TSV));
        assertEquals(org.foldbook.io.RecordingFormat.RAW, RecordingFormats.readerFormat(RecordingFormat.RAW_BINARY));
        assertTrue(RecordingFormats.agree(RecordingFormat.WAV, org.foldbook.io.RecordingFormat.RF64));
        assertEquals(RecordingFormat.WAV, RecordingFormats.loggedFormat(org.foldbook.io.RecordingFormat.RF64, "a.wav"));
        int agreeing = 0;
        for (RecordingFormat logged : RecordingFormat.values()) {
            for (org.foldbook.io.RecordingFormat found : org.foldbook.io.RecordingFormat.values()) {
                agreeing += RecordingFormats.agree(logged, found) ? 1 : 0;
            }
        }
        assertEquals(6, agreeing, "WAV-WAV, WAV-RF64, CSV-text, TSV-text, raw-raw, HDF5-HDF5");
        assertThrows(IllegalArgumentException.class, () -> RecordingFormats.readerFormat(null));
        assertThrows(IllegalArgumentException.class, () -> RecordingFormats.agree(RecordingFormat.WAV, null));
    }

    @Test
    @DisplayName("reader selection: text settings with the logged separator, HDF5 detection, none for WAV/raw")
    void selections() {
        assertEquals(DelimitedTextSettings.DETECT, RecordingFormats.readerSelection(RecordingFormat.CSV));
        DelimitedTextSettings tsv = (DelimitedTextSettings) RecordingFormats.readerSelection(RecordingFormat.TSV);
        assertEquals('\t', tsv.separator());
        assertEquals(Hdf5Selection.DETECT, RecordingFormats.readerSelection(RecordingFormat.HDF5));
        assertNull(RecordingFormats.readerSelection(RecordingFormat.WAV));
        assertNull(RecordingFormats.readerSelection(RecordingFormat.RAW_BINARY));
    }

    @Test
    @DisplayName("a WAV written by javax.sound opens as logged WAV; logged as CSV it is refused as binary")
    void wavFromTheJdk() throws IOException {
        Path wav = dir.resolve("tone.wav");
        ByteBuffer pcm = ByteBuffer.allocate(2 * 64).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < 64; i++) {
            pcm.putShort((short) Math.round(8000 * Math.sin(2 * Math.PI * i / 16.0)));
        }
        AudioFormat format = new AudioFormat(8000f, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(pcm.array()), format, 64)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, wav.toFile());
        }
        try (RecordingReader r = Recordings.open(wav, RecordingFormats.readerSelection(RecordingFormat.WAV))) {
            assertTrue(RecordingFormats.agree(RecordingFormat.WAV, r.info().format()));
            assertFalse(RecordingFormats.agree(RecordingFormat.CSV, r.info().format()));
            assertEquals(RecordingFormat.WAV, RecordingFormats.loggedFormat(r.info().format(), "tone.wav"));
        }
        RecordingFormatException e = assertThrows(RecordingFormatException.class,
                () -> Recordings.open(wav, RecordingFormats.readerSelection(RecordingFormat.CSV)).close());
        assertTrue(e.getMessage().startsWith(wav.toString()), e.getMessage());
    }

    @Test
    @DisplayName("synthetic TSV: logged TSV reads it with a tab separator, even with commas in a header cell")
    void tsvUsesTheTab() throws IOException {
        Path tsv = Files.writeString(dir.resolve("run.tsv"), "time [s]\tx, filtered [V]\n0\t1.5\n0.001\t2.5\n",
                StandardCharsets.UTF_8);
        try (RecordingReader r = Recordings.open(tsv, RecordingFormats.readerSelection(RecordingFormat.TSV))) {
            assertTrue(RecordingFormats.agree(RecordingFormat.TSV, r.info().format()));
            assertEquals(1, r.info().channelCount());
            assertEquals("x, filtered", r.info().channels().get(0).name());
            assertEquals(1000.0, r.info().sampleRate(), 1e-9, "1 ms between the stamps");
        }
    }
}
