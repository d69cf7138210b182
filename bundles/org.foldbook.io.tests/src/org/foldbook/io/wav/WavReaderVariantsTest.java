package org.foldbook.io.wav;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.Map;
import java.util.Random;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.TestFiles;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Synthetic variants of a sox file (its fmt and data chunks re-packed by {@link RiffFiles}): unknown and
 * odd-sized chunks, RF64, and broken headers. The samples must still equal sox's dump; broken files must
 * fail with our exception naming the file, the offset and the problem.
 */
class WavReaderVariantsTest {
    @TempDir
    Path dir;
    byte[] sox;
    byte[] fmt;
    byte[] data;
    double[][] expected;

    @BeforeEach
    void load() {
        sox = TestFiles.bytes("wav/sox/s16-stereo.wav");
        Map<String, byte[]> chunks = RiffFiles.chunks(sox);
        fmt = chunks.get("fmt ");
        data = chunks.get("data");
        expected = TestFiles.f64("wav/sox/s16-stereo.f64", 2);
    }

    private Path write(String name, byte[] content) throws IOException {
        Path p = dir.resolve(name);
        Files.write(p, content);
        return p;
    }

    private void assertSamples(Path p) throws IOException {
        try (RecordingReader r = WavReader.open(p)) {
            double[][] got = TestFiles.readAll(r, 1000);
            assertArrayEquals(expected[0], got[0], 0.0);
            assertArrayEquals(expected[1], got[1], 0.0);
        }
    }

