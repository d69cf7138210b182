package org.foldbook.dsp.resample;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.fft.RealFft;

/**
 * Streaming convolution by overlap-save: the input, zero-stuffed by {@code factor} (1 or 2), convolved
 * with {@code kernel} whose tap {@code delay} is time zero, so output n is
 * {@code Σ_j kernel[j]·s[n + delay − j]} with s the stuffed input (zero outside). Every transform is
 * {@link RealFft} of a power-of-two size about four kernel lengths, so a block costs O(log N) per output.
 * Delivers exactly factor·(inputs) outputs in all; the last {@code delay} of them need {@link #finish()}.
 * Not thread-safe (one run, one thread); the kernel spectrum may be shared.
 */
final class FftConvolver implements ResampleRun {

    /** A kernel's spectrum at one transform size, shared read-only by runs. */
    static final class Spectrum {
        final RealFft fft;
        final int length;
        final int delay;
        final double[] re;
        final double[] im;

        Spectrum(double[] kernel, int delay) {
            if (kernel.length < 1 || delay < 0 || delay >= kernel.length) {
                throw new IllegalArgumentException("kernel of " + kernel.length + " taps with delay " + delay);
            }
            int n = Integer.highestOneBit(Math.max(8192, 4 * kernel.length - 1)) << 1;
            this.fft = RealFft.of(n);
            this.length = kernel.length;
            this.delay = delay;
            double[] work = new double[n];
            System.arraycopy(kernel, 0, work, 0, kernel.length);
            this.re = new double[fft.bins()];
            this.im = new double[fft.bins()];
            fft.forwardInPlace(work, re, im);
        }

        int size() {
            return fft.size();
        }
    }

    private final Spectrum k;
    private final int factor;
    private final SampleSink sink;
    private final int n;
    private final int fresh;            // new stuffed samples per block: N − L + 1
    private final double[] buf;         // [0, L−1): history; then the block being filled
    private final double[] work;
    private final double[] re;
    private final double[] im;
    private int fill;                   // stuffed samples in buf beyond the history
    private long inputs;
    private long produced;              // convolution outputs computed (before the delay is dropped)
    private long delivered;
    private boolean finished;

    FftConvolver(Spectrum spectrum, int factor, SampleSink sink) {
        if (factor != 1 && factor != 2) {
            throw new IllegalArgumentException("factor must be 1 or 2, was " + factor);
        }
        this.k = spectrum;
        this.factor = factor;
        this.sink = sink;
        this.n = spectrum.size();
        this.fresh = n - spectrum.length + 1;
        this.buf = new double[n];
        this.work = new double[n];
        this.re = new double[spectrum.re.length];
        this.im = new double[spectrum.im.length];
    }

    @Override
    public void push(double[] samples, int offset, int length) {
        if (finished) {
            throw new IllegalStateException("run already finished");
        }
        if (samples == null) {
            throw new IllegalArgumentException("samples must not be null");
        }
        Check.slice("samples", samples.length, offset, length);
        int hist = k.length - 1;
        for (int i = offset, e = offset + length; i < e; i++) {
            double v = samples[i];
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException("samples: input sample " + (inputs + i - offset) + " must be finite, was " + v);
            }
            buf[hist + fill++] = v;
            if (fill == fresh) {
                block(fresh);
            }
            if (factor == 2) {
                buf[hist + fill++] = 0;
                if (fill == fresh) {
                    block(fresh);
                }
            }
        }
        inputs += length;
    }

    /** Convolves the buffer and hands on its {@code valid} new outputs (all but the delay's first ones). */
    private void block(int valid) {
        int hist = k.length - 1;
        System.arraycopy(buf, 0, work, 0, n);
        k.fft.forwardInPlace(work, re, im);
        double[] kr = k.re;
        double[] ki = k.im;
        for (int b = 0; b < re.length; b++) {
            double a = re[b];
            double c = im[b];
            re[b] = a * kr[b] - c * ki[b];
            im[b] = a * ki[b] + c * kr[b];
        }
        k.fft.inverseInPlace(re, im, work);
        // work[hist + i] is output (produced + i); drop the first `delay` outputs overall, keep factor·inputs
        long want = factor * inputs;
        int from = (int) Math.max(0, k.delay - produced);
        int to = valid;
        if (finished) {
            to = (int) Math.min(valid, want + k.delay - produced);
        }
        if (to > from) {
            sink.accept(work, hist + from, to - from);
            delivered += to - from;
        }
        produced += valid;
        // keep the last L−1 stuffed samples as history
        System.arraycopy(buf, fill, buf, 0, hist);
        fill = 0;
    }

    @Override
    public void finish() {
        if (finished) {
            return;
        }
        finished = true;
        int hist = k.length - 1;
        long target = factor * inputs;
        // zeros after the end until every output up to target − 1 (i.e. stuffed input up to target − 1 + delay) is in
        while (delivered < target) {
            java.util.Arrays.fill(buf, hist + fill, n, 0.0);
            fill = fresh;
            block(fresh);
        }
    }

    @Override
    public long inputCount() {
        return inputs;
    }

    @Override
    public long outputCount() {
        return delivered;
    }
}
