package org.foldbook.dsp.resample;

/**
 * The engine shared by every re-sampler here: a table of {@code up} phases × {@code taps} coefficients
 * and the rule
 * <pre>
 *   y[m] = Σ_{i=0}^{taps-1} x[b(m) + offset + i] · table[p(m)·taps + i],
 *   b(m) = floor(m·down/up),  p(m) = (m·down) mod up,
 * </pre>
 * with x = 0 outside the recording. Output m sits at t_m = m·down/up input samples. Immutable and
 * thread-safe (the table is filled in the constructor and never changed); the hot loop allocates
 * nothing, walks b and p incrementally and sums with several independent accumulators so the CPU can
 * overlap the multiply-adds.
 */
final class PolyphaseKernel {

    /** Largest table the constructor accepts (doubles): 2^23, 64 MiB. */
    static final int MAX_TABLE = 1 << 23;

    private final int up;
    private final int down;
    private final int taps;
    private final int offset;
    private final double[] table;
    private final int stepWhole;
    private final int stepRest;

    /**
     * @param table up·taps coefficients, row p for phase p; taken over (not copied), must not be changed
     * @param offset x index of tap 0 relative to b(m); {@code offset <= 0} and {@code taps + offset >= 1},
     *        so the first output needs no input before index 0 beyond zero padding and a complete set of
     *        input never leaves an output beyond ceil(N·up/down) half done
     */
    PolyphaseKernel(int up, int down, int taps, int offset, double[] table) {
        if (up < 1 || down < 1 || taps < 1 || table.length != (long) up * taps) {
            throw new IllegalArgumentException("polyphase table " + up + " x " + taps + " (down " + down
                    + ") does not match its length " + table.length);
        }
        if (offset > 0 || taps + offset < 1) {
            throw new IllegalArgumentException("tap offset " + offset + " outside [1 - taps, 0] for " + taps + " taps");
        }
        this.up = up;
        this.down = down;
        this.taps = taps;
        this.offset = offset;
        this.table = table;
        this.stepWhole = down / up;
        this.stepRest = down % up;
    }

    /**
     * The polyphase form of a prototype low-pass FIR {@code g} running at the up-sampled rate up·fs0:
     * y[m] = Σ_n x[n] · g[m·down − n·up + center] (zero-stuff by up, filter, keep every down-th sample),
     * {@code g[center]} being the tap at zero delay so the output stays aligned with t_m = m·down/up.
     */
    static PolyphaseKernel fromPrototype(int up, int down, double[] g, int center) {
        if (center < 0 || center >= g.length) {
            throw new IllegalArgumentException("prototype centre " + center + " outside [0, " + g.length + ")");
        }
        int kMax = Math.floorDiv(g.length - 1 - center, up);
        int kMin = -Math.floorDiv(center + up - 1, up);       // ceil((-center - (up-1)) / up)
        int taps = kMax - kMin + 1;
        if ((long) up * taps > MAX_TABLE) {
            throw new IllegalArgumentException("polyphase table of " + up + " phases x " + taps + " taps exceeds "
                    + MAX_TABLE + " coefficients");
        }
        double[] table = new double[up * taps];
        for (int p = 0; p < up; p++) {
            for (int i = 0; i < taps; i++) {
                long j = p + (long) (kMax - i) * up + center;
                if (j >= 0 && j < g.length) {
                    table[p * taps + i] = g[(int) j];
                }
            }
        }
        return new PolyphaseKernel(up, down, taps, -kMax, table);
    }

    int up() {
        return up;
    }

    int down() {
        return down;
    }

    int taps() {
        return taps;
    }

    int offset() {
        return offset;
    }

    /** Coefficient i of phase p (for tests and for combining kernels). */
    double coefficient(int p, int i) {
        return table[p * taps + i];
    }

    /** b(m) = floor(m·down/up). */
    long base(long m) {
        return Math.multiplyExact(m, (long) down) / up;
    }

    /** Smallest m with b(m) >= b, for b >= 0. */
    long firstOutputWithBaseAtLeast(long b) {
        return b <= 0 ? 0 : Math.ceilDiv(Math.multiplyExact(b, (long) up), down);
    }

    /** Number of outputs m >= 0 with b(m) <= b (0 when b < 0). */
    long outputsWithBaseAtMost(long b) {
        if (b < 0) {
            return 0;
        }
        // b(m) <= b  <=>  m·down < (b+1)·up
        return Math.ceilDiv(Math.multiplyExact(b + 1, (long) up), down);
    }

