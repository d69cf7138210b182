package org.foldbook.io.raw;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
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

/**
 * Raw sample files written by sox (releng/reference/io_files.sh: big-endian int16 stereo, little-endian
 * float32 4-channel) with sox's float64 dumps as reference; header offsets and planar files are
 * synthetic re-arrangements of those bytes made here.
 */
class RawReaderTest {
    @TempDir
    Path dir;

    @Test
    void bigEndianInt16FromSidecar() throws IOException {
        Path p = TestFiles.copy("raw/sox/s16be-stereo.raw", dir);
        Files.writeString(RawLayout.sidecarOf(p), """
                # written for the test
                foldbook-raw-layout = 1
                sample-type = int16
                byte-order = big
                channels = 2
                sample-rate = 48000
                names = left, right
                units = V
                scale = 3.0517578125e-05   # 1/32768, as sox scales 16-bit codes
                """);
        double[][] expected = TestFiles.f64("raw/sox/s16be-stereo.f64", 2);
        try (RecordingReader r = Recordings.open(p)) {
            assertEquals(RecordingFormat.RAW, r.info().format());
            assertEquals(List.of(new ChannelInfo("left", "V"), new ChannelInfo("right", "V")), r.info().channels());
            double[][] got = TestFiles.readAll(r, 50);
            assertArrayEquals(expected[0], got[0], 0.0);
            assertArrayEquals(expected[1], got[1], 0.0);
        }
    }

    @Test
    void float32WithHeaderOffset() throws IOException {
        byte[] raw = TestFiles.bytes("raw/sox/f32le-4ch.raw");
        byte[] withHeader = new byte[123 + raw.length];
        System.arraycopy(raw, 0, withHeader, 123, raw.length);
        Path p = dir.resolve("h.bin");
        Files.write(p, withHeader);
        double[][] expected = TestFiles.f64("raw/sox/f32le-4ch.f64", 4);
        RawLayout layout = RawLayout.of(SampleType.FLOAT32, ByteOrder.LITTLE_ENDIAN, 4, true, 123, 22050);
        try (RecordingReader r = Recordings.open(p, layout)) {
            assertEquals(240, r.info().frameCount());
            double[][] got = TestFiles.readAll(r, 7);
            for (int c = 0; c < 4; c++) {
                // sox's dump passed through its 32-bit integer pipeline (see the WAV test)
                assertArrayEquals(expected[c], got[c], 4.7e-10);
            }
        }
    }

    @Test
    void planarEqualsInterleaved() throws IOException {
        byte[] raw = TestFiles.bytes("raw/sox/s16be-stereo.raw");
        int frames = raw.length / 4;
        byte[] planar = new byte[raw.length];
        for (int f = 0; f < frames; f++) {
            for (int c = 0; c < 2; c++) {
                planar[c * frames * 2 + 2 * f] = raw[4 * f + 2 * c];
                planar[c * frames * 2 + 2 * f + 1] = raw[4 * f + 2 * c + 1];
            }
        }
        Path p = dir.resolve("planar.bin");
        Files.write(p, planar);
        double[][] expected = TestFiles.f64("raw/sox/s16be-stereo.f64", 2);
        RawLayout layout = new RawLayout(SampleType.INT16, ByteOrder.BIG_ENDIAN, 2, false, 0, 48000, -1, null, null,
                new double[] {1.0 / 32768, 2.0 / 32768}, new double[] {0, 0.5});
        try (RecordingReader r = RawReader.open(p, layout, new ReadOptions(true, 4096))) {
            double[] inter = TestFiles.readAllInterleaved(r, 100);
            for (int f = 0; f < frames; f++) {
                assertEquals(expected[0][f], inter[2 * f], 0.0);
                assertEquals(2 * expected[1][f] + 0.5, inter[2 * f + 1], 0.0, "scale 2/32768, offset 0.5");
            }
            assertEquals(TestFiles.jdkSha256(p), r.sha256Hex(), "the JDK's SHA-256 over the whole file");
        }
    }

    @Test
    void sizeErrors() throws IOException {
        Path p = dir.resolve("odd.bin");
        Files.write(p, new byte[1001]);
        RecordingFormatException e = assertThrows(RecordingFormatException.class,
                () -> RawReader.open(p, RawLayout.of(SampleType.INT32, ByteOrder.LITTLE_ENDIAN, 2, true, 0, 10),
                        ReadOptions.DEFAULT));
        assertTrue(e.getMessage().contains("not a whole number of 8-byte frames"), e.getMessage());
        assertEquals("byte offset 1000", e.location());
        e = assertThrows(RecordingFormatException.class, () -> RawReader.open(p,
                RawLayout.of(SampleType.INT8, ByteOrder.LITTLE_ENDIAN, 1, true, 2000, 10), ReadOptions.DEFAULT));
        assertTrue(e.getMessage().contains("declared size beyond the file"), e.getMessage());
        RawLayout tooMany = new RawLayout(SampleType.INT16, ByteOrder.LITTLE_ENDIAN, 1, true, 1, 10, 501, null, null,
                null, null);
        e = assertThrows(RecordingFormatException.class, () -> RawReader.open(p, tooMany, ReadOptions.DEFAULT));
        assertTrue(e.getMessage().contains("501 frames declared"), e.getMessage());
    }

    @Test
    void nanInFloatRaw() throws IOException {
        Path p = dir.resolve("nan.f32");
        ByteBuffer b = ByteBuffer.allocate(40).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < 10; i++) {
            b.putFloat(i == 7 ? Float.POSITIVE_INFINITY : i);
        }
        Files.write(p, b.array());
        try (RecordingReader r = RawReader.open(p, RawLayout.of(SampleType.FLOAT32, ByteOrder.LITTLE_ENDIAN, 1, true, 0, 1),
                ReadOptions.DEFAULT)) {
            RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> r.read(new double[1][10], 0, 10));
            assertEquals("byte offset 28", e.location());
        }
    }

    @Test
    void sidecarErrorsNameTheLine() throws IOException {
        Path p = dir.resolve("x.bin");
        Files.write(p, new byte[16]);
        Path side = RawLayout.sidecarOf(p);
        Files.writeString(side, "foldbook-raw-layout = 1\nsample-type = int12\nbyte-order = little\nchannels=1\nsample-rate=5\n");
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> RawReader.open(p));
        assertEquals(side, e.file());
        assertEquals("line 2, column 1", e.location());
        Files.writeString(side, "foldbook-raw-layout = 1\ncolour = red\n");
        assertTrue(assertThrows(RecordingFormatException.class, () -> RawReader.open(p)).getMessage()
                .contains("unknown key 'colour'"));
        Files.writeString(side, "foldbook-raw-layout = 1\nsample-type=int8\nbyte-order=little\nchannels=2\n"
                + "sample-rate=5\nunits=a,b,c\n");
        assertTrue(assertThrows(RecordingFormatException.class, () -> RawReader.open(p)).getMessage()
                .contains("units: 3 values for 2 channels"));
        assertThrows(IllegalArgumentException.class,
                () -> RawLayout.of(SampleType.INT8, ByteOrder.LITTLE_ENDIAN, 0, true, 0, 5));
    }
}
