package org.foldbook.dsp.peaks;

import java.util.Arrays;

/**
 * The peak rules of {@code scipy.signal.find_peaks} (scipy 1.10 {@code _peak_finding_utils.pyx}),
 * re-implemented step for step so the same input gives the same peaks.
 */
final class PeakShapes {
    private PeakShapes() {
    }

    /**
     * Local maxima of {@code x[0..count)}: a sample, or the middle ({@code (first+last)/2}, rounded down) of a
     * flat run, whose left and right neighbours are both strictly lower. The first and last samples are
     * never maxima.
     */
    static int[] localMaxima(double[] x, int count) {
        int[] peaks = new int[Math.max(0, count / 2)];
        int m = 0;
        int i = 1;
        int iMax = count - 1;
        while (i < iMax) {
            if (x[i - 1] < x[i]) {
                int ahead = i + 1;
                while (ahead < iMax && x[ahead] == x[i]) {
                    ahead++;
                }
                if (x[ahead] < x[i]) {
                    peaks[m++] = (i + ahead - 1) / 2;
                    i = ahead;
                }
            }
            i++;
        }
        return Arrays.copyOf(peaks, m);
    }

    /**
     * Prominence of each peak ({@code scipy.signal.peak_prominences}, {@code wlen=None}): walk left from the
     * peak while samples are {@code <= x[peak]}, keeping the lowest (its first position is the left base);
     * the same to the right; prominence = {@code x[peak] - max(leftMin, rightMin)}. Bases go into
     * {@code leftBases}/{@code rightBases} when these are non-null.
     */
    static double[] prominences(double[] x, int count, int[] peaks, int[] leftBases, int[] rightBases) {
        double[] prom = new double[peaks.length];
        for (int p = 0; p < peaks.length; p++) {
            int peak = peaks[p];
            double top = x[peak];
            int i = peak;
            int leftBase = peak;
            double leftMin = top;
            while (i >= 0 && x[i] <= top) {
                if (x[i] < leftMin) {
                    leftMin = x[i];
                    leftBase = i;
                }
                i--;
            }
            i = peak;
            int rightBase = peak;
            double rightMin = top;
            while (i < count && x[i] <= top) {
                if (x[i] < rightMin) {
                    rightMin = x[i];
                    rightBase = i;
                }
                i++;
            }
            prom[p] = top - Math.max(leftMin, rightMin);
            if (leftBases != null) {
                leftBases[p] = leftBase;
                rightBases[p] = rightBase;
            }
        }
        return prom;
    }

    /**
     * scipy's {@code _select_by_peak_distance}: visiting peaks from the highest down (ties: the later index
     * of a stable ascending sort first), each kept peak removes the unvisited peaks less than
     * {@code distance} samples away. Returns a keep mask.
     */
    static boolean[] selectByDistance(double[] x, int[] peaks, int distance) {
        int m = peaks.length;
        boolean[] keep = new boolean[m];
        Arrays.fill(keep, true);
        if (distance <= 1) {
            return keep;
        }
        Integer[] order = new Integer[m];
        for (int i = 0; i < m; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(x[peaks[a]], x[peaks[b]]));
        for (int i = m - 1; i >= 0; i--) {
            int j = order[i];
            if (!keep[j]) {
                continue;
            }
            for (int k = j - 1; k >= 0 && peaks[j] - peaks[k] < distance; k--) {
                keep[k] = false;
            }
            for (int k = j + 1; k < m && peaks[k] - peaks[j] < distance; k++) {
                keep[k] = false;
            }
        }
        return keep;
    }
}
