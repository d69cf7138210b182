package org.foldbook.dsp.sweep;

/**
 * A peak of a PSD as the sweep sees it: bin-centre frequency and level of the PSD in dB
 * ({@code 10·log10} of the density, dB re 1 unit²/Hz).
 *
 * @param frequency Hz
 * @param levelDb   dB re 1 unit²/Hz
 */
public record SpectralPeak(double frequency, double levelDb) {
    public SpectralPeak {
        if (!Double.isFinite(frequency) || frequency < 0) {
            throw new IllegalArgumentException("frequency must be finite and >= 0, was " + frequency);
        }
        if (Double.isNaN(levelDb)) {
            throw new IllegalArgumentException("levelDb must not be NaN");
        }
    }
}
