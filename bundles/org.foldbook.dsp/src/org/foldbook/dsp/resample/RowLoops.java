package org.foldbook.dsp.resample;

/**
 * The hot loops of a {@link PolyphaseKernel} with any number of taps per row that is a multiple of 4 (the
 * filtered re-samplers: scipy's resample_poly design, the ideal decimator's stages, the modelled mode with a
 * digitizer filter): outputs one by one up to the start of a row, then whole rows phase by phase, four
 * outputs of one phase together so each coefficient is loaded once for four outputs (one load per
 * 1.25 multiply-adds instead of two: the loads, not the multiply-adds, bound these loops).
 *
 * <p>Every output is summed in one fixed order, whichever loop computes it: four running sums over taps
 * i ≡ 0, 1, 2, 3 mod 4 by Math.fma, combined as (s0 + s2) + (s1 + s3). Rows padded with zeros to a multiple
 * of 4 give the same bits as unpadded ones (adding 0·x changes no sum), which is why the kernel pads them.
 */
final class RowLoops {

    private RowLoops() {
    }

    /**
     * Outputs {@code m0 .. m0+count-1} into {@code out[outOff..]}; the first tap of output m0 is
     * {@code x[pos]}, its phase {@code p}; rows of {@code taps} coefficients. Every tap must lie inside
     * {@code x} (the caller checks).
     */
    static void run(double[] h, int up, int down, int taps, double[] x, int pos, int p, long m0, double[] out,
            int outOff, int count) {
        if ((taps & 3) != 0) {
            throw new IllegalArgumentException("rows of " + taps + " taps: a multiple of 4 expected");
        }
        int sw = down / up;
        int sr = down % up;
        int done = 0;
        if (count >= 8 * up) {
            int head = (int) ((up - m0 % up) % up);
            int rows = (count - head) / up;
            linear(h, up, sw, sr, taps, x, pos, p, out, outOff, head);
            long t = (long) p + (long) head * sr;
            rows(h, up, down, taps, x, (int) (pos + (long) head * sw + t / up), out, outOff + head, rows);
            done = head + rows * up;
        }
        if (done < count) {
            long t = (long) p + (long) done * sr;
            linear(h, up, sw, sr, taps, x, (int) (pos + (long) done * sw + t / up), (int) (t % up), out,
                    outOff + done, count - done);
        }
    }

    private static void linear(double[] h, int up, int sw, int sr, int n, double[] x, int pos, int p, double[] out,
            int outOff, int count) {
        for (int o = outOff, end = outOff + count; o < end; o++) {
            int r = p * n;
            double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
            for (int i = 0; i < n; i += 4) {
                s0 = Math.fma(x[pos + i], h[r + i], s0);
                s1 = Math.fma(x[pos + i + 1], h[r + i + 1], s1);
                s2 = Math.fma(x[pos + i + 2], h[r + i + 2], s2);
                s3 = Math.fma(x[pos + i + 3], h[r + i + 3], s3);
            }
            out[o] = (s0 + s2) + (s1 + s3);
            pos += sw;
            p += sr;
            if (p >= up) {
                p -= up;
                pos++;
            }
        }
    }

    /**
     * {@code rows} whole rows of {@code up} outputs from an output of phase 0 whose first tap is x[pos]:
     * output q·up + j has phase p_j and its taps start at pos + q·down + floor(j·down/up). Rows go in groups
     * whose input stays in cache while every phase passes over it.
     */
    private static void rows(double[] h, int up, int down, int n, double[] x, int pos, double[] out, int outOff,
            int rows) {
        final int group = Math.max(4, Math.min(64, (1 << 15) / Math.max(down, 1)) & ~3);
        for (int q0 = 0; q0 < rows; q0 += group) {
            int qn = Math.min(group, rows - q0);
            int q4 = qn & ~3;
            for (int j = 0; j < up; j++) {
                long jd = (long) j * down;
                int fj = (int) (jd / up);
                int r = (int) (jd - (long) fj * up) * n;
                int base = pos + q0 * down + fj;
                int o = outOff + q0 * up + j;
                int q = 0;
                for (; q < q4; q += 4) {
                    int a = base + q * down;
                    int b = a + down;
                    int c = b + down;
                    int d = c + down;
                    double a0 = 0, a1 = 0, a2 = 0, a3 = 0;
                    double b0 = 0, b1 = 0, b2 = 0, b3 = 0;
                    double c0 = 0, c1 = 0, c2 = 0, c3 = 0;
                    double d0 = 0, d1 = 0, d2 = 0, d3 = 0;
                    for (int i = 0; i < n; i += 4) {
                        double h0 = h[r + i];
                        double h1 = h[r + i + 1];
                        double h2 = h[r + i + 2];
                        double h3 = h[r + i + 3];
                        a0 = Math.fma(x[a + i], h0, a0);
                        a1 = Math.fma(x[a + i + 1], h1, a1);
                        a2 = Math.fma(x[a + i + 2], h2, a2);
                        a3 = Math.fma(x[a + i + 3], h3, a3);
                        b0 = Math.fma(x[b + i], h0, b0);
                        b1 = Math.fma(x[b + i + 1], h1, b1);
                        b2 = Math.fma(x[b + i + 2], h2, b2);
                        b3 = Math.fma(x[b + i + 3], h3, b3);
                        c0 = Math.fma(x[c + i], h0, c0);
                        c1 = Math.fma(x[c + i + 1], h1, c1);
                        c2 = Math.fma(x[c + i + 2], h2, c2);
                        c3 = Math.fma(x[c + i + 3], h3, c3);
                        d0 = Math.fma(x[d + i], h0, d0);
                        d1 = Math.fma(x[d + i + 1], h1, d1);
                        d2 = Math.fma(x[d + i + 2], h2, d2);
                        d3 = Math.fma(x[d + i + 3], h3, d3);
                    }
                    out[o + q * up] = (a0 + a2) + (a1 + a3);
                    out[o + (q + 1) * up] = (b0 + b2) + (b1 + b3);
                    out[o + (q + 2) * up] = (c0 + c2) + (c1 + c3);
                    out[o + (q + 3) * up] = (d0 + d2) + (d1 + d3);
                }
                for (; q < qn; q++) {
                    int a = base + q * down;
                    double s0 = 0, s1 = 0, s2 = 0, s3 = 0;
                    for (int i = 0; i < n; i += 4) {
                        s0 = Math.fma(x[a + i], h[r + i], s0);
                        s1 = Math.fma(x[a + i + 1], h[r + i + 1], s1);
                        s2 = Math.fma(x[a + i + 2], h[r + i + 2], s2);
                        s3 = Math.fma(x[a + i + 3], h[r + i + 3], s3);
                    }
                    out[o + q * up] = (s0 + s2) + (s1 + s3);
                }
            }
        }
    }
}
