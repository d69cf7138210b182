package org.foldbook.dsp.digitizer;

import org.foldbook.dsp.filter.FrequencyResponse;

/**
 * The derived figures of a recorded channel, in one call, for the model and the views.
 *
 * @param sensorMaxHz            highest frequency the sensor passes
 * @param sampleRateHz           the digitizer's rate
 * @param bits                   its resolution
 * @param nyquistHz              fs/2
 * @param requiredAttenuationDb  what an out-of-band tone at the assumed level needs
 * @param aliasFreeBandHz        the alias-free band's upper edge
 * @param limitingSourceHz       the true frequency that limits it (NaN if none)
 * @param attenuationAtNyquistDb the chain's attenuation at fs/2
 * @param marginDb               protection margin of the whole band 0..fs/2: least attenuation of
 *                               anything that folds into it, minus the requirement (+∞ when the
 *                               sensor passes nothing above fs/2)
 */
public record ChainFigures(double sensorMaxHz, double sampleRateHz, int bits, double nyquistHz,
        double requiredAttenuationDb, double aliasFreeBandHz, double limitingSourceHz, double attenuationAtNyquistDb,
        double marginDb) {

    /**
     * Figures assuming the worst usual case: an out-of-band tone at full scale (0 dBFS) whose alias
     * must fall below the ideal quantisation noise, i.e. a required attenuation of 6.02·N + 1.76 dB.
     */
    public static ChainFigures of(double sensorMaxHz, FrequencyResponse chain, int bits, double sampleRateHz) {
        return of(sensorMaxHz, chain, new IdealQuantiser(bits, 1.0), sampleRateHz, 0.0, AliasCriterion.BELOW_NOISE_FLOOR);
    }

    /** Figures for a stated out-of-band tone level and criterion. */
    public static ChainFigures of(double sensorMaxHz, FrequencyResponse chain, IdealQuantiser quantiser,
            double sampleRateHz, double toneLevelDbfs, AliasCriterion criterion) {
        if (quantiser == null) {
            throw new IllegalArgumentException("quantiser must not be null");
        }
        double required = quantiser.requiredAttenuationDb(toneLevelDbfs, criterion);
        AliasAnalysis a = AliasAnalysis.of(chain, sensorMaxHz, required);
        AliasFreeBand band = a.aliasFreeBand(sampleRateHz);
        ProtectionMargin m = a.protectionMargin(sampleRateHz, 0.5 * sampleRateHz);
        return new ChainFigures(sensorMaxHz, sampleRateHz, quantiser.bits(), 0.5 * sampleRateHz, required,
                band.bandHz(), band.limitingSourceHz(), m.attenuationAtNyquistDb(), m.marginDb());
    }
}
