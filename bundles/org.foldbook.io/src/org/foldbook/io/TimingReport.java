package org.foldbook.io;

import java.util.List;

/**
 * What the time stamps of a recording say about its sampling: the nominal interval, how far single
 * intervals stray from it (jitter) and where samples are missing (gaps). Readers never resample to hide
 * either; the samples come back exactly as stored, and this report says how trustworthy the grid is.
 *
 * @param timeUnit        unit of the time column as found ("s", "ms", ...); all values here are seconds
 * @param nominalInterval median of the first intervals (up to {@value #NOMINAL_WINDOW}), seconds
 * @param meanInterval    (last - first) / (rows - 1), seconds; differs from nominal when there are gaps
 * @param maxJitter       largest |interval - nominal| among intervals that are not gaps, seconds
 * @param rmsJitter       RMS of (interval - nominal) among intervals that are not gaps, seconds
 * @param gapCount        number of intervals longer than {@value #GAP_FACTOR} x nominal
 * @param gaps            the first gaps (at most {@value #MAX_LISTED_GAPS})
 */
public record TimingReport(String timeUnit, double firstTime, double lastTime, double nominalInterval,
        double meanInterval, double maxJitter, double rmsJitter, long gapCount, List<Gap> gaps) {

    /** Intervals used for the median that defines the nominal interval (keeps memory bounded). */
    public static final int NOMINAL_WINDOW = 1001;
    /** An interval longer than this many nominal intervals is a gap (our threshold, common practice is 1.5). */
    public static final double GAP_FACTOR = 1.5;
    /** Jitter above this fraction of the nominal interval makes the timing irregular (our threshold). */
    public static final double JITTER_TOLERANCE = 0.01;
    public static final int MAX_LISTED_GAPS = 100;

    public TimingReport {
        gaps = List.copyOf(gaps);
    }

    /** One gap: the row after which samples are missing, and how long the interval was. */
    public record Gap(long line, double startTime, double interval, long missingSamples) {
    }

    /** Sample rate implied by the nominal interval, in S/s. */
    public double nominalRate() {
        return 1.0 / nominalInterval;
    }

    /** True when there are no gaps and the jitter stays below {@link #JITTER_TOLERANCE} of the interval. */
    public boolean isRegular() {
        return gapCount == 0 && maxJitter <= JITTER_TOLERANCE * nominalInterval;
    }
}
