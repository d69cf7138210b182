package org.foldbook.dsp.filter;

/**
 * How a Bessel (Thomson) low-pass is scaled to its cutoff frequency fc. The three choices give three
 * different filters for the same fc; the names follow scipy.signal.bessel's {@code norm} argument.
 */
public enum BesselNormalization {
    /** Group delay at DC = 1/(2π·fc): Thomson's original normalisation (scipy norm='delay'). */
    DELAY,
    /**
     * The high-frequency asymptote equals that of a Butterworth of the same order and cutoff (scipy
     * norm='phase', scipy's default); the phase at fc is then close to, but for n ≥ 3 not exactly,
     * −n·45°.
     */
    PHASE,
    /** −3.01 dB (|H|² = 1/2) at fc, as anti-alias data sheets usually quote a cutoff (scipy norm='mag'). */
    MAGNITUDE
}
