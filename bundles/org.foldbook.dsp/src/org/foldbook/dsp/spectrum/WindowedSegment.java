package org.foldbook.dsp.spectrum;

import org.foldbook.dsp.window.Window;

/**
 * Detrend fused with windowing: {@code buf[j] = (x[start+j] - trend(j)) * w[j]}, in two passes over the
 * segment (one to fit the trend, whose sum also reveals non-finite samples, one to write), no temporary
 * array.
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
                for (int j = 0; j < n; j++) {
                    buf[j] = x[start + j] * w[j];
                }
                requireFinite(sum(x, start), x, start);
            }
            case CONSTANT -> {
                double mean = sum(x, start) / n;
                requireFinite(mean, x, start);
                for (int j = 0; j < n; j++) {
                    buf[j] = (x[start + j] - mean) * w[j];
                }
            }
            case LINEAR -> {
                double mean = sum(x, start) / n;
                double slope = sumT2 > 0 ? centredMoment(x, start) / sumT2 : 0.0;
                requireFinite(mean + slope, x, start);
                for (int j = 0; j < n; j++) {
                    buf[j] = (x[start + j] - mean - slope * (j - tCentre)) * w[j];
                }
            }
            default -> throw new IllegalStateException(String.valueOf(detrend));
        }
    }

    /**
     * {@code sum x[start .. start+n)} with eight partial sums: a single running sum is one long chain of
     * dependent additions (the JIT does not reorder floating-point adds), eight chains keep both adders
     * busy. A NaN or infinity anywhere in the segment makes the result non-finite.
     */
    private double sum(double[] x, int start) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        double s4 = 0;
        double s5 = 0;
        double s6 = 0;
        double s7 = 0;
        int j = start;
        int end = start + n;
        for (; j + 7 < end; j += 8) {
            s0 += x[j];
            s1 += x[j + 1];
            s2 += x[j + 2];
            s3 += x[j + 3];
            s4 += x[j + 4];
            s5 += x[j + 5];
            s6 += x[j + 6];
            s7 += x[j + 7];
        }
        for (; j < end; j++) {
            s0 += x[j];
        }
        return ((s0 + s1) + (s2 + s3)) + ((s4 + s5) + (s6 + s7));
    }

    /** {@code sum (j - (n-1)/2) x[start+j]}, four partial sums. */
    private double centredMoment(double[] x, int start) {
        double s0 = 0;
        double s1 = 0;
        double s2 = 0;
        double s3 = 0;
        int j = 0;
        for (; j + 3 < n; j += 4) {
            double t = j - tCentre;
            s0 += t * x[start + j];
            s1 += (t + 1) * x[start + j + 1];
            s2 += (t + 2) * x[start + j + 2];
            s3 += (t + 3) * x[start + j + 3];
        }
        for (; j < n; j++) {
            s0 += (j - tCentre) * x[start + j];
        }
        return (s0 + s1) + (s2 + s3);
    }

    /** {@code value} is a sum over the segment: non-finite iff a sample is, or the sum overflows. */
    private void requireFinite(double value, double[] x, int start) {
        if (!Double.isFinite(value)) {
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
