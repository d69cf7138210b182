package org.foldbook.dsp.fft;

import jdk.incubator.vector.DoubleVector;
import jdk.incubator.vector.VectorShuffle;
import jdk.incubator.vector.VectorSpecies;

/**
 * Real forward DFT for power-of-two lengths on the JDK's Vector API (module {@code jdk.incubator.vector}),
 * loaded only through {@link FftKernels} when that module is present. Same convention and output as
 * {@link RealFft}.
 *
 * <p><b>Why this shape.</b> A real sequence of n samples is transformed as one complex sequence
 * {@code z[j] = x[2j] + i x[2j+1]} of h = n/2 points, then split into the n/2+1 real-input bins (the usual
 * "two for one" post-pass). The h-point DFT is the four-step (Bailey) factorisation h = R C: the data as an
 * R x C matrix (row r holds {@code z[c + C r]}), length-R DFTs down the columns, a twiddle
 * {@code W_h^(c k1)}, a transpose, and length-C DFTs down the columns of the transposed matrix. Both sets
 * of DFTs are radix-2 butterflies between whole rows, so every operation is a plain lane-wise one on
 * contiguous vectors (no shuffles inside the butterflies, which the JIT does not vectorise in scalar code)
 * and the working set (16 n bytes) stays in the first-level cache for the Welch lengths. The first set is
 * decimation in frequency (natural order in, bit-reversed out), the second decimation in time
 * (bit-reversed in, natural out); the transpose undoes and introduces the two orders, so the result
 * lands in natural order without a separate permutation pass.
 *
 * <p>Immutable tables; scratch per thread ({@link ThreadLocal}), so one instance serves every thread.
 */
final class VectorRealFft {
    private static final VectorSpecies<Double> S = DoubleVector.SPECIES_PREFERRED;
    private static final int L = S.length();
    private static final VectorShuffle<Double> REVERSE = VectorShuffle.fromOp(S, i -> L - 1 - i);
    private static final int[] EVEN = evenOffsets();

    private final int n;
    private final int h;
    private final int rows; // R
    private final int cols; // C
    // column DFTs of length R (DIF) and C (DIT): W_R^m, W_C^m for m < R/2, C/2, as cos and -sin
    private final double[] wRr;
    private final double[] wRi;
    private final double[] wCr;
    private final double[] wCi;
    // four-step twiddle W_h^(c k1) in the transposed layout: row q (c = rev_C(q)), column k1, C x R
    private final double[] twr;
    private final double[] twi;
    private final int[] revR;
    private final int[] revC;
    // gather map of a column of the R x C matrix in frequency order: offset of the row holding k1
    private final int[] rowStart;
    // post-pass: cos(2 pi k / n), sin(2 pi k / n), k = 0 .. h (+ padding to whole vectors)
    private final double[] cosN;
    private final double[] sinN;
    private final ThreadLocal<double[][]> scratch;

    /** Lanes of one vector on this machine; the kernel needs at least 4. */
    static int lanes() {
        return L;
    }

    /** Smallest n this kernel takes: R = sqrt-ish(n/2) must hold a whole vector. */
    static int minimumLength() {
        return 2 * L * L;
    }

    VectorRealFft(int n) {
        if (n < minimumLength() || Integer.bitCount(n) != 1) {
            throw new IllegalArgumentException("n must be a power of two >= " + minimumLength() + ", was " + n);
        }
        this.n = n;
        this.h = n / 2;
        int logH = Integer.numberOfTrailingZeros(h);
        this.rows = 1 << (logH / 2);
        this.cols = h / rows;
        this.wRr = new double[rows / 2];
        this.wRi = new double[rows / 2];
        fillRoots(rows, wRr, wRi);
        this.wCr = new double[cols / 2];
        this.wCi = new double[cols / 2];
        fillRoots(cols, wCr, wCi);
        this.revR = bitReversal(rows);
        this.revC = bitReversal(cols);
        this.twr = new double[h];
        this.twi = new double[h];
        this.rowStart = new int[rows];
        for (int k1 = 0; k1 < rows; k1++) {
            rowStart[k1] = revR[k1] * cols; // row position p = rev_R(k1) holds frequency k1
            for (int q = 0; q < cols; q++) {
                int c = revC[q];
                double a = -2 * Math.PI * ((long) c * k1) / h;
                twr[q * rows + k1] = Math.cos(a);
                twi[q * rows + k1] = Math.sin(a);
            }
        }
        int padded = h + L;
        this.cosN = new double[padded];
        this.sinN = new double[padded];
        for (int k = 0; k <= h; k++) {
            double a = 2 * Math.PI * k / n;
            cosN[k] = Math.cos(a);
            sinN[k] = Math.sin(a);
        }
        this.scratch = ThreadLocal.withInitial(() -> new double[][] {
            new double[h], new double[h], new double[padded], new double[padded] });
    }

