package org.foldbook.dsp;

/** Special functions shared by the window and filter designs. */
public final class SpecialFunctions {
    private SpecialFunctions() {
    }

    /** 1/k², so the series needs no division (kernel tables evaluate I0 millions of times). */
    private static final double[] INV_K2 = new double[1000];

    static {
        for (int k = 1; k < INV_K2.length; k++) {
            INV_K2[k] = 1.0 / ((double) k * k);
        }
    }

    /**
     * Modified Bessel function of the first kind, order 0 (Kaiser windows and kernels):
     * I0(x) = Σ_k ((x/2)^k / k!)², summed until a term no longer changes the sum. All terms are
     * positive, so there is no cancellation: the relative error is a few ulps for the |x| < 700 that a
     * Kaiser β can take (I0 overflows a double near 713).
     */
    public static double besselI0(double x) {
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
