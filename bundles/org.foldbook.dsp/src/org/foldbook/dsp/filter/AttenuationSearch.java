package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.foldbook.dsp.Check;

/**
 * Searches over frequency on any {@link FrequencyResponse}: the least attenuation in an interval,
 * and the bands where the attenuation is below a threshold.
 *
 * <p>How: a response whose attenuation never decreases ({@link FrequencyResponse#attenuationNonDecreasing()})
 * is handled exactly (endpoint, bisection). Otherwise the interval is cut at the response's
 * {@link FrequencyResponse#landmarksHz landmarks} (ripple peaks, transmission zeros, lobe peaks, mask
 * edges), each piece is sampled at {@value #POINTS_PER_OCTAVE} points per octave, every sampled local
 * minimum of attenuation is refined by golden-section search, and every threshold crossing by
 * bisection. So a feature is found if it sits at a landmark or is wider than about 1/64 octave; all
 * models in this package declare their narrow features as landmarks. A narrow peak of attenuation
 * missed between samples can only make a band "below threshold" come out wider (the safe side for
 * alias protection).
 */
public final class AttenuationSearch {

    /** Sampling density between landmarks. */
    public static final int POINTS_PER_OCTAVE = 64;
    private static final int MAX_POINTS_PER_PIECE = 8192;

    private AttenuationSearch() {
    }

