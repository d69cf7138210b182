package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * Runs a {@link SecondOrderSections} filter over samples, carrying its state from one call to the
 * next, so a long recording can be filtered block by block with the same result as in one go.
 * Each section is the transposed direct form II (the structure of scipy.signal.sosfilt):
 * {@code y = b0·x + s1; s1 = b1·x − a1·y + s2; s2 = b2·x − a2·y}.
 *
 * <p>Not thread-safe: one instance per stream. No allocation while filtering; a block is processed in
 * chunks of 1024 samples, each chunk passing through the sections two or three at a time with their
 * coefficients and state in locals, so the data stays in cache and two independent recurrences
 * overlap in the CPU. The arithmetic per section is the same as one section at a time.
 * Non-finite input is rejected before anything is written.
 */
public final class SosFilter {

    /** Samples per chunk (8 KiB of doubles). */
    private static final int CHUNK = 1024;

    /** State magnitudes below this are set to 0 at the end of each chunk (see {@link #filter}). */
    static final double FLUSH_BELOW = 1e-250;

    private final double[] c;
    private final double[] state; // s1, s2 per section
    private final int sections;
    private int samplesSinceFlush;

    SosFilter(double[] coeffs) {
        this.c = coeffs;
        this.sections = coeffs.length / 6;
        this.state = new double[2 * sections];
    }

    /** Clears the state (as if all earlier input had been zero). */
    public void reset() {
        java.util.Arrays.fill(state, 0);
        samplesSinceFlush = 0;
    }

    /**
     * Sets the state to the steady state of a constant input {@code level}, so filtering a record that
     * starts at that level has no start-up transient (scipy: {@code sosfilt_zi(sos) * level}).
     */
    public void primeForConstantInput(double level) {
        Check.finite("level", level);
        double u = level;
        for (int s = 0; s < sections; s++) {
            int o = 6 * s;
            double y = u * (c[o] + c[o + 1] + c[o + 2]) / (1 + c[o + 4] + c[o + 5]);
            state[2 * s] = y - c[o] * u;
            state[2 * s + 1] = c[o + 2] * u - c[o + 5] * y;
            u = y;
        }
    }

    /** Filters one sample (tiny state is flushed every {@value #CHUNK} samples, as in {@link #filter}). */
    public double filterSample(double x) {
        Check.finite("x", x);
        double v = x;
        for (int s = 0; s < sections; s++) {
            int o = 6 * s;
            double y = c[o] * v + state[2 * s];
            state[2 * s] = c[o + 1] * v - c[o + 4] * y + state[2 * s + 1];
            state[2 * s + 1] = c[o + 2] * v - c[o + 5] * y;
            v = y;
        }
        if (++samplesSinceFlush == CHUNK) {
            samplesSinceFlush = 0;
            for (int i = 0; i < state.length; i++) {
                state[i] = flush(state[i]);
            }
        }
        return v;
    }

    /** Filters the whole array in place. */
    public void filterInPlace(double[] data) {
        if (data == null) {
            throw new IllegalArgumentException("data must not be null");
        }
        filter(data, 0, data, 0, data.length);
    }

    /**
     * Filters {@code length} samples from {@code in[inOffset…]} into {@code out[outOffset…]}. The
     * two ranges may be the same range of the same array (in place) but must not otherwise overlap.
     * State values smaller than {@value #FLUSH_BELOW} in magnitude are set to 0 at chunk ends, so
     * silence after a signal runs on subnormal numbers for at most one chunk, then on exact zeros.
     */
    public void filter(double[] in, int inOffset, double[] out, int outOffset, int length) {
        if (in == null || out == null) {
            throw new IllegalArgumentException((in == null ? "in" : "out") + " must not be null");
        }
        Check.slice("in", in.length, inOffset, length);
        Check.slice("out", out.length, outOffset, length);
        for (int i = 0; i < length; i++) {
            double x = in[inOffset + i];
            if (!Double.isFinite(x)) {
                throw new IllegalArgumentException("in[" + (inOffset + i) + "] must be finite, was " + x);
            }
        }
        // Cache-sized chunks, each through all sections in turn: the chunk stays in L1 between
        // passes. Each pass runs two or three sections at once: every section's recurrence is a chain
        // of dependent multiply-adds, and independent chains in one loop keep the CPU busier.
        for (int start = 0; start < length; start += CHUNK) {
            int n = Math.min(CHUNK, length - start);
            double[] src = in;
            int srcOff = inOffset + start;
            int dstOff = outOffset + start;
            int s = 0;
            while (s < sections) {
                int left = sections - s;
                if (left == 1) {
                    runSingle(s, src, srcOff, out, dstOff, n);
                    s += 1;
                } else if (left == 2 || left == 4) {
                    runPair(s, src, srcOff, out, dstOff, n);
                    s += 2;
                } else {
                    runTriple(s, src, srcOff, out, dstOff, n);
                    s += 3;
                }
                src = out;
                srcOff = dstOff;
            }
        }
    }

