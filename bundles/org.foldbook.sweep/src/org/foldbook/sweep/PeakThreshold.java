package org.foldbook.sweep;

import java.util.Locale;

/**
 * Which local maxima of a spectrum count as peaks. Noise-aware (the default): a peak must stand
 * {@code marginDb} above a running median of {@code floorWindowBins} bins of the spectrum in dB, and above the
 * digitizer's quantisation noise density when its step is known. Prominence-only: the scipy find_peaks rule
 * alone, kept for side-by-side checks (on a clean high-resolution file it lists the floor's own wiggles).
 *
 * <p>Why 12 dB: a single-segment periodogram bin of noise is exponentially distributed, so it exceeds m times
 * its median with probability 2^(−m) (its median is ln 2 of its mean); 12 dB (m = 15.8) leaves about one
 * noise bin in 50 000 above the threshold, under one false peak in 20 spectra of 2049 bins, and averaging
 * more segments only lowers that (common practice for a detection margin is 10–15 dB).
 *
 * @param noiseAware       true: margin over the running floor (and the quantisation floor); false: prominence only
 * @param marginDb         how far above the floor a peak must stand, dB &gt;= 0 (used for verdicts in both kinds)
 * @param floorWindowBins  running-median window, odd, &gt;= 3
 * @param quantisationStep the digitizer's step (LSB) in the recording's units, 0 when unknown
 */
public record PeakThreshold(boolean noiseAware, double marginDb, int floorWindowBins, double quantisationStep) {

    /** 12 dB over a 63-bin running median, no quantiser known. */
    public static final PeakThreshold DEFAULT = new PeakThreshold(true, 12, 63, 0);
    /** Prominence only (the side-by-side rule); verdicts still use a 12 dB margin over the running floor. */
    public static final PeakThreshold PROMINENCE_ONLY = new PeakThreshold(false, 12, 63, 0);

    public PeakThreshold {
        if (!(marginDb >= 0) || Double.isInfinite(marginDb)) {
            throw new IllegalArgumentException("marginDb must be finite and >= 0, was " + marginDb);
        }
        if (floorWindowBins < 3 || (floorWindowBins & 1) == 0) {
            throw new IllegalArgumentException("floorWindowBins must be odd and >= 3, was " + floorWindowBins);
        }
        if (!(quantisationStep >= 0) || Double.isInfinite(quantisationStep)) {
            throw new IllegalArgumentException("quantisationStep must be finite and >= 0, was " + quantisationStep);
        }
    }

    public PeakThreshold withMarginDb(double db) {
        return new PeakThreshold(noiseAware, db, floorWindowBins, quantisationStep);
    }

    /** The same with the digitizer's step (LSB) in the recording's units. */
    public PeakThreshold withQuantisationStep(double lsb) {
        return new PeakThreshold(noiseAware, marginDb, floorWindowBins, lsb);
    }

    /**
     * One-sided density of the quantisation noise at rate {@code fs}, dB re unit²/Hz: variance q²/12 spread
     * evenly over 0..fs/2, i.e. q²/(6·fs) (uniform rounding error, Bennett 1948; common practice); −∞ when the
     * step is unknown.
     */
    public double quantisationFloorDb(double fs) {
        return quantisationStep > 0 ? 10 * Math.log10(quantisationStep * quantisationStep / (6 * fs))
                : Double.NEGATIVE_INFINITY;
    }

    /** The rule in words, for results. */
    public String describe() {
        String q = quantisationStep > 0 ? String.format(Locale.ROOT, " and the quantisation floor of a %.4g step",
                quantisationStep) : "";
        return noiseAware
                ? String.format(Locale.ROOT, "peaks stand %.1f dB above a %d-bin running median of the spectrum%s",
                        marginDb, floorWindowBins, q)
                : "peaks by prominence alone (side-by-side rule)";
    }
}
