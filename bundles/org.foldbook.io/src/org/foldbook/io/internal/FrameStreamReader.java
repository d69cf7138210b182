package org.foldbook.io.internal;

import java.io.IOException;

import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Sha256;

/**
 * Reader for binary files whose samples are interleaved frames in one contiguous byte range
 * (WAV data chunk, interleaved raw). Everything before the range is hashed at open, the range is
 * decoded block by block, and the rest of the file is hashed when the digest is asked for.
 */
public final class FrameStreamReader implements RecordingReader {
    private final RecordingInfo info;
    private final SequentialInput input;
    private final SampleCodec codec;
    private final long dataStart;
    private final int frameBytes;
    private final int channels;
    private long framePosition;
    private String sha256;

    /** Takes ownership of {@code input}; closes it if the data start cannot be reached. */
    public FrameStreamReader(RecordingInfo info, SequentialInput input, SampleCodec codec, long dataStart)
            throws IOException {
        this.info = info;
        this.input = input;
        this.codec = codec;
        this.dataStart = dataStart;
        this.frameBytes = codec.frameBytes();
        this.channels = info.channelCount();
        try {
            input.skipTo(dataStart);
        } catch (IOException | RuntimeException e) {
            input.close();
            throw e;
        }
    }

    @Override
    public RecordingInfo info() {
        return info;
    }

    @Override
    public long framePosition() {
        return framePosition;
    }

    @Override
    public int read(double[][] dest, int offset, int maxFrames) throws IOException {
        Buffers.checkChannels(dest, offset, maxFrames, channels);
        return readFrames(dest, null, offset, maxFrames);
    }

    @Override
    public int readInterleaved(double[] dest, int offset, int maxFrames) throws IOException {
        Buffers.checkInterleaved(dest, offset, maxFrames, channels);
        return readFrames(null, dest, offset, maxFrames);
    }

    private int readFrames(double[][] perChannel, double[] interleaved, int offset, int maxFrames)
            throws IOException {
        long remaining = info.frameCount() - framePosition;
        if (remaining == 0 && maxFrames > 0) {
            return -1;
        }
        int want = (int) Math.min(maxFrames, remaining);
        int done = 0;
        while (done < want) {
            if (!input.fill(frameBytes)) {
                throw RecordingFormatException.atByte(info.file(), input.position(),
                        "file ends inside the sample data at frame " + (framePosition + done) + " of "
                                + info.frameCount() + " (truncated, or shortened while being read)");
            }
            int n = Math.min(want - done, input.available() / frameBytes);
            long bad = perChannel != null
                    ? codec.decode(input.buffer(), input.index(), n, perChannel, offset + done)
                    : codec.decodeInterleaved(input.buffer(), input.index(), n, interleaved, offset + done * channels);
            if (bad >= 0) {
                long at = input.position() + bad * codec.type().bytes();
                throw RecordingFormatException.atByte(info.file(), at, "sample " + (framePosition + done
                        + bad / channels) + " of channel " + (bad % channels + 1)
                        + " is NaN or infinite; the format stores finite samples only");
            }
            input.advance(n * frameBytes);
            done += n;
        }
        framePosition += done;
        return done;
    }

    @Override
    public String sha256Hex() throws IOException {
        if (sha256 == null) {
            if (input.hashing() && framePosition == info.frameCount()) {
                sha256 = input.finishDigest();
            } else {
                sha256 = Sha256.ofChannel(input.channel());
            }
        }
        return sha256;
    }

    /** File offset of the first sample byte. */
    public long dataStart() {
        return dataStart;
    }

    @Override
    public void close() throws IOException {
        input.close();
    }
}
