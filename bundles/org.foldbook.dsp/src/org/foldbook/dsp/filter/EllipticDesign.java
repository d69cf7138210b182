package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.List;

/**
 * Elliptic (Cauer) low-pass prototype from Jacobi elliptic functions, the classical construction
 * (the same steps as scipy.signal.ellipap, which the tests compare against):
 * the degree equation gives the selectivity k = ωp/ωs from order, ripple and stopband attenuation;
 * zeros at ±j/(k·sn(iK/n)), poles from sn/cn/dn at a shifted argument v0.
 *
 * <p>Special functions: complete and incomplete elliptic integrals of the first kind through Carlson's
 * symmetric R_F (B. C. Carlson, "Numerical computation of real or complex elliptic integrals", Numer.
 * Algorithms 10, 1995; citation from memory), Jacobi sn/cn/dn by the descending Landen /
 * arithmetic-geometric-mean scheme (Abramowitz &amp; Stegun 16.4). Parameters are m = k², and the
 * complementary parameter m' = 1 − m is passed where m is close to 1 so nothing cancels.
 */
final class EllipticDesign {

    static final int MAX_ORDER = 16;

    private EllipticDesign() {
    }

    /** m = k² = (ωp/ωs)² solving the degree equation for the given order, ripple and attenuation. */
    static double selectivityParameter(int n, double rippleDb, double stopbandDb) {
        double epsSq = Math.expm1(0.1 * rippleDb * Math.log(10));
        double m1 = epsSq / Math.expm1(0.1 * stopbandDb * Math.log(10));
        return degree(n, m1);
    }

