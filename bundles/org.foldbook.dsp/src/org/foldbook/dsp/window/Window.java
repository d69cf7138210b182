package org.foldbook.dsp.window;

import java.util.Arrays;
import java.util.Locale;

import org.foldbook.dsp.fft.RealFft;

/**
 * An immutable sampled window {@code w[0..n)} and its figures of merit, all computed from the samples:
 * <ul>
 * <li>coherent gain {@code CG = sum(w) / n} (amplitude of a bin-centred tone relative to a rectangular
 * window);</li>
 * <li>equivalent noise bandwidth in bins {@code ENBW = n sum(w^2) / sum(w)^2};</li>
 * <li>scalloping loss {@code -20 log10(|W(1/2)| / W(0))}, a positive dB figure, with
 * {@code W(nu) = sum_j w[j] exp(-2 pi i nu j / n)}, nu in bins;</li>
 * <li>highest sidelobe {@code 20 log10(max |W(nu)| / W(0))} beyond the main lobe (which ends at the first
 * minimum of {@code |W|} below -20 dB), from a
 * zero-padded FFT of the window (64 points a bin up to n = 2^17, at least 2 beyond), refined by parabolic
 * interpolation or, on a coarse grid, by direct evaluation of {@code W(nu)} (negative dB).</li>
 * </ul>
 * The figures are computed on first request and cached.
 */
public final class Window {
    private final WindowShape shape;
    private final Symmetry symmetry;
    private final double[] w;
    private final double sum;
    private final double sumOfSquares;
    private volatile WindowMetrics metrics;

    Window(WindowShape shape, Symmetry symmetry, double[] samples) {
        this.shape = shape;
        this.symmetry = symmetry;
        this.w = samples;
        double s = 0;
        double s2 = 0;
        for (double v : samples) {
            s += v;
            s2 += v * v;
        }
        this.sum = s;
        this.sumOfSquares = s2;
    }

    public WindowShape shape() {
        return shape;
    }

    public Symmetry symmetry() {
        return symmetry;
    }

    /** Number of samples n. */
    public int length() {
        return w.length;
    }

    /** Sample j. */
    public double get(int j) {
        return w[j];
    }

    /** A copy of the samples. */
    public double[] toArray() {
        return w.clone();
    }

    /** Copies the samples into {@code dest[destOffset .. destOffset+n)}. */
    public void copyTo(double[] dest, int destOffset) {
        System.arraycopy(w, 0, dest, destOffset, w.length);
    }

    /** {@code S1 = sum(w)} (Heinzel et al. 2002 notation). */
    public double sum() {
        return sum;
    }

    /** {@code S2 = sum(w^2)}. */
    public double sumOfSquares() {
        return sumOfSquares;
    }

    /** {@code sum(w) / n}. */
    public double coherentGain() {
        return sum / w.length;
    }

    /** {@code n sum(w^2) / sum(w)^2}, in bins. */
    public double enbwBins() {
        return w.length * sumOfSquares / (sum * sum);
    }

    /** Scalloping loss in dB (positive): the loss of a tone half-way between two bins. */
    public double scallopLossDb() {
        return metrics().scallopLossDb();
    }

    /** Highest sidelobe in dB relative to the main-lobe peak (negative). */
    public double highestSidelobeDb() {
        return metrics().highestSidelobeDb();
    }

    /** All figures of merit at once. */
    public WindowMetrics metrics() {
        WindowMetrics m = metrics;
        if (m == null) {
            m = computeMetrics();
            metrics = m;
        }
        return m;
    }

    /**
     * {@code |W(nu)| = |sum_j w[j] exp(-2 pi i nu j / n)|} at {@code nu} bins from DC, by direct summation
     * (O(n); the phasor is recomputed exactly every 256 samples so rounding does not build up).
     */
    public double transformMagnitude(double nuBins) {
        int n = w.length;
        double theta = -2 * Math.PI * nuBins / n;
        double c1 = Math.cos(theta);
        double s1 = Math.sin(theta);
        double re = 0;
        double im = 0;
        for (int start = 0; start < n; start += 256) {
            double pr = Math.cos(theta * start);
            double pi = Math.sin(theta * start);
            int end = Math.min(n, start + 256);
            for (int j = start; j < end; j++) {
                re += w[j] * pr;
                im += w[j] * pi;
                double t = pr * c1 - pi * s1;
                pi = pr * s1 + pi * c1;
                pr = t;
            }
        }
        return Math.hypot(re, im);
    }