    int size() {
        return n;
    }

    /** {@code re[k], im[k]} for k = 0 .. n/2 of {@code x[0..n)}; x is not changed. */
    void forward(double[] x, double[] re, double[] im) {
        double[][] s = scratch.get();
        complexTransform(x, s);
        double[] zr = s[2];
        double[] zi = s[3];
        int k = 0;
        for (; k < h; k += L) {
            int m = h - k - (L - 1); // the lanes' mirrors h-k .. h-k-L+1, reversed into lane order
            DoubleVector ar = DoubleVector.fromArray(S, zr, k);
            DoubleVector ai = DoubleVector.fromArray(S, zi, k);
            DoubleVector br = DoubleVector.fromArray(S, zr, m).rearrange(REVERSE);
            DoubleVector bi = DoubleVector.fromArray(S, zi, m).rearrange(REVERSE);
            DoubleVector c = DoubleVector.fromArray(S, cosN, k);
            DoubleVector sn = DoubleVector.fromArray(S, sinN, k);
            // even part E = (Z[k] + conj Z[h-k]) / 2, odd part O = (Z[k] - conj Z[h-k]) / 2,
            // X[k] = E - i e^{-2 pi i k/n} O
            DoubleVector er = ar.add(br).mul(0.5);
            DoubleVector ei = ai.sub(bi).mul(0.5);
            DoubleVector or = ar.sub(br).mul(0.5);
            DoubleVector oi = ai.add(bi).mul(0.5);
            er.add(oi.mul(c)).sub(or.mul(sn)).intoArray(re, k);
            ei.sub(oi.mul(sn)).sub(or.mul(c)).intoArray(im, k);
        }
        re[h] = zr[0] - zi[0];
        im[h] = 0;
        im[0] = 0;
    }

    /** Adds {@code |X[k]|^2} to {@code sum[k]} for k = 0 .. n/2 and returns X[0]; x is not changed. */
    double accumulatePower(double[] x, double[] sum) {
        double[][] s = scratch.get();
        complexTransform(x, s);
        double[] zr = s[2];
        double[] zi = s[3];
        for (int k = 0; k < h; k += L) {
            int m = h - k - (L - 1);
            DoubleVector ar = DoubleVector.fromArray(S, zr, k);
            DoubleVector ai = DoubleVector.fromArray(S, zi, k);
            DoubleVector br = DoubleVector.fromArray(S, zr, m).rearrange(REVERSE);
            DoubleVector bi = DoubleVector.fromArray(S, zi, m).rearrange(REVERSE);
            DoubleVector c = DoubleVector.fromArray(S, cosN, k);
            DoubleVector sn = DoubleVector.fromArray(S, sinN, k);
            DoubleVector er = ar.add(br).mul(0.5);
            DoubleVector ei = ai.sub(bi).mul(0.5);
            DoubleVector or = ar.sub(br).mul(0.5);
            DoubleVector oi = ai.add(bi).mul(0.5);
            DoubleVector xr = er.add(oi.mul(c)).sub(or.mul(sn));
            DoubleVector xi = ei.sub(oi.mul(sn)).sub(or.mul(c));
            DoubleVector.fromArray(S, sum, k).add(xr.mul(xr).add(xi.mul(xi))).intoArray(sum, k);
        }
        // the k = 0 lane above used Z[h] = Z[0] and gave (Re Z0 + Im Z0)^2 exactly; bin h is Re Z0 - Im Z0
        double nyquist = zr[0] - zi[0];
        sum[h] += nyquist * nyquist;
        return zr[0] + zi[0];
    }

