package org.foldbook.audit;

import static org.foldbook.audit.Subject.fig;

import java.util.Arrays;

import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.derived.Quantities;

/**
 * Findings from a channel's samples and its spectrum: rails, DC, range in use, dropouts, flat runs,
 * non-finite values, energy near Nyquist. Every threshold comes from the {@link AuditPolicy}.
 */
final class DataAudit {

    private DataAudit() {
    }

    static void samples(Subject at, SampleStatistics s, double fullScale, int bits, double rate, AuditPolicy policy) {
        String where = " (sample %d, %s)";
        if (s.nonFinite > 0) {
            at.add(AuditKind.NON_FINITE, s.nonFinite + " value(s) are not finite numbers; the first is sample "
                    + s.firstNonFinite, fig("nonFiniteSamples", s.nonFinite, "samples"),
                    fig("firstSample", s.firstNonFinite, "samples"));
        }
        boolean fsKnown = fullScale > 0;
        if (fsKnown && s.clipped > 0) {
            at.add(AuditKind.CLIPPING, String.format(java.util.Locale.ROOT,
                    "%d sample(s) at or beyond %.1f %% of full scale; the longest run is %d samples" + where,
                    s.clipped, 100 * policy.clipFraction(), s.longestClipRun, s.longestClipStart,
                    Quantities.ms(s.longestClipStart / rate)),
                    fig("clippedSamples", s.clipped, "samples"), fig("longestRun", s.longestClipRun, "samples"),
                    fig("longestRunStart", s.longestClipStart, "samples"));
        }
        double mean = s.mean();
        double ac = s.acRms();
        if (Double.isFinite(mean)) {
            boolean big = fsKnown ? Math.abs(mean) >= policy.dcFractionOfFullScale() * fullScale
                    : Math.abs(mean) >= 0.1 * ac;
            double dbfs = fsKnown ? 20 * Math.log10(Math.max(Math.abs(mean), 1e-300) / fullScale) : Double.NaN;
            if (big) {
                at.add(AuditKind.DC_OFFSET, "mean " + Quantities.number(mean)
                        + (fsKnown ? " (" + Words.db(dbfs).replace(" dB", " dBFS") + ")" : "")
                        + " against an AC level (RMS) of " + Quantities.number(ac),
                        fig("mean", mean, ""), fig("offsetDbfs", dbfs, "dBFS"), fig("acRms", ac, ""));
            }
        }
        if (fsKnown && bits > 0 && s.max > s.min) {
            // peak-to-peak over the LSB 2·FS/2^N: N + log2(ptp / 2FS) bits of the range are exercised
            double used = bits + Math.log(Math.max(s.max - s.min, 1e-300) / (2 * fullScale)) / Math.log(2);
            double snr = 6.02 * used + 1.76;
            Severity sev = used < bits - policy.unusedBits() ? Severity.WARNING : Severity.INFO;
            at.add(AuditKind.RANGE_USE, sev, String.format(java.util.Locale.ROOT,
                    "the signal spans %.1f of the digitizer's %d bits (peak-to-peak %s of %s): a sine of that span "
                            + "would reach at most %.1f dB signal-to-quantisation ratio (6.02·N + 1.76 dB)",
                    used, bits, Quantities.number(s.max - s.min), Quantities.number(2 * fullScale), snr),
                    fig("bitsUsed", used, "bits"), fig("digitizerBits", bits, "bits"),
                    fig("idealSnrDb", snr, "dB"), fig("min", s.min, ""), fig("max", s.max, ""));
        }
        if (s.dropouts > 0) {
            at.add(AuditKind.DROPOUT, String.format(java.util.Locale.ROOT,
                    "%d run(s) of at least %d exact zeros; the longest is %d samples" + where, s.dropouts,
                    policy.dropoutSamples(), s.longestDropout, s.longestDropoutStart,
                    Quantities.ms(s.longestDropoutStart / rate)),
                    fig("dropouts", s.dropouts, ""), fig("longestRun", s.longestDropout, "samples"),
                    fig("longestRunStart", s.longestDropoutStart, "samples"));
        }
        if (s.flatRuns > 0) {
            at.add(AuditKind.FLAT_RUN, String.format(java.util.Locale.ROOT,
                    "%d run(s) of at least %d identical values; the longest is %d samples" + where, s.flatRuns,
                    policy.flatSamples(), s.longestFlat, s.longestFlatStart, Quantities.ms(s.longestFlatStart / rate)),
                    fig("flatRuns", s.flatRuns, ""), fig("longestRun", s.longestFlat, "samples"),
                    fig("longestRunStart", s.longestFlatStart, "samples"));
        }
    }

