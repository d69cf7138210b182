package org.foldbook.sweep;

/**
 * What became of one source peak at one rate.
 *
 * @param sourcePeak         id of the source peak
 * @param verdict            any verdict but {@link Verdict#UNEXPLAINED}
 * @param apparentFrequency  where folding arithmetic puts it at this rate, Hz: |f - k·fs|, k = round(f/fs)
 * @param observedFrequency  frequency of the peak matched to it, Hz; NaN when suppressed
 * @param gainDb             measured bin power minus source bin power, dB; NaN when suppressed
 * @param mergedInto         for {@link Verdict#MERGES}: the id of the stronger source peak it lands on; else -1
 */
public record SourceFate(int sourcePeak, Verdict verdict, double apparentFrequency, double observedFrequency,
        double gainDb, int mergedInto) {
}
