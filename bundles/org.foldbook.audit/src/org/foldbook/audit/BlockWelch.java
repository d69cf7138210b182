package org.foldbook.audit;

import java.util.Arrays;

import org.foldbook.dsp.spectrum.Welch;

/**
 * Welch PSD of a channel fed block by block (periodic Hann, 50 % overlap, constant detrend, density),
 * memory bounded by one chunk of segments: the segments are exactly those of one {@link Welch#psdInto}
 * over the whole channel, so the result equals scipy.signal.welch's to rounding. Non-finite samples
 * are replaced by 0 here (they are reported separately), so one bad value does not void the spectrum.
 */
final class BlockWelch implements org.foldbook.channel.ChannelStream.BlockSink {
    private static final int SEGMENTS_PER_CHUNK = 16;
    private final Welch welch;
    private final double rate;
    private final double[] buf;
    private final double[] part;
    private final double[] sum;
    private final Welch.Workspace ws;
    private int filled;
    private long segments;

    BlockWelch(int segment, double rate) {
        this.welch = Welch.builder(segment).build();
        this.rate = rate;
        this.buf = new double[segment + (SEGMENTS_PER_CHUNK - 1) * welch.step()];
        this.part = new double[welch.bins()];
        this.sum = new double[welch.bins()];
        this.ws = new Welch.Workspace(segment);
    }

    @Override
    public void accept(double[] x, int n) {
        int off = 0;
        while (off < n) {
            int take = Math.min(n - off, buf.length - filled);
            for (int i = 0; i < take; i++) {
                double v = x[off + i];
                buf[filled + i] = Double.isFinite(v) ? v : 0.0;
            }
            filled += take;
            off += take;
            if (filled == buf.length) {
                add(buf.length);
                int keep = welch.overlap();
                System.arraycopy(buf, buf.length - keep, buf, 0, keep);
                filled = keep;
            }
        }
    }

    private void add(int length) {
        int k = welch.psdInto(buf, 0, length, rate, ws, part);
        for (int i = 0; i < sum.length; i++) {
            sum[i] += part[i] * k;
        }
        segments += k;
    }

    /** The estimate, one value per bin 0..n/2 (unit²/Hz); empty when less than one segment arrived. */
    double[] finish() {
        if (filled >= welch.segmentLength()) {
            add(filled);
            filled = 0;
        }
        if (segments == 0) {
            return new double[0];
        }
        double[] out = Arrays.copyOf(sum, sum.length);
        for (int i = 0; i < out.length; i++) {
            out[i] /= segments;
        }
        return out;
    }

    double binWidth() {
        return rate / welch.segmentLength();
    }

    int segmentLength() {
        return welch.segmentLength();
    }
}
