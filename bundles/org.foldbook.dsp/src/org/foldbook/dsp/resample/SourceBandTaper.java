package org.foldbook.dsp.resample;

/**
 * The edge of the source band in the exact chain filter: 1 up to 0.49·fs0, 0 from 0.51·fs0, and between
 * them 1 − C(u)/C(1) with C the integral of the bump exp(−β/(1 − x²)), x = 2u − 1, u the position across
 * the edge. The bump has derivatives of every order, so the taper's impulse response falls off faster
 * than any power of time: a kernel of a few thousand taps then holds the filter to 1e-9 (measured with
 * numpy for β = 2, 5, 8; 8 gave the shortest kernels). Symmetric about fs0/2 (T(f) + T(fs0 − f) = 1), so
 * an image of a component in the edge band and the component itself sum to its level.
 */
final class SourceBandTaper {
    static final double START = 0.49;
    static final double END = 0.51;
    private static final double BETA = 8;
    private static final int CELLS = 1 << 14;
    private static final double TOTAL;
    private static final double[] CUMULATIVE;

    static {
        double[] c = new double[CELLS + 1];
        double h = 1.0 / CELLS;
        for (int i = 0; i < CELLS; i++) {
            c[i + 1] = c[i] + simpson(i * h, (i + 1) * h, 8);   // C at the cell edges, 8 Simpson panels a cell
        }
        TOTAL = c[CELLS];
        for (int i = 0; i <= CELLS; i++) {
            c[i] /= TOTAL;
        }
        CUMULATIVE = c;
    }

    private SourceBandTaper() {
    }

    /** The bump at u ∈ [0, 1]. */
    private static double bump(double u) {
        double x = 2 * u - 1;
        double d = 1 - x * x;
        return d <= 0 ? 0 : Math.exp(-BETA / d);
    }

    private static double simpson(double a, double b, int panels) {
        double h = (b - a) / panels;
        double s = bump(a) + bump(b);
        for (int i = 1; i < panels; i++) {
            s += (i % 2 == 1 ? 4 : 2) * bump(a + i * h);
        }
        return s * h / 3;
    }

    /** T at {@code f} for a source rate {@code fs0} (both Hz). */
    static double at(double f, double fs0) {
        double u = (Math.abs(f) / fs0 - START) / (END - START);
        if (u <= 0) {
            return 1;
        }
        if (u >= 1) {
            return 0;
        }
        // cubic Hermite between table points with the exact slopes C'(u) = bump(u) / C(1)
        double p = u * CELLS;
        int i = Math.min(CELLS - 1, (int) p);
        double t = p - i;
        double h = 1.0 / CELLS;
        double m0 = bump(i * h) / TOTAL * h;
        double m1 = bump((i + 1) * h) / TOTAL * h;
        double t2 = t * t;
        double t3 = t2 * t;
        double c = (2 * t3 - 3 * t2 + 1) * CUMULATIVE[i] + (t3 - 2 * t2 + t) * m0 + (-2 * t3 + 3 * t2) * CUMULATIVE[i + 1]
                + (t3 - t2) * m1;
        return 1 - c;
    }
}
