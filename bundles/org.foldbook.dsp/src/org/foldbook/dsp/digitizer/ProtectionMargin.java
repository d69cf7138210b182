package org.foldbook.dsp.digitizer;

/**
 * How well a chain protects a band [0, bandHz] at a sample rate: the least attenuation over every
 * frequency the sensor passes that folds onto the band (the images [k·fs − band, k·fs + band],
 * k ≥ 1), against the attenuation required.
 *
 * @param sampleRateHz          the rate
 * @param bandHz                the protected band's upper edge (≤ fs/2)
 * @param requiredDb            attenuation required
 * @param worstImageHz          the image frequency with the least attenuation (NaN if no image lies
 *                              within the sensor's range)
 * @param worstImageAttenuationDb its attenuation (+∞ if no image)
 * @param marginDb              worstImageAttenuationDb − requiredDb: ≥ 0 protected, &lt; 0 the shortfall
 * @param attenuationAtNyquistDb the chain's attenuation at fs/2 (the folding frequency)
 */
public record ProtectionMargin(double sampleRateHz, double bandHz, double requiredDb, double worstImageHz,
        double worstImageAttenuationDb, double marginDb, double attenuationAtNyquistDb) {

    public boolean isProtected() {
        return marginDb >= 0;
    }
}
