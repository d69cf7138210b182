package org.foldbook.dsp.peaks;

import java.util.Arrays;

import org.foldbook.dsp.Check;

/** Robust noise-floor estimates of a spectrum. */
public final class NoiseFloor {
    private NoiseFloor() {
    }

    /**
     * Running median: {@code floor[k]} = median of {@code x[k-h .. k+h]}, {@code h = window/2}, the window
     * cut at the ends of {@code x[0..count)} (an even number of samples gives the mean of the middle two).
     * A median ignores the few bins a peak occupies, so on dB levels it follows the noise, not the tones.
     * O(count * window) with a sorted sliding window.
     *
     * @param window odd, >= 1
     */
    public static double[] runningMedian(double[] x, int count, int window) {
        Check.atLeast("window", window, 1);
        if ((window & 1) == 0) {
            throw new IllegalArgumentException("window must be odd, was " + window);
        }
        if (x == null || count < 0 || count > x.length) {
            throw new IllegalArgumentException("count must lie in [0, x.length], was " + count);
        }
        double[] floor = new double[count];
        int h = window / 2;
        double[] sorted = new double[Math.min(window, count) + 1];
        int size = 0;
        int lo = 0; // x[lo .. hi) is in the sorted window
        int hi = 0;
        for (int k = 0; k < count; k++) {
            int wantLo = Math.max(0, k - h);
            int wantHi = Math.min(count, k + h + 1);
            while (lo < wantLo) {
                size = remove(sorted, size, x[lo++]);
            }
            while (hi < wantHi) {
                size = insert(sorted, size, x[hi++]);
            }
            floor[k] = (size & 1) == 1 ? sorted[size / 2] : 0.5 * (sorted[size / 2 - 1] + sorted[size / 2]);
        }
        return floor;
    }

    private static int insert(double[] a, int size, double v) {
        int p = Arrays.binarySearch(a, 0, size, v);
        if (p < 0) {
            p = -p - 1;
        }
        System.arraycopy(a, p, a, p + 1, size - p);
        a[p] = v;
        return size + 1;
    }

    private static int remove(double[] a, int size, double v) {
        int p = Arrays.binarySearch(a, 0, size, v);
        System.arraycopy(a, p + 1, a, p, size - p - 1);
        return size - 1;
    }
}
