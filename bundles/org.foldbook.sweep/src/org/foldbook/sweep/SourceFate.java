package org.foldbook.sweep;

/**
 * What became of one source peak at one rate.
 *
 * @param sourcePeak        id of the source peak
 * @param verdict           any verdict but {@link Verdict#UNEXPLAINED}
 * @param apparentFrequency where folding arithmetic puts it at this rate, Hz: |f − k·fs|, k = round(f/fs)
 * @param observedFrequency frequency of the peak matched to it, Hz; NaN when not seen on its own
 * @param gainDb            measured bin power minus source bin power, dB; NaN when not seen on its own
 * @param predictedGainDb   the mode's |H(f)|² at the source frequency, dB (0 without a mode)
 * @param floorDb           the detection floor at the apparent frequency, as power in one bin, dB (NaN: unknown)
 * @param otherPeak         the source peak it coincides with or is hidden beside, else −1
 * @param otherFrequency    frequency of the peak it coincides with or is hidden beside, Hz; else NaN
 * @param neededSegment     for {@link Verdict#HIDDEN}: the Welch segment that would resolve it, else 0
 * @param reason            the verdict in words
 */
public record SourceFate(int sourcePeak, Verdict verdict, double apparentFrequency, double observedFrequency,
        double gainDb, double predictedGainDb, double floorDb, int otherPeak, double otherFrequency,
        int neededSegment, String reason) {
}
