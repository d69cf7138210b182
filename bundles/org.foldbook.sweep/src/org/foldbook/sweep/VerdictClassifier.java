package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.dsp.peaks.SpectralPeak;

/**
 * Gives every source peak its verdict at one rate, with the reason in words, and every peak seen there its
 * source.
 *
 * <p>The apparent frequency of a source peak at rate fs is |f − k·fs| with k = round(f/fs) (folding;
 * Oppenheim &amp; Schafer ch. 4). A peak seen within the match radius of it is that source peak arriving:
 * SURVIVES when k = 0, FOLDS otherwise. The match radius is {@value #SOURCE_TOLERANCE_BINS} of a source bin
 * plus {@code matchBins} bins at the rate. With a mode given, a seen peak more than {@value #LEVEL_EXCESS_DB} dB
 * above the source peak's predicted level (its power times the mode's |H(f)|²) is not taken for it. Source
 * peaks are served strongest first. One not seen gets, in this order:
 * <ul>
 * <li>SPLITS when this rate's bins are finer than the source's and peaks it claims lie within a source bin
 *     of it: components the source spectrum could not resolve;</li>
 * <li>REMOVED when its predicted level lies below the detection floor (the running-median floor of this
 *     rate's spectrum, or the quantisation floor if higher, plus the margin) and the chain took it there;
 *     BURIED when its own level is already below that floor (nothing attenuated it much);</li>
 * <li>AT_DC / AT_NYQUIST when it lands within two bins of 0 or fs/2 (end bins are never peaks);</li>
 * <li>COINCIDES when a seen peak already taken by another source peak lies within one bin of it and that
 *     source peak lands there too: two components in one bin;</li>
 * <li>HIDDEN beside the nearest stronger seen peak within {@value #HIDE_BINS} bins, with the separation and
 *     the segment length that would resolve them (4 bins apart; common practice for the Hann window when the
 *     levels differ);</li>
 * <li>MISSING otherwise.</li>
 * </ul>
 * Peaks seen that no source peak claims are UNEXPLAINED. Levels are compared as power in one bin (density +
 * 10·log10(bin width)); a gain includes 0 to −1.42 dB of Hann scalloping (Harris 1978, Table 1).
 */
public final class VerdictClassifier {
    /** Default match radius in bins at the rate, beyond the source-bin half width: 1.5 (common practice). */
    public static final double DEFAULT_MATCH_BINS = 1.5;
    /** Uncertainty of a source peak's frequency, in source bins. */
    public static final double SOURCE_TOLERANCE_BINS = 0.05;
    /** How far above its predicted level (source power + 10·log10|H|²) a seen peak may be and still be the source peak. */
    public static final double LEVEL_EXCESS_DB = 6.0;
    /** A stronger peak within this many bins can hide a weaker component (Hann main lobe and first sidelobes). */
    public static final double HIDE_BINS = 6.0;
    /** Bins of separation the Hann window needs to show two components of different level apart (common practice). */
    public static final double RESOLVE_BINS = 4.0;
    /** End bins: within this many bins of 0 or fs/2 the spectrum has no peaks (find_peaks rule). */
    public static final double EDGE_BINS = 2.0;
    /** A mode that states "at least this many dB down" ({@link Resampling#powerGainIsUpperBound}) removes what it is not seen after. */
    public static final double BOUND_REMOVES_DB = 20.0;

    private final List<SourcePeak> sources;
    private final double sourceBinWidth;
    private final double matchBins;
    private final double marginDb;

    public VerdictClassifier(List<SourcePeak> sources, double sourceBinWidth, double matchBins, double marginDb) {
        this.sources = List.copyOf(sources);
        for (int i = 0; i < this.sources.size(); i++) {
            if (this.sources.get(i).id() != i) {
                throw new IllegalArgumentException("sources[" + i + "] has id " + this.sources.get(i).id()
                        + ", ids must be 0..n-1 in order");
            }
        }
        if (!(sourceBinWidth > 0) || Double.isInfinite(sourceBinWidth)) {
            throw new IllegalArgumentException("sourceBinWidth must be a finite number > 0, was " + sourceBinWidth);
        }
        if (!(matchBins >= 0) || Double.isInfinite(matchBins)) {
            throw new IllegalArgumentException("matchBins must be finite and >= 0, was " + matchBins);
        }
        if (!(marginDb >= 0) || Double.isInfinite(marginDb)) {
            throw new IllegalArgumentException("marginDb must be finite and >= 0, was " + marginDb);
        }
        this.sourceBinWidth = sourceBinWidth;
        this.matchBins = matchBins;
        this.marginDb = marginDb;
    }

