package org.foldbook.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;
import org.foldbook.dsp.peaks.PeakFinder;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.window.WindowShape;
import org.foldbook.model.derived.Quantities;

/**
 * Every spectral peak of a channel, with each true frequency within the front end's band that appears at
 * it at the channel's rate (k·fs ± f, Oppenheim and Schafer ch. 4), the chain's attenuation there, the level
 * it would need at the sensor, and a verdict:
 * <ul>
 * <li>{@link PeakVerdict#PROBABLY_FOLDED}: a higher-rate recording of the same sensor has a peak at a folded
 * candidate that, through this chain, is at least {@code foldedMarginDb} above what it shows at the peak's
 * own frequency;</li>
 * <li>{@link PeakVerdict#COULD_BE_FOLDED}: some folded candidate is not ruled out — it would need no more than
 * the chain's stated out-of-band level (0 dBFS when none is stated) at the sensor, or the higher-rate
 * recording shows it within {@code negligibleDb} of the in-band reading;</li>
 * <li>{@link PeakVerdict#TRUSTWORTHY}: otherwise.</li>
 * </ul>
 */
final class PeakAudit {
    static final int MAX_PEAKS = 40;
    static final int MAX_CANDIDATES = 64;

    private PeakAudit() {
    }

    static List<PeakAssessment> assess(ChannelSpectrum sp, int segment, FrequencyResponse protection, double upperHz,
            double ceilingDbfs, ReferenceRecording ref, double prominenceDb, AuditPolicy policy) {
        PeakFinder finder = PeakFinder.builder().prominenceDb(prominenceDb)
                .windowKernel(WindowShape.HANN.periodic(segment)).build();
        List<SpectralPeak> found = new ArrayList<>(finder.findInPower(sp.psd(), sp.bins(), sp.binHz()));
        found.removeIf(p -> p.bin() < 3);
        found.sort(Comparator.comparingDouble(SpectralPeak::levelDb).reversed());
        if (found.size() > MAX_PEAKS) {
            found = found.subList(0, MAX_PEAKS);
        }
        found.sort(Comparator.comparingDouble(SpectralPeak::frequencyHz));
        double rate = sp.rateHz();
        List<PeakAssessment> out = new ArrayList<>();
        for (SpectralPeak p : found) {
            double f = Math.min(Math.max(p.frequencyHz(), 0), rate / 2);
            double level = sp.sineLevelDb(Math.pow(10, p.levelDb() / 10));
            // a peak is known to a bin: a source at the front end's edge can fold to up to a bin beyond
            // the edge's own image, so candidates reach one bin past the stated edge
            out.add(one(f, level, rate, protection, upperHz + sp.binHz(), ceilingDbfs, ref, prominenceDb, policy));
        }
        return out;
    }

    static PeakAssessment one(double f, double level, double rate, FrequencyResponse protection, double upperHz,
            double ceilingDbfs, ReferenceRecording ref, double prominenceDb, AuditPolicy policy) {
        double[] truths = Folding.trueFrequencies(f, rate, upperHz > f ? upperHz : f);
        List<PeakCandidate> cands = new ArrayList<>();
        double inbandRef = Double.NaN;
        for (double t : truths) {
            if (cands.size() >= MAX_CANDIDATES) {
                break;
            }
            double att = protection.attenuationDb(t);
            double refLevel = Double.NaN;
            boolean refPeak = false;
            if (ref != null) {
                double d = ref.sensorDensity(t);
                if (!Double.isNaN(d)) {
                    refLevel = ref.spectrum().sineLevelDb(d) - att;
                    refPeak = ref.hasPeakNear(t, prominenceDb);
                }
            }
            boolean folded = Math.abs(t - f) > 1e-9 * rate;
            if (!folded) {
                inbandRef = refLevel;
            }
            cands.add(new PeakCandidate(t, folded, att, level + att, refLevel, refPeak));
        }
        PeakCandidate dominant = null;
        List<PeakCandidate> open = new ArrayList<>();
        for (PeakCandidate c : cands) {
            if (!c.folded()) {
                continue;
            }
            if (!Double.isNaN(c.referenceLevelDb())) {
                double lead = c.referenceLevelDb() - (Double.isNaN(inbandRef) ? Double.NEGATIVE_INFINITY : inbandRef);
                if (c.referencePeak() && lead >= policy.foldedMarginDb()
                        && (dominant == null || c.referenceLevelDb() > dominant.referenceLevelDb())) {
                    dominant = c;
                }
                if (lead > -policy.negligibleDb()) {
                    open.add(c);
                }
            } else if (c.sensorLevelDb() <= ceilingDbfs) {
                open.add(c);
            }
        }
        String at = Quantities.hz(f) + " at " + Quantities.rate(rate);
        if (dominant != null) {
            return new PeakAssessment(f, level, cands, PeakVerdict.PROBABLY_FOLDED, String.format(Locale.ROOT,
                    "%s: %s shows %s at %s, which this chain passes %s attenuated and folds to %s; that is %s above"
                            + " what it shows at %s itself",
                    at, ref.label(), Words.db(dominant.referenceLevelDb()).replace(" dB", " dBFS"),
                    Quantities.hz(dominant.trueHz()), Words.db(dominant.attenuationDb()), Quantities.hz(f),
                    Double.isNaN(inbandRef) ? "far" : Words.db(dominant.referenceLevelDb() - inbandRef),
                    Quantities.hz(f)));
        }
        if (!open.isEmpty()) {
            PeakCandidate c = open.stream().min(Comparator.comparingDouble(PeakCandidate::sensorLevelDb)).get();
            String why = Double.isNaN(c.referenceLevelDb())
                    ? String.format(Locale.ROOT, "a sine of %s at %s would put it here (the chain attenuates %s there); "
                            + "the chain does not rule out content that strong above Nyquist (%s)",
                            Words.db(c.sensorLevelDb()).replace(" dB", " dBFS"), Quantities.hz(c.trueHz()),
                            Words.db(c.attenuationDb()),
                            "limit " + Words.db(ceilingDbfs).replace(" dB", " dBFS"))
                    : String.format(Locale.ROOT, "%s shows %s at %s through this chain, not negligible against the "
                            + "in-band reading", ref.label(), Words.db(c.referenceLevelDb()).replace(" dB", " dBFS"),
                            Quantities.hz(c.trueHz()));
            return new PeakAssessment(f, level, cands, PeakVerdict.COULD_BE_FOLDED,
                    at + ": " + open.size() + " folded reading(s) not ruled out; " + why);
        }
        long folded = cands.stream().filter(PeakCandidate::folded).count();
        String why = folded == 0 ? "the front end passes nothing above Nyquist that lands here"
                : folded + " folded reading(s), each needing more than the chain allows above Nyquist"
                        + (ref != null ? " or negligible in " + ref.label() : "");
        return new PeakAssessment(f, level, cands, PeakVerdict.TRUSTWORTHY, at + ": " + why);
    }
}