    private void runSingle(int s, double[] src, int srcOff, double[] out, int dstOff, int n) {
        int o = 6 * s;
        final double b0 = c[o];
        final double b1 = c[o + 1];
        final double b2 = c[o + 2];
        final double a1 = c[o + 4];
        final double a2 = c[o + 5];
        double s1 = state[2 * s];
        double s2 = state[2 * s + 1];
        for (int i = 0; i < n; i++) {
            double x = src[srcOff + i];
            double y = b0 * x + s1;
            s1 = b1 * x - a1 * y + s2;
            s2 = b2 * x - a2 * y;
            out[dstOff + i] = y;
        }
        // A decaying state would otherwise reach subnormal numbers after a long silence, and
        // subnormal arithmetic is many times slower (measured ~35x here); nothing measured is that small.
        state[2 * s] = flush(s1);
        state[2 * s + 1] = flush(s2);
    }

    private void runPair(int s, double[] src, int srcOff, double[] out, int dstOff, int n) {
        int o = 6 * s;
        final double b0 = c[o];
        final double b1 = c[o + 1];
        final double b2 = c[o + 2];
        final double a1 = c[o + 4];
        final double a2 = c[o + 5];
        final double d0 = c[o + 6];
        final double d1 = c[o + 7];
        final double d2 = c[o + 8];
        final double e1 = c[o + 10];
        final double e2 = c[o + 11];
        double s1 = state[2 * s];
        double s2 = state[2 * s + 1];
        double t1 = state[2 * s + 2];
        double t2 = state[2 * s + 3];
        for (int i = 0; i < n; i++) {
            double x = src[srcOff + i];
            double y = b0 * x + s1;
            s1 = b1 * x - a1 * y + s2;
            s2 = b2 * x - a2 * y;
            double z = d0 * y + t1;
            t1 = d1 * y - e1 * z + t2;
            t2 = d2 * y - e2 * z;
            out[dstOff + i] = z;
        }
        state[2 * s] = flush(s1);
        state[2 * s + 1] = flush(s2);
        state[2 * s + 2] = flush(t1);
        state[2 * s + 3] = flush(t2);
    }

    private void runTriple(int s, double[] src, int srcOff, double[] out, int dstOff, int n) {
        int o = 6 * s;
        final double b0 = c[o];
        final double b1 = c[o + 1];
        final double b2 = c[o + 2];
        final double a1 = c[o + 4];
        final double a2 = c[o + 5];
        final double d0 = c[o + 6];
        final double d1 = c[o + 7];
        final double d2 = c[o + 8];
        final double e1 = c[o + 10];
        final double e2 = c[o + 11];
        final double g0 = c[o + 12];
        final double g1 = c[o + 13];
        final double g2 = c[o + 14];
        final double h1 = c[o + 16];
        final double h2 = c[o + 17];
        double s1 = state[2 * s];
        double s2 = state[2 * s + 1];
        double t1 = state[2 * s + 2];
        double t2 = state[2 * s + 3];
        double u1 = state[2 * s + 4];
        double u2 = state[2 * s + 5];
        for (int i = 0; i < n; i++) {
            double x = src[srcOff + i];
            double y = b0 * x + s1;
            s1 = b1 * x - a1 * y + s2;
            s2 = b2 * x - a2 * y;
            double z = d0 * y + t1;
            t1 = d1 * y - e1 * z + t2;
            t2 = d2 * y - e2 * z;
            double w = g0 * z + u1;
            u1 = g1 * z - h1 * w + u2;
            u2 = g2 * z - h2 * w;
            out[dstOff + i] = w;
        }
        state[2 * s] = flush(s1);
        state[2 * s + 1] = flush(s2);
        state[2 * s + 2] = flush(t1);
        state[2 * s + 3] = flush(t2);
        state[2 * s + 4] = flush(u1);
        state[2 * s + 5] = flush(u2);
    }

    private static double flush(double v) {
        return Math.abs(v) < FLUSH_BELOW ? 0 : v;
    }
}
