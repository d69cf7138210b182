package org.foldbook.dsp.window;

import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.SpecialFunctions;

/**
 * A window function independent of its length; {@link #create(int, Symmetry)} samples it.
 *
 * <p>Cosine-sum shapes are {@code w(z) = sum_k (-1)^k a_k cos(k z)}, {@code z = 2 pi j / M},
 * {@code j = 0 .. n-1}, with {@code M = n} (periodic) or {@code M = n - 1} (symmetric). Coefficients:
 * <ul>
 * <li>{@link #HANN} 0.5, 0.5; {@link #HAMMING} 0.54, 0.46 (F. J. Harris, Proc. IEEE 66(1), 1978);</li>
 * <li>{@link #BLACKMAN_HARRIS_4} 0.35875, 0.48829, 0.14128, 0.01168: Harris 1978's 4-term -92 dB window;</li>
 * <li>{@link #FLAT_TOP} 0.21557895, 0.41663158, 0.277263158, 0.083578947, 0.006947368: the flat top of
 * {@code scipy.signal.windows.flattop} (G. D'Antona, A. Ferrero, <i>Digital Signal Processing for
 * Measurement Systems</i>, Springer 2006, p. 70), also MATLAB's {@code flattopwin};</li>
 * <li>{@link #HFT95} 1, 1.9383379, 1.3045202, 0.4028270, 0.0350665: Heinzel, Rüdiger, Schilling,
 * "Spectrum and spectral density estimation by the DFT", MPI für Gravitationsphysik 2002, window HFT95
 * (-95 dB sidelobes, 0.0044 dB flatness).</li>
 * </ul>
 * {@link #kaiser(double)}: {@code w = I0(beta sqrt(1 - (2j/M - 1)^2)) / I0(beta)} (J. F. Kaiser 1974).
 */
public final class WindowShape {
    public static final WindowShape RECTANGULAR = new WindowShape("rectangular", new double[] {1.0}, Double.NaN);
    public static final WindowShape HANN = new WindowShape("hann", new double[] {0.5, 0.5}, Double.NaN);
    public static final WindowShape HAMMING = new WindowShape("hamming", new double[] {0.54, 0.46}, Double.NaN);
    public static final WindowShape BLACKMAN_HARRIS_4 = new WindowShape("blackman-harris-4",
            new double[] {0.35875, 0.48829, 0.14128, 0.01168}, Double.NaN);
    public static final WindowShape FLAT_TOP = new WindowShape("flat-top",
            new double[] {0.21557895, 0.41663158, 0.277263158, 0.083578947, 0.006947368}, Double.NaN);
    public static final WindowShape HFT95 = new WindowShape("hft95",
            new double[] {1.0, 1.9383379, 1.3045202, 0.4028270, 0.0350665}, Double.NaN);

    private final String name;
    private final double[] cosineTerms; // null for Kaiser
    private final double beta;

    private WindowShape(String name, double[] cosineTerms, double beta) {
        this.name = name;
        this.cosineTerms = cosineTerms;
        this.beta = beta;
    }

    /**
     * Kaiser window with shape parameter {@code 0 <= beta <= 700} (0 is rectangular; I0 overflows a double
     * beyond about 710, and practical windows use beta below 20).
     */
    public static WindowShape kaiser(double beta) {
        Check.inRange("beta", beta, 0, 700);
        return new WindowShape("kaiser(" + beta + ")", null, beta);
    }

    /** Short name, e.g. {@code "hann"}, {@code "kaiser(8.6)"}. */
    public String name() {
        return name;
    }

    /** The Kaiser beta, or NaN for cosine-sum shapes. */
    public double kaiserBeta() {
        return beta;
    }

    /** The cosine-sum coefficients {@code a_k} (copy), or an empty array for a Kaiser window. */
    public double[] cosineCoefficients() {
        return cosineTerms == null ? new double[0] : cosineTerms.clone();
    }

    /** Samples this shape to a window of length {@code n >= 1}. */
    public Window create(int n, Symmetry symmetry) {
        Check.atLeast("n", n, 1);
        Objects.requireNonNull(symmetry, "symmetry");
        return new Window(this, symmetry, sample(n, symmetry));
    }

    /** {@code create(n, Symmetry.PERIODIC)}: the form for spectral analysis. */
    public Window periodic(int n) {
        return create(n, Symmetry.PERIODIC);
    }

    /** {@code create(n, Symmetry.SYMMETRIC)}. */
    public Window symmetric(int n) {
        return create(n, Symmetry.SYMMETRIC);
    }

    private double[] sample(int n, Symmetry symmetry) {
        double[] w = new double[n];
        if (n == 1) {
            w[0] = 1.0; // as scipy: a single sample is 1 for every shape
            return w;
        }
        int m = symmetry == Symmetry.PERIODIC ? n : n - 1;
        if (cosineTerms != null) {
            for (int j = 0; j < n; j++) {
                double z = 2 * Math.PI * j / m;
                double v = 0;
                for (int k = 0; k < cosineTerms.length; k++) {
                    double c = cosineTerms[k] * Math.cos(k * z);
                    v += (k & 1) == 0 ? c : -c;
                }
                w[j] = v;
            }
        } else {
            double norm = SpecialFunctions.besselI0(beta);
            for (int j = 0; j < n; j++) {
                double r = 2.0 * j / m - 1.0;
                w[j] = SpecialFunctions.besselI0(beta * Math.sqrt(Math.max(0.0, 1.0 - r * r))) / norm;
            }
        }
        return w;
    }

    @Override
    public String toString() {
        return name;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof WindowShape s && s.name.equals(name);
    }

    @Override
    public int hashCode() {
        return name.hashCode();
    }
}