    static AnalogFilter lowPass(int n, double rippleDb, double stopbandDb, double cutoffHz) {
        double epsSq = Math.expm1(0.1 * rippleDb * Math.log(10));
        double eps = Math.sqrt(epsSq);
        double m1 = epsSq / Math.expm1(0.1 * stopbandDb * Math.log(10));
        double m = degree(n, m1);
        double mc = 1 - m;
        double capK = completeK(m, mc);
        // v0 from sc(u | 1 − m1) = 1/eps, i.e. u = F(atan(1/eps) | 1 − m1), complement m1 passed exactly
        double r = incompleteFComplement(Math.atan(1 / eps), m1);
        double v0 = capK * r / (n * completeK(m1, 1 - m1));
        double[] svcvdv = jacobi(v0, m); // parameter 1 − m, complement m
        double sv = svcvdv[0];
        double cv = svcvdv[1];
        double dv = svcvdv[2];

        double wc = 2 * Math.PI * cutoffHz;
        List<Complex> zeros = new ArrayList<>();
        List<Complex> poles = new ArrayList<>();
        for (int j = 1 - n % 2; j < n; j += 2) {
            double[] scd = jacobi(j * capK / n, mc);
            double s = scd[0];
            double c = scd[1];
            double d = scd[2];
            if (Math.abs(s) > 1e-14) {
                double zi = 1 / (Math.sqrt(m) * s);
                zeros.add(new Complex(0, zi));
                zeros.add(new Complex(0, -zi));
            }
            double den = 1 - (d * sv) * (d * sv);
            Complex p = new Complex(-(c * d * sv * cv) / den, -(s * dv) / den);
            if (Math.abs(p.im()) > 1e-14 * p.abs()) {
                poles.add(p);
                poles.add(p.conjugate());
            } else {
                poles.add(Complex.real(p.re()));
            }
        }
        Complex num = Complex.ONE;
        for (Complex p : poles) {
            num = num.times(p.negate());
        }
        Complex den = Complex.ONE;
        for (Complex z : zeros) {
            den = den.times(z.negate());
        }
        double k = num.dividedBy(den).re();
        if (n % 2 == 0) {
            k /= Math.sqrt(1 + epsSq);
        }
        Complex[] zs = new Complex[zeros.size()];
        for (int i = 0; i < zs.length; i++) {
            zs[i] = zeros.get(i).times(wc);
        }
        Complex[] ps = new Complex[poles.size()];
        for (int i = 0; i < ps.length; i++) {
            ps[i] = poles.get(i).times(wc);
        }
        k *= Math.pow(wc, ps.length - zs.length);

        // Attenuation extrema: passband at sn(iK/n)·ωp, stopband at ωp/(k·sn(iK/n)).
        List<Double> marks = new ArrayList<>();
        for (int i = 0; i <= n; i++) {
            double s = jacobi(i * capK / n, mc)[0];
            marks.add(s * cutoffHz);
            if (s > 1e-14) {
                marks.add(cutoffHz / (Math.sqrt(m) * s));
            }
        }
        String d = "Elliptic order " + n + ", " + rippleDb + " dB ripple to " + cutoffHz + " Hz, " + stopbandDb
                + " dB stopband from " + (cutoffHz / Math.sqrt(m)) + " Hz";
        return new AnalogFilter(d, zs, ps, k, cutoffHz, false, marks.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /** Solves the degree equation by the nome series: q = q1^(1/n), m = 16q·(Σ q^(i(i+1)) / (1 + 2Σ q^(i²)))⁴. */
    static double degree(int n, double m1) {
        double k1 = completeK(m1, 1 - m1);
        double k1p = completeK(1 - m1, m1);
        double q1 = Math.exp(-Math.PI * k1p / k1);
        double q = Math.pow(q1, 1.0 / n);
        double num = 0;
        for (int i = 0; i <= 7; i++) {
            num += Math.pow(q, i * (i + 1));
        }
        double den = 1;
        for (int i = 1; i <= 8; i++) {
            den += 2 * Math.pow(q, i * i);
        }
        return 16 * q * Math.pow(num / den, 4);
    }

    /** K(m) with the complement mc = 1 − m given separately. */
    static double completeK(double m, double mc) {
        return carlsonRF(0, mc, 1);
    }

    /** F(φ | m) for 0 ≤ φ ≤ π/2, given the complement mc = 1 − m (1 − m·sin²φ = cos²φ + mc·sin²φ). */
    static double incompleteFComplement(double phi, double mc) {
        double s = Math.sin(phi);
        double c = Math.cos(phi);
        return s * carlsonRF(c * c, c * c + mc * s * s, 1);
    }

    /** Carlson's R_F(x, y, z) by the duplication theorem (Carlson 1995, algorithm 1). */
    static double carlsonRF(double x, double y, double z) {
        for (int i = 0; i < 100; i++) {
            double a = (x + y + z) / 3;
            double dx = 1 - x / a;
            double dy = 1 - y / a;
            double dz = 1 - z / a;
            double e = Math.max(Math.abs(dx), Math.max(Math.abs(dy), Math.abs(dz)));
            if (e < 1e-4) {
                double e2 = dx * dy - dz * dz;
                double e3 = dx * dy * dz;
                return (1 - e2 / 10 + e3 / 14 + e2 * e2 / 24 - 3 * e2 * e3 / 44) / Math.sqrt(a);
            }
            double sx = Math.sqrt(x);
            double sy = Math.sqrt(y);
            double sz = Math.sqrt(z);
            double lambda = sx * sy + sx * sz + sy * sz;
            x = (x + lambda) / 4;
            y = (y + lambda) / 4;
            z = (z + lambda) / 4;
        }
        throw new IllegalStateException("Carlson R_F did not converge");
    }

    /**
     * Jacobi sn, cn, dn of real u for parameter m = 1 − mc (0 ≤ m &lt; 1), by the AGM / descending Landen
     * scheme.
     */
    static double[] jacobi(double u, double mc) {
        if (mc == 0) {
            double cn = 1 / Math.cosh(u);
            return new double[] {Math.tanh(u), cn, cn};
        }
        double[] em = new double[16];
        double[] en = new double[16];
        double a = 1;
        double dn = 1;
        double c = 1;
        double emc = mc;
        int l = 0;
        for (int i = 0; i < 16; i++) {
            l = i;
            em[i] = a;
            emc = Math.sqrt(emc);
            en[i] = emc;
            c = 0.5 * (a + emc);
            if (Math.abs(a - emc) <= 1e-9 * a) {
                break;
            }
            emc *= a;
            a = c;
        }
        u *= c;
        double sn = Math.sin(u);
        double cn = Math.cos(u);
        if (sn != 0) {
            a = cn / sn;
            c *= a;
            for (int ii = l; ii >= 0; ii--) {
                double b = em[ii];
                a *= c;
                c *= dn;
                dn = (en[ii] + a) / (b + a);
                a = c / b;
            }
            a = 1 / Math.sqrt(c * c + 1);
            sn = sn >= 0 ? a : -a;
            cn = c * sn;
        }
        return new double[] {sn, cn, dn};
    }
}
