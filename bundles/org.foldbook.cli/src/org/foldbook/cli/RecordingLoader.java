package org.foldbook.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.Optional;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.Recordings;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.raw.RawLayout;
import org.foldbook.io.raw.RawReader;
import org.foldbook.sweep.StreamingSweep;

/**
 * Reads one channel of a recording for the sweep through {@link Recordings#open} (WAV/RF64, HDF5, CSV/TSV,
 * raw with a layout sidecar), or raw little-endian float64 when a rate is given and the file is none of those. Either into memory (the in-memory
 * engine shares one array between its threads) or, for {@code --stream}, as a block source over the
 * reader's bounded buffer. Other channels are read block by block and dropped.
 */
final class RecordingLoader {
    private static final int BLOCK = 1 << 16;

    /** One channel's samples and its rate. */
    record Loaded(double[] samples, double rate) {
    }

    private RecordingLoader() {
    }

    /**
     * One channel as a {@link StreamingSweep.Source}: the reader's bounded buffer, nothing of the file's
     * size in memory. Close it when done.
     */
    static Streamed stream(Path file, Optional<Double> rawRate, int channel) throws IOException {
        RecordingReader r = open(file, rawRate);
        try {
            RecordingInfo info = checked(r, file, rawRate, channel);
            if (info.frameCount() == 0) {
                throw new IllegalArgumentException("--input " + file + ": no samples");
            }
            return new Streamed(r, info, channel - 1);
        } catch (RuntimeException | IOException e) {
            r.close();
            throw e;
        }
    }

    /** A channel read block by block; the other channels' samples pass through a scratch buffer. */
    static final class Streamed implements StreamingSweep.Source, AutoCloseable {
        private final RecordingReader reader;
        private final RecordingInfo info;
        private final int channel;
        private final double[][] scratch;

        Streamed(RecordingReader reader, RecordingInfo info, int channel) {
            this.reader = reader;
            this.info = info;
            this.channel = channel;
            this.scratch = new double[info.channelCount()][];
        }

        double rate() {
            return info.sampleRate();
        }

        @Override
        public long length() {
            return info.frameCount();
        }

        @Override
        public int read(double[] buf, int offset, int max) throws IOException {
            if (scratch.length == 1) {
                scratch[0] = buf;
                return reader.read(scratch, offset, max);
            }
            if (scratch[0] == null) {
                for (int c = 0; c < scratch.length; c++) {
                    scratch[c] = new double[BLOCK];
                }
            }
            int got = reader.read(scratch, 0, Math.min(max, BLOCK));
            if (got > 0) {
                System.arraycopy(scratch[channel], 0, buf, offset, got);
            }
            return got;
        }

        @Override
        public void close() throws IOException {
            reader.close();
        }
    }

    /**
     * Opens the file through {@link Recordings#open} (WAV/RF64, HDF5, raw with a layout sidecar, CSV/TSV);
     * a file none of them claims is raw little-endian float64 when --rate is given.
     */
    private static RecordingReader open(Path file, Optional<Double> rawRate) throws IOException {
        if (!Files.isRegularFile(file)) {
            throw new IllegalArgumentException("--input " + file + ": no such file");
        }
        if (rawRate.isPresent() && !describesItself(file)) {
            RawLayout layout = RawLayout.of(SampleType.FLOAT64, ByteOrder.LITTLE_ENDIAN, 1, true, 0, rawRate.get());
            return RawReader.open(file, layout, ReadOptions.DEFAULT.withSha256(false));
        }
        if (!describesItself(file)) {
            throw new IllegalArgumentException("--input " + file + ": not WAV/RF64, HDF5, CSV/TSV or raw with a "
                    + "layout sidecar (" + RawLayout.sidecarOf(file).getFileName() + "); for raw little-endian "
                    + "float64 samples give --rate");
        }
        return Recordings.open(file, null, ReadOptions.DEFAULT.withSha256(false));
    }

    /** The header's facts, checked against --rate and --channel. */
    private static RecordingInfo checked(RecordingReader r, Path file, Optional<Double> rawRate, int channel)
            throws IOException {
        RecordingInfo info = r.info();
        if (describesItself(file) && rawRate.isPresent() && rawRate.get() != info.sampleRate()) {
            throw new IllegalArgumentException("--rate " + rawRate.get() + " disagrees with the "
                    + info.sampleRate() + " S/s that " + file + " states");
        }
        if (channel > info.channelCount()) {
            throw new IllegalArgumentException("--channel " + channel + ": " + file + " has " + info.channelCount()
                    + " channel(s)");
        }
        return info;
    }

    static Loaded load(Path file, Optional<Double> rawRate, int channel) throws IOException {
        RecordingReader reader = open(file, rawRate);
        try (RecordingReader r = reader) {
            RecordingInfo info = checked(r, file, rawRate, channel);
            int channels = info.channelCount();
            if (info.frameCount() > Integer.MAX_VALUE - 8) {
                throw new IllegalArgumentException("--input " + file + ": " + info.frameCount()
                        + " frames, more than one array holds; use --stream");
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
            return new Loaded(x, info.sampleRate());
        }
    }

    /** Whether {@link Recordings#open} finds the file's layout by itself (magic bytes, sidecar, name). */
    private static boolean describesItself(Path file) throws IOException {
        byte[] head = new byte[8];
        int n;
        try (InputStream in = Files.newInputStream(file)) {
            n = in.readNBytes(head, 0, 8);
        }
        String tag = new String(head, 0, Math.min(n, 4), StandardCharsets.ISO_8859_1);
        String name = file.getFileName().toString().toLowerCase(Locale.ROOT);
        return tag.equals("RIFF") || tag.equals("RF64") || tag.equals("BW64")
                || (n == 8 && head[0] == (byte) 0x89 && new String(head, 1, 3, StandardCharsets.ISO_8859_1).equals("HDF"))
                || Files.isRegularFile(RawLayout.sidecarOf(file))
                || name.endsWith(".csv") || name.endsWith(".tsv") || name.endsWith(".txt");
    }
}
