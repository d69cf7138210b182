package org.foldbook.audit;

import static org.foldbook.audit.Subject.fig;

import java.util.Arrays;

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
     * or that content folds in there.
     */
    static void nyquist(Subject at, ChannelSpectrum sp, AuditPolicy policy) {
        int n = sp.bins();
        if (n < 16) {
            return;
        }
        int from = (int) Math.floor((1 - policy.nyquistBandFraction()) * (n - 1));
        double top = 0;
        for (int k = from; k < n; k++) {
            top += sp.psd()[k];
        }
        top /= (n - from);
        int quarter = n / 2;
        double[] low = Arrays.copyOfRange(sp.psd(), 1, quarter);
        Arrays.sort(low);
        double floor = low[low.length / 2];
        double drop = 10 * Math.log10(Math.max(floor, 1e-300) / Math.max(top, 1e-300));
        Severity sev = drop < policy.nyquistExcessDb() ? Severity.WARNING : Severity.INFO;
        at.add(AuditKind.ENERGY_AT_NYQUIST, sev, String.format(java.util.Locale.ROOT,
                "over the top %.0f %% of the band (%s–%s) the spectrum lies %s below the broadband floor of 0–%s%s",
                100 * policy.nyquistBandFraction(), Quantities.hz(from * sp.binHz()), Quantities.hz(sp.rateHz() / 2),
                Words.db(drop), Quantities.hz(sp.rateHz() / 4),
                sev == Severity.WARNING ? " (less than " + Words.db(policy.nyquistExcessDb())
                        + "): no effective low-pass was in place, or content folds in there" : ""),
                fig("dropDb", drop, "dB"), fig("fromHz", from * sp.binHz(), "Hz"));
    }
}
