package org.foldbook.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** The entry point picks the reader from the content or name, and no reader ever changes the file. */
class RecordingsTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0} -> {1}")
    @CsvSource({
            "wav/sox/s24-6ch.wav,            WAV",
            "csv/numpy/comma-semicolon.csv,  DELIMITED_TEXT",
            "hdf5/h5py/accel-1d.h5,          HDF5"})
    void detectsTheFormatAndLeavesBytesAndTimeAlone(String resource, RecordingFormat format) throws IOException {
        Path p = TestFiles.copy(resource, dir);
        byte[] before = Files.readAllBytes(p);
        FileTime t = FileTime.fromMillis(1_600_000_000_000L);
        Files.setLastModifiedTime(p, t);
        assertTrue(p.toFile().setWritable(false, false), "read-only file: opening for write would fail");
        try (RecordingReader r = Recordings.open(p)) {
            assertEquals(format, r.info().format());
            TestFiles.readAll(r, 100);
            r.verifySha256(TestFiles.jdkSha256(p)); // the JDK over the whole file
        }
        assertArrayEquals(before, Files.readAllBytes(p));
        assertEquals(t, Files.getLastModifiedTime(p));
    }

    @Test
    void unknownContentIsAClearError() throws IOException {
        Path p = dir.resolve("notes.bin");
        Files.writeString(p, "some notes");
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> Recordings.open(p));
        assertTrue(e.getMessage().contains("unknown recording format"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> Recordings.open(null));
        assertThrows(java.nio.file.NoSuchFileException.class, () -> Recordings.open(dir.resolve("missing.wav")));
    }

    @Test
    void bufferArgumentsAreChecked() throws IOException {
        Path p = TestFiles.copy("wav/sox/s16-stereo.wav", dir);
        try (RecordingReader r = Recordings.open(p)) {
            assertThrows(IllegalArgumentException.class, () -> r.read(new double[1][10], 0, 10), "one array, two channels");
            assertThrows(IllegalArgumentException.class, () -> r.read(new double[2][10], 5, 6));
            assertThrows(IllegalArgumentException.class, () -> r.readInterleaved(new double[10], 0, 6));
            assertThrows(IllegalArgumentException.class, () -> r.read(new double[2][10], -1, 1));
            assertEquals(0, r.framePosition(), "rejected calls read nothing");
        }
    }
}
