package org.foldbook.dsp.digitizer;

import org.foldbook.dsp.Check;
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
public record ProtectionFigures(double sensorMaxHz, double sampleRateHz, int bits, double nyquistHz,
        double requiredAttenuationDb, double aliasFreeBandHz, double limitingSourceHz, double attenuationAtNyquistDb,
        double marginDb) {

    /**
     * Figures assuming the worst usual case: an out-of-band tone at full scale (0 dBFS) whose alias
     * must fall below the ideal quantisation noise, i.e. a required attenuation of 6.02·N + 1.76 dB.
     */
    public static ProtectionFigures of(double sensorMaxHz, FrequencyResponse chain, int bits, double sampleRateHz) {
        return of(sensorMaxHz, chain, new IdealQuantiser(bits, 1.0), sampleRateHz, 0.0, AliasCriterion.BELOW_NOISE_FLOOR);
    }

    /** Figures for a stated out-of-band tone level and criterion. */
    public static ProtectionFigures of(double sensorMaxHz, FrequencyResponse chain, IdealQuantiser quantiser,
            double sampleRateHz, double toneLevelDbfs, AliasCriterion criterion) {
        if (quantiser == null) {
            throw new IllegalArgumentException("quantiser must not be null");
        }
        return from(sensorMaxHz, chain, quantiser.bits(), sampleRateHz,
                quantiser.requiredAttenuationDb(toneLevelDbfs, criterion));
    }

    /**
     * Figures for a digitizer of a stated dynamic range (the maker's specified full-scale-to-noise
     * ratio, which for real converters lies well below the ideal 6.02·N + 1.76 dB) and a stated level of
     * the strongest out-of-band content: its alias must fall below that noise floor, see
     * {@link #requiredAttenuationDb(double, double)}.
     *
     * @param bits           the resolution, 1..32 (reported only)
     * @param dynamicRangeDb full scale over the noise floor, dB, &gt; 0
     * @param toneLevelDbfs  the strongest content above Nyquist, dBFS (0 = a full-scale tone)
     */
    public static ProtectionFigures ofDynamicRange(double sensorMaxHz, FrequencyResponse chain, int bits,
            double sampleRateHz, double dynamicRangeDb, double toneLevelDbfs) {
        new IdealQuantiser(bits, 1.0); // checks bits
        return from(sensorMaxHz, chain, bits, sampleRateHz, requiredAttenuationDb(dynamicRangeDb, toneLevelDbfs));
    }

    /**
     * The attenuation (dB, ≥ 0) content at {@code toneLevelDbfs} needs so that its alias lies below a
     * noise floor {@code dynamicRangeDb} under full scale: max(0, dynamicRangeDb + toneLevelDbfs). E.g.
     * 110 dB range and −30 dBFS content need 80 dB.
     */
    public static double requiredAttenuationDb(double dynamicRangeDb, double toneLevelDbfs) {
        Check.positive("dynamicRangeDb", dynamicRangeDb);
        Check.finite("toneLevelDbfs", toneLevelDbfs);
        return Math.max(0, dynamicRangeDb + toneLevelDbfs);
    }

    private static ProtectionFigures from(double sensorMaxHz, FrequencyResponse chain, int bits, double sampleRateHz,
            double required) {
        AliasAnalysis a = AliasAnalysis.of(chain, sensorMaxHz, required);
        AliasFreeBand band = a.aliasFreeBand(sampleRateHz);
        ProtectionMargin m = a.protectionMargin(sampleRateHz, 0.5 * sampleRateHz);
        return new ProtectionFigures(sensorMaxHz, sampleRateHz, bits, 0.5 * sampleRateHz, required,
                band.bandHz(), band.limitingSourceHz(), m.attenuationAtNyquistDb(), m.marginDb());
    }
}
