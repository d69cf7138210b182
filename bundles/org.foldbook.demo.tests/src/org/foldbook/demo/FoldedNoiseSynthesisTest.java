package org.foldbook.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.foldbook.demo.SyntheticTones.Noise;
import org.foldbook.demo.SyntheticTones.Tone;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.spectrum.Unit;
import org.foldbook.dsp.spectrum.Welch;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The demo's analog noise, SYNTHETIC input: white noise of a stated rms over 0..B through a 4-pole
 * Butterworth (|H|² = 1/(1 + (f/fc)^8), the closed form of any filter handbook), then sampled. The
 * sampled density must be d·Σ|H(f')|² over every f' = |f − k·fs| ≤ B (the fold of sampling, Oppenheim
 * and Schafer, Discrete-Time Signal Processing, ch. 4), d = rms²/B, as a Welch estimate shows it.
 */
class FoldedNoiseSynthesisTest {

    static final double FS = 1000, FC = 300, BAND = 4000, RMS = 0.1;

    static double butterworthSquared(double f) {
        return 1 / (1 + Math.pow(f / FC, 8));
    }

    static double expectedDensity(double f) {
        double sum = 0;
        for (int k = 0; k * FS - f <= BAND; k++) {
            if (k > 0) {
                sum += butterworthSquared(k * FS - f);
            }
            if (k * FS + f <= BAND) {
                sum += butterworthSquared(k * FS + f);
            }
        }
        return RMS * RMS / BAND * sum;
    }

    @Test
    @DisplayName("analog noise through a Butterworth, sampled: the density is the folded closed form within 0.3 dB")
    void densityIsTheFoldedResponse() {
        FrequencyResponse chain = f -> Math.sqrt(butterworthSquared(f));
        int frames = 1 << 18;
        double[] x = SyntheticTones.render(new Tone[0], chain, FS, frames, new Noise(RMS, BAND, 0), 7L);
        double[] psd = Welch.builder(1024).build().psd(x, FS, Unit.FULL_SCALE).values();
        double binHz = FS / 1024;
        for (double f : new double[] {50, 150, 250, 320, 400, 470}) {
            int k0 = (int) Math.round(f / binHz);
            double measured = 0, expected = 0;
            for (int k = k0 - 8; k < k0 + 8; k++) { // 16 bins: the estimate's spread is well under 0.1 dB
                measured += psd[k];
                expected += expectedDensity(k * binHz);
            }
            assertEquals(10 * Math.log10(expected), 10 * Math.log10(measured), 0.3, "density at " + f + " Hz");
        }
        // near fs/2 the fold doubles the density compared with the response alone: 470 Hz and its image at 530 Hz
        assertEquals(10 * Math.log10(1 + butterworthSquared(530) / butterworthSquared(470)),
                10 * Math.log10(expectedDensity(470) / (RMS * RMS / BAND * butterworthSquared(470))), 0.05);
    }

    @Test
    @DisplayName("the digitizer's floor is white with the stated rms")
    void floorIsWhite() {
        double[] x = SyntheticTones.render(new Tone[0], f -> 1.0, FS, 1 << 16, Noise.white(0.01), 3L);
        double var = 0;
        for (double v : x) {
            var += v * v;
        }
        var /= x.length;
        // the sample variance of 65 536 Gaussian values is within 1.5 % of σ² (4 standard errors, √(2/n))
        assertEquals(1e-4, var, 1.5e-6);
    }
}
