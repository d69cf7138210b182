package org.foldbook.dsp.resample;

import org.foldbook.dsp.SpecialFunctions;

/**
 * Kaiser-windowed sinc interpolation kernel of half width {@code W} (input samples):
 * h(τ) = sinc(τ) · I0(β·√(1 − (τ/W)²)) / I0(β) for |τ| ≤ W, 0 outside; sinc(τ) = sin(πτ)/(πτ).
 * Not normalised (the scipy peer's kernel). At integer τ it is exactly δ(τ), so phase 0 of an
 * interpolator picks input samples unchanged. Immutable.
 */
final class KaiserSinc {

    private final int halfWidth;
    private final double beta;
    private final double i0Beta;

    KaiserSinc(int halfWidth, double beta) {
        if (halfWidth < 1) {
            throw new IllegalArgumentException("halfWidth must be >= 1, was " + halfWidth);
        }
        if (!(beta >= 0) || Double.isInfinite(beta)) {
            throw new IllegalArgumentException("beta must be a finite number >= 0, was " + beta);
        }
        this.halfWidth = halfWidth;
        this.beta = beta;
        this.i0Beta = SpecialFunctions.besselI0(beta);
    }

    int halfWidth() {
        return halfWidth;
    }

    double beta() {
        return beta;
    }

    /** h(τ). */
    double value(double tau) {
        double u = tau / halfWidth;
        double g = 1.0 - u * u;
        if (g < 0) {
            return 0.0;
        }
        return sinc(tau) * SpecialFunctions.besselI0(beta * Math.sqrt(g)) / i0Beta;
    }

    /** sin(πτ)/(πτ), exactly 0 at nonzero integers and 1 at 0. */
    static double sinc(double tau) {
        if (tau == 0) {
            return 1.0;
        }
        if (tau == Math.rint(tau)) {
            return 0.0;
        }
        double a = Math.PI * tau;
        return Math.sin(a) / a;
    }
}
