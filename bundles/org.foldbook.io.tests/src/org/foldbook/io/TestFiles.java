package org.foldbook.io;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.io.RecordingReader;

/** Test helpers: committed reference files copied out of the class path, and whole-recording reads. */
public final class TestFiles {
    private TestFiles() {
    }

    /** Copies a class-path resource (relative to /org/foldbook/io/) into {@code dir}. */
    public static Path copy(String resource, Path dir) {
        String full = "/org/foldbook/io/" + resource;
        try (InputStream in = TestFiles.class.getResourceAsStream(full)) {
            if (in == null) {
                throw new IllegalStateException("test resource missing: " + full);
            }
            Path target = dir.resolve(resource.substring(resource.lastIndexOf('/') + 1));
            Files.write(target, in.readAllBytes());
            return target;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static byte[] bytes(String resource) {
        String full = "/org/foldbook/io/" + resource;
        try (InputStream in = TestFiles.class.getResourceAsStream(full)) {
            if (in == null) {
                throw new IllegalStateException("test resource missing: " + full);
            }
            return in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** A raw little-endian float64 dump (frames x channels, row-major) as [channel][frame]. */
    public static double[][] f64(String resource, int channels) {
        ByteBuffer b = ByteBuffer.wrap(bytes(resource)).order(ByteOrder.LITTLE_ENDIAN);
        int frames = b.remaining() / 8 / channels;
        double[][] out = new double[channels][frames];
        for (int f = 0; f < frames; f++) {
            for (int c = 0; c < channels; c++) {
                out[c][f] = b.getDouble();
            }
        }
        return out;
    }

    /** Reads every frame in blocks of {@code block} frames, per channel, and checks the end is reported. */
    public static double[][] readAll(RecordingReader r, int block) throws IOException {
        int ch = r.info().channelCount();
        int frames = Math.toIntExact(r.info().frameCount());
        double[][] out = new double[ch][frames];
        for (int at = 0; at < frames;) {
            int n = r.read(out, at, Math.min(block, frames - at));
            if (n <= 0) {
                throw new IllegalStateException("read returned " + n + " at frame " + at + " of " + frames);
            }
            at += n;
        }
        if (r.read(new double[ch][1], 0, 1) != -1) {
            throw new IllegalStateException("no end reported after " + frames + " frames");
        }
        return out;
    }

    /** Reads every frame interleaved in blocks of {@code block} frames. */
    public static double[] readAllInterleaved(RecordingReader r, int block) throws IOException {
        int ch = r.info().channelCount();
        int frames = Math.toIntExact(r.info().frameCount());
        double[] out = new double[ch * frames];
        for (int at = 0; at < frames;) {
            int n = r.readInterleaved(out, at * ch, Math.min(block, frames - at));
            if (n <= 0) {
                throw new IllegalStateException("readInterleaved returned " + n + " at frame " + at);
            }
            at += n;
        }
        if (r.readInterleaved(new double[ch], 0, 1) != -1) {
            throw new IllegalStateException("no end reported after " + frames + " frames");
        }
        return out;
    }

    /**
     * SHA-256 of the whole file by the JDK in one call over its bytes: an outside reference for the
     * readers' streamed digests (which go through org.foldbook.io.Sha256).
     */
    public static String jdkSha256(Path file) throws IOException {
        try {
            return java.util.HexFormat.of().formatHex(
                    java.security.MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(file)));
        } catch (java.security.NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
