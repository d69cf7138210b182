package org.foldbook.sweep;

/**
 * How one source peak fares down the ladder.
 *
 * @param sourcePeak     id of the source peak
 * @param frequency      its frequency, Hz
 * @param lowestTrueRate lowest rate, going down from the highest, before which it SURVIVES at every rate;
 *                       NaN if it does not survive even the highest rate
 * @param firstFoldRate  highest rate at which it FOLDS; NaN if it never does
 */
public record PeakSummary(int sourcePeak, double frequency, double lowestTrueRate, double firstFoldRate) {
}
