package org.foldbook.sweep;

import org.foldbook.dsp.peaks.PeakFinder;

/**
 * How the sweep turns samples into peaks: Welch PSD with periodic Hann segments of
 * {@code min(maxSegment, largest power of two <= length)} samples, 50 % overlap, constant detrend, density
 * scaling; peaks of {@code 10·log10(max(P, 1e-300))} with prominence at least {@code prominenceDb}
 * (scipy.signal.find_peaks rules, end bins never) and, by default, a margin over the running noise floor
 * ({@link PeakThreshold}); a seen peak belongs to a source peak when it lies within half a source bin plus
 * {@code matchBins} bins of the predicted frequency. Source peaks more than {@code listWithinDb} below the
 * strongest are counted, not listed.
 *
 * @param maxSegment   largest Welch segment, a power of two &gt;= 8
 * @param prominenceDb peak prominence threshold, dB &gt;= 0
 * @param matchBins    match radius in bins at the rate, &gt;= 0
 * @param threshold    the peak threshold
 * @param listWithinDb source peaks further below the strongest are summarised, dB &gt; 0
 */
public record SpectrumSettings(int maxSegment, double prominenceDb, double matchBins, PeakThreshold threshold,
        double listWithinDb) {

    /** 4096-sample segments, 10 dB prominence, 1.5-bin match radius, 12 dB over the floor, list within 120 dB. */
    public static final SpectrumSettings DEFAULT = new SpectrumSettings(4096, 10.0,
            VerdictClassifier.DEFAULT_MATCH_BINS, PeakThreshold.DEFAULT, 120);

    /** The side-by-side rule: as {@link #DEFAULT} with prominence only and every source peak listed. */
    public static final SpectrumSettings PROMINENCE_ONLY = new SpectrumSettings(4096, 10.0,
            VerdictClassifier.DEFAULT_MATCH_BINS, PeakThreshold.PROMINENCE_ONLY, Double.POSITIVE_INFINITY);

    public SpectrumSettings {
        if (maxSegment < 8 || Integer.bitCount(maxSegment) != 1) {
            throw new IllegalArgumentException("maxSegment must be a power of two >= 8, was " + maxSegment);
        }
        if (!(prominenceDb >= 0) || Double.isInfinite(prominenceDb)) {
            throw new IllegalArgumentException("prominenceDb must be finite and >= 0, was " + prominenceDb);
        }
        if (!(matchBins >= 0) || Double.isInfinite(matchBins)) {
            throw new IllegalArgumentException("matchBins must be finite and >= 0, was " + matchBins);
        }
        java.util.Objects.requireNonNull(threshold, "threshold");
        if (!(listWithinDb > 0)) {
            throw new IllegalArgumentException("listWithinDb must be > 0, was " + listWithinDb);
        }
    }

    /** With the default threshold and listing. */
    public SpectrumSettings(int maxSegment, double prominenceDb, double matchBins) {
        this(maxSegment, prominenceDb, matchBins, PeakThreshold.DEFAULT, 120);
    }

    public SpectrumSettings withThreshold(PeakThreshold t) {
        return new SpectrumSettings(maxSegment, prominenceDb, matchBins, t, listWithinDb);
    }

    /** Segment length for a sequence of {@code length} samples: min(maxSegment, largest power of two <= length). */
    public int segmentFor(long length) {
        if (length < 1) {
            throw new IllegalArgumentException("length must be >= 1, was " + length);
        }
        long p = Long.highestOneBit(length);
        return (int) Math.min(maxSegment, p);
    }

    /** The peak finder at rate {@code fs} (the quantisation floor depends on the rate). */
    PeakFinder finderAt(double fs) {
        PeakFinder.Builder b = PeakFinder.builder().prominenceDb(prominenceDb);
        if (threshold.noiseAware()) {
            b.noiseFloor(threshold.floorWindowBins(), threshold.marginDb());
            double q = threshold.quantisationFloorDb(fs);
            if (q > Double.NEGATIVE_INFINITY) {
                b.minimumLevelDb(q + threshold.marginDb());
            }
        }
        return b.build();
    }
}
