package org.foldbook.io.wav;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.io.IOException;
import java.io.RandomAccessFile;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.TimeUnit;

import org.foldbook.io.RecordingReader;
import org.foldbook.io.TestFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A recording larger than 4 GiB (so only RF64 can hold it) read by a child JVM whose heap (-Xmx64m) is
 * far smaller than the file. The file is sparse: an RF64 header (EBU Tech 3306 layout, built by
 * {@link RiffFiles}) in front of 4 GiB + 4 MiB of 16-bit stereo data, mostly zeros, with marked frames
 * written at the start, across the 4 GiB boundary and at the end. Its SHA-256 is checked against a plain
 * JDK MessageDigest pass over the file. Set -Dfoldbook.io.largeFile=false to skip it on slow disks.
 */
class LargeRf64Test {
    @TempDir
    Path dir;

    private static final long DATA_BYTES = (1L << 32) + (1L << 22);
    private static final int BLOCK_ALIGN = 4;

    @Test
    void readsMoreThan4GiBWithA64MiBHeap() throws Exception {
        org.junit.jupiter.api.Assumptions.assumeFalse("false".equals(System.getProperty("foldbook.io.largeFile")),
                "large-file test switched off by -Dfoldbook.io.largeFile=false");
        Map<String, byte[]> sox = RiffFiles.chunks(TestFiles.bytes("wav/sox/s16-stereo.wav"));
        byte[] header = RiffFiles.rf64Header(sox.get("fmt "), DATA_BYTES, BLOCK_ALIGN);
        Path file = dir.resolve("big.rf64");
        long frames = DATA_BYTES / BLOCK_ALIGN;
        long[] probes = {0, 1, (1L << 30) - 1, (1L << 30) - header.length / 4, frames - 1};
        short[][] marks = {{1000, -1000}, {-32768, 32767}, {12345, -12345}, {7, -7}, {-2, 3}};
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            raf.setLength(header.length + DATA_BYTES);
            raf.write(header);
            for (int i = 0; i < probes.length; i++) {
                ByteBuffer b = ByteBuffer.allocate(4).order(ByteOrder.LITTLE_ENDIAN).putShort(marks[i][0])
                        .putShort(marks[i][1]);
                raf.seek(header.length + probes[i] * BLOCK_ALIGN);
                raf.write(b.array());
            }
        }
        try (RecordingReader r = WavReader.open(file)) {
            assertEquals(frames, r.info().frameCount());
        }
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx64m", "-cp", childClassPath(), LargeRf64Child.class.getName(), file.toString()));
        for (long p : probes) {
            cmd.add(Long.toString(p));
        }
        Path out = dir.resolve("child.txt");
        Process child = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(out.toFile()).start();
        String expectedSha = sha256(file);
        boolean done = child.waitFor(240, TimeUnit.SECONDS);
        if (!done) {
            child.destroyForcibly();
        }
        String text = Files.readString(out);
        System.out.println("LargeRf64Test child: " + text.strip());
        assertTrue(done, "child did not finish: " + text);
        assertEquals(0, child.exitValue(), text);
        assertTrue(text.contains("frames=" + frames + " format=RF64"), text);
        assertTrue(text.contains("sha256=" + expectedSha), text);
        for (int i = 0; i < probes.length; i++) {
            String expected = probes[i] + "=" + marks[i][0] / 32768.0 + "/" + marks[i][1] / 32768.0;
            assertTrue(text.contains(" " + expected), "frame " + expected + " in " + text);
        }
        long peak = Long.parseLong(text.replaceAll("(?s).*peakHeap=(\\d+).*", "$1"));
        assertTrue(peak < 64L << 20, "heap in use " + peak);
    }

    /** Plain JDK digest of the file, as the outside check of the streamed one. */
    private static String sha256(Path file) throws Exception {
        MessageDigest md = MessageDigest.getInstance("SHA-256");
        ByteBuffer b = ByteBuffer.allocate(1 << 20);
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            while (ch.read(b.clear()) > 0) {
                md.update(b.array(), 0, b.position());
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }

    /**
     * Class path for the child: the folders or jars holding our main and test classes. Works on a plain
     * class path and under OSGi, where the code source of a workspace bundle is its folder (classes then
     * sit in target/classes).
     */
    static String childClassPath() throws URISyntaxException {
        Set<String> entries = new LinkedHashSet<>();
        for (Class<?> c : new Class<?>[] {WavReader.class, LargeRf64Child.class}) {
            URL url = c.getProtectionDomain().getCodeSource().getLocation();
            File f = new File(url.toURI());
            entries.add(f.getPath());
            for (String sub : new String[] {"target/classes", "target/test-classes", "bin"}) {
                File d = new File(f, sub);
                if (d.isDirectory()) {
                    entries.add(d.getPath());
                }
            }
        }
        return String.join(File.pathSeparator, entries);
    }
}
