package org.foldbook.channel;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CancellationException;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingDescriptor;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Recordings;
import org.foldbook.io.csv.DelimitedTextSettings;
import org.foldbook.model.Channel;
import org.foldbook.model.Recording;
import org.foldbook.model.RecordingFormat;
import org.foldbook.model.persistence.RecordingFiles;
import org.foldbook.model.persistence.RecordingFormats;

/**
 * Reads a notebook channel's samples: the recording's path resolved against the notebook's folder,
 * the file opened read-only through {@link Recordings#open} (WAV/RF64, CSV/TSV, raw with its layout
 * sidecar, HDF5), its SHA-256 streamed while reading and compared with the logged one, its rate and
 * channel count compared with the notebook's. The workbench and the command line both read channels
 * here, so they see the same samples and the same problems.
 */
public final class ChannelReader {
    private static final int BLOCK = 1 << 16;
    /** Rates that differ by less than this fraction are the same rate (text time stamps round). */
    private static final double RATE_TOLERANCE = 1e-6;

    private ChannelReader() {
    }

    /** What to accept while reading. */
    public record ReadRequest(boolean acceptChangedChecksum) {
        /** A changed checksum is an error. */
        public static final ReadRequest STRICT = new ReadRequest(false);
    }

    /** The recording file of {@code channel}, resolved against its notebook's folder. */
    public static Path fileOf(Channel channel) throws ChannelDataException {
        Recording recording = channel.getRecording();
        if (recording == null) {
            throw new ChannelDataException(null, "channel '" + channel.getName() + "' names no recording");
        }
        try {
            return RecordingFiles.resolve(recording);
        } catch (IllegalArgumentException | IllegalStateException e) {
            throw new ChannelDataException(null, "recording " + recording.getId() + " of channel '"
                    + channel.getName() + "': " + e.getMessage(), e);
        }
    }

    /**
     * Reads the channel whole. A changed file is an error unless the request accepts it (then the data
     * says so); a missing, unreadable or corrupt file, or one that disagrees with the notebook about rate
     * or channel count, is an error naming the file.
     *
     * @throws CancellationException when {@code progress} asked to stop
     */
    public static ChannelData read(Channel channel, ReadRequest request, ReadProgress progress)
            throws ChannelDataException {
        Path file = existingFileOf(channel);
        Recording recording = channel.getRecording();
        try (RecordingReader reader = open(file, recording)) {
            RecordingInfo info = reader.info();
            checkAgainstNotebook(file, info, channel, recording);
            if (info.frameCount() > Integer.MAX_VALUE - 8) {
                throw new ChannelDataException(file, info.frameCount() + " frames: more than one array holds"
                        + " (ChannelScan.scan reads it block by block)");
            }
            double[] samples = readChannel(reader, info, channel.getChannelIndex(), file, progress);
            String sha = reader.sha256Hex().toLowerCase(Locale.ROOT);
            boolean changed = checksumChanged(file, recording, sha, request);
            String unit = info.channels().get(channel.getChannelIndex()).unit();
            return new ChannelData(file, samples, info.sampleRate(), sha, changed, unit);
        } catch (ChannelDataException | CancellationException e) {
            throw e;
        } catch (IOException | IllegalArgumentException e) {
            throw unreadable(file, e);
        }
    }

    /**
     * Streams the channel once in blocks into {@code sink} (memory bounded by one block, any file size)
     * and returns what the file says about itself. Unlike {@link #read} it does not stop when the file's
     * rate, channel count or checksum disagree with the notebook, nor at non-finite samples: an audit
     * reports those. A missing, unreadable or corrupt file, or a channel index the file lacks, is an
     * error naming the file.
     *
     * @throws CancellationException when {@code progress} asked to stop
     */
    public static ChannelStream stream(Channel channel, ChannelStream.BlockSink sink, ReadProgress progress)
            throws ChannelDataException {
        Path file = existingFileOf(channel);
        Recording recording = channel.getRecording();
        try (RecordingReader reader = open(file, recording)) {
            RecordingInfo info = reader.info();
            int index = channel.getChannelIndex();
            if (index < 0 || index >= info.channelCount()) {
                throw new ChannelDataException(file, "channel '" + channel.getName() + "' is index " + index
                        + ", but the file holds " + info.channelCount() + " channel(s)");
            }
            double[][] bufs = new double[info.channelCount()][BLOCK];
            long done = 0;
            int got;
            while ((got = reader.read(bufs, 0, BLOCK)) > 0) {
                if (progress.cancelled()) {
                    throw new CancellationException("reading " + file + " cancelled");
                }
                sink.accept(bufs[index], got);
                done += got;
                progress.framesRead(done, info.frameCount());
            }
            String logged = recording.getSha256() == null ? "" : recording.getSha256().toLowerCase(Locale.ROOT);
            return new ChannelStream(file, info.sampleRate(), info.channelCount(), done, info.sampleType(),
                    reader.sha256Hex().toLowerCase(Locale.ROOT), logged, info.channels().get(index).unit());
        } catch (ChannelDataException | CancellationException e) {
            throw e;
        } catch (IOException | IllegalArgumentException e) {
            throw new ChannelDataException(file, "cannot be read: " + e.getMessage(), e);
        }
    }

