package org.foldbook.ui.simulation;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.model.derived.Quantities;
import org.foldbook.sweep.BandSummary;
import org.foldbook.sweep.PeakSummary;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SourceFate;
import org.foldbook.sweep.SourcePeak;
import org.foldbook.sweep.SweepResult;
import org.foldbook.sweep.Verdict;

/**
 * The verdict table and the summaries of a sweep result in words, without SWT: one row per source peak
 * and rate (peaks in frequency order, rates from the ladder's first), what happened, where it lands, the
 * gain it got and why (the reason the sweep gives), then per peak the lowest rate it is still true at and the band's lowest alias-free
 * rate. The table shows exactly the verdicts the result carries.
 */
public final class VerdictRows {

    /**
     * One row of the table; {@code rateIndex} is the rate's index in the result's ladder; {@code gainDb} the
     * gain measured where it is seen, else the mode's predicted gain.
     */
    public record Row(int sourcePeak, int rateIndex, double sourceHz, double rateHz, Verdict verdict, double landsAtHz,
            double gainDb, String reason) {

        /** The table's cells, in column order. */
        public String[] cells() {
            return new String[] {Quantities.hz(sourceHz), Quantities.rate(rateHz), verdict.key(),
                    Double.isNaN(landsAtHz) ? "" : Quantities.hz(landsAtHz),
                    Double.isNaN(gainDb) ? "" : Quantities.signedDb(gainDb), reason};
        }
    }

    public static final String[] COLUMNS = {"Source peak", "Rate", "Verdict", "Lands at", "Gain", "Why"};

    private VerdictRows() {
    }

    public static List<Row> of(SweepResult result) {
        List<Row> rows = new ArrayList<>();
        for (SourcePeak s : result.sources()) {
            for (RateResult r : result.rates()) {
                SourceFate f = r.fate(s.id());
                // where it is seen, else where the fold arithmetic puts it
                double lands = Double.isNaN(f.observedFrequency()) ? f.apparentFrequency() : f.observedFrequency();
                rows.add(new Row(s.id(), r.step().index(), s.frequency(), r.step().effectiveRate(), f.verdict(), lands,
                        Double.isNaN(f.gainDb()) ? f.predictedGainDb() : f.gainDb(), f.reason()));
            }
        }
        return rows;
    }

    /** Per source peak: the lowest rate at which it is still true, in words. */
    public static List<String> peakSummaries(SweepResult result) {
        List<String> out = new ArrayList<>();
        for (PeakSummary p : result.peakSummaries()) {
            String lowest = Double.isNaN(p.lowestTrueRate()) ? "not true even at the highest rate"
                    : "true down to " + Quantities.rate(p.lowestTrueRate());
            String fold = Double.isNaN(p.firstFoldRate()) ? "" : "; folds from " + Quantities.rate(p.firstFoldRate());
            out.add(Quantities.hz(p.frequency()) + ": " + lowest + fold);
        }
        return out;
    }

    /** The band of interest's lowest alias-free rate in words, or null without a band. */
    public static String bandSummary(SweepResult result) {
        if (result.band().isEmpty()) {
            return null;
        }
        BandSummary b = result.band().get();
        String what = Double.isNaN(b.lowestAliasFreeRate()) ? "no rate of the ladder keeps it free of aliases"
                : "lowest alias-free rate " + Quantities.rate(b.lowestAliasFreeRate());
        return "Band " + Quantities.hz(b.low()) + " – " + Quantities.hz(b.high()) + ": " + what;
    }
}
