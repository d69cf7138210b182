package org.foldbook.demo;

import java.util.Random;

import org.foldbook.dsp.filter.FrequencyResponse;

/**
 * SYNTHETIC test signals for the demo notebook: a sum of tones seen through a chain's magnitude
 * response, sampled at the chain's rate, plus white Gaussian noise from a fixed seed. Each tone is
 * evaluated at its true frequency at the sample instants, so content above Nyquist folds exactly as
 * real sampling folds it. Only magnitudes are applied: the chain's phase shift is not modelled,
 * which is enough for spectra and fold checks.
 */
public final class SyntheticTones {

    /** One tone: frequency in Hz, amplitude as a fraction of full scale before the chain, phase in rad. */
    public record Tone(double frequencyHz, double amplitude, double phaseRad) {
        public Tone {
            if (!(frequencyHz >= 0) || Double.isInfinite(frequencyHz)) {
                throw new IllegalArgumentException("frequencyHz must be finite and ≥ 0, was " + frequencyHz);
            }
            if (!(amplitude >= 0) || Double.isInfinite(amplitude)) {
                throw new IllegalArgumentException("amplitude must be finite and ≥ 0, was " + amplitude);
            }
        }
    }

    private SyntheticTones() {
    }

    /**
     * {@code frames} samples at {@code sampleRateHz}: Σ a·|H(f)|·sin(2πf·n/fs + φ) plus noise of
     * standard deviation {@code noiseRms} from {@code new Random(seed)} (the JDK specifies that
     * generator, so the data are the same on every machine).
     */
    public static double[] render(Tone[] tones, FrequencyResponse chain, double sampleRateHz, int frames,
            double noiseRms, long seed) {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sampleRateHz must be positive and finite, was " + sampleRateHz);
        }
        if (frames < 1) {
            throw new IllegalArgumentException("frames must be at least 1, was " + frames);
        }
        if (!(noiseRms >= 0)) {
            throw new IllegalArgumentException("noiseRms must be ≥ 0, was " + noiseRms);
        }
        double[] out = new double[frames];
        for (Tone tone : tones) {
            double a = tone.amplitude() * chain.magnitude(tone.frequencyHz());
            double step = 2 * Math.PI * tone.frequencyHz() / sampleRateHz;
            for (int n = 0; n < frames; n++) {
                // the phase is reduced per sample (n·step mod 2π) so long signals keep their precision
                out[n] += a * StrictMath.sin(Math.IEEEremainder(n * step, 2 * Math.PI) + tone.phaseRad());
            }
        }
        Random noise = new Random(seed);
        for (int n = 0; n < frames; n++) {
            out[n] += noiseRms * noise.nextGaussian();
        }
        return out;
    }
}
