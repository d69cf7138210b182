package org.foldbook.io.fuzz;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingReader;

/**
 * Shared harness: the fuzzer's bytes become a file, a reader reads it completely, twice (per channel and
 * interleaved). Our checked {@link RecordingFormatException} is the expected outcome for bad input; any
 * other exception (unchecked, or an IOException that is not ours) is a finding. A reader that reports
 * fewer frames than it declared is a finding too (a silent partial read).
 */
final class FuzzTarget {
    interface Opener {
        RecordingReader open(Path file) throws IOException;
    }

    private static Path file;

    private FuzzTarget() {
    }

    static void run(byte[] data, String suffix, Opener opener) throws IOException {
        if (file == null) {
            file = Files.createTempFile("foldbook-fuzz-", suffix);
            file.toFile().deleteOnExit();
        }
        Files.write(file, data);
        readFully(opener, false);
        readFully(opener, true);
    }

    private static void readFully(Opener opener, boolean interleaved) throws IOException {
        try (RecordingReader r = opener.open(file)) {
            int ch = r.info().channelCount();
            if (ch < 1) {
                throw new IllegalStateException("reader accepted " + ch + " channels");
            }
            int block = Math.max(1, 4096 / ch);
            double[][] per = new double[ch][block];
            double[] inter = new double[ch * block];
            long frames = 0;
            int n;
            while ((n = interleaved ? r.readInterleaved(inter, 0, block) : r.read(per, 0, block)) > 0) {
                frames += n;
            }
            if (n != -1 || frames != r.info().frameCount() || r.framePosition() != frames) {
                throw new IllegalStateException("read " + frames + " of " + r.info().frameCount()
                        + " declared frames, last call returned " + n);
            }
            r.sha256Hex();
        } catch (RecordingFormatException expected) {
            if (!expected.getMessage().startsWith(file.toString())) {
                throw new IllegalStateException("error message does not name the file: " + expected.getMessage());
            }
        } catch (IOException e) {
            throw new UncheckedIOException("an IOException that is not a RecordingFormatException", e);
        }
    }
}
