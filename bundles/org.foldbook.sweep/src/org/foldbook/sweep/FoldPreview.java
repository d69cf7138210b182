package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

import org.foldbook.dsp.peaks.SpectralPeak;

/**
 * The spectral-fold preview: what a rate would show, computed from the source PSD alone, without touching
 * the samples, so a what-if control can answer at once (a rate costs a few passes over a few thousand bins).
 *
 * <p>Sampling at fs maps source frequency f to |f − k·fs|, k = round(f/fs) (Oppenheim &amp; Schafer ch. 4),
 * and the one-sided densities of all frequencies landing on one apparent frequency add (the map keeps
 * widths). The source PSD is split in two parts that fold differently:
 * <ul>
 * <li>the <b>continuum</b>: the PSD with each source peak's main lobe bridged (log-linear between the
 * lobe's ends). Every source bin, weighted by the chain's |H(f)|², moves to the bin nearest its apparent
 * frequency; the result is read at the rate's own bin centres by linear interpolation;</li>
 * <li>the <b>lines</b>: each source peak as a tone of power P·df0·ENBW (P its scalloping-corrected density
 * level, ENBW = 1.5 bins for Hann), weighted by |H(f)|² at its frequency, placed at its exact apparent
 * frequency and drawn on the rate's bin grid with the Hann kernel |W(ν)|/W(0) = |sinc ν / (1 − ν²)|
 * (F. J. Harris, Proc. IEEE 66(1), 1978), over ±{@value #KERNEL_BINS} bins.</li>
 * </ul>
 * The rate's bin grid is that of the time-domain modes (segment min(4096, 2^⌊log2 M⌋) for M re-sampled
 * values), so peaks that merge or separate there do so here too; then the sweep's peak rules and verdicts
 * apply. What it cannot show: noise peaks of a short Welch average (it draws the mean floor), and what a
 * re-sampler does beyond the |H|² model it is given. Immutable and thread-safe.
 */
public final class FoldPreview {
    static final int KERNEL_BINS = 48;
    private static final double HANN_ENBW = 1.5;

    private final SourceSpectrum source;
    private final VerdictClassifier classifier;
    private final double[] continuum;
    private final double[] freq;
    private final double[] linePower;

    public FoldPreview(SourceSpectrum source) {
        this.source = Objects.requireNonNull(source, "source");
        this.classifier = source.classifier();
        int k = source.bins();
        this.freq = new double[k];
        this.continuum = source.psdValues();
        for (int i = 0; i < k; i++) {
            freq[i] = i * source.binWidth();
        }
        List<SourcePeak> peaks = source.peaks();
        this.linePower = new double[peaks.size()];
        for (SourcePeak p : peaks) {
            linePower[p.id()] = Math.pow(10, p.levelDb() / 10) * source.binWidth() * HANN_ENBW;
            bridgeLobe(continuum, source.peakBin(p.id()));
        }
    }

    /** Replaces the falling flanks around bin {@code b} (up to 64 bins a side) by a log-linear bridge. */
    private static void bridgeLobe(double[] p, int b) {
        int lo = b;
        while (lo > 0 && b - lo < 64 && p[lo - 1] < p[lo]) {
            lo--;
        }
        int hi = b;
        while (hi < p.length - 1 && hi - b < 64 && p[hi + 1] < p[hi]) {
            hi++;
        }
        double a = Math.log(Math.max(p[lo], 1e-300));
        double c = Math.log(Math.max(p[hi], 1e-300));
        for (int i = lo + 1; i < hi; i++) {
            p[i] = Math.exp(a + (c - a) * (i - lo) / (hi - lo));
        }
    }

    public SourceSpectrum source() {
        return source;
    }

    /** Welch segment the time-domain modes use at {@code step}'s rate. */
    int segmentAt(RateStep step) {
        return source.settings().segmentFor(step.outputLength(source.samples()));
    }

    /**
     * The predicted PSD at {@code step}'s rate through {@code chain}, on that rate's own bins
     * ({@code segment/2 + 1} values, bin j at {@code j·fs/segment}).
     */
    public double[] foldedPsd(RateStep step, Resampling chain) {
        double fs = step.effectiveRate();
        double df0 = source.binWidth();
        int zoneBins = (int) Math.floor(fs / 2 / df0) + 2;
        double[] folded = new double[zoneBins];
        for (int k = 0; k < freq.length; k++) {
            double p = continuum[k];
            if (p == 0) {
                continue;
            }
            int j = (int) Math.rint(VerdictClassifier.apparentFrequency(freq[k], fs) / df0);
            folded[Math.min(j, zoneBins - 1)] += p * chain.powerGain(freq[k], step);
        }
        int seg = segmentAt(step);
        double df = fs / seg;
        int bins = seg / 2 + 1;
        double[] out = new double[bins];
        for (int j = 0; j < bins; j++) {
            double u = j * df / df0;
            int i = Math.min((int) u, zoneBins - 2);
            double t = u - i;
            out[j] = folded[i] + t * (folded[i + 1] - folded[i]);
        }
        for (SourcePeak p : source.peaks()) {
            double power = linePower[p.id()] * chain.powerGain(p.frequency(), step);
            double centre = VerdictClassifier.apparentFrequency(p.frequency(), fs) / df;
            int first = Math.max(0, (int) Math.ceil(centre - KERNEL_BINS));
            int last = Math.min(bins - 1, (int) Math.floor(centre + KERNEL_BINS));
            double scale = power / (df * HANN_ENBW);
            for (int j = first; j <= last; j++) {
                double w = hannKernel(j - centre);
                out[j] += scale * w * w;
            }
        }
        return out;
    }

    /** |W(ν)|/W(0) of the Hann window, ν in bins: |sinc ν / (1 − ν²)|, 1/2 at ν = ±1. */
    static double hannKernel(double nu) {
        double a = Math.abs(nu);
        if (a < 1e-9) {
            return 1.0;
        }
        if (Math.abs(a - 1) < 1e-9) {
            return 0.5;
        }
        return Math.abs(Math.sin(Math.PI * a) / (Math.PI * a) / (1 - a * a));
    }

    /** Peaks and verdicts at {@code step} through {@code chain}, as a {@link RateResult} with 0 output samples. */
    public RateResult preview(RateStep step, Resampling chain) {
        double[] p = foldedPsd(step, chain);
        double df = step.effectiveRate() / segmentAt(step);
        SpectrumSettings st = source.settings();
        List<SpectralPeak> peaks = st.finderAt(step.effectiveRate()).findInPower(p, p.length, df);
        return classifier.classify(step, 0, df, peaks, chain, SweepEngine.floorOf(p, p.length, st),
                st.threshold().quantisationFloorDb(step.effectiveRate()));
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
        return new SweepResult("preview-" + chain.mode().word(), source.sourceRate(), source.samples(), source.binWidth(),
                source.peaks(), rates, Optional.empty(), chain.accuracy(source.sourceRate()),
                chain.warnings(source.sourceRate()), source.summarised(), source.settings().threshold().describe());
    }
}
