package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.dsp.peaks.SpectralPeak;

/**
 * Gives every source peak its verdict at one rate and every peak seen there its source.
 *
 * <p>The apparent frequency of a source peak at rate fs is |f − k·fs| with k = round(f/fs) (folding;
 * Oppenheim &amp; Schafer ch. 4). A peak seen within the match radius of it is that source peak arriving:
 * SURVIVES when k = 0, FOLDS otherwise. The match radius is {@value #SOURCE_TOLERANCE_BINS} of a source bin
 * (the source peak's sub-bin frequency estimate, with room for leakage of neighbours and noise) plus
 * {@code matchBins} bins at the rate (a seen peak is a bin centre). A source peak with no free peak in
 * its match radius but a stronger source peak's seen peak within {@value #MERGE_BINS} bins (the Hann main
 * lobe's half width: not resolved) MERGES into it. With a mode given, a seen peak more
 * than {@value #LEVEL_EXCESS_DB} dB above the source peak's predicted level (its power times the mode's
 * |H(f)|²) is not taken for it: that is other content (often a noise peak of a short average) at the spot
 * where a strongly attenuated source peak would land. Source peaks are served
 * strongest first; one whose only candidate was already taken by a stronger source peak MERGES into it; one
 * with no candidate is SUPPRESSED. Peaks seen that no source peak claims are UNEXPLAINED.
 *
 * <p>Levels are compared as power in one bin (density + 10·log10(bin width)), which for a tone stays put
 * when the rate, and so the bin width, changes; the gain is then the attenuation the peak got. The source
 * level is scalloping-corrected and a seen level is a bin's, so a gain includes 0 to −1.42 dB of Hann
 * scalloping (Harris 1978, Table 1).
 */
public final class VerdictClassifier {
    /** Default match radius in bins at the rate, beyond the source-bin half width: 1.5 (common practice). */
    public static final double DEFAULT_MATCH_BINS = 1.5;
    /** Uncertainty of a source peak's frequency, in source bins. */
    public static final double SOURCE_TOLERANCE_BINS = 0.05;
    /** How far above its predicted level (source power + 10·log10|H|²) a seen peak may be and still be the source peak. */
    public static final double LEVEL_EXCESS_DB = 6.0;
    /** Two peaks closer than this many bins are not resolved: the Hann main lobe's half width (Harris 1978). */
    public static final double MERGE_BINS = 2.0;

    private final List<SourcePeak> sources;
    private final double sourceBinWidth;
    private final double matchBins;

    public VerdictClassifier(List<SourcePeak> sources, double sourceBinWidth, double matchBins) {
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
        this.sourceBinWidth = sourceBinWidth;
        this.matchBins = matchBins;
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

    /**
     * Classifies the peaks seen at {@code step}, from a spectrum of bin width {@code binWidth} taken over
     * {@code outputSamples} values.
     */
    public RateResult classify(RateStep step, long outputSamples, double binWidth, List<SpectralPeak> seen) {
        return classify(step, outputSamples, binWidth, seen, null);
    }

    /** As {@link #classify(RateStep, long, double, List)}, with the level check against {@code mode}'s |H|² (null: none). */
    public RateResult classify(RateStep step, long outputSamples, double binWidth, List<SpectralPeak> seen,
            Resampling mode) {
        if (!(binWidth > 0) || Double.isInfinite(binWidth)) {
            throw new IllegalArgumentException("binWidth must be a finite number > 0, was " + binWidth);
        }
        double fs = step.effectiveRate();
        double radius = SOURCE_TOLERANCE_BINS * sourceBinWidth + matchBins * binWidth;
        double mergeRadius = SOURCE_TOLERANCE_BINS * sourceBinWidth + Math.max(matchBins, MERGE_BINS) * binWidth;
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
            double ceilingDb = Double.POSITIVE_INFINITY;
            if (mode != null) {
                ceilingDb = src.powerDb() + 10 * Math.log10(Math.max(mode.powerGain(src.frequency(), step), 1e-300))
                        + LEVEL_EXCESS_DB;
            }
            int best = -1;
            int bestTaken = -1;
            for (int j = 0; j < seen.size(); j++) {
                double d = Math.abs(seen.get(j).frequencyHz() - apparent[i]);
                if (d > (claimedBy[j] < 0 ? radius : mergeRadius)) {
                    continue;
                }
                if (claimedBy[j] < 0) {
                    if (seen.get(j).levelDb() + binDb > ceilingDb) {
                        continue; // too strong to be this source peak on its own
                    }
                    if (best < 0 || d < Math.abs(seen.get(best).frequencyHz() - apparent[i])) {
                        best = j;
                    }
                } else if (bestTaken < 0 || d < Math.abs(seen.get(bestTaken).frequencyHz() - apparent[i])) {
                    bestTaken = j;
                }
            }
            if (best >= 0) {
                claimedBy[best] = i;
                SpectralPeak p = seen.get(best);
                Verdict v = foldOrder(src.frequency(), fs) == 0 ? Verdict.SURVIVES : Verdict.FOLDS;
                fates[i] = new SourceFate(i, v, apparent[i], p.frequencyHz(), p.levelDb() + binDb - src.powerDb(), -1);
            } else if (bestTaken >= 0) {
                SpectralPeak p = seen.get(bestTaken);
                fates[i] = new SourceFate(i, Verdict.MERGES, apparent[i], p.frequencyHz(),
                        p.levelDb() + binDb - src.powerDb(), claimedBy[bestTaken]);
            } else {
                fates[i] = new SourceFate(i, Verdict.SUPPRESSED, apparent[i], Double.NaN, Double.NaN, -1);
            }
        }
        List<ObservedPeak> observed = new ArrayList<>(seen.size());
        for (int j = 0; j < seen.size(); j++) {
            SpectralPeak p = seen.get(j);
            int s = claimedBy[j];
            if (s < 0) {
                observed.add(new ObservedPeak(p.frequencyHz(), p.levelDb(), Verdict.UNEXPLAINED, -1, Double.NaN));
            } else {
                observed.add(new ObservedPeak(p.frequencyHz(), p.levelDb(), fates[s].verdict(), s, fates[s].gainDb()));
            }
        }
        return new RateResult(step, outputSamples, binWidth, observed, Arrays.asList(fates));
    }
}
