package org.foldbook.io.internal;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;

import org.foldbook.io.SampleType;

/**
 * Turns stored samples into doubles (read from a heap or direct buffer at absolute byte indices): {@code value = stored * scale[c] + offset[c]}, for interleaved
 * frames of {@code channels} samples. Floating-point samples that are NaN or infinite are reported
 * (the recording formats read here have no use for them), integer samples never are.
 */
public final class SampleCodec {
    private static final VarHandle S16_LE = view(short[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle S16_BE = view(short[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle S32_LE = view(int[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle S32_BE = view(int[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle S64_LE = view(long[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle S64_BE = view(long[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle F32_LE = view(float[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle F32_BE = view(float[].class, ByteOrder.BIG_ENDIAN);
    private static final VarHandle F64_LE = view(double[].class, ByteOrder.LITTLE_ENDIAN);
    private static final VarHandle F64_BE = view(double[].class, ByteOrder.BIG_ENDIAN);

    private static VarHandle view(Class<?> arrayType, ByteOrder order) {
        return MethodHandles.byteBufferViewVarHandle(arrayType, order);
    }

    private final SampleType type;
    private final boolean little;
    private final int channels;
    private final double[] scale;
    private final double[] offset;

    public SampleCodec(SampleType type, ByteOrder order, int channels, double[] scale, double[] offset) {
        if (scale.length != channels || offset.length != channels) {
            throw new IllegalArgumentException("scale/offset: need one per channel (" + channels + ")");
        }
        this.type = type;
        this.little = order == ByteOrder.LITTLE_ENDIAN;
        this.channels = channels;
        this.scale = scale.clone();
        this.offset = offset.clone();
    }

    /** Same scale and offset on every channel. */
    public static SampleCodec uniform(SampleType type, ByteOrder order, int channels, double scale, double offset) {
        double[] s = new double[channels];
        double[] o = new double[channels];
        java.util.Arrays.fill(s, scale);
        java.util.Arrays.fill(o, offset);
        return new SampleCodec(type, order, channels, s, o);
    }

    public SampleType type() {
        return type;
    }

    public int frameBytes() {
        return type.bytes() * channels;
    }

    /** Stored value of the sample at {@code p}, before scale and offset. */
    double raw(ByteBuffer src, int p) {
        switch (type) {
        case UINT8:
            return src.get(p) & 0xFF;
        case INT8:
            return src.get(p);
        case INT16:
            return little ? (short) S16_LE.get(src, p) : (short) S16_BE.get(src, p);
        case UINT16:
            return (little ? (short) S16_LE.get(src, p) : (short) S16_BE.get(src, p)) & 0xFFFF;
        case INT24:
            return little ? ((src.get(p + 2) << 16) | ((src.get(p + 1) & 0xFF) << 8) | (src.get(p) & 0xFF))
                    : ((src.get(p) << 16) | ((src.get(p + 1) & 0xFF) << 8) | (src.get(p + 2) & 0xFF));
        case INT32:
            return little ? (int) S32_LE.get(src, p) : (int) S32_BE.get(src, p);
        case UINT32:
            return (little ? (int) S32_LE.get(src, p) : (int) S32_BE.get(src, p)) & 0xFFFFFFFFL;
        case INT64:
            return little ? (long) S64_LE.get(src, p) : (long) S64_BE.get(src, p);
        case FLOAT32:
            return little ? (float) F32_LE.get(src, p) : (float) F32_BE.get(src, p);
        case FLOAT64:
            return little ? (double) F64_LE.get(src, p) : (double) F64_BE.get(src, p);
        default:
            throw new IllegalStateException(type.name());
        }
    }

    /**
     * Decodes {@code frames} interleaved frames starting at {@code src.get(p)} into one array per channel.
     *
     * @return -1, or the sample index (frame * channels + channel) of the first NaN/infinite value
     */
    public long decode(ByteBuffer src, int p, int frames, double[][] dest, int destOffset) {
        switch (type) {
        case INT16:
            return little ? decode16le(src, p, frames, dest, destOffset) : generic(src, p, frames, dest, destOffset);
        case INT24:
            return little ? decode24le(src, p, frames, dest, destOffset) : generic(src, p, frames, dest, destOffset);
        default:
            return generic(src, p, frames, dest, destOffset);
        }
    }

    // The two layouts that dominate lab WAV files get their own tight loops: frame-major, so the input
    // block is read once front to back, with mono and stereo unrolled over channels.
    private long decode16le(ByteBuffer src, int p, int frames, double[][] dest, int off) {
        if (channels == 1) {
            double[] d0 = dest[0];
            double s0 = scale[0];
            double o0 = offset[0];
            for (int f = 0; f < frames; f++, p += 2) {
                d0[off + f] = (short) S16_LE.get(src, p) * s0 + o0;
            }
        } else if (channels == 2) {
            double[] d0 = dest[0];
            double[] d1 = dest[1];
            double s0 = scale[0];
            double s1 = scale[1];
            double o0 = offset[0];
            double o1 = offset[1];
            for (int f = 0; f < frames; f++, p += 4) {
                d0[off + f] = (short) S16_LE.get(src, p) * s0 + o0;
                d1[off + f] = (short) S16_LE.get(src, p + 2) * s1 + o1;
            }
        } else {
            for (int f = 0; f < frames; f++) {
                for (int c = 0; c < channels; c++, p += 2) {
                    dest[c][off + f] = (short) S16_LE.get(src, p) * scale[c] + offset[c];
                }
            }
        }
        return -1;
    }

    /** Little-endian 24-bit: the low 16 bits as one unsigned short, the top byte sign-extends. */
    private static int s24le(ByteBuffer src, int q) {
        return (src.get(q + 2) << 16) | ((short) S16_LE.get(src, q) & 0xFFFF);
    }

    private long decode24le(ByteBuffer src, int p, int frames, double[][] dest, int off) {
        if (channels == 1) {
            double[] d0 = dest[0];
            double s0 = scale[0];
            double o0 = offset[0];
            for (int f = 0; f < frames; f++, p += 3) {
                d0[off + f] = s24le(src, p) * s0 + o0;
            }
        } else if (channels == 2) {
            double[] d0 = dest[0];
            double[] d1 = dest[1];
            double s0 = scale[0];
            double s1 = scale[1];
            double o0 = offset[0];
            double o1 = offset[1];
            for (int f = 0; f < frames; f++, p += 6) {
                d0[off + f] = s24le(src, p) * s0 + o0;
                d1[off + f] = s24le(src, p + 3) * s1 + o1;
            }
        } else {
            for (int f = 0; f < frames; f++) {
                for (int c = 0; c < channels; c++, p += 3) {
                    dest[c][off + f] = s24le(src, p) * scale[c] + offset[c];
                }
            }
        }
        return -1;
    }

    private long generic(ByteBuffer src, int p, int frames, double[][] dest, int off) {
        int bytes = type.bytes();
        boolean checkFinite = type.isFloatingPoint();
        for (int f = 0; f < frames; f++) {
            for (int c = 0; c < channels; c++, p += bytes) {
                double v = raw(src, p);
                if (checkFinite && !Double.isFinite(v)) {
                    return (long) f * channels + c;
                }
                dest[c][off + f] = v * scale[c] + offset[c];
            }
        }
        return -1;
    }

    /** As {@link #decode} but into one interleaved array. */
    public long decodeInterleaved(ByteBuffer src, int p, int frames, double[] dest, int off) {
        int bytes = type.bytes();
        boolean checkFinite = type.isFloatingPoint();
        int n = frames * channels;
        if (type == SampleType.INT16 && little) {
            for (int i = 0; i < n; i++, p += 2) {
                int c = i % channels;
                dest[off + i] = (short) S16_LE.get(src, p) * scale[c] + offset[c];
            }
            return -1;
        }
        for (int i = 0; i < n; i++, p += bytes) {
            int c = i % channels;
            double v = raw(src, p);
            if (checkFinite && !Double.isFinite(v)) {
                return i;
            }
            dest[off + i] = v * scale[c] + offset[c];
        }
        return -1;
    }
}