    /**
     * Opens with the reader the logged format selects ({@link RecordingFormats}); a text recording without
     * a time column takes the notebook's declared rate. A file of another family than the logged one is
     * an error: the notebook and the file disagree about what the recording is.
     */
    static RecordingReader open(Path file, Recording recording) throws IOException {
        RecordingFormat logged = recording.getFormat();
        RecordingDescriptor selection = RecordingFormats.readerSelection(logged);
        RecordingReader reader;
        try {
            reader = Recordings.open(file, selection, ReadOptions.DEFAULT);
        } catch (RecordingFormatException e) {
            if (selection instanceof DelimitedTextSettings text && recording.getDeclaredRateHz() > 0
                    && e.getMessage().contains("no time column")) {
                reader = Recordings.open(file, text.withSampleRate(recording.getDeclaredRateHz()), ReadOptions.DEFAULT);
            } else {
                throw e;
            }
        }
        if (!RecordingFormats.agree(logged, reader.info().format())) {
            org.foldbook.io.RecordingFormat found = reader.info().format();
            reader.close();
            throw new ChannelDataException(file, "the notebook logs recording " + recording.getId() + " as " + logged
                    + ", but the file is " + found + " (correct the recording's format in the notebook)");
        }
        return reader;
    }

    static void checkAgainstNotebook(Path file, RecordingInfo info, Channel channel, Recording recording)
            throws ChannelDataException {
        int index = channel.getChannelIndex();
        if (index < 0 || index >= info.channelCount()) {
            throw new ChannelDataException(file, "channel '" + channel.getName() + "' is index " + index
                    + ", but the file holds " + info.channelCount() + " channel(s)");
        }
        if (recording.getChannelCount() > 0 && recording.getChannelCount() != info.channelCount()) {
            throw new ChannelDataException(file, "the notebook says " + recording.getChannelCount()
                    + " channel(s), the file holds " + info.channelCount());
        }
        double declared = recording.getDeclaredRateHz();
        if (declared > 0 && Math.abs(info.sampleRate() - declared) > RATE_TOLERANCE * declared) {
            throw new ChannelDataException(file, String.format(Locale.ROOT,
                    "the file is at %.9g S/s, the notebook declares %.9g S/s", info.sampleRate(), declared));
        }
        if (info.frameCount() < 1) {
            throw new ChannelDataException(file, "holds no samples");
        }
    }

    private static double[] readChannel(RecordingReader r, RecordingInfo info, int channel, Path file,
            ReadProgress progress) throws IOException {
        int n = (int) info.frameCount();
        int channels = info.channelCount();
        double[] x = new double[n];
        double[][] bufs = channels == 1 ? new double[][] {x} : new double[channels][BLOCK];
        int pos = 0;
        while (pos < n) {
            if (progress.cancelled()) {
                throw new CancellationException("reading " + file + " cancelled");
            }
            int want = Math.min(BLOCK, n - pos);
            int got = channels == 1 ? r.read(bufs, pos, want) : r.read(bufs, 0, want);
            if (got < 0) {
                throw new ChannelDataException(file, "ended after " + pos + " of " + n + " frames");
            }
            if (channels > 1) {
                System.arraycopy(bufs[channel], 0, x, pos, got);
            }
            pos += got;
            progress.framesRead(pos, n);
        }
        for (int i = 0; i < n; i++) {
            if (!Double.isFinite(x[i])) {
                throw new ChannelDataException(file, "sample " + i + " of channel " + channel + " is " + x[i]
                        + " (not a finite number)");
            }
        }
        return x;
    }

    /** {@link #fileOf}, required to be an existing regular file. */
    static Path existingFileOf(Channel channel) throws ChannelDataException {
        Path file = fileOf(channel);
        if (!Files.isRegularFile(file)) {
            throw new ChannelDataException(file, Files.exists(file) ? "not a regular file"
                    : "missing (the notebook expects recording " + channel.getRecording().getId() + " here)");
        }
        return file;
    }

    /**
     * Whether {@code sha} differs from the checksum the notebook logged for {@code recording}; a change is an
     * error naming the file unless {@code request} accepts it.
     */
    static boolean checksumChanged(Path file, Recording recording, String sha, ReadRequest request)
            throws ChannelDataException {
        String logged = recording.getSha256();
        boolean changed = logged != null && !logged.isBlank() && !logged.equalsIgnoreCase(sha);
        if (changed && !request.acceptChangedChecksum()) {
            throw new ChannelDataException(file, "changed since it was logged: SHA-256 now " + sha
                    + ", logged " + logged.toLowerCase(Locale.ROOT)
                    + " (a different or edited file; accept it explicitly to go on)");
        }
        return changed;
    }

    /** A reader's failure as the error of this file: a damaged file, or one the notebook describes wrongly. */
    static ChannelDataException unreadable(Path file, Exception e) {
        if (e instanceof ChannelDataException c) {
            return c;
        }
        return new ChannelDataException(file, e instanceof IllegalArgumentException ? e.getMessage()
                : "cannot be read: " + e.getMessage(), e);
    }
}
