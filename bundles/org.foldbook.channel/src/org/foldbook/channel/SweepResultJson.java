package org.foldbook.channel;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.resample.SimulationWarning;
import org.foldbook.sweep.BandSummary;
import org.foldbook.sweep.ObservedPeak;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.RateStep;
import org.foldbook.sweep.SimulatorAccuracy;
import org.foldbook.sweep.SourceFate;
import org.foldbook.sweep.SourcePeak;
import org.foldbook.sweep.SummarisedPeaks;
import org.foldbook.sweep.SweepResult;
import org.foldbook.sweep.Verdict;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Reads {@link SweepResult#toJson()}'s form back into a result, with Jackson (the JSON the command line
 * prints and the archive keeps). JSON holds no NaN: the writer's {@code null} numbers come back as NaN.
 * Problems raise {@link IOException} saying which member is wrong.
 */
public final class SweepResultJson {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private SweepResultJson() {
    }

    public static SweepResult read(String json) throws IOException {
        return read(MAPPER.readTree(json));
    }

    public static SweepResult read(JsonNode root) throws IOException {
        if (!"foldbook-sweep".equals(root.path("format").asText())) {
            throw new IOException("not a sweep result (format is '" + root.path("format").asText() + "')");
        }
        if (root.path("version").asInt(-1) != SweepResult.FORMAT_VERSION) {
            throw new IOException("sweep result version " + root.path("version") + ", this program reads version "
                    + SweepResult.FORMAT_VERSION);
        }
        JsonNode src = need(root, "source");
        double rate = num(need(src, "rate"));
        double binWidth = num(need(src, "binWidth"));
        double binDb = 10 * Math.log10(binWidth);
        List<SourcePeak> sources = new ArrayList<>();
        for (JsonNode p : need(src, "peaks")) {
            double level = num(p.path("levelDb"));
            sources.add(new SourcePeak(p.path("id").asInt(), num(p.path("frequency")), level, level + binDb));
        }
        JsonNode acc = need(root, "accuracy");
        SimulatorAccuracy accuracy = new SimulatorAccuracy(num(acc.path("upToRateFraction")), num(acc.path("upToHz")),
                num(acc.path("levelDb")), acc.path("statement").asText());
        List<SimulationWarning> warnings = new ArrayList<>();
        for (JsonNode w : root.path("warnings")) {
            // an open-ended band or an unbounded uncertainty is written as null, JSON having no infinity
            warnings.add(new SimulationWarning(num(w.path("fromHz")), orInfinity(w.path("toHz")),
                    orInfinity(w.path("uncertaintyDb")),
                    w.path("text").asText()));
        }
        List<RateResult> rates = new ArrayList<>();
        for (JsonNode r : need(root, "rates")) {
            RateStep step = new RateStep(r.path("index").asInt(), r.path("up").asInt(), r.path("down").asInt(), rate);
            List<ObservedPeak> observed = new ArrayList<>();
            for (JsonNode p : r.path("peaks")) {
                JsonNode id = p.path("sourcePeak");
                observed.add(new ObservedPeak(num(p.path("frequency")), num(p.path("levelDb")),
                        verdict(p.path("verdict").asText()), id.isNull() ? -1 : id.asInt(), num(p.path("gainDb")),
                        p.path("reason").asText()));
            }
            List<SourceFate> fates = new ArrayList<>();
            for (JsonNode f : r.path("sources")) {
                fates.add(new SourceFate(f.path("sourcePeak").asInt(), verdict(f.path("verdict").asText()),
                        num(f.path("apparentFrequency")), num(f.path("observedFrequency")), num(f.path("gainDb")),
                        num(f.path("predictedGainDb")), num(f.path("floorDb")),
                        f.has("otherPeak") ? f.path("otherPeak").asInt() : -1, num(f.path("otherFrequency")),
                        f.path("neededSegment").asInt(0), f.path("reason").asText()));
            }
            rates.add(new RateResult(step, r.path("samples").asLong(), num(r.path("binWidth")), observed, fates));
        }
        Optional<BandSummary> band = Optional.empty();
        JsonNode b = root.path("summary").path("band");
        if (b.isObject()) {
            band = Optional.of(new BandSummary(num(b.path("low")), num(b.path("high")),
                    num(b.path("lowestAliasFreeRate"))));
        }
        JsonNode sum = src.path("summarised");
        SummarisedPeaks summarised = new SummarisedPeaks(sum.path("count").asInt(0), num(sum.path("belowDb")),
                num(sum.path("highestDb")));
        return new SweepResult(root.path("mode").asText(), rate, src.path("samples").asLong(), binWidth, sources, rates,
                band, accuracy, warnings, summarised, src.path("peakRule").asText());
    }

    private static JsonNode need(JsonNode parent, String name) throws IOException {
        JsonNode n = parent.get(name);
        if (n == null || n.isNull()) {
            throw new IOException("sweep result has no '" + name + "'");
        }
        return n;
    }

    private static double num(JsonNode n) {
        return n == null || n.isNull() || n.isMissingNode() ? Double.NaN : n.asDouble();
    }

    private static double orInfinity(JsonNode n) {
        return n.isNumber() ? n.asDouble() : Double.POSITIVE_INFINITY;
    }

    private static Verdict verdict(String key) throws IOException {
        for (Verdict v : Verdict.values()) {
            if (v.key().equals(key)) {
                return v;
            }
        }
        throw new IOException("unknown verdict '" + key + "'");
    }
}