    /** With the default detection margin of {@link PeakThreshold#DEFAULT}. */
    public VerdictClassifier(List<SourcePeak> sources, double sourceBinWidth, double matchBins) {
        this(sources, sourceBinWidth, matchBins, PeakThreshold.DEFAULT.marginDb());
    }

    /** Apparent frequency of {@code f} sampled at {@code fs}: |f − k·fs|, k = round(f/fs). */
    public static double apparentFrequency(double f, double fs) {
        return Folding.apparentHz(f, fs);
    }

    /** Fold order k = round(f/fs); 0 means the frequency is below fs/2 and is kept as it is. */
    public static long foldOrder(double f, double fs) {
        return (long) Math.floor(f / fs + 0.5);
    }

    public List<SourcePeak> sources() {
        return sources;
    }

    public double sourceBinWidth() {
        return sourceBinWidth;
    }

    /** As {@link #classify(RateStep, long, double, List, Resampling, double[], double)} without mode or floor. */
    public RateResult classify(RateStep step, long outputSamples, double binWidth, List<SpectralPeak> seen) {
        return classify(step, outputSamples, binWidth, seen, null, null, Double.NEGATIVE_INFINITY);
    }

    /** As {@link #classify(RateStep, long, double, List, Resampling, double[], double)} without a floor. */
    public RateResult classify(RateStep step, long outputSamples, double binWidth, List<SpectralPeak> seen,
            Resampling mode) {
        return classify(step, outputSamples, binWidth, seen, mode, null, Double.NEGATIVE_INFINITY);
    }

