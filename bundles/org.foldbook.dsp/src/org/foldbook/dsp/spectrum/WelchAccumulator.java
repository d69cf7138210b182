package org.foldbook.dsp.spectrum;

import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * {@link Welch} over a stream: samples arrive block by block (a recording larger than memory), only one
 * segment is held at a time, and {@link #result} is the same estimate {@link Welch#psd} gives for the whole
 * signal at once - segments at 0, step, 2 step ..., the tail after the last whole segment unused - because
 * the Welch mean is a plain average of per-segment periodograms and each segment's periodogram is computed
 * by the same operator. Not thread-safe: one stream, one thread.
 */
public final class WelchAccumulator {
    private final Welch welch;
    private final double sampleRate;
    private final Unit unit;
    private final double[] segment;
    private final double[] one;
    private final double[] sum;
    private final Welch.Workspace workspace;
    private int filled;
    private int segments;

    /** Accumulates {@code welch}'s estimate of samples in {@code unit} at {@code sampleRate} Hz. */
    public WelchAccumulator(Welch welch, double sampleRate, Unit unit) {
        this.welch = Objects.requireNonNull(welch, "welch");
        this.sampleRate = Check.positive("sampleRate", sampleRate);
        this.unit = Objects.requireNonNull(unit, "unit");
        int n = welch.segmentLength();
        this.segment = new double[n];
        this.one = new double[welch.bins()];
        this.sum = new double[welch.bins()];
        this.workspace = new Welch.Workspace(n);
    }

    /** Adds {@code x[offset .. offset+length)}, the next samples of the stream. */
    public void add(double[] x, int offset, int length) {
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        Check.slice("x", x.length, offset, length);
        int n = segment.length;
        int step = welch.step();
        int i = 0;
        while (i < length) {
            int take = Math.min(n - filled, length - i);
            System.arraycopy(x, offset + i, segment, filled, take);
            filled += take;
            i += take;
            if (filled == n) {
                welch.psdInto(segment, 0, n, sampleRate, workspace, one); // one segment, already scaled
                for (int k = 0; k < sum.length; k++) {
                    sum[k] += one[k];
                }
                segments++;
                // the next segment starts step samples later: keep the overlap
                System.arraycopy(segment, step, segment, 0, n - step);
                filled = n - step;
            }
        }
    }

    /** Whole segments averaged so far. */
    public int segments() {
        return segments;
    }

    /**
     * The estimate over everything added so far.
     *
     * @throws IllegalStateException before one whole segment has arrived
     */
    public PowerSpectrum result() {
        if (segments == 0) {
            throw new IllegalStateException("fewer samples than one segment of " + segment.length);
        }
        double[] mean = new double[sum.length];
        for (int k = 0; k < mean.length; k++) {
            mean[k] = sum[k] / segments;
        }
        return new PowerSpectrum(mean, sampleRate, segment.length, welch.scaling(), unit, segments,
                welch.window().enbwBins());
    }
}