    /** The least attenuation over [loHz, hiHz] and where it occurs. */
    public static AttenuationPoint minimum(FrequencyResponse response, double loHz, double hiHz) {
        checkInterval(response, loHz, hiHz);
        if (response.attenuationNonDecreasing()) {
            return new AttenuationPoint(loHz, response.attenuationDb(loHz));
        }
        double[] x = grid(response, loHz, hiHz);
        double[] a = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            a[i] = response.attenuationDb(x[i]);
        }
        AttenuationPoint best = new AttenuationPoint(x[0], a[0]);
        for (int i = 0; i < x.length; i++) {
            if (a[i] < best.attenuationDb()) {
                best = new AttenuationPoint(x[i], a[i]);
            }
            boolean localMin = (i == 0 || a[i] <= a[i - 1]) && (i == x.length - 1 || a[i] <= a[i + 1]);
            if (localMin && x.length > 1) {
                AttenuationPoint r = golden(response, x[Math.max(0, i - 1)], x[Math.min(x.length - 1, i + 1)]);
                if (r.attenuationDb() < best.attenuationDb()) {
                    best = r;
                }
            }
        }
        return best;
    }

    /**
     * The parts of [0, upToHz] where the attenuation is below {@code thresholdDb}, as disjoint bands in
     * ascending order (edges located to about 1e-12 relative).
     */
    public static List<FrequencyBand> bandsBelow(FrequencyResponse response, double thresholdDb, double upToHz) {
        checkInterval(response, 0, upToHz);
        Check.finite("thresholdDb", thresholdDb);
        List<FrequencyBand> out = new ArrayList<>();
        if (response.attenuationNonDecreasing()) {
            if (!(response.attenuationDb(0) < thresholdDb)) {
                return out;
            }
            if (response.attenuationDb(upToHz) < thresholdDb) {
                out.add(new FrequencyBand(0, upToHz));
                return out;
            }
            out.add(new FrequencyBand(0, crossing(response, thresholdDb, 0, upToHz)));
            return out;
        }
        double[] x = grid(response, 0, upToHz);
        double[] a = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            a[i] = response.attenuationDb(x[i]);
        }
        // Edges of the "below" set: sign changes between samples, plus dips below the threshold that
        // fall between two samples above it (found by refining local minima).
        List<double[]> pieces = new ArrayList<>();
        double start = a[0] < thresholdDb ? 0 : Double.NaN;
        for (int i = 1; i < x.length; i++) {
            boolean prevBelow = a[i - 1] < thresholdDb;
            boolean below = a[i] < thresholdDb;
            if (prevBelow && !below) {
                pieces.add(new double[] {start, crossing(response, thresholdDb, x[i - 1], x[i])});
                start = Double.NaN;
            } else if (!prevBelow && below) {
                start = crossing(response, thresholdDb, x[i - 1], x[i]);
            } else if (!prevBelow && i + 1 < x.length && a[i] <= a[i - 1] && a[i] <= a[i + 1] && !(a[i + 1] < thresholdDb)) {
                AttenuationPoint m = golden(response, x[i - 1], x[i + 1]);
                if (m.attenuationDb() < thresholdDb) {
                    pieces.add(new double[] {crossing(response, thresholdDb, x[i - 1], m.frequencyHz()),
                            crossing(response, thresholdDb, m.frequencyHz(), x[i + 1])});
                }
            }
        }
        if (!Double.isNaN(start)) {
            pieces.add(new double[] {start, upToHz});
        }
        pieces.sort((p, q) -> Double.compare(p[0], q[0]));
        for (double[] p : pieces) {
            if (!out.isEmpty() && p[0] <= out.get(out.size() - 1).highHz()) {
                FrequencyBand last = out.remove(out.size() - 1);
                out.add(new FrequencyBand(last.lowHz(), Math.max(last.highHz(), p[1])));
            } else {
                out.add(new FrequencyBand(p[0], p[1]));
            }
        }
        return out;
    }

    private static void checkInterval(FrequencyResponse response, double loHz, double hiHz) {
        if (response == null) {
            throw new IllegalArgumentException("response must not be null");
        }
        Check.nonNegative("loHz", loHz);
        Check.nonNegative("hiHz", hiHz);
        if (hiHz < loHz) {
            throw new IllegalArgumentException("hiHz must be >= loHz (" + loHz + "), was " + hiHz);
        }
    }

    /** The sampling grid: ends, landmarks inside, log-spaced points between. */
    static double[] grid(FrequencyResponse r, double lo, double hi) {
        double[] marks = r.landmarksHz(hi);
        double[] breaks = new double[marks.length + 2];
        int n = 0;
        breaks[n++] = lo;
        for (double m : marks) {
            if (m > lo && m < hi) {
                breaks[n++] = m;
            }
        }
        breaks[n++] = hi;
        breaks = Arrays.copyOf(breaks, n);
        Arrays.sort(breaks);
        double[] pts = new double[16];
        int count = 0;
        for (int b = 0; b + 1 < breaks.length; b++) {
            double a0 = breaks[b];
            double a1 = breaks[b + 1];
            if (a1 <= a0) {
                continue;
            }
            int pieces;
            boolean log = a0 > 0;
            if (log) {
                pieces = (int) Math.min(MAX_POINTS_PER_PIECE, Math.max(4, Math.ceil(POINTS_PER_OCTAVE * Math.log(a1 / a0) / Math.log(2))));
            } else {
                pieces = POINTS_PER_OCTAVE;
            }
            for (int i = 0; i < pieces; i++) {
                double t = (double) i / pieces;
                double f = log ? a0 * Math.pow(a1 / a0, t) : a0 + (a1 - a0) * t;
                if (count == pts.length) {
                    pts = Arrays.copyOf(pts, 2 * count);
                }
                pts[count++] = f;
            }
        }
        if (count == pts.length) {
            pts = Arrays.copyOf(pts, count + 1);
        }
        pts[count++] = hi;
        return Arrays.copyOf(pts, count);
    }

    /** Bisection for attenuation = threshold between a and b (one side below, one not). */
    private static double crossing(FrequencyResponse r, double threshold, double a, double b) {
        boolean aBelow = r.attenuationDb(a) < threshold;
        for (int i = 0; i < 200 && b - a > 1e-12 * Math.max(b, 1e-300); i++) {
            double m = 0.5 * (a + b);
            if ((r.attenuationDb(m) < threshold) == aBelow) {
                a = m;
            } else {
                b = m;
            }
        }
        return 0.5 * (a + b);
    }

    /** Golden-section search for the least attenuation in [a, b]. */
    private static AttenuationPoint golden(FrequencyResponse r, double a, double b) {
        final double g = (Math.sqrt(5) - 1) / 2;
        double c = b - g * (b - a);
        double d = a + g * (b - a);
        double fc = r.attenuationDb(c);
        double fd = r.attenuationDb(d);
        for (int i = 0; i < 100 && b - a > 1e-13 * Math.max(b, 1e-300); i++) {
            if (fc < fd) {
                b = d;
                d = c;
                fd = fc;
                c = b - g * (b - a);
                fc = r.attenuationDb(c);
            } else {
                a = c;
                c = d;
                fc = fd;
                d = a + g * (b - a);
                fd = r.attenuationDb(d);
            }
        }
        return fc < fd ? new AttenuationPoint(c, fc) : new AttenuationPoint(d, fd);
    }
}