    /**
     * Classifies the peaks seen at {@code step}, from a spectrum of bin width {@code binWidth} taken over
     * {@code outputSamples} values.
     *
     * @param mode        the re-sampling mode, for the predicted levels (null: gain 1)
     * @param floorDb     running-median floor of this rate's spectrum, density dB per bin (null: unknown)
     * @param extraFloorDb a fixed density floor (the quantiser's), dB; −∞ when none
     */
    public RateResult classify(RateStep step, long outputSamples, double binWidth, List<SpectralPeak> seen,
            Resampling mode, double[] floorDb, double extraFloorDb) {
        if (!(binWidth > 0) || Double.isInfinite(binWidth)) {
            throw new IllegalArgumentException("binWidth must be a finite number > 0, was " + binWidth);
        }
        double fs = step.effectiveRate();
        double radius = SOURCE_TOLERANCE_BINS * sourceBinWidth + matchBins * binWidth;
        double binDb = 10 * Math.log10(binWidth);
        int n = sources.size();
        double[] apparent = new double[n];
        for (int i = 0; i < n; i++) {
            apparent[i] = apparentFrequency(sources.get(i).frequency(), fs);
        }
        Integer[] order = new Integer[n];
        for (int i = 0; i < n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, Comparator.comparingDouble((Integer i) -> -sources.get(i).powerDb()).thenComparing(i -> i));

        int[] claimedBy = new int[seen.size()];
        Arrays.fill(claimedBy, -1);
        SourceFate[] fates = new SourceFate[n];
        for (int i : order) {
            SourcePeak src = sources.get(i);
            double a = apparent[i];
            boolean folded = foldOrder(src.frequency(), fs) != 0;
            double gainDb = mode == null ? 0 : 10 * Math.log10(Math.max(mode.powerGain(src.frequency(), step), 1e-300));
            double predicted = src.powerDb() + gainDb;
            double ceilingDb = mode == null ? Double.POSITIVE_INFINITY : predicted + LEVEL_EXCESS_DB;
            int best = -1;
            for (int j = 0; j < seen.size(); j++) {
                double d = Math.abs(seen.get(j).frequencyHz() - a);
                if (claimedBy[j] >= 0 || d > radius || seen.get(j).levelDb() + binDb > ceilingDb) {
                    continue;
                }
                if (best < 0 || d < Math.abs(seen.get(best).frequencyHz() - a)) {
                    best = j;
                }
            }
            double floor = floorAt(floorDb, extraFloorDb, a, binWidth) + binDb + marginDb;
            String what = describe(src, a, folded, fs);
            if (best >= 0) {
                claimedBy[best] = i;
                SpectralPeak p = seen.get(best);
                double g = p.levelDb() + binDb - src.powerDb();
                fates[i] = new SourceFate(i, folded ? Verdict.FOLDS : Verdict.SURVIVES, a, p.frequencyHz(), g, gainDb,
                        floor, -1, Double.NaN, 0, String.format(Locale.ROOT, "%s; seen at %.6g Hz with a gain of %.1f dB "
                                + "(the mode predicts %.1f dB)", what, p.frequencyHz(), g, gainDb));
                continue;
            }
            List<Integer> parts = new ArrayList<>();
            for (int j = 0; j < seen.size(); j++) {
                if (claimedBy[j] < 0 && Math.abs(seen.get(j).frequencyHz() - a) <= radius + sourceBinWidth
                        && seen.get(j).levelDb() + binDb <= ceilingDb) {
                    parts.add(j);
                }
            }
            if (!parts.isEmpty() && binWidth < sourceBinWidth) {
                StringBuilder at = new StringBuilder();
                for (int j : parts) {
                    claimedBy[j] = i;
                    at.append(at.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.6g Hz", seen.get(j).frequencyHz()));
                }
                fates[i] = new SourceFate(i, Verdict.SPLITS, a, seen.get(parts.get(0)).frequencyHz(), Double.NaN, gainDb,
                        floor, -1, Double.NaN, 0, String.format(Locale.ROOT, "%s; the source spectrum (bins of %.3g Hz) "
                                + "held components closer than a bin as this one peak; at this rate's %.3g Hz bins they "
                                + "come apart: %d peak(s) at %s", what, sourceBinWidth, binWidth, parts.size(), at));
                continue;
            }
            boolean bound = mode != null && mode.powerGainIsUpperBound() && gainDb <= -BOUND_REMOVES_DB;
            fates[i] = unseen(i, src, a, what, gainDb, bound ? Double.NEGATIVE_INFINITY : predicted, floor, fs, binWidth,
                    binDb, outputSamples, seen, claimedBy, apparent);
        }
        List<ObservedPeak> observed = new ArrayList<>(seen.size());
        for (int j = 0; j < seen.size(); j++) {
            SpectralPeak p = seen.get(j);
            int s = claimedBy[j];
            if (s < 0) {
                observed.add(new ObservedPeak(p.frequencyHz(), p.levelDb(), Verdict.UNEXPLAINED, -1, Double.NaN,
                        "no source peak, nor any alias of one, lands here"));
            } else {
                observed.add(new ObservedPeak(p.frequencyHz(), p.levelDb(), fates[s].verdict(), s, fates[s].gainDb(),
                        fates[s].reason()));
            }
        }
        return new RateResult(step, outputSamples, binWidth, observed, Arrays.asList(fates));
    }

    private static String describe(SourcePeak src, double a, boolean folded, double fs) {
        return folded ? String.format(Locale.ROOT, "%.6g Hz folds to %.6g Hz at %.6g S/s", src.frequency(), a, fs)
                : String.format(Locale.ROOT, "%.6g Hz lies below half of %.6g S/s", src.frequency(), fs);
    }

    /** The floor density (dB) at frequency {@code f}: the larger of the running floor's bin and the fixed one. */
    private static double floorAt(double[] floorDb, double extra, double f, double binWidth) {
        if (floorDb == null || floorDb.length == 0) {
            return extra;
        }
        int k = (int) Math.min(floorDb.length - 1, Math.max(0, Math.round(f / binWidth)));
        return Math.max(floorDb[k], extra);
    }

    private SourceFate unseen(int i, SourcePeak src, double a, String what, double gainDb, double predicted,
            double floor, double fs, double binWidth, double binDb, long outputSamples, List<SpectralPeak> seen,
            int[] claimedBy, double[] apparent) {
        if (predicted == Double.NEGATIVE_INFINITY) {
            return new SourceFate(i, Verdict.REMOVED, a, Double.NaN, Double.NaN, gainDb, floor, -1, Double.NaN, 0,
                    String.format(Locale.ROOT, "%s; the mode attenuates it by at least %.1f dB and it is not seen: "
                            + "removed", what, -gainDb));
        }
        if (predicted < floor) {
            boolean chain = src.powerDb() >= floor;
            return new SourceFate(i, chain ? Verdict.REMOVED : Verdict.BURIED, a, Double.NaN, Double.NaN, gainDb, floor,
                    -1, Double.NaN, 0, chain
                            ? String.format(Locale.ROOT, "%s; the chain's predicted level %.1f dB (gain %.1f dB) lies "
                                    + "below the detection floor %.1f dB at this rate: removed", what, predicted, gainDb, floor)
                            : String.format(Locale.ROOT, "%s; its level %.1f dB (gain %.1f dB) lies below this rate's "
                                    + "detection floor %.1f dB: buried in the (folded) noise, not removed by the chain",
                                    what, predicted, gainDb, floor));
        }
        if (a < EDGE_BINS * binWidth || a > fs / 2 - EDGE_BINS * binWidth) {
            boolean dc = a < fs / 4;
            return new SourceFate(i, dc ? Verdict.AT_DC : Verdict.AT_NYQUIST, a, Double.NaN, Double.NaN, gainDb, floor, -1,
                    Double.NaN, 0, String.format(Locale.ROOT, "%s, within two bins of %s where the spectrum shows no "
                            + "peak; it arrives there at a predicted %.1f dB", what, dc ? "0 Hz (DC)" : "half the rate",
                            predicted));
        }
        int near = -1;
        for (int j = 0; j < seen.size(); j++) {
            double d = Math.abs(seen.get(j).frequencyHz() - a);
            if (d <= HIDE_BINS * binWidth && seen.get(j).levelDb() + binDb >= predicted
                    && (near < 0 || d < Math.abs(seen.get(near).frequencyHz() - a))) {
                near = j;
            }
        }
        if (near >= 0) {
            SpectralPeak p = seen.get(near);
            int other = claimedBy[near];
            double sep = Math.abs(p.frequencyHz() - a);
            if (other >= 0 && Math.abs(apparent[other] - a) <= binWidth + SOURCE_TOLERANCE_BINS * sourceBinWidth) {
                return new SourceFate(i, Verdict.COINCIDES, a, p.frequencyHz(), Double.NaN, gainDb, floor, other,
                        p.frequencyHz(), 0, String.format(Locale.ROOT, "%s, the same bin as source peak %d (%.6g Hz, "
                                + "seen at %.6g Hz): two components in one peak, %.3g Hz apart", what, other,
                                sources.get(other).frequency(), p.frequencyHz(), Math.abs(apparent[other] - a)));
            }
            double sepTrue = other >= 0 ? Math.abs(apparent[other] - a) : sep;
            int needed = (int) Math.min(1 << 30, Long.highestOneBit((long) Math.ceil(RESOLVE_BINS * fs / Math.max(sepTrue,
                    1e-9 * fs)) - 1) << 1);
            String longer = needed > outputSamples ? String.format(Locale.ROOT, " (more than the %d samples at this "
                    + "rate: a longer recording)", outputSamples) : "";
            return new SourceFate(i, Verdict.HIDDEN, a, Double.NaN, Double.NaN, gainDb, floor, other, p.frequencyHz(),
                    needed, String.format(Locale.ROOT, "%s and passes the chain (predicted %.1f dB, floor %s), but "
                            + "lies %.3g Hz (%.2f bins) beside the stronger peak at %.6g Hz%s and is not resolved; a "
                            + "segment of %d samples would separate them%s", what, predicted, dbText(floor), sepTrue,
                            sepTrue / binWidth, p.frequencyHz(), other >= 0 ? " (source peak " + other + ")" : "",
                            needed, longer));
        }
        return new SourceFate(i, Verdict.MISSING, a, Double.NaN, Double.NaN, gainDb, floor, -1, Double.NaN, 0,
                String.format(Locale.ROOT, "%s; predicted at %.1f dB, above the floor (%s) and clear of other "
                        + "peaks, yet not seen", what, predicted, dbText(floor)));
    }

    private static String dbText(double db) {
        return Double.isFinite(db) ? String.format(Locale.ROOT, "%.1f dB", db) : "not known";
    }
}
