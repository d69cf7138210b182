package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.dsp.Check;

/**
 * Factories for analog anti-alias low-pass models as {@link AnalogFilter} (zeros/poles/gain in rad/s).
 * What "cutoff" means per family:
 * <ul>
 * <li>{@link #rc} and {@link #butterworth}: −3.01 dB at the cutoff (|H|² = 1/2).</li>
 * <li>{@link #bessel}: as the chosen {@link BesselNormalization} says.</li>
 * <li>{@link #chebyshev1}: the passband edge, where the attenuation last equals the ripple.</li>
 * <li>{@link #elliptic}: the passband edge, as for Chebyshev I.</li>
 * </ul>
 * These match scipy.signal's butter/bessel/cheby1/ellip with {@code analog=True} and Wn = 2π·cutoff.
 */
public final class AnalogLowPass {

    /** Largest order offered for Butterworth and Chebyshev I. */
    public static final int MAX_ORDER = 32;
    /** Largest Bessel order: beyond it the polynomial roots lose accuracy in double precision. */
    public static final int MAX_BESSEL_ORDER = 16;

    private AnalogLowPass() {
    }

    /** First-order RC low-pass, H(s) = ωc/(s + ωc). */
    public static AnalogFilter rc(double cutoffHz) {
        Check.positive("cutoffHz", cutoffHz);
        double wc = 2 * Math.PI * cutoffHz;
        return new AnalogFilter("RC first order, -3 dB at " + cutoffHz + " Hz", new Complex[0],
                new Complex[] {Complex.real(-wc)}, wc, cutoffHz, true, null);
    }

    /** Butterworth of {@code order}: maximally flat, |H|² = 1/(1 + (f/fc)^(2n)). */
    public static AnalogFilter butterworth(int order, double cutoffHz) {
        checkOrder(order, MAX_ORDER);
        Check.positive("cutoffHz", cutoffHz);
        double wc = 2 * Math.PI * cutoffHz;
        Complex[] p = new Complex[order];
        for (int i = 0; i < order; i++) {
            // p = −exp(jπm/(2n)), m = −n+1, −n+3, …, n−1 (poles on a circle in the left half-plane)
            int m = -order + 1 + 2 * i;
            double a = Math.PI * m / (2.0 * order);
            p[i] = new Complex(-Math.cos(a) * wc, -Math.sin(a) * wc);
        }
        if (order % 2 == 1) {
            p[order / 2] = Complex.real(-wc); // exactly real
        }
        return new AnalogFilter("Butterworth order " + order + ", -3 dB at " + cutoffHz + " Hz", new Complex[0], p,
                productOfNegated(p), cutoffHz, true, null);
    }

    /**
     * Bessel (Thomson) low-pass: maximally flat group delay. The delay-normalised prototype's
     * denominator is the reverse Bessel polynomial θₙ(s) = Σ aₖ sᵏ, aₖ = (2n−k)! / (2ⁿ⁻ᵏ k! (n−k)!);
     * the other normalisations rescale its roots.
     */
    public static AnalogFilter bessel(int order, double cutoffHz, BesselNormalization normalization) {
        checkOrder(order, MAX_BESSEL_ORDER);
        Check.positive("cutoffHz", cutoffHz);
        if (normalization == null) {
            throw new IllegalArgumentException("normalization must be one of DELAY, PHASE, MAGNITUDE, was null");
        }
        double[] a = new double[order + 1];
        a[order] = 1;
        for (int k = order; k >= 1; k--) {
            a[k - 1] = a[k] * (2.0 * order - k + 1) * k / (2.0 * (order - k + 1));
        }
        // Substitute s = c·x with c = a0^(1/n): monic polynomial with constant 1, roots near |x| = 1,
        // well conditioned. Its roots are the phase-normalised poles.
        double c = Math.pow(a[0], 1.0 / order);
        double[] b = new double[order + 1];
        for (int k = 0; k <= order; k++) {
            b[k] = a[k] * Math.pow(c, k - order);
        }
        Complex[] x = tidyConjugates(PolynomialRoots.of(b));
        double scale = switch (normalization) {
            case PHASE -> 1.0;
            case DELAY -> c;
            case MAGNITUDE -> 1.0 / halfPowerFrequency(x);
        };
        double wc = 2 * Math.PI * cutoffHz;
        Complex[] p = new Complex[order];
        for (int i = 0; i < order; i++) {
            p[i] = x[i].times(scale * wc);
        }
        String norm = switch (normalization) {
            case DELAY -> "delay 1/(2π·" + cutoffHz + " Hz) at DC";
            case PHASE -> "asymptote of a Butterworth at " + cutoffHz + " Hz";
            case MAGNITUDE -> "-3 dB at " + cutoffHz + " Hz";
        };
        return new AnalogFilter("Bessel order " + order + ", " + norm, new Complex[0], p, productOfNegated(p),
                cutoffHz, true, null);
    }

