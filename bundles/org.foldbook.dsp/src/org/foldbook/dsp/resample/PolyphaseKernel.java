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
        this.offset = offset;
        // rows padded with zeros to a multiple of 4 for RowLoops: same sums, same bits (see there)
        int padded = (taps + 3) & ~3;
        if (padded != taps) {
            if ((long) up * padded > MAX_TABLE) {
                throw new IllegalArgumentException("polyphase table of " + up + " phases x " + padded + " taps exceeds "
                        + MAX_TABLE + " coefficients");
            }
            double[] t = new double[up * padded];
            for (int p = 0; p < up; p++) {
                System.arraycopy(table, p * taps, t, p * padded, taps);
            }
            table = t;
        }
        this.taps = padded;
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
        int used = kMax - kMin + 1;
        // rows padded with zeros to a multiple of 4, the step of RowLoops (adding 0·x changes no sum)
        int taps = (used + 3) & ~3;
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
            run32(buf, (int) first, p, m0, out, outOff, count);
        } else if (taps == SixteenTapLoops.TAPS) {
            SixteenTapLoops.run(table, up, down, buf, (int) first, p, m0, out, outOff, count);
        } else {
            RowLoops.run(table, up, down, taps, buf, (int) first, p, m0, out, outOff, count);
        }
    }

    // Every multiply-add is Math.fma (one rounding instead of two; the JIT emits the FMA instruction):
    // about 1.5x faster bare re-sampling than separate multiply and add, measured alternating. It needs
    // a CPU with FMA (x86 since 2013, ARMv8); without one the JDK emulates it, far slower.
    // The 32-tap case (the bare sampler, short filtered rows) gets its own loops. Every output is summed
    // in one fixed order (four running sums over taps i ≡ 0, 1, 2, 3 mod 4, combined as (s0+s2)+(s1+s3)),
    // whichever loop computes it, so results do not depend on how a caller splits the output range.
    private void run32(double[] x, int pos, int p, long m0, double[] out, int outOff, int count) {
        int done = 0;
        if (up >= 4 && count >= 8 * up) {
            // outputs one by one up to the start of a row (m ≡ 0 mod up), then whole rows phase by phase
            int head = (int) ((up - m0 % up) % up);
            int rows = (count - head) / up;
            runLinear32(x, pos, p, out, outOff, head);
            int[] st = advanceState(pos, p, head);
            runRows32(x, st[0], out, outOff + head, rows);
            done = head + rows * up;
        }
        if (done < count) {
            int[] st = advanceState(pos, p, done);
            runLinear32(x, st[0], st[1], out, outOff + done, count - done);
        }
    }

    /** (pos, phase) after {@code steps} outputs from (pos, p). */
    private int[] advanceState(int pos, int p, int steps) {
        long t = (long) p + (long) steps * stepRest;
        return new int[] {(int) (pos + (long) steps * stepWhole + t / up), (int) (t % up)};
    }

    private void runLinear32(double[] x, int pos, int p, double[] out, int outOff, int count) {
        final double[] h = table;
        final int u = up;
        final int sw = stepWhole;
        final int sr = stepRest;
        for (int o = outOff, end = outOff + count; o < end; o++) {
            int r = p << 5;
            double e0 = 0, o0 = 0, e1 = 0, o1 = 0;
            // two interleaved chains per sum keep the adds overlapped; they are combined in a fixed order
            for (int i = 0; i < 32; i += 4) {
                e0 = Math.fma(x[pos + i], h[r + i], e0);
                o0 = Math.fma(x[pos + i + 1], h[r + i + 1], o0);
                e1 = Math.fma(x[pos + i + 2], h[r + i + 2], e1);
                o1 = Math.fma(x[pos + i + 3], h[r + i + 3], o1);
            }
            out[o] = (e0 + e1) + (o0 + o1);
            pos += sw;
            p += sr;
            if (p >= u) {
                p -= u;
                pos++;
            }
        }
    }

    /**
     * {@code rows} whole rows of up outputs, starting at an output of phase index 0 (m ≡ 0 mod up) whose
     * first tap is x[pos]. Outputs m = q·up + j share phase p_j and step down samples from row to row,
     * so four rows of one phase are summed together: each coefficient is loaded once for four outputs.
     * Rows are taken in groups small enough for their input to stay in cache across all phases.
     */
    private void runRows32(double[] x, int pos, double[] out, int outOff, int rows) {
        final double[] h = table;
        final int u = up;
        final int d = down;
        final int group = Math.max(4, Math.min(64, (1 << 15) / Math.max(d, 1)) & ~3);
        for (int q0 = 0; q0 < rows; q0 += group) {
            int qn = Math.min(group, rows - q0);
            int q4 = qn & ~3;
            for (int j = 0; j < u; j++) {
                long jd = (long) j * d;
                int fj = (int) (jd / u);
                int r = (int) (jd - (long) fj * u) << 5;
                int q = 0;
                for (; q < q4; q += 4) {
                    int p0 = pos + (q0 + q) * d + fj;
                    int p1 = p0 + d;
                    int p2 = p1 + d;
                    int p3 = p2 + d;
                    double ae0 = 0, ao0 = 0, ae1 = 0, ao1 = 0;
                    double be0 = 0, bo0 = 0, be1 = 0, bo1 = 0;
                    double ce0 = 0, co0 = 0, ce1 = 0, co1 = 0;
                    double de0 = 0, do0 = 0, de1 = 0, do1 = 0;
                    for (int i = 0; i < 32; i += 4) {
                        double h0 = h[r + i];
                        double h1 = h[r + i + 1];
                        double h2 = h[r + i + 2];
                        double h3 = h[r + i + 3];
                        ae0 = Math.fma(x[p0 + i], h0, ae0);
                        ao0 = Math.fma(x[p0 + i + 1], h1, ao0);
                        ae1 = Math.fma(x[p0 + i + 2], h2, ae1);
                        ao1 = Math.fma(x[p0 + i + 3], h3, ao1);
                        be0 = Math.fma(x[p1 + i], h0, be0);
                        bo0 = Math.fma(x[p1 + i + 1], h1, bo0);
                        be1 = Math.fma(x[p1 + i + 2], h2, be1);
                        bo1 = Math.fma(x[p1 + i + 3], h3, bo1);
                        ce0 = Math.fma(x[p2 + i], h0, ce0);
                        co0 = Math.fma(x[p2 + i + 1], h1, co0);
                        ce1 = Math.fma(x[p2 + i + 2], h2, ce1);
                        co1 = Math.fma(x[p2 + i + 3], h3, co1);
                        de0 = Math.fma(x[p3 + i], h0, de0);
                        do0 = Math.fma(x[p3 + i + 1], h1, do0);
                        de1 = Math.fma(x[p3 + i + 2], h2, de1);
                        do1 = Math.fma(x[p3 + i + 3], h3, do1);
                    }
                    int o = outOff + (q0 + q) * u + j;
                    out[o] = (ae0 + ae1) + (ao0 + ao1);
                    out[o + u] = (be0 + be1) + (bo0 + bo1);
                    out[o + 2 * u] = (ce0 + ce1) + (co0 + co1);
                    out[o + 3 * u] = (de0 + de1) + (do0 + do1);
                }
                for (; q < qn; q++) {
                    int p0 = pos + (q0 + q) * d + fj;
                    double e0 = 0, o0 = 0, e1 = 0, o1 = 0;
                    for (int i = 0; i < 32; i += 4) {
                        e0 = Math.fma(x[p0 + i], h[r + i], e0);
                        o0 = Math.fma(x[p0 + i + 1], h[r + i + 1], o0);
                        e1 = Math.fma(x[p0 + i + 2], h[r + i + 2], e1);
                        o1 = Math.fma(x[p0 + i + 3], h[r + i + 3], o1);
                    }
                    out[outOff + (q0 + q) * u + j] = (e0 + e1) + (o0 + o1);
                }
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
