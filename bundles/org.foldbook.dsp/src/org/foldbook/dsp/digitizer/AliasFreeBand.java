package org.foldbook.dsp.digitizer;

/**
 * The alias-free band of a chain at one sample rate: every frequency the sensor passes that folds
 * onto [0, bandHz] is attenuated by at least the required amount.
 *
 * @param sampleRateHz        the rate
 * @param nyquistHz           fs/2, the upper bound of any band
 * @param bandHz              the alias-free band's upper edge, in [0, fs/2]
 * @param limitingSourceHz    the true frequency whose alias sets {@code bandHz} (NaN when nothing the
 *                            sensor passes folds into the baseband under-attenuated, bandHz = fs/2)
 */
public record AliasFreeBand(double sampleRateHz, double nyquistHz, double bandHz, double limitingSourceHz) {
}