    /** Natural-order h-point DFT of {@code z[j] = x[2j] + i x[2j+1]} into s[2], s[3] (with Z[h] = Z[0]). */
    private void complexTransform(double[] x, double[][] s) {
        double[] ar = s[0];
        double[] ai = s[1];
        double[] br = s[2];
        double[] bi = s[3];
        // 1. length-R DFTs down the columns: decimation in frequency over whole rows of C; the first stage
        // reads the interleaved samples straight from x (stride-2 gathers)
        int halfRows = rows / 2;
        for (int j = 0; j < halfRows; j++) {
            firstDif(x, ar, ai, j * cols, (j + halfRows) * cols, wRr[j], wRi[j]);
        }
        int span = rows / 4;
        for (; span >= 2; span >>= 2) { // two stages at once (spans span, span/2): radix 4
            int step = rows / (2 * span);
            int q = span / 2;
            for (int g = 0; g < rows; g += 2 * span) {
                for (int j = 0; j < q; j++) {
                    radix4Dif(ar, ai, (g + j) * cols, q * cols, cols,
                            wRr[j * step], wRi[j * step], wRr[2 * j * step], wRi[2 * j * step]);
                }
            }
        }
        if (span == 1) {
            for (int g = 0; g < rows; g += 2) {
                butterflyDif(ar, ai, g * cols, (g + 1) * cols, cols, 1, 0);
            }
        }
        // 2.-3. twiddle W_h^(c k1) and transpose, fused into the first decimation-in-time stage: row q of
        // the C x R matrix is column rev_C(q) of the R x C one, its rows in bit-reversed order (gathers)
        for (int q = 0; q < cols; q += 2) {
            firstDit(ar, ai, br, bi, q);
        }
        // 4. length-C DFTs down the columns: decimation in time over whole rows of R, natural order out
        int dspan = 2;
        for (; 2 * dspan < cols; dspan <<= 2) { // two stages at once (spans dspan, 2 dspan): radix 4
            int step = cols / (2 * dspan);
            for (int g = 0; g < cols; g += 4 * dspan) {
                for (int j = 0; j < dspan; j++) {
                    radix4Dit(br, bi, (g + j) * rows, dspan * rows, rows,
                            wCr[j * step], wCi[j * step], wCr[j * step / 2], wCi[j * step / 2]);
                }
            }
        }
        if (dspan < cols) {
            int step = cols / (2 * dspan);
            for (int j = 0; j < dspan; j++) {
                butterflyDit(br, bi, j * rows, (j + dspan) * rows, rows, wCr[j * step], wCi[j * step]);
            }
        }
        br[h] = br[0];
        bi[h] = bi[0];
    }

    /** First DIF stage from the interleaved input: rows a, b (offsets into the h complex points). */
    private void firstDif(double[] x, double[] re, double[] im, int a, int b, double wr, double wi) {
        for (int i = 0; i < cols; i += L) {
            DoubleVector xr = DoubleVector.fromArray(S, x, 2 * (a + i), EVEN, 0);
            DoubleVector xi = DoubleVector.fromArray(S, x, 2 * (a + i) + 1, EVEN, 0);
            DoubleVector yr = DoubleVector.fromArray(S, x, 2 * (b + i), EVEN, 0);
            DoubleVector yi = DoubleVector.fromArray(S, x, 2 * (b + i) + 1, EVEN, 0);
            xr.add(yr).intoArray(re, a + i);
            xi.add(yi).intoArray(im, a + i);
            DoubleVector dr = xr.sub(yr);
            DoubleVector di = xi.sub(yi);
            dr.mul(wr).sub(di.mul(wi)).intoArray(re, b + i);
            dr.mul(wi).add(di.mul(wr)).intoArray(im, b + i);
        }
    }

    /**
     * Rows q, q+1 of the transposed matrix, gathered from columns rev_C(q), rev_C(q+1) of the R x C one and
     * multiplied by the four-step twiddle, then the span-1 DIT butterfly (its twiddle is 1).
     */
    private void firstDit(double[] ar, double[] ai, double[] br, double[] bi, int q) {
        int ca = revC[q];
        int cb = revC[q + 1];
        int a = q * rows;
        int b = a + rows;
        for (int i = 0; i < rows; i += L) {
            DoubleVector xr = DoubleVector.fromArray(S, ar, ca, rowStart, i);
            DoubleVector xi = DoubleVector.fromArray(S, ai, ca, rowStart, i);
            DoubleVector yr = DoubleVector.fromArray(S, ar, cb, rowStart, i);
            DoubleVector yi = DoubleVector.fromArray(S, ai, cb, rowStart, i);
            DoubleVector ur = DoubleVector.fromArray(S, twr, a + i);
            DoubleVector ui = DoubleVector.fromArray(S, twi, a + i);
            DoubleVector vr = DoubleVector.fromArray(S, twr, b + i);
            DoubleVector vi = DoubleVector.fromArray(S, twi, b + i);
            DoubleVector pr = xr.mul(ur).sub(xi.mul(ui));
            DoubleVector pi = xr.mul(ui).add(xi.mul(ur));
            DoubleVector tr = yr.mul(vr).sub(yi.mul(vi));
            DoubleVector ti = yr.mul(vi).add(yi.mul(vr));
            pr.add(tr).intoArray(br, a + i);
            pi.add(ti).intoArray(bi, a + i);
            pr.sub(tr).intoArray(br, b + i);
            pi.sub(ti).intoArray(bi, b + i);
        }
    }