    /**
     * Outputs {@code m0 .. m0+count-1} from a buffer in which {@code buf[j]} holds input index
     * {@code j + origin}. Every tap must lie inside the buffer (the caller pads); no checks in the loop.
     */
    void run(double[] buf, long origin, long m0, double[] out, int outOff, int count) {
        if (count <= 0) {
            return;
        }
        long t = Math.multiplyExact(m0, (long) down);
        long b = t / up;
        int p = (int) (t - b * up);
        long first = b + offset - origin;
        long last = Math.multiplyExact(m0 + count - 1, (long) down) / up + offset + taps - origin;
        if (first < 0 || last > buf.length) {
            throw new IllegalStateException("taps [" + first + ", " + last + ") outside buffer of " + buf.length);
        }
        if (taps == 32) {
            run32(buf, (int) first, p, out, outOff, count);
        } else {
            runAny(buf, (int) first, p, out, outOff, count);
        }
    }

    // The 32-tap case (the bare sampler) gets its own loop: a fixed trip count the JIT unrolls fully.
    private void run32(double[] x, int pos, int p, double[] out, int outOff, int count) {
        final double[] h = table;
        final int u = up;
        final int sw = stepWhole;
        final int sr = stepRest;
        for (int o = outOff, end = outOff + count; o < end; o++) {
            int r = p << 5;
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0, s4 = 0, s5 = 0, s6 = 0, s7 = 0;
            for (int i = 0; i < 32; i += 8) {
                s0 += x[pos + i] * h[r + i];
                s1 += x[pos + i + 1] * h[r + i + 1];
                s2 += x[pos + i + 2] * h[r + i + 2];
                s3 += x[pos + i + 3] * h[r + i + 3];
                s4 += x[pos + i + 4] * h[r + i + 4];
                s5 += x[pos + i + 5] * h[r + i + 5];
                s6 += x[pos + i + 6] * h[r + i + 6];
                s7 += x[pos + i + 7] * h[r + i + 7];
            }
            out[o] = ((s0 + s1) + (s2 + s3)) + ((s4 + s5) + (s6 + s7));
            pos += sw;
            p += sr;
            if (p >= u) {
                p -= u;
                pos++;
            }
        }
    }

    private void runAny(double[] x, int pos, int p, double[] out, int outOff, int count) {
        final double[] h = table;
        final int n = taps;
        final int n4 = n & ~3;
        final int u = up;
        final int sw = stepWhole;
        final int sr = stepRest;
        for (int o = outOff, end = outOff + count; o < end; o++) {
            int r = p * n;
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            int i = 0;
            for (; i < n4; i += 4) {
                s0 += x[pos + i] * h[r + i];
                s1 += x[pos + i + 1] * h[r + i + 1];
                s2 += x[pos + i + 2] * h[r + i + 2];
                s3 += x[pos + i + 3] * h[r + i + 3];
            }
            for (; i < n; i++) {
                s0 += x[pos + i] * h[r + i];
            }
            out[o] = (s0 + s1) + (s2 + s3);
            pos += sw;
            p += sr;
            if (p >= u) {
                p -= u;
                pos++;
            }
        }
    }

    /**
     * Outputs {@code m0 .. m0+count-1} straight from a recording {@code x[0..n)}, zeros outside it.
     * Interior outputs read x in place; only the few at either edge go through a small zero-padded copy.
     */
    void evaluate(double[] x, int n, long m0, double[] out, int outOff, int count) {
        if (count <= 0) {
            return;
        }
        long mEnd = m0 + count;
        long inStart = firstOutputWithBaseAtLeast(-offset);                 // first tap >= 0
        long inEnd = outputsWithBaseAtMost((long) n - offset - taps);        // last tap <= n-1
        long a = Math.max(m0, Math.min(inStart, mEnd));
        long b = Math.max(a, Math.min(inEnd, mEnd));
        if (b <= a) {
            // no interior output in this range: one padded copy
            padded(x, n, m0, out, outOff, count);
            return;
        }
        padded(x, n, m0, out, outOff, (int) (a - m0));
        run(x, 0, a, out, outOff + (int) (a - m0), (int) (b - a));
        padded(x, n, b, out, outOff + (int) (b - m0), (int) (mEnd - b));
    }

    private void padded(double[] x, int n, long m0, double[] out, int outOff, int count) {
        final int chunk = 4096;
        for (int done = 0; done < count; done += chunk) {
            int c = Math.min(chunk, count - done);
            long m = m0 + done;
            long lo = base(m) + offset;
            long hi = base(m + c - 1) + offset + taps;
            double[] tmp = new double[Math.toIntExact(hi - lo)];
            long from = Math.max(lo, 0);
            long to = Math.min(hi, n);
            if (to > from) {
                System.arraycopy(x, (int) from, tmp, (int) (from - lo), (int) (to - from));
            }
            run(tmp, lo, m, out, outOff + done, c);
        }
    }
}
