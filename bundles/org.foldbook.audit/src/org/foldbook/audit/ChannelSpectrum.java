package org.foldbook.audit;

/**
 * A channel's Welch PSD as the audit computed it (Hann, 50 % overlap, density).
 *
 * @param rateHz   the channel's rate
 * @param binHz    bin spacing; bin k is at k·binHz
 * @param psd      one-sided density per bin, (unit)²/Hz; full-scale fractions for PCM
 * @param fullScale the value of full scale in the samples' unit, NaN when unknown
 */
public record ChannelSpectrum(double rateHz, double binHz, double[] psd, double fullScale) {

    public int bins() {
        return psd.length;
    }

    /** Density in dB relative to full scale² per Hz (dB re unit²/Hz when full scale is unknown). */
    public double levelDb(int bin) {
        double ref = Double.isNaN(fullScale) ? 1.0 : fullScale * fullScale;
        return 10 * Math.log10(Math.max(psd[bin], 1e-300) / ref);
    }

    /**
     * The level of a sine whose peak sits at {@code bin} with density {@code density}: Hann's
     * equivalent noise bandwidth is 1.5 bins (Harris 1978, Table 1), the sine's power A²/2 → dB of A.
     */
    public double sineLevelDb(double density) {
        double ref = Double.isNaN(fullScale) ? 1.0 : fullScale * fullScale;
        return 10 * Math.log10(Math.max(2 * density * binHz * 1.5 / ref, 1e-300));
    }

    /** The highest density within ±{@code radius} bins of {@code hz}, or NaN outside the spectrum. */
    public double densityNear(double hz, int radius) {
        int k = (int) Math.round(hz / binHz);
        if (k < 0 || k >= psd.length) {
            return Double.NaN;
        }
        double best = 0;
        for (int i = Math.max(0, k - radius); i <= Math.min(psd.length - 1, k + radius); i++) {
            best = Math.max(best, psd[i]);
        }
        return best;
    }
}
