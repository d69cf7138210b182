package org.foldbook.io.hdf5;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Recordings;
import org.foldbook.io.SampleType;
import org.foldbook.io.TestFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** HDF5 files written by Debian's python3-h5py 3.7 (releng/reference/io_files.py) with numpy float64 dumps. */
class Hdf5ReaderTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "accel-1d,        1,  1000, 2000,  FLOAT64",
            "daq-2d,          3,   500, 10000, FLOAT32",
            "counts-chunked,  1,  3000, 10000, INT16",
            "channels-first,  2,   400, 1000,  INT32",
            // /loop/again is a hard link back to /loop: detection must not recurse forever
            "cyclic-links,    1,   100, 2000,  FLOAT64"})
    void matchesNumpyDump(String name, int channels, long frames, double rate, SampleType type) throws IOException {
        Path p = TestFiles.copy("hdf5/h5py/" + name + ".h5", dir);
        double[][] expected = TestFiles.f64("hdf5/h5py/" + name + ".f64", channels);
        // small buffer: several slices per read
        try (RecordingReader r = Recordings.open(p, Hdf5Selection.DETECT, new ReadOptions(true, 4096))) {
            assertEquals(RecordingFormat.HDF5, r.info().format());
            assertEquals(channels, r.info().channelCount());
            assertEquals(frames, r.info().frameCount());
            assertEquals(rate, r.info().sampleRate(), rate * 1e-12, "from sample_rate or 1/sample_interval");
            assertEquals(type, r.info().sampleType());
            double[][] got = TestFiles.readAll(r, 777);
            for (int c = 0; c < channels; c++) {
                assertArrayEquals(expected[c], got[c], 0.0, "channel " + c);
            }
            assertEquals(TestFiles.jdkSha256(p), r.sha256Hex(), "the JDK's SHA-256 over the whole file");
        }
    }

    @Test
    void namesAndUnitsFromAttributes() throws IOException {
        Path p = TestFiles.copy("hdf5/h5py/daq-2d.h5", dir);
        try (RecordingReader r = Hdf5Reader.open(p, Hdf5Selection.dataset("/daq/voltages"), ReadOptions.DEFAULT)) {
            assertEquals(List.of(new ChannelInfo("bridge", "V"), new ChannelInfo("reference", "V"),
                    new ChannelInfo("preamp", "mV")), r.info().channels());
        }
        Path q = TestFiles.copy("hdf5/h5py/channels-first.h5", dir);
        try (RecordingReader r = Hdf5Reader.open(q)) {
            assertEquals(List.of(new ChannelInfo("emg[0]", "uV"), new ChannelInfo("emg[1]", "uV")), r.info().channels());
        }
    }

    @Test
    void errorsAreChecked() throws IOException {
        Path p = TestFiles.copy("hdf5/h5py/daq-2d.h5", dir);
        RecordingFormatException e = assertThrows(RecordingFormatException.class,
                () -> Hdf5Reader.open(p, Hdf5Selection.dataset("/nope"), ReadOptions.DEFAULT));
        assertEquals("/nope", e.location());
        e = assertThrows(RecordingFormatException.class,
                () -> Hdf5Reader.open(p, Hdf5Selection.dataset("/daq"), ReadOptions.DEFAULT));
        assertTrue(e.getMessage().contains("not a dataset"), e.getMessage());
        e = assertThrows(RecordingFormatException.class,
                () -> Hdf5Reader.open(p, Hdf5Selection.dataset("/notes_count"), ReadOptions.DEFAULT));
        assertTrue(e.getMessage().contains("not a numeric 1-D or 2-D dataset"), e.getMessage());
        Path junk = dir.resolve("junk.h5");
        byte[] b = Files.readAllBytes(p);
        byte[] cut = java.util.Arrays.copyOf(b, 700); // synthetic: the h5py file cut short
        Files.write(junk, cut);
        assertThrows(RecordingFormatException.class, () -> {
            try (RecordingReader r = Hdf5Reader.open(junk)) {
                TestFiles.readAll(r, 100);
            }
        });
        Path text = dir.resolve("text.h5");
        Files.writeString(text, "not hdf5 at all");
        assertThrows(RecordingFormatException.class, () -> Hdf5Reader.open(text));
    }

    @Test
    void leavesTheFileUntouched() throws IOException {
        Path p = TestFiles.copy("hdf5/h5py/counts-chunked.h5", dir);
        byte[] before = Files.readAllBytes(p);
        FileTime t = FileTime.fromMillis(1_400_000_000_000L);
        Files.setLastModifiedTime(p, t);
        try (RecordingReader r = Hdf5Reader.open(p)) {
            TestFiles.readAll(r, 500);
        }
        assertArrayEquals(before, Files.readAllBytes(p));
        assertEquals(t, Files.getLastModifiedTime(p));
    }
}
