package org.foldbook.audit;

/**
 * The thresholds an audit applies. The defaults are our own rules of thumb (common practice, not a
 * standard); the report prints the policy it used.
 *
 * @param calibrationValidMonths a sensor's or instrument's calibration holds this long (common practice: 12)
 * @param clipFraction           a sample at or above this fraction of full scale counts as at the rail
 * @param dcFractionOfFullScale  a mean above this fraction of full scale is a DC offset worth a warning
 * @param dropoutSamples         this many consecutive exact zeros (or NaNs) make a dropout
 * @param flatSamples            this many consecutive identical non-zero values make a flat run
 * @param nyquistBandFraction    the top part of 0..fs/2 examined for energy near Nyquist
 * @param nyquistExcessDb        the top of the band less than this far below the broadband floor says no effective low-pass
 * @param foldedMarginDb         a folded candidate this far above the in-band one (through the chain, in a
 *                               higher-rate recording) makes a peak "probably folded"
 * @param negligibleDb           a candidate this far below the in-band one is negligible
 * @param unusedBits             using fewer than (digitizer bits − this) bits of the range is worth a warning
 */
public record AuditPolicy(int calibrationValidMonths, double clipFraction, double dcFractionOfFullScale,
        int dropoutSamples, int flatSamples, double nyquistBandFraction, double nyquistExcessDb,
        double foldedMarginDb, double negligibleDb, double unusedBits) {

    public static final AuditPolicy DEFAULT = new AuditPolicy(12, 0.999, 0.01, 32, 32, 0.05, 10, 6, 20, 8);
}
