package org.foldbook.dsp.resample;

/** Modified Bessel function of the first kind, order 0, for Kaiser windows. */
final class Bessel {
    private Bessel() {
    }

    /** 1/k², so the series needs no division (tables of kernels evaluate I0 millions of times). */
    private static final double[] INV_K2 = new double[500];

    static {
        for (int k = 1; k < INV_K2.length; k++) {
            INV_K2[k] = 1.0 / ((double) k * k);
        }
    }

    /**
     * I0(x) = Σ_k ((x/2)^k / k!)², summed until a term no longer changes the sum. All terms are positive,
     * so there is no cancellation: relative error is a few ulps for the |x| ≤ 50 that Kaiser windows use
     * (β ≤ ~15 in practice).
     */
    static double i0(double x) {
        double q = 0.25 * x * x;
        double term = 1.0;
        double sum = 1.0;
        for (int k = 1; k < INV_K2.length; k++) {
            term *= q * INV_K2[k];
            double next = sum + term;
            if (next == sum) {
                break;
            }
            sum = next;
        }
        return sum;
    }
}
