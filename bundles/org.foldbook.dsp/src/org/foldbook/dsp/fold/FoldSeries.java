package org.foldbook.dsp.fold;

/**
 * One tone's fold-map line: apparent frequency against sample rate, as the vertices of a polyline.
 * Between consecutive vertices the apparent frequency is exactly linear in the rate (see
 * {@link FoldMap}), so drawing straight segments between these points is exact.
 *
 * @param toneHz     the true frequency
 * @param rateHz     sample rates, ascending (copy on access)
 * @param apparentHz apparent frequency at each rate
 */
public record FoldSeries(double toneHz, double[] rateHz, double[] apparentHz) {
    public FoldSeries {
        rateHz = rateHz.clone();
        apparentHz = apparentHz.clone();
    }

    @Override
    public double[] rateHz() {
        return rateHz.clone();
    }

    @Override
    public double[] apparentHz() {
        return apparentHz.clone();
    }

    public int size() {
        return rateHz.length;
    }
}
