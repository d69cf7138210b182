package org.foldbook.sweep;

/**
 * Source peaks left out of the list because they lie far below the strongest (see
 * {@link SpectrumSettings#listWithinDb()}): how many, and the band of their levels.
 *
 * @param count       how many were left out
 * @param belowDb     they lie more than this far below the strongest source peak, dB
 * @param highestDb   the highest level among them, dB re 1 unit²/Hz (NaN when none)
 */
public record SummarisedPeaks(int count, double belowDb, double highestDb) {
}
