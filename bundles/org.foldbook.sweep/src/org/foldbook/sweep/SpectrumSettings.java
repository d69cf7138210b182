package org.foldbook.sweep;

/**
 * How the sweep turns samples into peaks, the peer's rules by default: Welch PSD with periodic Hann
 * segments of {@code min(maxSegment, largest power of two <= length)} samples, 50 % overlap, constant
 * detrend, density scaling; peaks of {@code 10·log10(max(P, 1e-300))} with prominence at least
 * {@code prominenceDb} (scipy.signal.find_peaks rules, end bins never); a seen peak belongs to a source peak
 * when it lies within half a source bin plus {@code matchBins} bins of the predicted frequency.
 *
 * @param maxSegment  largest Welch segment, a power of two &gt;= 8
 * @param prominenceDb peak prominence threshold, dB &gt;= 0
 * @param matchBins   match radius in bins at the rate, &gt;= 0
 */
public record SpectrumSettings(int maxSegment, double prominenceDb, double matchBins) {

    /** 4096-sample segments, 10 dB prominence, 1.5-bin match radius. */
    public static final SpectrumSettings DEFAULT = new SpectrumSettings(4096, 10.0,
            VerdictClassifier.DEFAULT_MATCH_BINS);

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
    }

    /** Segment length for a sequence of {@code length} samples: min(maxSegment, largest power of two <= length). */
    public int segmentFor(long length) {
        if (length < 1) {
            throw new IllegalArgumentException("length must be >= 1, was " + length);
        }
        long p = Long.highestOneBit(length);
        return (int) Math.min(maxSegment, p);
    }
}
