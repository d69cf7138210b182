package org.foldbook.dsp.filter;

/**
 * All complex roots of a real polynomial by the Durand–Kerner (Weierstrass) simultaneous iteration,
 * each root then polished by Newton steps on the original polynomial. Meant for the small, well
 * scaled polynomials of filter prototypes (degree ≤ 25, roots of similar modulus).
 */
final class PolynomialRoots {
    private PolynomialRoots() {
    }

    /**
     * @param ascending coefficients c0 + c1·x + … + cn·xⁿ, cn ≠ 0
     * @return the n roots
     */
    static Complex[] of(double[] ascending) {
        int n = ascending.length - 1;
        double lead = ascending[n];
        if (n < 1 || lead == 0) {
            throw new IllegalArgumentException("polynomial must have degree >= 1 and a non-zero leading coefficient");
        }
        double[] c = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            c[i] = ascending[i] / lead;
        }
        // Start on a circle of the geometric-mean root radius, angles off the real axis.
        double radius = Math.pow(Math.abs(c[0]), 1.0 / n);
        if (!(radius > 0)) {
            radius = 1;
        }
        double[] re = new double[n];
        double[] im = new double[n];
        for (int k = 0; k < n; k++) {
            double a = 2 * Math.PI * k / n + 0.4;
            re[k] = radius * Math.cos(a);
            im[k] = radius * Math.sin(a);
        }
        for (int iter = 0; iter < 2000; iter++) {
            double change = 0;
            for (int k = 0; k < n; k++) {
                Complex x = new Complex(re[k], im[k]);
                Complex num = evaluate(c, x);
                Complex den = Complex.ONE;
                for (int j = 0; j < n; j++) {
                    if (j != k) {
                        den = den.times(x.minus(new Complex(re[j], im[j])));
                    }
                }
                Complex step = num.dividedBy(den);
                re[k] -= step.re();
                im[k] -= step.im();
                change = Math.max(change, step.abs() / Math.max(radius, x.abs()));
            }
            if (change < 1e-15) {
                break;
            }
        }
        Complex[] roots = new Complex[n];
        for (int k = 0; k < n; k++) {
            Complex x = new Complex(re[k], im[k]);
            for (int p = 0; p < 3; p++) {
                Complex[] fd = evaluateWithDerivative(c, x);
                if (fd[1].abs() == 0) {
                    break;
                }
                x = x.minus(fd[0].dividedBy(fd[1]));
            }
            roots[k] = x;
        }
        return roots;
    }

    private static Complex evaluate(double[] c, Complex x) {
        Complex v = Complex.real(c[c.length - 1]);
        for (int i = c.length - 2; i >= 0; i--) {
            v = v.times(x).plus(Complex.real(c[i]));
        }
        return v;
    }

    private static Complex[] evaluateWithDerivative(double[] c, Complex x) {
        Complex v = Complex.real(c[c.length - 1]);
        Complex d = Complex.ZERO;
        for (int i = c.length - 2; i >= 0; i--) {
            d = d.times(x).plus(v);
            v = v.times(x).plus(Complex.real(c[i]));
        }
        return new Complex[] {v, d};
    }
}
