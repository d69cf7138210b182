package org.foldbook.ui.parts;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.FoldMap;
import org.foldbook.dsp.fold.FoldSeries;
import org.foldbook.dsp.fold.Folding;

/**
 * The figures behind the fold explorer, free of SWT so they can be tested plainly: per tone the
 * apparent frequency, Nyquist zone and whether it is an alias at the chosen rate, the chain's
 * attenuation of the tone at that rate, and the exact fold curve of each tone over the plotted rate range
 * (its vertices from {@link FoldMap}, not dense sampling) with the attenuation along it.
 */
final class FoldExplorerModel {
    /** Rates at which the attenuation along a fold path is evaluated (geometric). */
    static final int ATTENUATION_POINTS = 240;

    record Row(double toneHz, double apparentHz, long zone, boolean folded, double attenuationDb) {
    }

    private final double[] tones;
    private final double rate;
    private final double minRate;
    private final double maxRate;
    private final DoubleFunction<FrequencyResponse> protection;

    /** Tones sampled with no chain in front (nothing attenuates them). */
    FoldExplorerModel(double[] tones, double rate) {
        this(tones, rate, null);
    }

    /**
     * Tones in front of a chain whose protection at a sample rate is {@code protection.apply(rate)}
     * (ChainModel.protection), or null for none.
     */
    FoldExplorerModel(double[] tones, double rate, DoubleFunction<FrequencyResponse> protection) {
        this.tones = tones.clone();
        this.rate = rate;
        this.protection = protection;
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

    boolean hasChain() {
        return protection != null;
    }

    List<Row> rows() {
        List<Row> rows = new ArrayList<>();
        for (double t : tones) {
            long zone = Folding.nyquistZone(t, rate);
            rows.add(new Row(t, Folding.apparentHz(t, rate), zone, zone > 1, attenuationDb(t, rate)));
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

    /** The chain's attenuation of a tone at {@code toneHz} sampled at {@code rateHz}; 0 without a chain. */
    double attenuationDb(double toneHz, double rateHz) {
        return protection == null ? 0 : protection.apply(rateHz).attenuationDb(toneHz);
    }

    /** x = sample rate, y = apparent frequency of tone {@code index} over [minRate, maxRate]. */
    double[][] foldCurve(int index) {
        FoldSeries series = FoldMap.series(tones[index], minRate, maxRate);
        return new double[][] {series.rateHz(), series.apparentHz()};
    }

    /** x = sample rate (geometric grid), y = the chain's attenuation of tone {@code index} along its path. */
    double[][] attenuationCurve(int index) {
        double[] r = new double[ATTENUATION_POINTS];
        double[] a = new double[ATTENUATION_POINTS];
        for (int i = 0; i < r.length; i++) {
            r[i] = minRate * Math.pow(maxRate / minRate, i / (double) (r.length - 1));
            double db = attenuationDb(tones[index], r[i]);
            a[i] = Double.isFinite(db) ? db : 400; // an exact null: drawn at the chart's top
        }
        return new double[][] {r, a};
    }

    double[][] nyquistLine() {
        return new double[][] {{minRate, maxRate}, {minRate / 2, maxRate / 2}};
    }
}
