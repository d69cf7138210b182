package org.foldbook.sweep;

/**
 * The lowest rate of the ladder that keeps a band free of aliases.
 *
 * @param low                 lower band edge, Hz
 * @param high                upper band edge, Hz
 * @param lowestAliasFreeRate lowest rate, going down from the highest, before which at every rate the band
 *                            lies below Nyquist and no source peak folds (or merges after folding) into it;
 *                            NaN if even the highest rate fails
 */
public record BandSummary(double low, double high, double lowestAliasFreeRate) {
    public BandSummary {
        if (!(low >= 0) || !(high > low) || Double.isInfinite(high)) {
            throw new IllegalArgumentException("band must satisfy 0 <= low < high < inf, was [" + low + ", " + high + "]");
        }
    }
}
