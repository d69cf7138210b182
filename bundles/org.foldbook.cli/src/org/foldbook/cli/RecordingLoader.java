package org.foldbook.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.raw.RawLayout;
import org.foldbook.io.raw.RawReader;
import org.foldbook.io.wav.WavReader;

/**
 * Reads one channel of a recording into memory for the sweep: WAV (RIFF/RF64, by the io bundle's reader),
 * or raw little-endian float64 when a rate is given and the file is not RIFF. The sweep needs the whole
 * channel at once (rates run in parallel over one shared array); other channels are read block by block and
 * dropped.
 */
final class RecordingLoader {
    private static final int BLOCK = 1 << 16;

    /** One channel's samples and its rate. */
    record Loaded(double[] samples, double rate, String format) {
    }

    private RecordingLoader() {
    }

    static Loaded load(Path file, Optional<Double> rawRate, int channel) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException("--input " + file + ": no such file");
        }
        boolean riff = isRiff(file);
        RecordingReader reader;
        String format;
        if (riff) {
            reader = WavReader.open(file, ReadOptions.DEFAULT.withSha256(false));
            format = "wav";
        } else if (rawRate.isPresent()) {
            RawLayout layout = RawLayout.of(SampleType.FLOAT64, ByteOrder.LITTLE_ENDIAN, 1, true, 0, rawRate.get());
            reader = RawReader.open(file, layout, ReadOptions.DEFAULT.withSha256(false));
            format = "raw-f64le";
        } else {
            throw new IllegalArgumentException("--input " + file
                    + ": not a WAV file; for raw little-endian float64 samples give --rate");
        }
        try (RecordingReader r = reader) {
            RecordingInfo info = r.info();
            if (riff && rawRate.isPresent() && rawRate.get() != info.sampleRate()) {
                throw new IllegalArgumentException("--rate " + rawRate.get() + " disagrees with the WAV header's "
                        + info.sampleRate() + " S/s in " + file);
            }
            int channels = info.channelCount();
            if (channel > channels) {
                throw new IllegalArgumentException("--channel " + channel + ": " + file + " has " + channels
                        + " channel(s)");
            }
            if (info.frameCount() > Integer.MAX_VALUE - 8) {
                throw new IllegalArgumentException("--input " + file + ": " + info.frameCount()
                        + " frames, more than one array holds");
            }
            int n = (int) info.frameCount();
            double[] x = new double[n];
            // one channel: straight into place; several: block by block through scratch arrays
            double[][] bufs = channels == 1 ? new double[][] {x} : new double[channels][BLOCK];
            int pos = 0;
            while (pos < n) {
                int want = Math.min(BLOCK, n - pos);
                int got = channels == 1 ? r.read(bufs, pos, want) : r.read(bufs, 0, want);
                if (got < 0) {
                    throw new IOException(file + ": ended after " + pos + " of " + n + " frames");
                }
                if (channels > 1) {
                    System.arraycopy(bufs[channel - 1], 0, x, pos, got);
                }
                pos += got;
            }
            if (n == 0) {
                throw new IllegalArgumentException("--input " + file + ": no samples");
            }
            return new Loaded(x, info.sampleRate(), format);
        }
    }

    private static boolean isRiff(Path file) throws IOException {
        byte[] head = new byte[4];
        try (InputStream in = Files.newInputStream(file)) {
            if (in.readNBytes(head, 0, 4) < 4) {
                return false;
            }
        }
        String tag = new String(head, java.nio.charset.StandardCharsets.US_ASCII);
        return tag.equals("RIFF") || tag.equals("RF64") || tag.equals("BW64");
    }
}
