package org.foldbook.demo;

import java.util.Random;

import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.filter.FrequencyResponse;

/**
 * SYNTHETIC test signals for the demo notebook: a sum of tones seen through a chain's magnitude
 * response, sampled at the chain's rate, plus Gaussian noise from a fixed seed: the conditioner's analog
 * noise through the chain's filters (folding as it is sampled) and the digitizer's white floor. Each tone is
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
     * The noise of a scenario's channel, in full-scale fractions. {@code analogRms} is white noise of the
     * conditioner's output over 0..{@code analogBandHz}: it passes the chain's filters (magnitude) and is then
     * sampled, so what lies above Nyquist folds, as in a real chain. {@code floorRms} is the digitizer's own
     * white floor, added after sampling.
     */
    public record Noise(double analogRms, double analogBandHz, double floorRms) {
        public Noise {
            if (!(analogRms >= 0) || Double.isInfinite(analogRms) || !(floorRms >= 0) || Double.isInfinite(floorRms)) {
                throw new IllegalArgumentException("noise levels must be finite and ≥ 0, were " + analogRms + ", " + floorRms);
            }
            if (analogRms > 0 && (!(analogBandHz > 0) || Double.isInfinite(analogBandHz))) {
                throw new IllegalArgumentException("analogBandHz must be positive and finite, was " + analogBandHz);
            }
        }

        /** White noise after sampling only (e.g. a camera's read noise). */
        public static Noise white(double rms) {
            return new Noise(0, 0, rms);
        }
    }

    /**
     * {@code frames} samples at {@code sampleRateHz}: Σ a·|H(f)|·sin(2πf·n/fs + φ) plus {@code noise}, from
     * {@code new Random(seed)} (the JDK specifies that generator, so the data are the same on every machine).
     */
    public static double[] render(Tone[] tones, FrequencyResponse chain, double sampleRateHz, int frames,
            Noise noise, long seed) {
        if (!(sampleRateHz > 0) || Double.isInfinite(sampleRateHz)) {
            throw new IllegalArgumentException("sampleRateHz must be positive and finite, was " + sampleRateHz);
        }
        if (frames < 1) {
            throw new IllegalArgumentException("frames must be at least 1, was " + frames);
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
        Random random = new Random(seed);
        if (noise.analogRms() > 0 && frames > 1) {
            double[] analog = foldedAnalogNoise(chain, sampleRateHz, frames, noise, random);
            for (int n = 0; n < frames; n++) {
                out[n] += analog[n];
            }
        }
        for (int n = 0; n < frames; n++) {
            out[n] += noise.floorRms() * random.nextGaussian();
        }
        return out;
    }

    /**
     * Analog white noise through the chain, sampled: drawn in the frequency domain with the sampled
     * process's one-sided density S(f) = d·Σ|H(f')|² over every f' in (0, B] that lands on f (f' = |f − k·fs|,
     * the fold of sampling; Oppenheim and Schafer, Discrete-Time Signal Processing, ch. 4), d = rms²/B. A bin
     * of a length-N transform of white noise of variance σ² = S·fs/2 has E|X|² = N·σ², so each bin gets
     * independent Gaussian real and imaginary parts of variance N·S·fs/4 (the Nyquist bin, real, N·S·fs/2).
     * The DC bin is left empty: the conditioner is AC-coupled.
     */
    static double[] foldedAnalogNoise(FrequencyResponse chain, double fs, int frames, Noise noise, Random random) {
        RealFft fft = RealFft.of(frames);
        int bins = fft.bins();
        double[] re = new double[bins];
        double[] im = new double[bins];
        double density = noise.analogRms() * noise.analogRms() / noise.analogBandHz();
        double band = noise.analogBandHz();
        for (int k = 1; k < bins; k++) {
            double f = k * fs / frames;
            boolean nyquistBin = (frames % 2 == 0) && k == bins - 1;
            double power = 0;
            for (int m = 0; m * fs - f <= band; m++) {
                double below = m * fs - f; // images m·fs ± f of the bin
                double above = m * fs + f;
                if (m > 0 && !nyquistBin && below <= band) { // at fs/2 the two image sets are one
                    double h = chain.magnitude(below);
                    power += h * h;
                }
                if (above <= band) {
                    double h = chain.magnitude(above);
                    power += h * h;
                }
            }
            double s = density * power;
            if (nyquistBin) {
                re[k] = Math.sqrt(frames * s * fs / 2) * random.nextGaussian();
            } else {
                double sd = Math.sqrt(frames * s * fs / 4);
                re[k] = sd * random.nextGaussian();
                im[k] = sd * random.nextGaussian();
            }
        }
        double[] out = new double[frames];
        fft.inverseInPlace(re, im, out);
        return out;
    }
}