    @Test
    void skipsUnknownOddSizedChunksWithTheirPadByte() throws IOException {
        // a 3-byte private chunk is followed by one pad byte (RIFF 1.0: chunks are word aligned)
        Path p = write("odd.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", fmt), RiffFiles.chunk("xyz1", new byte[] {1, 2, 3}),
                RiffFiles.chunk("LIST", "INFOICMT\u0005\0\0\0hello\0".getBytes(java.nio.charset.StandardCharsets.ISO_8859_1)),
                RiffFiles.chunk("data", data), RiffFiles.chunk("afte", new byte[7])));
        assertSamples(p);
    }

    @Test
    void readsFmtAfterData() throws IOException {
        assertSamples(write("late-fmt.wav", RiffFiles.riff(RiffFiles.chunk("data", data), RiffFiles.chunk("fmt ", fmt))));
    }

    @Test
    void readsRf64WithSizesInDs64() throws IOException {
        Path p = write("r.rf64", RiffFiles.rf64(fmt, data, 4));
        try (RecordingReader r = WavReader.open(p)) {
            assertEquals(RecordingFormat.RF64, r.info().format());
            assertEquals(240, r.info().frameCount());
        }
        assertSamples(p);
    }

    @Test
    void framesLargerThanTheReadBufferStillRead() throws IOException {
        // synthetic: 1024 channels of float64 make 8192-byte frames, twice the 4096-byte buffer asked for
        ByteBuffer f = ByteBuffer.allocate(16).order(ByteOrder.LITTLE_ENDIAN).putShort((short) 3).putShort((short) 1024)
                .putInt(1000).putInt(1000 * 8192).putShort((short) 8192).putShort((short) 64);
        ByteBuffer d = ByteBuffer.allocate(2 * 8192).order(ByteOrder.LITTLE_ENDIAN);
        for (int i = 0; i < 2048; i++) {
            d.putDouble(i / 4096.0);
        }
        Path p = write("wide.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", f.array()), RiffFiles.chunk("data", d.array())));
        try (RecordingReader r = WavReader.open(p, new ReadOptions(true, 4096))) {
            double[][] got = TestFiles.readAll(r, 1);
            assertEquals(1024, got.length);
            assertEquals(1023 / 4096.0, got[1023][0], 0.0);
            assertEquals(2047 / 4096.0, got[1023][1], 0.0);
        }
    }

    @Test
    void rf64TableSizeForAnotherChunk() throws IOException {
        // EBU Tech 3306 ds64 table: a chunk whose 32-bit size is 0xFFFFFFFF takes its size from the table
        ByteBuffer ds64 = ByteBuffer.allocate(28 + 12).order(ByteOrder.LITTLE_ENDIAN);
        long riffSize = 4 + (8 + 40) + (8 + 6) + (8 + fmt.length) + 8 + data.length;
        ds64.putLong(riffSize).putLong(data.length).putLong(240).putInt(1).put("big1".getBytes()).putLong(6);
        java.io.ByteArrayOutputStream o = new java.io.ByteArrayOutputStream();
        o.writeBytes("RF64".getBytes());
        o.writeBytes(RiffFiles.le32(-1));
        o.writeBytes("WAVE".getBytes());
        o.writeBytes(RiffFiles.chunk("ds64", ds64.array()));
        o.writeBytes("big1".getBytes());
        o.writeBytes(RiffFiles.le32(-1));
        o.writeBytes(new byte[6]);
        o.writeBytes(RiffFiles.chunk("fmt ", fmt));
        o.writeBytes(RiffFiles.chunk("data", data));
        assertSamples(write("table.rf64", o.toByteArray()));
    }

    @Test
    void sha256CoversTheWholeFileAndMatchesTheJdkDigest() throws Exception {
        byte[] content = RiffFiles.riff(RiffFiles.chunk("fmt ", fmt), RiffFiles.chunk("data", data),
                RiffFiles.chunk("tail", new byte[33]));
        Path p = write("h.wav", content);
        String jdk = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(content));
        try (RecordingReader r = WavReader.open(p, new ReadOptions(true, 4096))) {
            TestFiles.readAll(r, 50);
            assertEquals(jdk, r.sha256Hex(), "streamed digest");
            r.verifySha256(jdk.toUpperCase());
            RecordingFormatException e = assertThrows(RecordingFormatException.class,
                    () -> r.verifySha256("00" + jdk.substring(2)));
            assertTrue(e.getMessage().contains("SHA-256 mismatch") && e.getMessage().contains(jdk), e.getMessage());
            assertThrows(IllegalArgumentException.class, () -> r.verifySha256("abc"));
        }
        try (RecordingReader r = WavReader.open(p)) {
            r.read(new double[2][10], 0, 10);
            assertEquals(jdk, r.sha256Hex(), "digest after a partial read");
            assertEquals(10, r.framePosition());
            double[][] rest = new double[2][230];
            assertEquals(230, r.read(rest, 0, 230), "reading continues after the digest");
            assertEquals(expected[0][239], rest[0][229], 0.0);
        }
    }

    @Test
    void neverWritesTheFile() throws Exception {
        Path p = write("ro.wav", sox);
        FileTime before = FileTime.fromMillis(1_500_000_000_000L);
        Files.setLastModifiedTime(p, before);
        assertTrue(p.toFile().setWritable(false, false));
        try (RecordingReader r = WavReader.open(p)) {
            TestFiles.readAll(r, 64);
            r.sha256Hex();
        }
        assertArrayEquals(sox, Files.readAllBytes(p));
        assertEquals(before, Files.getLastModifiedTime(p));
    }

    private RecordingFormatException fails(String name, byte[] content) throws IOException {
        Path p = write(name, content);
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> {
            try (RecordingReader r = WavReader.open(p)) {
                TestFiles.readAll(r, 64);
            }
        });
        assertTrue(e.getMessage().startsWith(p.toString()), e.getMessage());
        assertEquals(p, e.file());
        return e;
    }

    @Test
    void truncatedDataChunk() throws IOException {
        byte[] cut = java.util.Arrays.copyOf(sox, sox.length - 101);
        RecordingFormatException e = fails("cut.wav", cut);
        // the RIFF size (offset 4) is checked first and already names the truncation
        assertTrue(e.getMessage().contains("truncated"), e.getMessage());
        assertEquals("byte offset 4", e.location());

        byte[] riffFixed = cut.clone();
        ByteBuffer.wrap(riffFixed).order(ByteOrder.LITTLE_ENDIAN).putInt(4, cut.length - 8);
        e = fails("cut2.wav", riffFixed);
        assertTrue(e.getMessage().contains("truncated data chunk"), e.getMessage());
        assertEquals("byte offset 36", e.location(), "the data chunk header of the sox file starts at 36");
    }

    @Test
    void declaredSizeBeyondTheFile() throws IOException {
        byte[] bad = RiffFiles.riff(RiffFiles.chunk("fmt ", fmt), RiffFiles.chunk("junk", new byte[8]),
                RiffFiles.chunk("data", data));
        ByteBuffer.wrap(bad).order(ByteOrder.LITTLE_ENDIAN).putInt(36 + 4, 1 << 30);
        RecordingFormatException e = fails("big.wav", bad);
        assertTrue(e.getMessage().contains("'junk' declares 1073741824 bytes"), e.getMessage());
        assertTrue(e.getMessage().contains("declared size beyond the file"), e.getMessage());
    }

    @Test
    void unknownFormatCode() throws IOException {
        byte[] f = fmt.clone();
        f[0] = 0x55; // 0x0055 is MPEG layer 3 in the registered codes, not a PCM layout
        RecordingFormatException e = fails("mp3.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", f), RiffFiles.chunk("data", data)));
        assertTrue(e.getMessage().contains("unknown format code 0x0055"), e.getMessage());
        assertEquals("byte offset 20", e.location(), "fmt body starts at 20");
    }

    @Test
    void zeroChannels() throws IOException {
        byte[] f = fmt.clone();
        f[2] = 0;
        f[3] = 0;
        RecordingFormatException e = fails("zero.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", f), RiffFiles.chunk("data", data)));
        assertTrue(e.getMessage().contains("zero channels"), e.getMessage());
        assertEquals("byte offset 22", e.location());
    }

    @Test
    void nanInFloatData() throws IOException {
        byte[] soxFloat = TestFiles.bytes("wav/sox/f32-stereo.wav");
        Map<String, byte[]> chunks = RiffFiles.chunks(soxFloat);
        byte[] d = chunks.get("data").clone();
        ByteBuffer.wrap(d).order(ByteOrder.LITTLE_ENDIAN).putFloat(8 * 100 + 4, Float.NaN); // frame 100, channel 2
        byte[] file = RiffFiles.riff(RiffFiles.chunk("fmt ", chunks.get("fmt ")), RiffFiles.chunk("data", d));
        int dataStart = 12 + 8 + chunks.get("fmt ").length + 8;
        RecordingFormatException e = fails("nan.wav", file);
        assertTrue(e.getMessage().contains("sample 100 of channel 2 is NaN"), e.getMessage());
        assertEquals("byte offset " + (dataStart + 804), e.location());
    }

    @Test
    void partialFrameAndMissingChunks() throws IOException {
        byte[] odd = java.util.Arrays.copyOf(data, data.length - 1);
        assertTrue(fails("part.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", fmt), RiffFiles.chunk("data", odd)))
                .getMessage().contains("not a whole number of 4-byte frames"));
        assertTrue(fails("nofmt.wav", RiffFiles.riff(RiffFiles.chunk("data", data))).getMessage().contains("no fmt chunk"));
        assertTrue(fails("nodata.wav", RiffFiles.riff(RiffFiles.chunk("fmt ", fmt))).getMessage().contains("no data chunk"));
        assertTrue(fails("empty.wav", new byte[0]).getMessage().contains("too short"));
        assertTrue(fails("text.wav", "hello, this is not audio".getBytes()).getMessage().contains("not a WAV file"));
    }

    @Test
    void garbageNeverEscapesUnchecked() throws IOException {
        Random rnd = new Random(5); // synthetic random input, fixed seed
        for (int i = 0; i < 300; i++) {
            byte[] g = sox.clone();
            for (int k = 0; k < 1 + rnd.nextInt(6); k++) {
                g[rnd.nextInt(48)] = (byte) rnd.nextInt(256);
            }
            Path p = write("g" + i + ".wav", g);
            try (RecordingReader r = WavReader.open(p)) {
                TestFiles.readAll(r, 100);
            } catch (RecordingFormatException expectedOrNot) {
                assertTrue(expectedOrNot.getMessage().startsWith(p.toString()));
            }
        }
    }
}
