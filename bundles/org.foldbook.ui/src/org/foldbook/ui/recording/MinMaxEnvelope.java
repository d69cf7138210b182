package org.foldbook.ui.recording;

import java.util.Arrays;

/**
 * The time overview of a recording of any length: the samples are reduced, as they stream past, to a
 * fixed number of columns holding each column's minimum and maximum, so memory does not grow with the
 * file and no short spike disappears (as it would by picking every k-th sample). Not thread-safe.
 */
public final class MinMaxEnvelope {
    private final long frames;
    private final long perColumn;
    private final double[] min;
    private final double[] max;
    private long position;

    /** For a stream of {@code frames >= 1} samples, in at most {@code columns >= 1} columns. */
    public MinMaxEnvelope(long frames, int columns) {
        if (frames < 1 || columns < 1) {
            throw new IllegalArgumentException("frames and columns must be >= 1, were " + frames + ", " + columns);
        }
        this.frames = frames;
        this.perColumn = (frames + columns - 1) / columns;
        int used = (int) ((frames + perColumn - 1) / perColumn);
        this.min = new double[used];
        this.max = new double[used];
        Arrays.fill(min, Double.POSITIVE_INFINITY);
        Arrays.fill(max, Double.NEGATIVE_INFINITY);
    }

    public void add(double[] x, int count) {
        if (position + count > frames) {
            throw new IllegalArgumentException("more samples than the " + frames + " announced");
        }
        for (int i = 0; i < count; i++) {
            int c = (int) ((position + i) / perColumn);
            double v = x[i];
            if (v < min[c]) {
                min[c] = v;
            }
            if (v > max[c]) {
                max[c] = v;
            }
        }
        position += count;
    }

    public int columns() {
        return min.length;
    }

    /** Samples per column (the last one may hold fewer). */
    public long samplesPerColumn() {
        return perColumn;
    }

    public double min(int column) {
        return min[column];
    }

    public double max(int column) {
        return max[column];
    }

    /**
     * The envelope as one zig-zag line: per column its minimum and maximum at the column's middle time, in
     * {@code scale} units per sample value; {@code {x, y}}.
     */
    public double[][] line(double rateHz, double scale) {
        double[] t = new double[2 * min.length];
        double[] y = new double[2 * min.length];
        for (int c = 0; c < min.length; c++) {
            long first = c * perColumn;
            long last = Math.min(frames, first + perColumn) - 1;
            double mid = (first + last) / 2.0 / rateHz;
            t[2 * c] = mid;
            t[2 * c + 1] = mid;
            boolean up = (c & 1) == 0;
            y[2 * c] = (up ? min[c] : max[c]) * scale;
            y[2 * c + 1] = (up ? max[c] : min[c]) * scale;
        }
        return new double[][] {t, y};
    }
}
