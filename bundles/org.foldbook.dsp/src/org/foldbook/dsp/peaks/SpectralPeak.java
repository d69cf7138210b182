package org.foldbook.dsp.peaks;

/**
 * One peak of a spectrum, an immutable value.
 *
 * @param bin          index of the local maximum (for a flat top, its middle)
 * @param frequencyHz  estimated frequency: the bin centre, or the sub-bin estimate when the finder
 *                     interpolates
 * @param levelDb      level in dB in the spectrum's own reference: the bin's level, or, when interpolating,
 *                     the estimated level at the true peak (scalloping corrected)
 * @param binLevelDb   level of the bin itself, dB
 * @param prominenceDb prominence of the bin (scipy.signal.peak_prominences definition), dB
 * @param floorDb      the noise-floor estimate at the bin (running median), dB; NaN when not estimated
 */
public record SpectralPeak(int bin, double frequencyHz, double levelDb, double binLevelDb, double prominenceDb,
        double floorDb) {
}