    /**
     * Energy near Nyquist: the mean density over the top {@code nyquistBandFraction} of 0..fs/2 against the
     * broadband floor of the band (the median density over 0..fs/4). An effective low-pass ahead of the
     * digitizer pushes the top down well below the floor; a spectrum still as high there says it did not,
     * or that content folds in there. The words say which, from the same drop predicted by the chain's
     * modelled protection for white noise at the sensor up to {@code upperHz} (folded as it is sampled):
     * a drop the model predicts too means the top of the band is unprotected by the chain's design (a
     * filter's transition band, or no filter); a drop far short of the model's says the filter did not
     * act as the notebook records.
     */
    static void nyquist(Subject at, ChannelSpectrum sp, AuditPolicy policy, FrequencyResponse protection,
            double upperHz) {
        int n = sp.bins();
        if (n < 16) {
            return;
        }
        int from = (int) Math.floor((1 - policy.nyquistBandFraction()) * (n - 1));
        double drop = topDrop(sp.psd(), from);
        double[] predicted = new double[n];
        for (int k = 0; k < n; k++) {
            predicted[k] = foldedWhite(protection, k * sp.binHz(), sp.rateHz(), upperHz);
        }
        double modelDrop = topDrop(predicted, from);
        Severity sev = drop < policy.nyquistExcessDb() ? Severity.WARNING : Severity.INFO;
        String why = "";
        if (sev == Severity.WARNING) {
            why = " (less than " + Words.db(policy.nyquistExcessDb()) + "): "
                    + (modelDrop >= policy.nyquistExcessDb() && drop < modelDrop - MODEL_TOLERANCE_DB
                            ? "the chain's modelled protection predicts " + Words.db(modelDrop)
                                    + ", so its filter did not act as recorded, or content folds in there"
                            : "as the chain's modelled protection predicts (" + Words.db(modelDrop)
                                    + "): the chain does not protect the top of the band (no low-pass, or its "
                                    + "transition band lies there); read it as not alias-free");
        }
        at.add(AuditKind.ENERGY_AT_NYQUIST, sev, String.format(java.util.Locale.ROOT,
                "over the top %.0f %% of the band (%s–%s) the spectrum lies %s below the broadband floor of 0–%s%s",
                100 * policy.nyquistBandFraction(), Quantities.hz(from * sp.binHz()), Quantities.hz(sp.rateHz() / 2),
                Words.db(drop), Quantities.hz(sp.rateHz() / 4), why),
                fig("dropDb", drop, "dB"), fig("modelDropDb", modelDrop, "dB"), fig("fromHz", from * sp.binHz(), "Hz"));
    }

    /** How far the data may fall short of the model's drop before the filter is doubted (dB, our choice). */
    static final double MODEL_TOLERANCE_DB = 3.0;

    /** The median of {@code psd[1 .. n/2)} over the mean of {@code psd[from .. n)}, in dB. */
    private static double topDrop(double[] psd, int from) {
        int n = psd.length;
        double top = 0;
        for (int k = from; k < n; k++) {
            top += psd[k];
        }
        top /= (n - from);
        double[] low = Arrays.copyOfRange(psd, 1, n / 2);
        Arrays.sort(low);
        double floor = low[low.length / 2];
        return 10 * Math.log10(Math.max(floor, 1e-300) / Math.max(top, 1e-300));
    }

    /**
     * Density at {@code f} (0..fs/2) after sampling of white noise at the sensor up to {@code upperHz} through
     * {@code h}: Σ|H(f')|² over every f' = |f − k·fs| ≤ upper (the fold of sampling, Oppenheim and Schafer ch. 4).
     */
    static double foldedWhite(FrequencyResponse h, double f, double fs, double upperHz) {
        double upper = upperHz > fs / 2 ? upperHz : fs / 2;
        double sum = 0;
        for (int m = 0; m * fs - f <= upper; m++) {
            if (m > 0 && f > 0 && 2 * f < fs) { // at 0 and fs/2 the two image sets are one
                double g = h.magnitude(m * fs - f);
                sum += g * g;
            }
            if (m * fs + f <= upper) {
                double g = h.magnitude(m * fs + f);
                sum += g * g;
            }
        }
        return sum;
    }
}