    /** Rows a, b of {@code width}: a <- a + b, b <- (a - b) w. */
    private static void butterflyDif(double[] re, double[] im, int a, int b, int width, double wr, double wi) {
        for (int i = 0; i < width; i += L) {
            DoubleVector xr = DoubleVector.fromArray(S, re, a + i);
            DoubleVector xi = DoubleVector.fromArray(S, im, a + i);
            DoubleVector yr = DoubleVector.fromArray(S, re, b + i);
            DoubleVector yi = DoubleVector.fromArray(S, im, b + i);
            xr.add(yr).intoArray(re, a + i);
            xi.add(yi).intoArray(im, a + i);
            DoubleVector dr = xr.sub(yr);
            DoubleVector di = xi.sub(yi);
            dr.mul(wr).sub(di.mul(wi)).intoArray(re, b + i);
            dr.mul(wi).add(di.mul(wr)).intoArray(im, b + i);
        }
    }

    /**
     * Two DIF stages on rows a, a+d, a+2d, a+3d: span-2d butterflies with w (the second pair's twiddle is
     * -i w), then span-d butterflies with w2 = w^2.
     */
    private static void radix4Dif(double[] re, double[] im, int a, int d, int width,
            double wr, double wi, double w2r, double w2i) {
        for (int i = 0; i < width; i += L) {
            int o0 = a + i;
            int o1 = o0 + d;
            int o2 = o1 + d;
            int o3 = o2 + d;
            DoubleVector x0r = DoubleVector.fromArray(S, re, o0);
            DoubleVector x0i = DoubleVector.fromArray(S, im, o0);
            DoubleVector x1r = DoubleVector.fromArray(S, re, o1);
            DoubleVector x1i = DoubleVector.fromArray(S, im, o1);
            DoubleVector x2r = DoubleVector.fromArray(S, re, o2);
            DoubleVector x2i = DoubleVector.fromArray(S, im, o2);
            DoubleVector x3r = DoubleVector.fromArray(S, re, o3);
            DoubleVector x3i = DoubleVector.fromArray(S, im, o3);
            DoubleVector u0r = x0r.add(x2r);
            DoubleVector u0i = x0i.add(x2i);
            DoubleVector u1r = x1r.add(x3r);
            DoubleVector u1i = x1i.add(x3i);
            DoubleVector d0r = x0r.sub(x2r);
            DoubleVector d0i = x0i.sub(x2i);
            DoubleVector d1r = x1r.sub(x3r);
            DoubleVector d1i = x1i.sub(x3i);
            DoubleVector u2r = d0r.mul(wr).sub(d0i.mul(wi));
            DoubleVector u2i = d0r.mul(wi).add(d0i.mul(wr));
            // (d1 w)(-i) = (Im, -Re) of d1 w
            DoubleVector u3r = d1r.mul(wi).add(d1i.mul(wr));
            DoubleVector u3i = d1i.mul(wi).sub(d1r.mul(wr));
            u0r.add(u1r).intoArray(re, o0);
            u0i.add(u1i).intoArray(im, o0);
            DoubleVector e1r = u0r.sub(u1r);
            DoubleVector e1i = u0i.sub(u1i);
            e1r.mul(w2r).sub(e1i.mul(w2i)).intoArray(re, o1);
            e1r.mul(w2i).add(e1i.mul(w2r)).intoArray(im, o1);
            u2r.add(u3r).intoArray(re, o2);
            u2i.add(u3i).intoArray(im, o2);
            DoubleVector e3r = u2r.sub(u3r);
            DoubleVector e3i = u2i.sub(u3i);
            e3r.mul(w2r).sub(e3i.mul(w2i)).intoArray(re, o3);
            e3r.mul(w2i).add(e3i.mul(w2r)).intoArray(im, o3);
        }
    }

