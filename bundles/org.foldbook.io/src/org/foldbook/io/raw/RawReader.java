package org.foldbook.io.raw;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.Sha256;
import org.foldbook.io.internal.Buffers;
import org.foldbook.io.internal.FrameStreamReader;
import org.foldbook.io.internal.SampleCodec;
import org.foldbook.io.internal.SequentialInput;

/** Reads raw binary recordings described by a {@link RawLayout}. */
public final class RawReader {
    private RawReader() {
    }

    /** Opens with the layout from the sidecar file next to the recording. */
    public static RecordingReader open(Path file) throws IOException {
        Path sidecar = RawLayout.sidecarOf(file);
        if (!Files.isRegularFile(sidecar)) {
            throw new RecordingFormatException(file, "whole file", "no layout given and no sidecar " + sidecar.getFileName());
        }
        return open(file, RawLayout.readSidecar(sidecar), ReadOptions.DEFAULT);
    }

    public static RecordingReader open(Path file, RawLayout layout, ReadOptions options) throws IOException {
        FileChannel ch = FileChannel.open(file, StandardOpenOption.READ);
        try {
            long size = ch.size();
            long available = size - layout.headerBytes();
            if (available < 0) {
                throw RecordingFormatException.atByte(file, 0, "header of " + layout.headerBytes()
                        + " bytes declared, but the file has only " + size + " (declared size beyond the file)");
            }
            long frames = layout.frames();
            long frameBytes = layout.frameBytes();
            if (frames < 0) {
                if (available % frameBytes != 0) {
                    throw RecordingFormatException.atByte(file, size - available % frameBytes, "the "
                            + available + " bytes after the header are not a whole number of " + frameBytes
                            + "-byte frames (truncated data, or wrong sample type/channels)");
                }
                frames = available / frameBytes;
            } else if (frames > available / frameBytes) {
                throw RecordingFormatException.atByte(file, size, frames + " frames declared need "
                        + frames * frameBytes + " bytes after the header, the file has " + available
                        + " (truncated data, or declared size beyond the file)");
            }
            if (frames == 0) {
                throw RecordingFormatException.atByte(file, layout.headerBytes(), "no sample data after the header");
            }
            List<ChannelInfo> channels = new ArrayList<>();
            for (int c = 0; c < layout.channels(); c++) {
                channels.add(new ChannelInfo(layout.names().get(c), layout.units().get(c)));
            }
            RecordingInfo info = new RecordingInfo(file, RecordingFormat.RAW, channels, layout.sampleRate(), frames,
                    layout.sampleType(), "stored * scale + offset, per channel", Optional.empty(), 0);
            SampleCodec codec = new SampleCodec(layout.sampleType(), layout.byteOrder(), layout.channels(),
                    layout.scale(), layout.offset());
            if (layout.interleaved()) {
                int buffer = Math.max(options.bufferBytes(), layout.frameBytes());
                SequentialInput input = new SequentialInput(file, ch, buffer, options.sha256());
                return new FrameStreamReader(info, input, codec, layout.headerBytes());
            }
            // planes decode one channel at a time; the per-channel scale is applied afterwards
            SampleCodec single = SampleCodec.uniform(layout.sampleType(), layout.byteOrder(), 1, 1.0, 0.0);
            return new PlanarReader(info, ch, layout, single, options.bufferBytes());
        } catch (IOException | RuntimeException e) {
            ch.close();
            throw e;
        }
    }

    /**
     * Channel-after-channel files: each channel is read with positional reads from its own plane.
     * The digest is computed by a separate read-only pass when asked for.
     */
    private static final class PlanarReader implements RecordingReader {
        private final RecordingInfo info;
        private final FileChannel ch;
        private final RawLayout layout;
        private final double[] scale;
        private final double[] offset;
        private final SampleCodec codec;
        private final byte[] bytes;
        private final double[][] one = new double[1][];
        private long framePosition;
        private String sha256;

        PlanarReader(RecordingInfo info, FileChannel ch, RawLayout layout, SampleCodec codec, int bufferBytes) {
            this.info = info;
            this.ch = ch;
            this.layout = layout;
            this.codec = codec;
            this.scale = layout.scale();
            this.offset = layout.offset();
            int sample = layout.sampleType().bytes();
            this.bytes = new byte[Math.max(sample, bufferBytes / sample * sample)];
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
        public int read(double[][] channels, int offset, int maxFrames) throws IOException {
            Buffers.checkChannels(channels, offset, maxFrames, info.channelCount());
            return readInto(channels, null, offset, maxFrames);
        }

        @Override
        public int readInterleaved(double[] interleaved, int offset, int maxFrames) throws IOException {
            Buffers.checkInterleaved(interleaved, offset, maxFrames, info.channelCount());
            return readInto(null, interleaved, offset, maxFrames);
        }

        private int readInto(double[][] channels, double[] interleaved, int destOffset, int maxFrames)
                throws IOException {
            long remaining = info.frameCount() - framePosition;
            if (remaining == 0 && maxFrames > 0) {
                return -1;
            }
            int want = (int) Math.min(maxFrames, remaining);
            int sample = layout.sampleType().bytes();
            int perBlock = bytes.length / sample;
            int cc = info.channelCount();
            double[] tmp = interleaved == null ? null : new double[Math.min(want, perBlock)];
            for (int c = 0; c < cc; c++) {
                long plane = layout.headerBytes() + c * info.frameCount() * sample;
                for (int done = 0; done < want;) {
                    int n = Math.min(perBlock, want - done);
                    long at = plane + (framePosition + done) * sample;
                    ByteBuffer b = ByteBuffer.wrap(bytes, 0, n * sample);
                    while (b.hasRemaining()) {
                        if (ch.read(b, at + b.position()) < 0) {
                            throw RecordingFormatException.atByte(info.file(), at + b.position(),
                                    "file ends inside channel " + (c + 1) + " (shortened while being read)");
                        }
                    }
                    one[0] = tmp != null ? tmp : channels[c];
                    int o = tmp != null ? 0 : destOffset + done;
                    long bad = codec.decode(b, 0, n, one, o);
                    if (bad >= 0) {
                        throw RecordingFormatException.atByte(info.file(), at + bad * sample, "sample "
                                + (framePosition + done + bad) + " of channel " + (c + 1) + " is NaN or infinite");
                    }
                    for (int i = 0; i < n; i++) {
                        double v = one[0][o + i] * scale[c] + offset[c];
                        if (tmp != null) {
                            interleaved[destOffset + (done + i) * cc + c] = v;
                        } else {
                            channels[c][o + i] = v;
                        }
                    }
                    done += n;
                }
            }
            framePosition += want;
            return want;
        }

        @Override
        public String sha256Hex() throws IOException {
            if (sha256 == null) {
                sha256 = Sha256.ofChannel(ch);
            }
            return sha256;
        }

        @Override
        public void close() throws IOException {
            ch.close();
        }
    }
}
