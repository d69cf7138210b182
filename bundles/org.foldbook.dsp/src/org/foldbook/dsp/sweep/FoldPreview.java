package org.foldbook.dsp.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.foldbook.dsp.peaks.PeakFinder;
import org.foldbook.dsp.peaks.SpectralPeak;

/**
 * The spectral-fold preview: what a rate would show, computed from the source PSD alone, without touching
 * the samples, so a what-if control can answer at once.
 *
 * <p>Sampling at fs maps source frequency f to |f − k·fs|, k = round(f/fs) (Oppenheim &amp; Schafer ch. 4),
 * and one-sided densities of all frequencies landing on the same apparent frequency add (the map keeps
 * widths, so density is conserved bin for bin). Each source bin k, weighted by the chain's |H(f)|², is moved
 * to the bin nearest its apparent frequency on a grid of the source bin width over [0, fs/2]. Within one
 * fold zone the map is a shift or a mirror, so neighbouring source bins stay neighbours and a peak keeps its
 * shape; bins of different zones that land together are the aliasing itself. Then the sweep's peak rules and
 * verdicts apply as at any rate.
 *
 * <p>Limits: resolution is that of the source spectrum (the time-domain modes at a lower rate have finer
 * bins), so the preview's frequencies are good to about one source bin; it predicts levels as power per
 * bin, not the exact density a Welch estimate at the new rate would give. Immutable and thread-safe.
 */
public final class FoldPreview {
    private final SourceSpectrum source;
    private final VerdictClassifier classifier;
    private final PeakFinder finder;
    private final double[] freq;

    public FoldPreview(SourceSpectrum source) {
        this.source = Objects.requireNonNull(source, "source");
        this.classifier = source.classifier();
        this.finder = SourceSpectrum.finder(source.settings());
        this.freq = new double[source.bins()];
        for (int k = 0; k < freq.length; k++) {
            freq[k] = k * source.binWidth();
        }
    }

    public SourceSpectrum source() {
        return source;
    }

    /** The folded PSD at {@code step}'s rate, bins of the source bin width from 0 to fs/2, weighted by {@code chain}. */
    public double[] foldedPsd(RateStep step, Resampling chain) {
        double fs = step.effectiveRate();
        double df = source.binWidth();
        int bins = (int) Math.floor(fs / 2 / df) + 1;
        double[] out = new double[Math.max(bins, 3)];
        int last = out.length - 1;
        for (int k = 0; k < freq.length; k++) {
            double p = source.psd(k);
            if (p == 0) {
                continue;
            }
            double g = chain.powerGain(freq[k], step);
            double fa = VerdictClassifier.apparentFrequency(freq[k], fs);
            int j = (int) Math.rint(fa / df);
            out[Math.min(j, last)] += p * g;
        }
        return out;
    }

    /** Peaks and verdicts at {@code step} through {@code chain}, as a {@link RateResult} with 0 output samples. */
    public RateResult preview(RateStep step, Resampling chain) {
        double[] p = foldedPsd(step, chain);
        List<SpectralPeak> peaks = finder.findInPower(p, p.length, source.binWidth());
        return classifier.classify(step, 0, source.binWidth(), peaks);
    }

    /** The preview over a whole ladder, as a sweep result whose mode is {@code preview-<chain>}. */
    public SweepResult preview(RateLadder ladder, Resampling chain) {
        if (ladder.sourceRate() != source.sourceRate()) {
            throw new IllegalArgumentException("ladder source rate " + ladder.sourceRate()
                    + " differs from the recording's " + source.sourceRate());
        }
        List<RateResult> rates = new ArrayList<>(ladder.size());
        for (RateStep s : ladder.steps()) {
            rates.add(preview(s, chain));
        }
        return new SweepResult("preview-" + chain.name(), source.sourceRate(), source.samples(), source.binWidth(),
                source.peaks(), rates, java.util.Optional.empty());
    }
}
