package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.foldbook.dsp.Check;

/**
 * A rational analog transfer function in zeros/poles/gain form,
 * {@code H(s) = k · Π(s − zᵢ) / Π(s − pⱼ)} with s in rad/s, as produced by {@link AnalogLowPass}.
 * Immutable. Zeros and poles come in complex-conjugate pairs (a real system), poles lie in the open
 * left half-plane (stable), and there are no more zeros than poles (proper).
 *
 * <p>{@link #cutoffHz()} is the frequency the design was normalised to (its meaning depends on the
 * family, see {@link AnalogLowPass}); a digital realisation pre-warps there.
 */
public final class AnalogFilter implements FrequencyResponse {

    private static final double PAIR_TOL = 1e-9;

    private final String description;
    private final Complex[] zeros;
    private final Complex[] poles;
    private final double gain;
    private final double cutoffHz;
    private final boolean monotone;
    private final double[] extraLandmarksHz;

    /**
     * @param description    human-readable name, e.g. "Butterworth order 4, −3 dB at 1000 Hz"
     * @param zeros          finite zeros in rad/s (conjugate pairs)
     * @param poles          poles in rad/s (conjugate pairs, Re &lt; 0)
     * @param gain           k, real and non-zero
     * @param cutoffHz       design normalisation frequency, &gt; 0
     * @param monotone       whether the attenuation is known not to decrease with frequency
     * @param extraLandmarksHz frequencies of known attenuation extrema (ripple peaks), may be empty
     */
    public AnalogFilter(String description, Complex[] zeros, Complex[] poles, double gain, double cutoffHz,
            boolean monotone, double[] extraLandmarksHz) {
        this.description = description == null ? "analog filter" : description;
        this.zeros = checkRoots("zeros", zeros, false);
        this.poles = checkRoots("poles", poles, true);
        if (poles.length < 1) {
            throw new IllegalArgumentException("poles must hold at least one pole, was empty");
        }
        if (zeros.length > poles.length) {
            throw new IllegalArgumentException("zeros: a proper filter has no more zeros than poles, was "
                    + zeros.length + " zeros for " + poles.length + " poles");
        }
        Check.finite("gain", gain);
        if (gain == 0) {
            throw new IllegalArgumentException("gain must be non-zero, was 0");
        }
        this.gain = gain;
        this.cutoffHz = Check.positive("cutoffHz", cutoffHz);
        this.monotone = monotone;
        this.extraLandmarksHz = extraLandmarksHz == null ? new double[0] : extraLandmarksHz.clone();
    }

    private static Complex[] checkRoots(String name, Complex[] roots, boolean mustBeStable) {
        if (roots == null) {
            throw new IllegalArgumentException(name + " must not be null");
        }
        for (int i = 0; i < roots.length; i++) {
            Complex r = roots[i];
            if (r == null || !Double.isFinite(r.re()) || !Double.isFinite(r.im())) {
                throw new IllegalArgumentException(name + "[" + i + "] must be a finite complex number, was " + r);
            }
            if (mustBeStable && !(r.re() < 0)) {
                throw new IllegalArgumentException(name + "[" + i + "] must lie in the left half-plane (Re < 0), was " + r);
            }
        }
        ConjugateSplit.of(name, roots); // throws if not in conjugate pairs
        return roots.clone();
    }

    public String description() {
        return description;
    }

    /** The finite zeros in rad/s (a copy). */
    public Complex[] zeros() {
        return zeros.clone();
    }

    /** The poles in rad/s (a copy). */
    public Complex[] poles() {
        return poles.clone();
    }

    public double gain() {
        return gain;
    }

    public int order() {
        return poles.length;
    }

    /** The frequency the design is normalised to (Hz); the pre-warp frequency of a digital realisation. */
    public double cutoffHz() {
        return cutoffHz;
    }

    /** The complex response H(j·2πf). */
    public Complex response(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        Complex s = new Complex(0, 2 * Math.PI * frequencyHz);
        Complex h = Complex.real(gain);
        // Interleave zeros and poles so that high orders neither overflow nor underflow.
        for (int i = 0; i < poles.length; i++) {
            Complex den = s.minus(poles[i]);
            Complex num = i < zeros.length ? s.minus(zeros[i]) : Complex.ONE;
            h = h.times(num.dividedBy(den));
        }
        return h;
    }

    @Override
    public double magnitude(double frequencyHz) {
        return response(frequencyHz).abs();
    }

    @Override
    public double attenuationDb(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double w = 2 * Math.PI * frequencyHz;
        // Sum of logarithms: stays exact far into the stopband where |H| would underflow.
        double db = -20 * Math.log10(Math.abs(gain));
        for (Complex z : zeros) {
            db -= 20 * Math.log10(Math.hypot(z.re(), w - z.im()));
        }
        for (Complex p : poles) {
            db += 20 * Math.log10(Math.hypot(p.re(), w - p.im()));
        }
        return db;
    }

