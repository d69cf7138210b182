package org.foldbook.io.csv;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.foldbook.io.TimingReport;

/**
 * Builds a {@link TimingReport} from time stamps seen one at a time, in bounded memory: the first
 * {@link TimingReport#NOMINAL_WINDOW} intervals are held back until their median (the nominal interval)
 * is known, later intervals are judged on the fly.
 */
final class TimingAccumulator {
    private final String unit;
    private final double[] window = new double[TimingReport.NOMINAL_WINDOW];
    private final long[] windowLines = new long[TimingReport.NOMINAL_WINDOW];
    private final double[] windowStarts = new double[TimingReport.NOMINAL_WINDOW];
    private int held;
    private double nominal = Double.NaN;
    private double first = Double.NaN;
    private double last = Double.NaN;
    private long count;
    private double maxJitter;
    private double sumSquares;
    private long regularIntervals;
    private long gapCount;
    private final List<TimingReport.Gap> gaps = new ArrayList<>();

    TimingAccumulator(String unit) {
        this.unit = unit;
    }

    /** Adds the time stamp (seconds) of the row at {@code line}; stamps are already checked to increase. */
    void add(double t, long previousLine) {
        if (count == 0) {
            first = t;
        } else {
            double dt = t - last;
            if (Double.isNaN(nominal)) {
                window[held] = dt;
                windowLines[held] = previousLine;
                windowStarts[held] = last;
                held++;
                if (held == window.length) {
                    settleNominal();
                }
            } else {
                judge(dt, previousLine, last);
            }
        }
        last = t;
        count++;
    }

    double last() {
        return last;
    }

    long count() {
        return count;
    }

    private void settleNominal() {
        double[] sorted = Arrays.copyOf(window, held);
        Arrays.sort(sorted);
        int m = held / 2;
        nominal = held % 2 == 1 ? sorted[m] : 0.5 * (sorted[m - 1] + sorted[m]);
        for (int i = 0; i < held; i++) {
            judge(window[i], windowLines[i], windowStarts[i]);
        }
    }

    private void judge(double dt, long line, double start) {
        if (dt > TimingReport.GAP_FACTOR * nominal) {
            gapCount++;
            if (gaps.size() < TimingReport.MAX_LISTED_GAPS) {
                gaps.add(new TimingReport.Gap(line, start, dt, Math.round(dt / nominal) - 1));
            }
        } else {
            double dev = dt - nominal;
            maxJitter = Math.max(maxJitter, Math.abs(dev));
            sumSquares += dev * dev;
            regularIntervals++;
        }
    }

    /** The report, or null with fewer than two stamps. */
    TimingReport report() {
        if (count < 2) {
            return null;
        }
        if (Double.isNaN(nominal)) {
            settleNominal();
        }
        double rms = regularIntervals == 0 ? 0 : Math.sqrt(sumSquares / regularIntervals);
        return new TimingReport(unit, first, last, nominal, (last - first) / (count - 1), maxJitter, rms, gapCount,
                gaps);
    }
}