    /**
     * Chebyshev type I: |H|² = 1/(1 + ε²Tₙ²(f/fc)), ε = √(10^(r/10) − 1), equiripple of
     * {@code rippleDb} in the passband [0, fc], monotone above.
     */
    public static AnalogFilter chebyshev1(int order, double rippleDb, double cutoffHz) {
        checkOrder(order, MAX_ORDER);
        Check.positive("rippleDb", rippleDb);
        Check.positive("cutoffHz", cutoffHz);
        double eps = Math.sqrt(Math.expm1(rippleDb * Math.log(10) / 10));
        double mu = asinh(1 / eps) / order;
        double wc = 2 * Math.PI * cutoffHz;
        Complex[] p = new Complex[order];
        for (int i = 0; i < order; i++) {
            int m = -order + 1 + 2 * i;
            double theta = Math.PI * m / (2.0 * order);
            // p = −sinh(μ + jθ)
            p[i] = new Complex(-Math.sinh(mu) * Math.cos(theta) * wc, -Math.cosh(mu) * Math.sin(theta) * wc);
        }
        if (order % 2 == 1) {
            p[order / 2] = Complex.real(p[order / 2].re());
        }
        double k = productOfNegated(p);
        if (order % 2 == 0) {
            k /= Math.sqrt(1 + eps * eps); // even order: DC sits at the bottom of the ripple
        }
        List<Double> ripplePeaks = new ArrayList<>();
        for (int m = 0; m <= order; m++) {
            ripplePeaks.add(cutoffHz * Math.cos(m * Math.PI / order));
            if (m >= 1) {
                ripplePeaks.add(cutoffHz * Math.cos((2 * m - 1) * Math.PI / (2.0 * order)));
            }
        }
        return new AnalogFilter("Chebyshev I order " + order + ", " + rippleDb + " dB ripple to " + cutoffHz + " Hz",
                new Complex[0], p, k, cutoffHz, false,
                ripplePeaks.stream().mapToDouble(Double::doubleValue).filter(f -> f >= 0).toArray());
    }

    /**
     * Elliptic (Cauer): equiripple {@code rippleDb} in the passband [0, fc] and at least
     * {@code stopbandDb} attenuation in the stopband, the steepest transition for the order. The
     * stopband edge follows from order, ripple and attenuation (see {@link #ellipticStopbandEdgeHz}).
     */
    public static AnalogFilter elliptic(int order, double rippleDb, double stopbandDb, double cutoffHz) {
        checkOrder(order, EllipticDesign.MAX_ORDER);
        Check.positive("rippleDb", rippleDb);
        Check.positive("stopbandDb", stopbandDb);
        Check.positive("cutoffHz", cutoffHz);
        if (!(stopbandDb > rippleDb)) {
            throw new IllegalArgumentException("stopbandDb must exceed rippleDb (" + rippleDb + "), was " + stopbandDb);
        }
        return EllipticDesign.lowPass(order, rippleDb, stopbandDb, cutoffHz);
    }

    /** The stopband edge (Hz) of {@link #elliptic} with the same arguments: where the attenuation first reaches stopbandDb. */
    public static double ellipticStopbandEdgeHz(int order, double rippleDb, double stopbandDb, double cutoffHz) {
        elliptic(order, rippleDb, stopbandDb, cutoffHz); // validates
        return cutoffHz / Math.sqrt(EllipticDesign.selectivityParameter(order, rippleDb, stopbandDb));
    }

    static void checkOrder(int order, int max) {
        if (order < 1 || order > max) {
            throw new IllegalArgumentException("order must lie in [1, " + max + "], was " + order);
        }
    }

    static double productOfNegated(Complex[] p) {
        Complex k = Complex.ONE;
        for (Complex q : p) {
            k = k.times(q.negate());
        }
        return k.re();
    }

    private static double asinh(double x) {
        return Math.log(x + Math.sqrt(x * x + 1));
    }

    /** Makes near-real roots exactly real and conjugate partners exact mirrors. */
    static Complex[] tidyConjugates(Complex[] r) {
        Complex[] out = r.clone();
        boolean[] done = new boolean[r.length];
        for (int i = 0; i < r.length; i++) {
            if (done[i]) {
                continue;
            }
            if (Math.abs(r[i].im()) <= 1e-10 * r[i].abs()) {
                out[i] = Complex.real(r[i].re());
                done[i] = true;
                continue;
            }
            int best = -1;
            double bd = Double.POSITIVE_INFINITY;
            for (int j = 0; j < r.length; j++) {
                if (j != i && !done[j]) {
                    double d = r[i].minus(r[j].conjugate()).abs();
                    if (d < bd) {
                        bd = d;
                        best = j;
                    }
                }
            }
            Complex avg = new Complex((r[i].re() + r[best].re()) / 2, (Math.abs(r[i].im()) + Math.abs(r[best].im())) / 2);
            out[i] = avg;
            out[best] = avg.conjugate();
            done[i] = done[best] = true;
        }
        return out;
    }

    /** ω (normalised units) where the all-pole response with DC gain 1 and these poles is at |H|² = 1/2. */
    private static double halfPowerFrequency(Complex[] x) {
        double lo = 1e-3;
        double hi = 1e3;
        for (int i = 0; i < 200; i++) {
            double mid = Math.sqrt(lo * hi);
            double db = 0;
            for (Complex p : x) {
                db += 10 * Math.log10((p.re() * p.re() + (mid - p.im()) * (mid - p.im())) / (p.abs() * p.abs()));
            }
            if (db < 10 * Math.log10(2)) {
                lo = mid;
            } else {
                hi = mid;
            }
            if (hi / lo - 1 < 1e-15) {
                break;
            }
        }
        return Math.sqrt(lo * hi);
    }
}
