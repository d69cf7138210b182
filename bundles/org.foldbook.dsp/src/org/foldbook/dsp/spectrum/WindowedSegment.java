package org.foldbook.dsp.spectrum;

import org.foldbook.dsp.window.Window;

/**
 * Detrend fused with windowing: {@code buf[j] = (x[start+j] - trend(j)) * w[j]}, in two passes over the
 * segment (one to fit the trend and detect non-finite samples, one to write), no temporary array.
 * Shared by {@link Welch} and {@link AmplitudeEstimator}; immutable.
 */
final class WindowedSegment {
    private final double[] w;
    private final int n;
    private final Detrend detrend;
    // Linear trend in t_j = j - (n-1)/2, which makes the least-squares mean and slope independent.
    private final double tCentre;
    private final double sumT2;

    WindowedSegment(Window window, Detrend detrend) {
        this.w = window.toArray();
        this.n = w.length;
        this.detrend = detrend;
        this.tCentre = (n - 1) / 2.0;
        double s = 0;
        for (int j = 0; j < n; j++) {
            double t = j - tCentre;
            s += t * t;
        }
        this.sumT2 = s;
    }

    /** Writes {@code buf[0..n)}; throws naming {@code x[i]} if a sample of the segment is not finite. */
    void prepare(double[] x, int start, double[] buf) {
        switch (detrend) {
            case NONE -> {
                double probe = 0;
                for (int j = 0; j < n; j++) {
                    double v = x[start + j];
                    probe += v * 0.0; // 0 for finite v, NaN otherwise
                    buf[j] = v * w[j];
                }
                requireFinite(probe, x, start);
            }
            case CONSTANT -> {
                double sum = 0;
                for (int j = 0; j < n; j++) {
                    sum += x[start + j];
                }
                double mean = sum / n;
                requireFinite(mean * 0.0, x, start);
                for (int j = 0; j < n; j++) {
                    buf[j] = (x[start + j] - mean) * w[j];
                }
            }
            case LINEAR -> {
                double sum = 0;
                double sumTx = 0;
                for (int j = 0; j < n; j++) {
                    double v = x[start + j];
                    sum += v;
                    sumTx += (j - tCentre) * v;
                }
                double mean = sum / n;
                double slope = sumT2 > 0 ? sumTx / sumT2 : 0.0;
                requireFinite(mean * 0.0 + slope * 0.0, x, start);
                for (int j = 0; j < n; j++) {
                    buf[j] = (x[start + j] - mean - slope * (j - tCentre)) * w[j];
                }
            }
            default -> throw new IllegalStateException(String.valueOf(detrend));
        }
    }

    private void requireFinite(double probe, double[] x, int start) {
        if (probe != 0) {
            for (int j = start; j < start + n; j++) {
                if (!Double.isFinite(x[j])) {
                    throw new IllegalArgumentException("x[" + j + "] must be finite, was " + x[j]);
                }
            }
            throw new IllegalArgumentException("x[" + start + " .. " + (start + n - 1)
                    + "] is too large to sum in double precision");
        }
    }
}