    private WindowMetrics computeMetrics() {
        int n = w.length;
        double peak = Math.abs(sum);
        double scallop = -20 * Math.log10(transformMagnitude(0.5) / peak);
        // Zero-padded FFT: grid of nu = j * n / len bins; at least 2 points a bin, 64 where affordable.
        long padded = Long.highestOneBit(Math.max(1, n - 1)) * 2 * 64;
        while (padded > (1 << 23) && padded / n > 2) {
            padded >>= 1;
        }
        int len = Math.toIntExact(padded);
        double[] work = new double[len];
        System.arraycopy(w, 0, work, 0, n);
        RealFft fft = RealFft.of(len);
        double[] mag = new double[fft.bins()];
        fft.powerInPlace(work, mag);
        for (int j = 0; j < mag.length; j++) {
            mag[j] = Math.sqrt(mag[j]);
        }
        double step = (double) n / len; // bins per grid point
        // End of the main lobe: the first local minimum of |W| below -20 dB (flat-top windows ripple by
        // hundredths of a dB across their top, so a plain first minimum would stop inside the main lobe).
        int edge = -1;
        for (int j = 1; j + 1 < mag.length; j++) {
            if (mag[j] <= mag[j - 1] && mag[j] <= mag[j + 1] && mag[j] < 0.1 * mag[0]) {
                edge = j;
                break;
            }
        }
        if (edge < 0) {
            return new WindowMetrics(coherentGain(), enbwBins(), scallop, Double.NaN, Double.NaN);
        }
        double best = 0;
        double bestNu = Double.NaN;
        boolean fine = len / n >= 16;
        // The two highest grid maxima beyond the main lobe, refined: on a fine grid by a parabola through
        // the three log-magnitudes around each, on a coarse one by golden-section search on W itself.
        for (int c : topLocalMaxima(mag, edge + 1, 2)) {
            if (c < 0) {
                continue;
            }
            double[] r = fine && c + 1 < mag.length ? parabolicMax(mag, c, step) : refineMax(c * step, step);
            if (r[1] > best) {
                best = r[1];
                bestNu = r[0];
            }
        }
        double sidelobe = 20 * Math.log10(best / peak);
        return new WindowMetrics(coherentGain(), enbwBins(), scallop, sidelobe, bestNu);
    }

    private static int[] topLocalMaxima(double[] mag, int from, int count) {
        int[] idx = new int[count];
        double[] val = new double[count];
        Arrays.fill(idx, -1);
        Arrays.fill(val, -1);
        for (int j = Math.max(1, from); j < mag.length; j++) {
            boolean max = mag[j] >= mag[j - 1] && (j + 1 == mag.length || mag[j] >= mag[j + 1]);
            if (!max || mag[j] <= val[count - 1]) {
                continue;
            }
            int p = count - 1;
            while (p > 0 && val[p - 1] < mag[j]) {
                val[p] = val[p - 1];
                idx[p] = idx[p - 1];
                p--;
            }
            val[p] = mag[j];
            idx[p] = j;
        }
        return idx;
    }

    /** Vertex of the parabola through {@code ln mag} at c-1, c, c+1; returns {nu, |W|}. */
    private static double[] parabolicMax(double[] mag, int c, double step) {
        double a = Math.log(mag[c - 1]);
        double b = Math.log(mag[c]);
        double d = Math.log(mag[c + 1]);
        double den = a - 2 * b + d;
        if (!(den < 0)) {
            return new double[] {c * step, mag[c]};
        }
        double off = 0.5 * (a - d) / den;
        return new double[] {(c + off) * step, Math.exp(b - 0.25 * (a - d) * off)};
    }

    /** Golden-section search for the maximum of |W| on [nu - h, nu + h]; returns {nu, |W|}. */
    private double[] refineMax(double nu, double h) {
        double a = Math.max(0, nu - h);
        double b = nu + h;
        double g = (Math.sqrt(5) - 1) / 2;
        double x1 = b - g * (b - a);
        double x2 = a + g * (b - a);
        double f1 = transformMagnitude(x1);
        double f2 = transformMagnitude(x2);
        for (int it = 0; it < 30; it++) { // shrinks the interval to 0.618^30 = 5e-7 of its width
            if (f1 < f2) {
                a = x1;
                x1 = x2;
                f1 = f2;
                x2 = a + g * (b - a);
                f2 = transformMagnitude(x2);
            } else {
                b = x2;
                x2 = x1;
                f2 = f1;
                x1 = b - g * (b - a);
                f1 = transformMagnitude(x1);
            }
        }
        double fc = transformMagnitude(nu);
        double best = Math.max(fc, Math.max(f1, f2));
        double at = best == fc ? nu : (best == f1 ? x1 : x2);
        return new double[] {at, best};
    }

    @Override
    public String toString() {
        return shape.name() + "(" + w.length + ", " + symmetry.name().toLowerCase(Locale.ROOT) + ")";
    }
}