    /**
     * Phase of H(j·2πf) in radians, continuous in f (the sum of the factors' angles, not wrapped to
     * ±π); a zero on the jω axis makes it jump by π there, as the physical phase does. At f = 0 the
     * phase of a low-pass is 0 (or π for a negative gain).
     */
    public double phaseRad(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double w = 2 * Math.PI * frequencyHz;
        double phi = gain < 0 ? Math.PI : 0;
        for (Complex z : zeros) {
            phi += Math.atan2(w - z.im(), -z.re());
        }
        for (Complex p : poles) {
            phi -= Math.atan2(w - p.im(), -p.re());
        }
        return phi;
    }

    /** Group delay −dφ/dω in seconds, in closed form from the poles and zeros. */
    public double groupDelaySeconds(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double w = 2 * Math.PI * frequencyHz;
        double tau = 0;
        for (Complex p : poles) {
            double d = w - p.im();
            tau += -p.re() / (d * d + p.re() * p.re());
        }
        for (Complex z : zeros) {
            double d = w - z.im();
            double den = d * d + z.re() * z.re();
            if (den > 0) {
                tau -= -z.re() / den;
            }
        }
        return tau;
    }

    /**
     * Coefficients of the denominator polynomial Π(s − pⱼ), highest power first, in rad/s, as
     * handbook tables print them (for a prototype normalised to 1 rad/s, pass {@code scaleHz} =
     * cutoff so that s is measured in units of 2π·cutoff).
     */
    public double[] denominatorCoefficients(double scaleHz) {
        Check.positive("scaleHz", scaleHz);
        double w = 2 * Math.PI * scaleHz;
        Complex[] c = {Complex.ONE};
        for (Complex p : poles) {
            Complex q = p.times(1 / w);
            Complex[] n = new Complex[c.length + 1];
            Arrays.fill(n, Complex.ZERO);
            for (int i = 0; i < c.length; i++) {
                n[i] = n[i].plus(c[i]);
                n[i + 1] = n[i + 1].minus(c[i].times(q));
            }
            c = n;
        }
        double[] out = new double[c.length];
        for (int i = 0; i < c.length; i++) {
            out[i] = c[i].re();
        }
        return out;
    }

    @Override
    public double[] landmarksHz(double upToHz) {
        List<Double> l = new ArrayList<>();
        l.add(cutoffHz);
        for (Complex p : poles) {
            l.add(Math.abs(p.im()) / (2 * Math.PI));
            l.add(p.abs() / (2 * Math.PI));
        }
        for (Complex z : zeros) {
            l.add(Math.abs(z.im()) / (2 * Math.PI));
        }
        for (double e : extraLandmarksHz) {
            l.add(e);
        }
        return l.stream().mapToDouble(Double::doubleValue).filter(f -> f >= 0 && f <= upToHz).sorted().distinct()
                .toArray();
    }

    @Override
    public boolean attenuationNonDecreasing() {
        return monotone;
    }

    /**
     * The digital realisation at {@code sampleRateHz} by the bilinear transform pre-warped at
     * {@link #cutoffHz()}; see {@link DigitalRealisation}.
     */
    public SecondOrderSections toDigital(double sampleRateHz) {
        return DigitalRealisation.of(this, sampleRateHz);
    }

    @Override
    public String toString() {
        return description;
    }

    /** Roots split into upper-half-plane representatives of conjugate pairs and real roots. */
    record ConjugateSplit(List<Complex> pairs, List<Double> reals) {
        static ConjugateSplit of(String name, Complex[] roots) {
            List<Complex> upper = new ArrayList<>();
            List<Complex> lower = new ArrayList<>();
            List<Double> reals = new ArrayList<>();
            for (Complex r : roots) {
                if (Math.abs(r.im()) <= PAIR_TOL * Math.max(1, r.abs())) {
                    reals.add(r.re());
                } else if (r.im() > 0) {
                    upper.add(r);
                } else {
                    lower.add(r);
                }
            }
            if (upper.size() != lower.size()) {
                throw new IllegalArgumentException(name + " must come in complex-conjugate pairs, was " + Arrays.toString(roots));
            }
            boolean[] used = new boolean[lower.size()];
            for (Complex u : upper) {
                int best = -1;
                double bestD = Double.POSITIVE_INFINITY;
                for (int j = 0; j < lower.size(); j++) {
                    if (!used[j]) {
                        double d = u.minus(lower.get(j).conjugate()).abs();
                        if (d < bestD) {
                            bestD = d;
                            best = j;
                        }
                    }
                }
                if (bestD > 1e-7 * Math.max(1, u.abs())) {
                    throw new IllegalArgumentException(name + " must come in complex-conjugate pairs; no partner for " + u);
                }
                used[best] = true;
            }
            return new ConjugateSplit(upper, reals);
        }
    }
}
