package org.foldbook.audit;

/**
 * Figures of one channel's samples gathered in a single pass, block by block, in constant memory:
 * extremes, mean and RMS, samples at the rails (with the longest run), runs of exact zeros (dropouts),
 * runs of one repeated non-zero value (flat runs), non-finite values.
 */
final class SampleStatistics implements org.foldbook.channel.ChannelStream.BlockSink {
    private final double railLevel;
    private final int dropoutSamples;
    private final int flatSamples;

    long count;
    long nonFinite;
    long firstNonFinite = -1;
    double min = Double.POSITIVE_INFINITY;
    double max = Double.NEGATIVE_INFINITY;
    private double sum;
    private double sumSq;
    long clipped;
    long longestClipRun;
    long longestClipStart = -1;
    long dropouts;
    long longestDropout;
    long longestDropoutStart = -1;
    long flatRuns;
    long longestFlat;
    long longestFlatStart = -1;

    private long clipRun;
    private long run;
    private long runStart;
    private double runValue = Double.NaN;

    /**
     * @param railLevel      |x| at or above this is at the rail (NaN: full scale unknown, not counted)
     * @param dropoutSamples run length of exact zeros or NaNs that makes a dropout
     * @param flatSamples    run length of one non-zero value that makes a flat run
     */
    SampleStatistics(double railLevel, int dropoutSamples, int flatSamples) {
        this.railLevel = railLevel;
        this.dropoutSamples = dropoutSamples;
        this.flatSamples = flatSamples;
    }

    @Override
    public void accept(double[] x, int n) {
        for (int i = 0; i < n; i++) {
            double v = x[i];
            long index = count++;
            boolean finite = Double.isFinite(v);
            if (!finite) {
                nonFinite++;
                if (firstNonFinite < 0) {
                    firstNonFinite = index;
                }
            } else {
                min = Math.min(min, v);
                max = Math.max(max, v);
                sum += v;
                sumSq += v * v;
                if (Math.abs(v) >= railLevel) {
                    clipped++;
                    if (++clipRun > longestClipRun) {
                        longestClipRun = clipRun;
                        longestClipStart = index - clipRun + 1;
                    }
                } else {
                    clipRun = 0;
                }
            }
            // NaN and 0 both read as "no signal" for dropouts; compare bit-equal values for flat runs
            double key = finite ? v : 0.0;
            if (run > 0 && key == runValue) {
                run++;
            } else {
                closeRun();
                run = 1;
                runStart = index;
                runValue = key;
            }
        }
    }

    /** Ends the pass: the last run is counted. */
    void finish() {
        closeRun();
        run = 0;
    }

    private void closeRun() {
        if (run == 0) {
            return;
        }
        if (runValue == 0.0 && run >= dropoutSamples) {
            dropouts++;
            if (run > longestDropout) {
                longestDropout = run;
                longestDropoutStart = runStart;
            }
        } else if (runValue != 0.0 && run >= flatSamples) {
            flatRuns++;
            if (run > longestFlat) {
                longestFlat = run;
                longestFlatStart = runStart;
            }
        }
    }

    long finiteCount() {
        return count - nonFinite;
    }

    double mean() {
        return finiteCount() == 0 ? Double.NaN : sum / finiteCount();
    }

    /** Standard deviation about the mean (the AC part). */
    double acRms() {
        long n = finiteCount();
        if (n == 0) {
            return Double.NaN;
        }
        double m = mean();
        return Math.sqrt(Math.max(0, sumSq / n - m * m));
    }
}
