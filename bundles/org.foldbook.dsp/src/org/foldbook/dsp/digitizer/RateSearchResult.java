package org.foldbook.dsp.digitizer;

/**
 * The outcome of {@link AliasAnalysis#lowestRate}.
 *
 * @param found       whether some rate in the searched range keeps the band alias-free
 * @param rateHz      the lowest such rate found (NaN if none); it is itself verified alias-free, and
 *                    the true boundary lies within {@code toleranceHz} below it
 * @param toleranceHz bracket width at the end of the bisection
 * @param bandHz      the band of interest
 * @param evaluations how many rates were analysed
 */
public record RateSearchResult(boolean found, double rateHz, double toleranceHz, double bandHz, int evaluations) {
}
