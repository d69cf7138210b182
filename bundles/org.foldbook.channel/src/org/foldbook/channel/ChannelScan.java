package org.foldbook.channel;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.CancellationException;

import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.model.Channel;
import org.foldbook.model.Recording;

/**
 * Reads a notebook channel block by block, for files larger than memory, as strictly as
 * {@link ChannelReader#read} (the same path resolution, checks against the notebook and errors; unlike the
 * lenient {@link ChannelReader#stream} of the audit, which reports disagreements instead), but the samples go to a {@link Sink} as they arrive and
 * only one block is held. The SHA-256 is streamed too, so a changed file is known only at the end: the
 * sink's work is then thrown away with the error (unless the request accepts changed files).
 */
public final class ChannelScan {
    private static final int BLOCK = 1 << 16;

    private ChannelScan() {
    }

    /** Receives the channel's samples in order; called on the reading thread. */
    public interface Sink {
        /** Called once before any sample, with what the file says. */
        default void start(RecordingInfo info) {
        }

        /** {@code samples[0 .. count)} are the next samples of the channel. */
        void accept(double[] samples, int count);
    }

    /**
     * What a completed scan found.
     *
     * @param frames          samples of the channel read
     * @param checksumChanged true when the SHA-256 differs from the logged one (accepted by the request)
     */
    public record Scan(Path file, double rateHz, long frames, String sha256, boolean checksumChanged, String unit) {
    }

    /**
     * Streams {@code channel}'s samples into {@code sink}.
     *
     * @throws ChannelDataException naming the file and the problem (missing, unreadable, corrupt, changed,
     *                              disagreeing with the notebook, a sample that is not a finite number)
     * @throws CancellationException when {@code progress} asked to stop
     */
    public static Scan scan(Channel channel, ChannelReader.ReadRequest request, Sink sink, ReadProgress progress)
            throws ChannelDataException {
        Path file = ChannelReader.existingFileOf(channel);
        Recording recording = channel.getRecording();
        try (RecordingReader reader = ChannelReader.open(file, recording)) {
            RecordingInfo info = reader.info();
            ChannelReader.checkAgainstNotebook(file, info, channel, recording);
            sink.start(info);
            int index = channel.getChannelIndex();
            double[][] bufs = new double[info.channelCount()][BLOCK];
            long total = info.frameCount();
            long pos = 0;
            int got;
            while ((got = reader.read(bufs, 0, BLOCK)) > 0) {
                if (progress.cancelled()) {
                    throw new CancellationException("reading " + file + " cancelled");
                }
                double[] x = bufs[index];
                for (int i = 0; i < got; i++) {
                    if (!Double.isFinite(x[i])) {
                        throw new ChannelDataException(file, "sample " + (pos + i) + " of channel " + index
                                + " is " + x[i] + " (not a finite number)");
                    }
                }
                sink.accept(x, got);
                pos += got;
                progress.framesRead(pos, total);
            }
            if (pos != total) {
                throw new ChannelDataException(file, "ended after " + pos + " of " + total + " frames");
            }
            String sha = reader.sha256Hex().toLowerCase(Locale.ROOT);
            boolean changed = ChannelReader.checksumChanged(file, recording, sha, request);
            return new Scan(file, info.sampleRate(), pos, sha, changed, info.channels().get(index).unit());
        } catch (ChannelDataException | CancellationException e) {
            throw e;
        } catch (IOException | IllegalArgumentException e) {
            throw ChannelReader.unreadable(file, e);
        }
    }
}
