package org.foldbook.dsp.filter;

/**
 * A complex number, as used for the zeros and poles of filter models (s-plane in rad/s, z-plane
 * dimensionless). Only the few operations the filter code needs.
 */
public record Complex(double re, double im) {

    public static final Complex ZERO = new Complex(0, 0);
    public static final Complex ONE = new Complex(1, 0);

    public static Complex real(double re) {
        return new Complex(re, 0);
    }

    public Complex plus(Complex o) {
        return new Complex(re + o.re, im + o.im);
    }

    public Complex minus(Complex o) {
        return new Complex(re - o.re, im - o.im);
    }

    public Complex times(Complex o) {
        return new Complex(re * o.re - im * o.im, re * o.im + im * o.re);
    }

    public Complex times(double f) {
        return new Complex(re * f, im * f);
    }

    public Complex dividedBy(Complex o) {
        // Smith's algorithm: avoids overflow for large |o|.
        if (Math.abs(o.re) >= Math.abs(o.im)) {
            double r = o.im / o.re;
            double d = o.re + o.im * r;
            return new Complex((re + im * r) / d, (im - re * r) / d);
        }
        double r = o.re / o.im;
        double d = o.re * r + o.im;
        return new Complex((re * r + im) / d, (im * r - re) / d);
    }

    public Complex conjugate() {
        return new Complex(re, -im);
    }

    public Complex negate() {
        return new Complex(-re, -im);
    }

    public double abs() {
        return Math.hypot(re, im);
    }

    public double arg() {
        return Math.atan2(im, re);
    }

    /** True when the imaginary part is negligible against the modulus. */
    public boolean isReal(double relTol) {
        return Math.abs(im) <= relTol * Math.max(1e-300, abs());
    }

    @Override
    public String toString() {
        return im >= 0 ? re + "+" + im + "j" : re + "" + im + "j";
    }
}
