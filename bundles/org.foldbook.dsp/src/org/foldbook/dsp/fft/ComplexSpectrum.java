package org.foldbook.dsp.fft;

import java.util.Arrays;

/**
 * Immutable one-sided DFT of a real sequence of length {@link #transformLength()} n: bins
 * {@code k = 0 .. n/2}, {@code X[k] = sum_j x[j] exp(-2 pi i j k / n)} (unnormalised). See {@link RealFft}.
 */
public final class ComplexSpectrum {
    private final int n;
    private final double[] re;
    private final double[] im;

    ComplexSpectrum(int n, double[] re, double[] im) {
        this.n = n;
        this.re = re;
        this.im = im;
    }

    /** Length n of the transformed sequence. */
    public int transformLength() {
        return n;
    }

    /** Number of bins, {@code n/2 + 1}. */
    public int bins() {
        return re.length;
    }

    /** Real part of bin k. */
    public double re(int k) {
        return re[k];
    }

    /** Imaginary part of bin k. */
    public double im(int k) {
        return im[k];
    }

    /** {@code |X[k]|}. */
    public double magnitude(int k) {
        return Math.hypot(re[k], im[k]);
    }

    /** {@code |X[k]|^2}. */
    public double power(int k) {
        return re[k] * re[k] + im[k] * im[k];
    }

    /** Phase of bin k in radians, {@code atan2(im, re)}. */
    public double phase(int k) {
        return Math.atan2(im[k], re[k]);
    }

    /** Copy of the real parts, indexed by bin. */
    public double[] realParts() {
        return re.clone();
    }

    /** Copy of the imaginary parts, indexed by bin. */
    public double[] imaginaryParts() {
        return im.clone();
    }

    @Override
    public String toString() {
        return "ComplexSpectrum[n=" + n + ", bins=" + re.length + "]";
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ComplexSpectrum c && c.n == n && Arrays.equals(c.re, re) && Arrays.equals(c.im, im);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * n + Arrays.hashCode(re)) + Arrays.hashCode(im);
    }
}