    /**
     * Two DIT stages on rows a, a+d, a+2d, a+3d: span-d butterflies with w1, then span-2d butterflies with
     * w2 (the second pair's twiddle is -i w2).
     */
    private static void radix4Dit(double[] re, double[] im, int a, int d, int width,
            double w1r, double w1i, double w2r, double w2i) {
        for (int i = 0; i < width; i += L) {
            int o0 = a + i;
            int o1 = o0 + d;
            int o2 = o1 + d;
            int o3 = o2 + d;
            DoubleVector x0r = DoubleVector.fromArray(S, re, o0);
            DoubleVector x0i = DoubleVector.fromArray(S, im, o0);
            DoubleVector x1r = DoubleVector.fromArray(S, re, o1);
            DoubleVector x1i = DoubleVector.fromArray(S, im, o1);
            DoubleVector x2r = DoubleVector.fromArray(S, re, o2);
            DoubleVector x2i = DoubleVector.fromArray(S, im, o2);
            DoubleVector x3r = DoubleVector.fromArray(S, re, o3);
            DoubleVector x3i = DoubleVector.fromArray(S, im, o3);
            DoubleVector t1r = x1r.mul(w1r).sub(x1i.mul(w1i));
            DoubleVector t1i = x1r.mul(w1i).add(x1i.mul(w1r));
            DoubleVector t3r = x3r.mul(w1r).sub(x3i.mul(w1i));
            DoubleVector t3i = x3r.mul(w1i).add(x3i.mul(w1r));
            DoubleVector u0r = x0r.add(t1r);
            DoubleVector u0i = x0i.add(t1i);
            DoubleVector u1r = x0r.sub(t1r);
            DoubleVector u1i = x0i.sub(t1i);
            DoubleVector u2r = x2r.add(t3r);
            DoubleVector u2i = x2i.add(t3i);
            DoubleVector u3r = x2r.sub(t3r);
            DoubleVector u3i = x2i.sub(t3i);
            DoubleVector vr = u2r.mul(w2r).sub(u2i.mul(w2i));
            DoubleVector vi = u2r.mul(w2i).add(u2i.mul(w2r));
            // (u3 w2)(-i) = (Im, -Re) of u3 w2
            DoubleVector sr = u3r.mul(w2i).add(u3i.mul(w2r));
            DoubleVector si = u3i.mul(w2i).sub(u3r.mul(w2r));
            u0r.add(vr).intoArray(re, o0);
            u0i.add(vi).intoArray(im, o0);
            u0r.sub(vr).intoArray(re, o2);
            u0i.sub(vi).intoArray(im, o2);
            u1r.add(sr).intoArray(re, o1);
            u1i.add(si).intoArray(im, o1);
            u1r.sub(sr).intoArray(re, o3);
            u1i.sub(si).intoArray(im, o3);
        }
    }

    /** Rows a, b of {@code width}: t = b w, a <- a + t, b <- a - t. */
    private static void butterflyDit(double[] re, double[] im, int a, int b, int width, double wr, double wi) {
        for (int i = 0; i < width; i += L) {
            DoubleVector xr = DoubleVector.fromArray(S, re, a + i);
            DoubleVector xi = DoubleVector.fromArray(S, im, a + i);
            DoubleVector yr = DoubleVector.fromArray(S, re, b + i);
            DoubleVector yi = DoubleVector.fromArray(S, im, b + i);
            DoubleVector tr = yr.mul(wr).sub(yi.mul(wi));
            DoubleVector ti = yr.mul(wi).add(yi.mul(wr));
            xr.add(tr).intoArray(re, a + i);
            xi.add(ti).intoArray(im, a + i);
            xr.sub(tr).intoArray(re, b + i);
            xi.sub(ti).intoArray(im, b + i);
        }
    }

    /** {@code W_m^j = exp(-2 pi i j / m)} for j < m/2. */
    private static void fillRoots(int m, double[] re, double[] im) {
        for (int j = 0; j < m / 2; j++) {
            double a = -2 * Math.PI * j / m;
            re[j] = Math.cos(a);
            im[j] = Math.sin(a);
        }
    }

    private static int[] evenOffsets() {
        int[] e = new int[L];
        for (int i = 0; i < L; i++) {
            e[i] = 2 * i;
        }
        return e;
    }

    private static int[] bitReversal(int m) {
        int bits = Integer.numberOfTrailingZeros(m);
        int[] r = new int[m];
        for (int j = 0; j < m; j++) {
            r[j] = bits == 0 ? 0 : Integer.reverse(j) >>> (32 - bits);
        }
        return r;
    }
}
