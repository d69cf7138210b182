package org.foldbook.ui.parts;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.dsp.fold.FoldMap;
import org.foldbook.dsp.fold.FoldSeries;
import org.foldbook.dsp.fold.Folding;

/**
 * The figures behind the fold explorer, free of SWT so they can be tested plainly: per tone the
 * apparent frequency, Nyquist zone and whether it is an alias at the chosen rate, and the exact fold
 * curve of each tone over the plotted rate range (its vertices from {@link FoldMap}, not dense
 * sampling).
 */
final class FoldExplorerModel {
    record Row(double toneHz, double apparentHz, long zone, boolean folded) {
    }

    private final double[] tones;
    private final double rate;
    private final double minRate;
    private final double maxRate;

    FoldExplorerModel(double[] tones, double rate) {
        this.tones = tones.clone();
        this.rate = rate;
        double highest = 0;
        for (double t : tones) {
            highest = Math.max(highest, t);
        }
        // Plot from well below the chosen rate up to the rate at which every tone is below Nyquist.
        this.maxRate = Math.max(rate * 1.5, 2.2 * highest);
        this.minRate = Math.min(rate / 4, maxRate / 50);
    }

    double minRate() {
        return minRate;
    }

    double maxRate() {
        return maxRate;
    }

    List<Row> rows() {
        List<Row> rows = new ArrayList<>();
        for (double t : tones) {
            long zone = Folding.nyquistZone(t, rate);
            rows.add(new Row(t, Folding.apparentHz(t, rate), zone, zone > 1));
        }
        return rows;
    }

    int foldedCount() {
        int n = 0;
        for (Row r : rows()) {
            n += r.folded() ? 1 : 0;
        }
        return n;
    }

    /** x = sample rate, y = apparent frequency of tone {@code index} over [minRate, maxRate]. */
    double[][] foldCurve(int index) {
        FoldSeries series = FoldMap.series(tones[index], minRate, maxRate);
        return new double[][] {series.rateHz(), series.apparentHz()};
    }

    double[][] nyquistLine() {
        return new double[][] {{minRate, maxRate}, {minRate / 2, maxRate / 2}};
    }
}
