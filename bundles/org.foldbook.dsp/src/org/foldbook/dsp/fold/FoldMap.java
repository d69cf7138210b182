package org.foldbook.dsp.fold;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.foldbook.dsp.Check;

/**
 * Fold maps: apparent frequency of fixed tones as the sample rate varies, with the exact vertices.
 *
 * <p>Why vertices at fs = 2f/m suffice: for a tone f ≥ 0, the apparent frequency |f − k·fs| with
 * k = round(f/fs) is linear in fs wherever k and the sign of f − k·fs stay constant. k changes
 * where f/fs = j + ½ (fs = 2f/(2j+1), where the apparent frequency touches fs/2), and the sign
 * changes where f = k·fs (fs = 2f/(2k), where it touches 0). So the line is piecewise linear in fs
 * (not in 1/fs) with corners exactly at fs = 2f/m, m = 1, 2, …; above fs = 2f it is the constant f.
 */
public final class FoldMap {

    /** Most vertices one series may have (m from ⌈2f/fsMax⌉ to ⌊2f/fsMin⌋). */
    public static final int MAX_VERTICES = 1_000_000;

    private FoldMap() {
    }

    /** The fold-map line of one tone over [minRateHz, maxRateHz]. */
    public static FoldSeries series(double toneHz, double minRateHz, double maxRateHz) {
        Check.nonNegative("toneHz", toneHz);
        Check.positive("minRateHz", minRateHz);
        Check.positive("maxRateHz", maxRateHz);
        if (!(maxRateHz > minRateHz)) {
            throw new IllegalArgumentException("maxRateHz must exceed minRateHz (" + minRateHz + "), was " + maxRateHz);
        }
        double twoF = 2 * toneHz;
        long mLo = (long) Math.ceil(twoF / maxRateHz);
        long mHi = (long) Math.floor(twoF / minRateHz);
        mLo = Math.max(1, mLo);
        long count = Math.max(0, mHi - mLo + 1);
        if (count > MAX_VERTICES) {
            throw new IllegalArgumentException("toneHz " + toneHz + " over rates [" + minRateHz + ", " + maxRateHz
                    + "] needs " + count + " vertices, more than " + MAX_VERTICES + ": narrow the rate range");
        }
        double[] r = new double[(int) count + 2];
        double[] a = new double[r.length];
        int n = 0;
        r[n] = minRateHz;
        a[n++] = Folding.apparentHz(toneHz, minRateHz);
        for (long m = mHi; m >= mLo; m--) { // ascending rate = descending m
            double fs = twoF / m;
            if (fs > minRateHz && fs < maxRateHz) {
                r[n] = fs;
                a[n++] = m % 2 == 0 ? 0 : 0.5 * fs; // exact vertex values
            }
        }
        r[n] = maxRateHz;
        a[n++] = Folding.apparentHz(toneHz, maxRateHz);
        return new FoldSeries(toneHz, Arrays.copyOf(r, n), Arrays.copyOf(a, n));
    }

    /** Fold-map lines of several tones over the same rate range. */
    public static List<FoldSeries> series(double[] tonesHz, double minRateHz, double maxRateHz) {
        if (tonesHz == null) {
            throw new IllegalArgumentException("tonesHz must not be null");
        }
        List<FoldSeries> out = new ArrayList<>(tonesHz.length);
        for (int i = 0; i < tonesHz.length; i++) {
            if (!(tonesHz[i] >= 0) || Double.isInfinite(tonesHz[i])) {
                throw new IllegalArgumentException("tonesHz[" + i + "] must be a finite number >= 0, was " + tonesHz[i]);
            }
            out.add(series(tonesHz[i], minRateHz, maxRateHz));
        }
        return List.copyOf(out);
    }
}
