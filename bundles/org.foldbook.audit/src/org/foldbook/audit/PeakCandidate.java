package org.foldbook.audit;

/**
 * A true frequency that would appear at a peak's frequency at the channel's rate.
 *
 * @param trueHz           the frequency at the sensor (k·fs ± observed)
 * @param folded           false for the peak's own frequency (the in-band reading)
 * @param attenuationDb    the chain's attenuation there before sampling
 * @param sensorLevelDb    the sine level it would need ahead of the chain's protection to give the peak (dBFS)
 * @param referenceLevelDb its level in the higher-rate recording, through this chain (dBFS); NaN without one
 * @param referencePeak    true when the higher-rate recording has a peak there
 */
public record PeakCandidate(double trueHz, boolean folded, double attenuationDb, double sensorLevelDb,
        double referenceLevelDb, boolean referencePeak) {
}
