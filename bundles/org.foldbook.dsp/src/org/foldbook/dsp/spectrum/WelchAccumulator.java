package org.foldbook.dsp.spectrum;

import java.util.Arrays;
import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * {@link Welch} over a stream: samples arrive block by block (a recording larger than memory, a re-sampled
 * sequence that is never stored whole), feed them with {@link #add}, then {@link #finish} gives the
 * one-sided PSD. The one streaming Welch of Foldbook: the sweep (in memory and streamed), the audit and the
 * recording view all use it.
 *
 * <p><b>Same segments as one pass.</b> Samples collect in a chunk of {@value #SEGMENTS_PER_CHUNK} segments;
 * each full chunk goes through {@link Welch#psdInto} and its estimate, weighted by its segment count, is
 * added up; the last {@code overlap} samples move to the front for the next chunk. The segments are
 * exactly those of one {@code psdInto} over the whole signal (every whole segment starting at a multiple
 * of the step, the tail after the last whole segment unused), because the Welch mean is a plain average
 * of per-segment periodograms. The grouping into chunks depends only on the number of samples, never on
 * how they were split into blocks, so any feeding of the same samples gives the same result to the last
 * bit.
 *
 * <p><b>Reuse.</b> {@link #reset} starts a new estimate (any operator with segment length up to the
 * capacity) without reallocating. Not thread-safe: one stream, one thread.
 */
public final class WelchAccumulator {
    /** Segments a chunk holds: enough to amortise a {@code psdInto} call, few enough to stay in cache. */
    public static final int SEGMENTS_PER_CHUNK = 16;

    private final int capacity;
    private final Welch.Workspace workspace;
    private Welch welch;
    private double sampleRate;
    private double[] chunk = new double[0];
    private double[] part = new double[0];
    private double[] sum = new double[0];
    private int chunkLength;
    private int filled;
    private long segments;
    private boolean finished;

    /** An accumulator for operators of segment length up to {@code capacity >= 1}; {@link #reset} it first. */
    public WelchAccumulator(int capacity) {
        this.capacity = Check.atLeast("capacity", capacity, 1);
        this.workspace = new Welch.Workspace(capacity);
    }

    /** An accumulator of {@code welch}'s estimate of samples at {@code sampleRate} Hz, ready to {@link #add}. */
    public WelchAccumulator(Welch welch, double sampleRate) {
        this(Objects.requireNonNull(welch, "welch").segmentLength());
        reset(welch, sampleRate);
    }

    /** Starts a new estimate with {@code welch} (segment length up to the capacity) at {@code sampleRate} Hz. */
    public void reset(Welch welch, double sampleRate) {
        Objects.requireNonNull(welch, "welch");
        Check.positive("sampleRate", sampleRate);
        int n = welch.segmentLength();
        if (n > capacity) {
            throw new IllegalArgumentException("segment length must be <= the capacity " + capacity + ", was " + n);
        }
        this.welch = welch;
        this.sampleRate = sampleRate;
        chunkLength = n + (SEGMENTS_PER_CHUNK - 1) * welch.step();
        if (chunk.length < chunkLength) {
            chunk = new double[chunkLength];
        }
        if (sum.length < welch.bins()) {
            sum = new double[welch.bins()];
            part = new double[welch.bins()];
        }
        Arrays.fill(sum, 0, welch.bins(), 0.0);
        filled = 0;
        segments = 0;
        finished = false;
    }

    /** The operator of the current estimate. */
    public Welch welch() {
        requireReset();
        return welch;
    }

    /** Adds {@code x[offset .. offset+length)} (finite samples), the next samples of the stream. */
    public void add(double[] x, int offset, int length) {
        requireOpen();
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        Check.slice("x", x.length, offset, length);
        while (length > 0) {
            int take = Math.min(length, chunkLength - filled);
            System.arraycopy(x, offset, chunk, filled, take);
            offset += take;
            length -= take;
            advance(take);
        }
    }

    /**
     * Zero-copy feeding, for a producer that writes samples itself: up to {@link #room()} samples go
     * straight into this array from {@link #position()} on, then {@link #advance} takes them. Valid until
     * the next call of this accumulator.
     */
    public double[] buffer() {
        requireOpen();
        return chunk;
    }

    /** Where the next sample goes in {@link #buffer()}. */
    public int position() {
        return filled;
    }

    /** Samples {@link #buffer()} takes before the next {@link #advance} (at least one while open). */
    public int room() {
        return chunkLength - filled;
    }

    /** Takes the {@code count <= room()} samples just written to {@link #buffer()} at {@link #position()}. */
    public void advance(int count) {
        requireOpen();
        if (count < 0 || count > room()) {
            throw new IllegalArgumentException("count must lie in [0, " + room() + "], was " + count);
        }
        filled += count;
        if (filled == chunkLength) {
            addChunk(chunkLength);
            int keep = welch.overlap();
            System.arraycopy(chunk, chunkLength - keep, chunk, 0, keep);
            filled = keep;
        }
    }

    /** Whole segments the estimate will average: those already summed and those still in the buffer. */
    public long segments() {
        requireReset();
        return segments + (finished || filled < welch.segmentLength() ? 0 : welch.segmentCount(filled));
    }

    /**
     * Ends the estimate and writes it to {@code out[0 .. bins)} (bins = {@code welch().bins()}); returns the
     * number of segments averaged. Nothing more can be added until {@link #reset}.
     *
     * @throws IllegalStateException if fewer samples than one segment arrived, or the estimate was already
     *                               finished
     */
    public long finish(double[] out) {
        requireOpen();
        int bins = welch.bins();
        if (out == null || out.length < bins) {
            throw new IllegalArgumentException("out.length must be >= " + bins + ", was "
                    + (out == null ? "null" : String.valueOf(out.length)));
        }
        if (filled >= welch.segmentLength()) {
            addChunk(filled);
        }
        filled = 0;
        finished = true;
        if (segments == 0) {
            throw new IllegalStateException("fewer samples than one segment of " + welch.segmentLength());
        }
        for (int k = 0; k < bins; k++) {
            out[k] = sum[k] / segments;
        }
        return segments;
    }

    /** As {@link #finish(double[])}, as a {@link PowerSpectrum} of samples in {@code unit}. */
    public PowerSpectrum finish(Unit unit) {
        Objects.requireNonNull(unit, "unit");
        requireOpen();
        double[] out = new double[welch.bins()];
        long k = finish(out);
        return new PowerSpectrum(out, sampleRate, welch.segmentLength(), welch.scaling(), unit,
                Math.toIntExact(k), welch.window().enbwBins());
    }

    private void addChunk(int length) {
        int k = welch.psdInto(chunk, 0, length, sampleRate, workspace, part);
        for (int i = 0, b = welch.bins(); i < b; i++) {
            sum[i] += part[i] * k;
        }
        segments += k;
    }

    private void requireReset() {
        if (welch == null) {
            throw new IllegalStateException("no estimate started: call reset first");
        }
    }

    private void requireOpen() {
        requireReset();
        if (finished) {
            throw new IllegalStateException("estimate already finished: call reset to start another");
        }
    }
}
