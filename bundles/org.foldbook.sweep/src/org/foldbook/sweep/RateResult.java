package org.foldbook.sweep;

import java.util.List;

/**
 * Everything the sweep found at one rate: the peaks seen there, each with its verdict and source, and
 * the fate of every source peak (including those not seen).
 *
 * @param step          the rate
 * @param outputSamples number of re-sampled values the spectrum was taken from (0 for the spectral preview)
 * @param binWidth      frequency step of the spectrum at this rate, Hz
 * @param observed      peaks found at this rate, in order of frequency
 * @param fates         one entry per source peak, in source-peak order
 */
public record RateResult(RateStep step, long outputSamples, double binWidth, List<ObservedPeak> observed,
        List<SourceFate> fates) {
    public RateResult {
        observed = List.copyOf(observed);
        fates = List.copyOf(fates);
    }

    /** The fate of source peak {@code id}. */
    public SourceFate fate(int id) {
        return fates.get(id);
    }
}
