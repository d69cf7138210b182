package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.peaks.PeakFinder;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.spectrum.WelchAccumulator;
import org.foldbook.dsp.window.WindowShape;

/**
 * The recording's own PSD at its own rate and the reference peaks found in it: the starting point of
 * every sweep verdict and of the spectral preview. Immutable.
 */
public final class SourceSpectrum {
    private final double sourceRate;
    private final long samples;
    private final int segment;
    private final double[] psd;
    private final List<SourcePeak> peaks;
    private final int[] peakBins;
    private final SpectrumSettings settings;
    private final SummarisedPeaks summarised;

    private SourceSpectrum(double sourceRate, long samples, int segment, double[] psd, List<SourcePeak> peaks,
            int[] peakBins, SpectrumSettings settings, SummarisedPeaks summarised) {
        this.sourceRate = sourceRate;
        this.samples = samples;
        this.segment = segment;
        this.psd = psd;
        this.peaks = List.copyOf(peaks);
        this.peakBins = peakBins;
        this.settings = settings;
        this.summarised = summarised;
    }

    /**
     * Welch PSD of {@code source} (finite samples) at {@code sourceRate} with the sweep's spectrum rules, and
     * its peaks.
     */
    public static SourceSpectrum of(double[] source, double sourceRate, SpectrumSettings settings) {
        Check.finiteSamples("source", source);
        Check.positive("sourceRate", sourceRate);
        int seg = settings.segmentFor(source.length);
        // through the same accumulator as the streaming sweep, so both give this PSD to the last bit
        WelchAccumulator acc = new WelchAccumulator(Welch.builder(seg).build(), sourceRate);
        acc.add(source, 0, source.length);
        double[] p = new double[seg / 2 + 1];
        acc.finish(p);
        return fromPsd(p, sourceRate, source.length, seg, settings);
    }

    /** From a PSD already computed with the sweep's rules ({@code psd.length = segment/2 + 1}). */
    static SourceSpectrum fromPsd(double[] psd, double sourceRate, long samples, int segment,
            SpectrumSettings settings) {
        if (psd.length != segment / 2 + 1) {
            throw new IllegalArgumentException("psd.length must be segment/2+1 = " + (segment / 2 + 1) + ", was "
                    + psd.length);
        }
        double binWidth = sourceRate / segment;
        // same bins as the sweep's finder, but with the Hann kernel's sub-bin estimate (PeakFinder: below
        // 1e-3 bin and 0.01 dB for a lone tone), so a source peak's frequency is known far better than its bin
        PeakFinder.Builder fb = PeakFinder.builder().prominenceDb(settings.prominenceDb())
                .windowKernel(WindowShape.HANN.periodic(segment));
        PeakThreshold t = settings.threshold();
        if (t.noiseAware()) {
            fb.noiseFloor(t.floorWindowBins(), t.marginDb());
            double q = t.quantisationFloorDb(sourceRate);
            if (q > Double.NEGATIVE_INFINITY) {
                fb.minimumLevelDb(q + t.marginDb());
            }
        }
        List<SpectralPeak> found = fb.build().findInPower(psd, psd.length, binWidth);
        double strongest = Double.NEGATIVE_INFINITY;
        for (SpectralPeak p : found) {
            strongest = Math.max(strongest, p.levelDb());
        }
        List<SourcePeak> refs = new ArrayList<>(found.size());
        int[] bins = new int[found.size()];
        double binDb = 10 * Math.log10(binWidth);
        int left = 0;
        double highestLeft = Double.NaN;
        for (SpectralPeak p : found) {
            if (p.levelDb() < strongest - settings.listWithinDb()) {
                left++;
                highestLeft = Double.isNaN(highestLeft) ? p.levelDb() : Math.max(highestLeft, p.levelDb());
                continue;
            }
            bins[refs.size()] = p.bin();
            refs.add(new SourcePeak(refs.size(), p.frequencyHz(), p.levelDb(), p.levelDb() + binDb));
        }
        return new SourceSpectrum(sourceRate, samples, segment, psd.clone(), refs,
                java.util.Arrays.copyOf(bins, refs.size()), settings,
                new SummarisedPeaks(left, settings.listWithinDb(), highestLeft));
    }

    /** Bin of the local maximum of source peak {@code id}. */
    int peakBin(int id) {
        return peakBins[id];
    }

    /** Source peaks left out of {@link #peaks()} for lying far below the strongest. */
    public SummarisedPeaks summarised() {
        return summarised;
    }

    public double sourceRate() {
        return sourceRate;
    }

    public long samples() {
        return samples;
    }

    /** Welch segment length used at the source rate. */
    public int segment() {
        return segment;
    }

    public double binWidth() {
        return sourceRate / segment;
    }

    /** Number of one-sided bins, {@code segment/2 + 1}. */
    public int bins() {
        return psd.length;
    }

    /** Density at bin k (unit²/Hz), k·binWidth Hz. */
    public double psd(int k) {
        return psd[k];
    }

    /** A copy of the density values. */
    public double[] psdValues() {
        return psd.clone();
    }

    /** The reference peaks, in frequency order, ids 0..n-1. */
    public List<SourcePeak> peaks() {
        return peaks;
    }

    public SpectrumSettings settings() {
        return settings;
    }

    /** The verdict rules against these reference peaks. */
    public VerdictClassifier classifier() {
        return new VerdictClassifier(peaks, binWidth(), settings.matchBins(), settings.threshold().marginDb());
    }
}
