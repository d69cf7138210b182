package org.foldbook.sweep;

import java.util.Arrays;

import org.foldbook.dsp.resample.SampleSink;
import org.foldbook.dsp.spectrum.Welch;

/**
 * A Welch PSD fed sample by sample, so a re-sampled sequence is never stored whole: samples collect in
 * a buffer of {@value #SEGMENTS_PER_CHUNK} segments; each full buffer goes through
 * {@link Welch#psdInto} and its (segment-count weighted) estimate is added up; the last
 * {@code overlap} samples move to the front for the next chunk. The segments used are exactly those of
 * one {@code psdInto} over the whole sequence (every whole segment starting at a multiple of the step), so
 * the result equals scipy.signal.welch's to rounding.
 *
 * <p>One instance per thread; {@link #reset} makes it ready for the next rate without reallocating.
 */
final class StreamingWelch implements SampleSink {
    static final int SEGMENTS_PER_CHUNK = 16;

    private Welch welch;
    private double rate;
    private double[] buf = new double[0];
    private double[] part = new double[0];
    private double[] sum = new double[0];
    private final Welch.Workspace ws;
    private int filled;
    private int chunkLength;
    private long segments;

    StreamingWelch(int maxSegmentLength) {
        this.ws = new Welch.Workspace(maxSegmentLength);
    }

    /** Starts a new estimate with {@code welch} at {@code sampleRate}. */
    void reset(Welch welch, double sampleRate) {
        this.welch = welch;
        this.rate = sampleRate;
        int n = welch.segmentLength();
        chunkLength = n + (SEGMENTS_PER_CHUNK - 1) * welch.step();
        if (buf.length < chunkLength) {
            buf = new double[chunkLength];
        }
        if (sum.length < welch.bins()) {
            sum = new double[welch.bins()];
            part = new double[welch.bins()];
        }
        Arrays.fill(sum, 0, welch.bins(), 0.0);
        filled = 0;
        segments = 0;
    }

    @Override
    public void accept(double[] samples, int offset, int length) {
        while (length > 0) {
            int take = Math.min(length, chunkLength - filled);
            System.arraycopy(samples, offset, buf, filled, take);
            filled += take;
            offset += take;
            length -= take;
            if (filled == chunkLength) {
                addChunk(chunkLength);
                int keep = welch.overlap();
                System.arraycopy(buf, chunkLength - keep, buf, 0, keep);
                filled = keep;
            }
        }
    }

    /**
     * Zero-copy feeding: a producer writes up to {@link #room()} samples straight into {@link #buffer()} from
     * {@link #position()} on, then calls {@link #advance}.
     */
    double[] buffer() {
        return buf;
    }

    int position() {
        return filled;
    }

    int room() {
        return chunkLength - filled;
    }

    /** Takes the {@code count <= room()} samples just written at {@link #position()}. */
    void advance(int count) {
        if (count < 0 || count > room()) {
            throw new IllegalArgumentException("count must lie in [0, " + room() + "], was " + count);
        }
        filled += count;
        if (filled == chunkLength) {
            addChunk(chunkLength);
            int keep = welch.overlap();
            System.arraycopy(buf, chunkLength - keep, buf, 0, keep);
            filled = keep;
        }
    }

    private void addChunk(int length) {
        int k = welch.psdInto(buf, 0, length, rate, ws, part);
        for (int i = 0, b = welch.bins(); i < b; i++) {
            sum[i] += part[i] * k;
        }
        segments += k;
    }

    /**
     * The estimate over everything accepted since {@link #reset}, written to {@code out[0..bins)}.
     *
     * @throws IllegalArgumentException if fewer samples than one segment arrived
     */
    void finish(double[] out) {
        if (filled >= welch.segmentLength()) {
            addChunk(filled);
        }
        if (segments == 0) {
            throw new IllegalArgumentException("re-sampled sequence shorter than one segment of "
                    + welch.segmentLength());
        }
        for (int i = 0, b = welch.bins(); i < b; i++) {
            out[i] = sum[i] / segments;
        }
    }
}
