package org.foldbook.dsp.resample;

/**
 * The hot loops of a {@link PolyphaseKernel} whose rows have 16 taps (the kernel that samples the 2·fs0
 * series of the exact bare and modelled modes, {@link BareSampler#forDoubledSeries}). The same shape as the
 * kernel's own 32-tap loops: outputs one by one up to the start of a row, then whole rows phase by phase,
 * four outputs of one phase together so that each coefficient is loaded once for four outputs.
 *
 * <p>Every output is summed in one fixed order, whichever loop computes it (four running sums over taps
 * i ≡ 0, 1, 2, 3 mod 4, each by Math.fma, combined as (s0 + s2) + (s1 + s3)), so results do not depend on
 * how a caller splits the output range: the streaming and the in-memory sweep give the same bits.
 */
final class SixteenTapLoops {

    static final int TAPS = 16;

    private SixteenTapLoops() {
    }

    /**
     * Outputs {@code m0 .. m0+count-1} into {@code out[outOff..]}; the first tap of output m0 is
     * {@code x[pos]}, its phase {@code p}. Every tap must lie inside {@code x} (the caller checks).
     */
    static void run(double[] h, int up, int down, double[] x, int pos, int p, long m0, double[] out, int outOff,
            int count) {
        int sw = down / up;
        int sr = down % up;
        int done = 0;
        if (up >= 4 && count >= 8 * up) {
            int head = (int) ((up - m0 % up) % up);
            int rows = (count - head) / up;
            linear(h, up, sw, sr, x, pos, p, out, outOff, head);
            long t = (long) p + (long) head * sr;
            int rowPos = (int) (pos + (long) head * sw + t / up);      // phase (t % up) is 0 here
            rows(h, up, down, x, rowPos, out, outOff + head, rows);
            done = head + rows * up;
        }
        if (done < count) {
            long t = (long) p + (long) done * sr;
            linear(h, up, sw, sr, x, (int) (pos + (long) done * sw + t / up), (int) (t % up), out, outOff + done,
                    count - done);
        }
    }

    private static void linear(double[] h, int up, int sw, int sr, double[] x, int pos, int p, double[] out,
            int outOff, int count) {
        for (int o = outOff, end = outOff + count; o < end; o++) {
            int r = p << 4;
            out[o] = dot(x, pos, h[r], h[r + 1], h[r + 2], h[r + 3], h[r + 4], h[r + 5], h[r + 6], h[r + 7], h[r + 8],
                    h[r + 9], h[r + 10], h[r + 11], h[r + 12], h[r + 13], h[r + 14], h[r + 15]);
            pos += sw;
            p += sr;
            if (p >= up) {
                p -= up;
                pos++;
            }
        }
    }

    /**
     * {@code rows} whole rows of {@code up} outputs from an output of phase 0 whose first tap is x[pos].
     * Output q·up + j has phase p_j and its taps start at pos + q·down + floor(j·down/up); rows go in groups
     * whose input (group·down samples) stays in cache while every phase passes over it.
     */
    private static void rows(double[] h, int up, int down, double[] x, int pos, double[] out, int outOff, int rows) {
        final int group = Math.max(4, Math.min(64, (1 << 15) / Math.max(down, 1)) & ~3);
        for (int q0 = 0; q0 < rows; q0 += group) {
            int qn = Math.min(group, rows - q0);
            int q4 = qn & ~3;
            for (int j = 0; j < up; j++) {
                long jd = (long) j * down;
                int fj = (int) (jd / up);
                int r = (int) (jd - (long) fj * up) << 4;
                double h0 = h[r], h1 = h[r + 1], h2 = h[r + 2], h3 = h[r + 3];
                double h4 = h[r + 4], h5 = h[r + 5], h6 = h[r + 6], h7 = h[r + 7];
                double h8 = h[r + 8], h9 = h[r + 9], h10 = h[r + 10], h11 = h[r + 11];
                double h12 = h[r + 12], h13 = h[r + 13], h14 = h[r + 14], h15 = h[r + 15];
                int base = pos + q0 * down + fj;
                int o = outOff + q0 * up + j;
                int q = 0;
                for (; q < q4; q += 4) {
                    int a = base + q * down;
                    out[o + q * up] = dot(x, a, h0, h1, h2, h3, h4, h5, h6, h7, h8, h9, h10, h11, h12, h13, h14, h15);
                    a += down;
                    out[o + (q + 1) * up] = dot(x, a, h0, h1, h2, h3, h4, h5, h6, h7, h8, h9, h10, h11, h12, h13, h14, h15);
                    a += down;
                    out[o + (q + 2) * up] = dot(x, a, h0, h1, h2, h3, h4, h5, h6, h7, h8, h9, h10, h11, h12, h13, h14, h15);
                    a += down;
                    out[o + (q + 3) * up] = dot(x, a, h0, h1, h2, h3, h4, h5, h6, h7, h8, h9, h10, h11, h12, h13, h14, h15);
                }
                for (; q < qn; q++) {
                    out[o + q * up] = dot(x, base + q * down, h0, h1, h2, h3, h4, h5, h6, h7, h8, h9, h10, h11, h12, h13,
                            h14, h15);
                }
            }
        }
    }

    /** One output in the one fixed order; the coefficients of its phase passed in (held in registers). */
    private static double dot(double[] x, int a, double h0, double h1, double h2, double h3, double h4, double h5,
            double h6, double h7, double h8, double h9, double h10, double h11, double h12, double h13, double h14,
            double h15) {
        double s0 = x[a] * h0;
        double s1 = x[a + 1] * h1;
        double s2 = x[a + 2] * h2;
        double s3 = x[a + 3] * h3;
        s0 = Math.fma(x[a + 4], h4, s0);
        s1 = Math.fma(x[a + 5], h5, s1);
        s2 = Math.fma(x[a + 6], h6, s2);
        s3 = Math.fma(x[a + 7], h7, s3);
        s0 = Math.fma(x[a + 8], h8, s0);
        s1 = Math.fma(x[a + 9], h9, s1);
        s2 = Math.fma(x[a + 10], h10, s2);
        s3 = Math.fma(x[a + 11], h11, s3);
        s0 = Math.fma(x[a + 12], h12, s0);
        s1 = Math.fma(x[a + 13], h13, s1);
        s2 = Math.fma(x[a + 14], h14, s2);
        s3 = Math.fma(x[a + 15], h15, s3);
        return (s0 + s2) + (s1 + s3);
    }
}
