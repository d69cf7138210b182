package org.foldbook.sweep;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.resample.SimulationWarning;

/**
 * The outcome of a sweep over a rate ladder in one mode: the source peaks, what each rate shows, and the
 * summaries. Immutable; {@link #toJson()} and {@link #toCsv()} give the forms the command line and the UI
 * read.
 *
 * @param mode          the re-sampling mode (or preview) that produced it
 * @param sourceRate    recording rate, S/s
 * @param sourceSamples recording length
 * @param sourceBinWidth frequency step of the source spectrum, Hz
 * @param sources       source peaks in frequency order
 * @param rates         one result per ladder rate, in ladder order
 * @param band          the band summary, if a band was asked for
 * @param accuracy      the band in which the mode simulates faithfully
 * @param warnings      bands where the simulation cannot honour the modelled chain, and by how much
 * @param summarised    source peaks left out of {@code sources} for lying far below the strongest
 * @param peakRule      the peak threshold in words
 */
public record SweepResult(String mode, double sourceRate, long sourceSamples, double sourceBinWidth,
        List<SourcePeak> sources, List<RateResult> rates, Optional<BandSummary> band, SimulatorAccuracy accuracy,
        List<SimulationWarning> warnings, SummarisedPeaks summarised, String peakRule) {

    /** Version of the JSON/CSV layout; raise it when a field changes meaning. */
    public static final int FORMAT_VERSION = 1;

    public SweepResult {
        sources = List.copyOf(sources);
        rates = List.copyOf(rates);
        warnings = List.copyOf(warnings);
        java.util.Objects.requireNonNull(accuracy, "accuracy");
    }

    /** Computes the band summary for [low, high] and returns a result carrying it. */
    public SweepResult withBand(double low, double high) {
        BandSummary b = new BandSummary(low, high, Double.NaN);
        return new SweepResult(mode, sourceRate, sourceSamples, sourceBinWidth, sources, rates,
                Optional.of(new BandSummary(low, high, lowestAliasFreeRate(b))), accuracy, warnings, summarised,
                peakRule);
    }

    /** Rates from highest to lowest (ladder order is kept in {@link #rates()}). */
    private List<RateResult> descending() {
        List<RateResult> d = new ArrayList<>(rates);
        d.sort(Comparator.comparingDouble((RateResult r) -> -r.step().effectiveRate()));
        return d;
    }

    /** Per source peak: lowest rate it is still true at, and the rate where it first folds. */
    public List<PeakSummary> peakSummaries() {
        List<RateResult> d = descending();
        List<PeakSummary> out = new ArrayList<>();
        for (SourcePeak s : sources) {
            double lowestTrue = Double.NaN;
            for (RateResult r : d) {
                if (r.fate(s.id()).verdict() != Verdict.SURVIVES) {
                    break;
                }
                lowestTrue = r.step().effectiveRate();
            }
            double firstFold = Double.NaN;
            for (RateResult r : d) {
                if (r.fate(s.id()).verdict() == Verdict.FOLDS) {
                    firstFold = r.step().effectiveRate();
                    break;
                }
            }
            out.add(new PeakSummary(s.id(), s.frequency(), lowestTrue, firstFold));
        }
        return out;
    }

    private double lowestAliasFreeRate(BandSummary b) {
        double lowest = Double.NaN;
        for (RateResult r : descending()) {
            double fs = r.step().effectiveRate();
            if (b.high() > fs / 2) {
                break;
            }
            boolean clean = true;
            for (SourceFate f : r.fates()) {
                SourcePeak s = sources.get(f.sourcePeak());
                boolean folded = VerdictClassifier.foldOrder(s.frequency(), fs) != 0;
                // a folded component in the band spoils it whether the spectrum shows it or hides it
                boolean seen = folded && f.verdict().present();
                if (seen && f.apparentFrequency() >= b.low() - sourceBinWidth / 2
                        && f.apparentFrequency() <= b.high() + sourceBinWidth / 2) {
                    clean = false;
                    break;
                }
            }
            if (!clean) {
                break;
            }
            lowest = fs;
        }
        return lowest;
    }

    /** The JSON form (one object; layout described in the package documentation). */
    public String toJson() {
        JsonWriter w = new JsonWriter().beginObject();
        w.member("format", "foldbook-sweep").member("version", FORMAT_VERSION).member("mode", mode);
        w.name("source").beginObject().member("rate", sourceRate).member("samples", sourceSamples)
                .member("binWidth", sourceBinWidth);
        w.name("peaks").beginArray();
        for (SourcePeak s : sources) {
            w.beginObject().member("id", s.id()).member("frequency", s.frequency()).member("levelDb", s.levelDb())
                    .endObject();
        }
        w.endArray();
        w.name("summarised").beginObject().member("count", summarised.count())
                .member("belowDb", summarised.belowDb()).member("highestDb", summarised.highestDb()).endObject();
        w.member("peakRule", peakRule).endObject();
        w.name("accuracy").beginObject().member("upToHz", accuracy.upToHz())
                .member("upToRateFraction", accuracy.upToNewRateFraction()).member("levelDb", accuracy.levelDb())
                .member("statement", accuracy.statement()).endObject();
        w.name("warnings").beginArray();
        for (SimulationWarning sw : warnings) {
            w.beginObject().member("fromHz", sw.fromHz()).member("toHz", sw.toHz())
                    .member("uncertaintyDb", sw.uncertaintyDb()).member("text", sw.text()).endObject();
        }
        w.endArray();
        w.name("rates").beginArray();
        for (RateResult r : rates) {
            RateStep st = r.step();
            w.beginObject().member("index", st.index()).member("up", st.up()).member("down", st.down())
                    .member("rate", st.effectiveRate()).member("samples", r.outputSamples())
                    .member("binWidth", r.binWidth());
            w.name("peaks").beginArray();
            for (ObservedPeak p : r.observed()) {
                w.beginObject().member("frequency", p.frequency()).member("levelDb", p.levelDb())
                        .member("verdict", p.verdict().key());
                w.name("sourcePeak");
                if (p.sourcePeak() < 0) {
                    w.value((String) null);
                } else {
                    w.value(p.sourcePeak());
                }
                w.member("gainDb", p.gainDb()).member("reason", p.reason()).endObject();
            }
            w.endArray();
            w.name("sources").beginArray();
            for (SourceFate f : r.fates()) {
                w.beginObject().member("sourcePeak", f.sourcePeak()).member("verdict", f.verdict().key())
                        .member("apparentFrequency", f.apparentFrequency())
                        .member("observedFrequency", f.observedFrequency()).member("gainDb", f.gainDb())
                        .member("predictedGainDb", f.predictedGainDb()).member("floorDb", f.floorDb());
                if (f.otherPeak() >= 0) {
                    w.member("otherPeak", f.otherPeak());
                }
                if (Double.isFinite(f.otherFrequency())) {
                    w.member("otherFrequency", f.otherFrequency());
                }
                if (f.neededSegment() > 0) {
                    w.member("neededSegment", f.neededSegment());
                }
                w.member("reason", f.reason()).endObject();
            }
            w.endArray().endObject();
        }
        w.endArray();
        w.name("summary").beginObject().name("peaks").beginArray();
        for (PeakSummary s : peakSummaries()) {
            w.beginObject().member("sourcePeak", s.sourcePeak()).member("frequency", s.frequency())
                    .member("lowestTrueRate", s.lowestTrueRate()).member("firstFoldRate", s.firstFoldRate())
                    .endObject();
        }
        w.endArray();
        if (band.isPresent()) {
            BandSummary b = band.get();
            w.name("band").beginObject().member("low", b.low()).member("high", b.high())
                    .member("lowestAliasFreeRate", b.lowestAliasFreeRate()).endObject();
        }
        w.endObject();
        return w.endObject().toString();
    }

    /**
     * The CSV form: a header, then one row per peak seen at each rate and one per source peak that is not
     * seen on its own there (any other verdict; frequency = where it would appear, level empty).
     */
    public String toCsv() {
        StringBuilder b = new StringBuilder(
                "index,up,down,rate_hz,frequency_hz,level_db,verdict,source_peak,gain_db\n");
        for (RateResult r : rates) {
            RateStep st = r.step();
            String head = st.index() + "," + st.up() + "," + st.down() + "," + num(st.effectiveRate()) + ",";
            for (ObservedPeak p : r.observed()) {
                b.append(head).append(num(p.frequency())).append(',').append(num(p.levelDb())).append(',')
                        .append(p.verdict().key()).append(',').append(p.sourcePeak() < 0 ? "" : p.sourcePeak())
                        .append(',').append(num(p.gainDb())).append('\n');
            }
            for (SourceFate f : r.fates()) {
                if (f.verdict() != Verdict.SURVIVES && f.verdict() != Verdict.FOLDS) {
                    b.append(head).append(num(f.apparentFrequency())).append(",,").append(f.verdict().key())
                            .append(',').append(f.sourcePeak()).append(',').append(num(f.gainDb())).append('\n');
                }
            }
        }
        return b.toString();
    }

    private static String num(double v) {
        return Double.isFinite(v) ? Double.toString(v) : "";
    }
}
