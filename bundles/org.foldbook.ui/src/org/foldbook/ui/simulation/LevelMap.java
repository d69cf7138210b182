package org.foldbook.ui.simulation;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.foldbook.sweep.ObservedPeak;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SourceFate;
import org.foldbook.sweep.SweepResult;

/**
 * The rate × frequency map of a sweep, without SWT: one row per rate (highest at the top), frequency across
 * from 0 to the highest rate's Nyquist; the levels of the peaks seen at each rate; each source peak's fold
 * path (where it lands, rate by rate); and the reverse look-up from a point of the map to the nearest
 * (source peak, rate). The view only draws what this gives.
 */
public final class LevelMap {
    /** A peak seen at a rate: frequency, row, level. */
    public record Cell(double frequencyHz, int row, double levelDb) {
    }

    /** A point of a source peak's fold path. */
    public record PathPoint(int row, double frequencyHz) {
    }

    private final List<RateResult> rows;
    private final int sources;
    private final double maxHz;
    private final double minDb;
    private final double maxDb;

    public LevelMap(SweepResult result) {
        List<RateResult> sorted = new ArrayList<>(result.rates());
        sorted.sort(Comparator.comparingDouble((RateResult r) -> -r.step().effectiveRate()));
        this.rows = List.copyOf(sorted);
        this.sources = result.sources().size();
        this.maxHz = rows.isEmpty() ? 1 : rows.get(0).step().nyquist();
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (RateResult r : rows) {
            for (ObservedPeak p : r.observed()) {
                lo = Math.min(lo, p.levelDb());
                hi = Math.max(hi, p.levelDb());
            }
        }
        this.minDb = Double.isInfinite(lo) ? -100 : lo;
        this.maxDb = Double.isInfinite(hi) || hi <= lo ? minDb + 1 : hi;
    }

    public int rowCount() {
        return rows.size();
    }

    /** Highest frequency on the map (the highest rate's Nyquist), Hz. */
    public double maxHz() {
        return maxHz;
    }

    public double minDb() {
        return minDb;
    }

    public double maxDb() {
        return maxDb;
    }

    /** Rate of a row, S/s. */
    public double rateOf(int row) {
        return rows.get(row).step().effectiveRate();
    }

    /** The row showing the ladder's rate {@code rateIndex}. */
    public int rowOf(int rateIndex) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).step().index() == rateIndex) {
                return i;
            }
        }
        throw new IllegalArgumentException("no rate with index " + rateIndex);
    }

    /** Level as a fraction 0 (weakest on the map) .. 1 (strongest). */
    public double shade(double levelDb) {
        return Math.max(0, Math.min(1, (levelDb - minDb) / (maxDb - minDb)));
    }

    public List<Cell> cells() {
        List<Cell> out = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            for (ObservedPeak p : rows.get(i).observed()) {
                out.add(new Cell(p.frequency(), i, p.levelDb()));
            }
        }
        return out;
    }

    public int sourceCount() {
        return sources;
    }

    /** Where source peak {@code id} lands at each rate, top row first. */
    public List<PathPoint> path(int id) {
        List<PathPoint> out = new ArrayList<>();
        for (int i = 0; i < rows.size(); i++) {
            out.add(new PathPoint(i, rows.get(i).fate(id).apparentFrequency()));
        }
        return out;
    }

    /** The (source peak, ladder rate index) nearest to frequency {@code hz} in row {@code row}. */
    public int[] nearest(int row, double hz) {
        RateResult r = rows.get(Math.max(0, Math.min(rows.size() - 1, row)));
        int best = -1;
        double dist = Double.POSITIVE_INFINITY;
        for (SourceFate f : r.fates()) {
            double d = Math.abs(f.apparentFrequency() - hz);
            if (d < dist) {
                dist = d;
                best = f.sourcePeak();
            }
        }
        return best < 0 ? null : new int[] {best, r.step().index()};
    }
}
