package org.foldbook.dsp.digitizer;

import org.foldbook.dsp.Check;

/**
 * An ideal N-bit quantiser over a full-scale span: uniform step q = span/2ᴺ, quantisation error
 * uniform in ±q/2 so its RMS is q/√12, spread evenly from 0 to fs/2. SNR of a full-scale sine =
 * 6.02·N + 1.76 dB (W. Kester, Analog Devices MT-001; exactly 20·log10(2ᴺ·√1.5)).
 *
 * <p>Level convention: 0 dBFS is a full-scale sine (peak = span/2, RMS = span/(2√2)); every dBFS
 * figure here is an RMS ratio to that sine.
 *
 * @param bits           resolution N, 1..32
 * @param fullScaleVolts the full-scale span in volts peak to peak (e.g. 20 for ±10 V)
 */
public record IdealQuantiser(int bits, double fullScaleVolts) {

    public static final int MAX_BITS = 32;

    public IdealQuantiser {
        Check.atLeast("bits", bits, 1);
        if (bits > MAX_BITS) {
            throw new IllegalArgumentException("bits must be <= " + MAX_BITS + ", was " + bits);
        }
        Check.positive("fullScaleVolts", fullScaleVolts);
    }

    /** Step size q (V). */
    public double lsbVolts() {
        return fullScaleVolts / Math.pow(2, bits);
    }

    /** RMS of a full-scale sine (V). */
    public double fullScaleSineRmsVolts() {
        return fullScaleVolts / (2 * Math.sqrt(2));
    }

    /** Quantisation noise RMS q/√12 (V), over the whole band 0..fs/2. */
    public double noiseRmsVolts() {
        return lsbVolts() / Math.sqrt(12);
    }

    /** Ideal SNR of a full-scale sine, 20·log10(2ᴺ·√1.5) ≈ 6.02·N + 1.76 dB. */
    public double snrDb() {
        return 20 * Math.log10(Math.pow(2, bits) * Math.sqrt(1.5));
    }

    /** Total quantisation noise in dBFS (= −SNR). */
    public double noiseFloorDbfs() {
        return -snrDb();
    }

    /** Noise spectral density at a sample rate (V/√Hz): the noise RMS spread evenly over fs/2. */
    public double noiseDensityVoltsPerRootHz(double sampleRateHz) {
        Check.positive("sampleRateHz", sampleRateHz);
        return noiseRmsVolts() / Math.sqrt(sampleRateHz / 2);
    }

    /** Noise density at a sample rate in dBFS per Hz (noise floor − 10·log10(fs/2)). */
    public double noiseDensityDbfsPerHz(double sampleRateHz) {
        Check.positive("sampleRateHz", sampleRateHz);
        return noiseFloorDbfs() - 10 * Math.log10(sampleRateHz / 2);
    }

    /** Level (dBFS) of a sine whose peak amplitude is {@code lsbs} steps. */
    public double sinePeakOfLsbsDbfs(double lsbs) {
        Check.positive("lsbs", lsbs);
        return 20 * Math.log10(lsbs * lsbVolts() / (fullScaleVolts / 2));
    }

    /** The alias level (dBFS) a criterion allows. */
    public double thresholdDbfs(AliasCriterion criterion) {
        if (criterion == null) {
            throw new IllegalArgumentException("criterion must not be null");
        }
        return switch (criterion) {
            case BELOW_NOISE_FLOOR -> noiseFloorDbfs();
            case BELOW_ONE_LSB -> sinePeakOfLsbsDbfs(1);
            case BELOW_HALF_LSB -> sinePeakOfLsbsDbfs(0.5);
        };
    }

    /**
     * The attenuation (dB, ≥ 0) an out-of-band tone at {@code toneLevelDbfs} needs before sampling so
     * that its alias meets the criterion.
     */
    public double requiredAttenuationDb(double toneLevelDbfs, AliasCriterion criterion) {
        Check.finite("toneLevelDbfs", toneLevelDbfs);
        return Math.max(0, toneLevelDbfs - thresholdDbfs(criterion));
    }

    /** Converts a level in volts RMS to dBFS. */
    public double dbfsOfRmsVolts(double rmsVolts) {
        Check.positive("rmsVolts", rmsVolts);
        return 20 * Math.log10(rmsVolts / fullScaleSineRmsVolts());
    }
}
