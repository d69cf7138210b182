package org.foldbook.ui.walkthrough;

import static org.foldbook.model.derived.Quantities.db;
import static org.foldbook.model.derived.Quantities.hz;
import static org.foldbook.model.derived.Quantities.number;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.Cascade;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.derived.Names;
import org.foldbook.ui.walkthrough.StagePage.Figure;

/** The pages of the stages before sampling: sensor, conditioner, anti-alias filter. */
final class FrontEndPages {

    private FrontEndPages() {
    }

    static StagePage sensor(SignalChain chain, Stage stage, int index) {
        Sensor sensor = (Sensor) stage.getDevice();
        ChainModel model = ChainModel.of(chain);
        List<String> text = new ArrayList<>();
        List<Figure> figures = new ArrayList<>();
        String what = sensor.getQuantity() != null ? sensor.getQuantity() : "its quantity";
        text.add(Names.shortName(sensor) + (sensor.getModelName() != null ? " (" + sensor.getModelName() + ")" : "")
                + " turns " + what + " into a signal" + (sensor.getSensitivity() != null
                        ? " of " + number(sensor.getSensitivity()) + " " + String.valueOf(sensor.getSensitivityUnit())
                        : "") + ".");
        if (sensor.getSensitivity() != null) {
            figures.add(new Figure("Sensitivity", number(sensor.getSensitivity()) + " " + sensor.getSensitivityUnit(),
                    "notebook, sensor"));
        }
        if (sensor.getUsableMinHz() != null || sensor.getUsableMaxHz() != null) {
            String band = hz(orNaN(sensor.getUsableMinHz())) + " – " + hz(orNaN(sensor.getUsableMaxHz()));
            figures.add(new Figure("Usable band", band, "notebook, sensor"));
            text.add("Its usable band is " + band + ": inside it the sensor's output follows " + what + ".");
        }
        if (sensor.getResonanceHz() != null) {
            String q = sensor.getResonanceQ() != null ? ", Q " + number(sensor.getResonanceQ()) : ", Q not given";
            figures.add(new Figure("Mounted resonance", hz(sensor.getResonanceHz()) + q, "notebook, sensor"));
            text.add("Above the usable band the mounted resonance at " + hz(sensor.getResonanceHz())
                    + " lifts content instead of cutting it, so Foldbook counts the front end as passing up to it"
                    + (model.sensorResonance().isPresent()
                            ? "; its peak is about " + db(20 * Math.log10(sensor.getResonanceQ())) + " (20·log10 Q)."
                            : "; with no Q in the notebook its peak is not modelled."));
        }
        double upper = ChainFigures.frontEndUpperHz(chain);
        double rate = ChainFigures.samplingRateHz(chain);
        if (!Double.isNaN(upper)) {
            figures.add(new Figure("Front end passes up to", hz(upper),
                    "the higher of usable maximum and resonance, capped by a conditioner's upper edge"));
            if (rate > 0) {
                text.add(upper > rate / 2
                        ? "This chain samples at " + org.foldbook.model.derived.Quantities.rate(rate) + ": everything the sensor passes between "
                                + hz(rate / 2) + " (Nyquist) and " + hz(upper) + " can fold back unless a filter removes it."
                        : "Everything the sensor passes lies below this chain's Nyquist frequency " + hz(rate / 2) + ".");
            }
        }
        Optional<StageChart> chart = model.sensorResonance()
                .flatMap(r -> ResponseCharts.of("Sensor resonance (mounted)", chain, r));
        return new StagePage(StagePage.Kind.SENSOR, "Sensor: " + Names.shortName(sensor), text, figures, chart,
                Optional.empty(), index);
    }

    static StagePage conditioner(SignalChain chain, Stage stage, int index) {
        Amplifier amplifier = (Amplifier) stage.getDevice();
        List<String> text = new ArrayList<>();
        List<Figure> figures = new ArrayList<>();
        if (stage.getGain() != null) {
            double gain = stage.getGain();
            figures.add(new Figure("Gain", "×" + number(gain) + " (" + db(20 * Math.log10(gain)) + ")",
                    "stage setting; dB = 20·log10(gain)"));
            text.add(Names.shortName(amplifier) + " amplifies the sensor's signal ×" + number(gain) + " ("
                    + db(20 * Math.log10(gain)) + ").");
            Stage sampler = ChainFigures.samplingStage(chain);
            if (sampler != null && sampler.getRangeV() != null && gain > 0) {
                double before = sampler.getRangeV() / gain;
                figures.add(new Figure("Full scale before the gain", "±" + number(before) + " V",
                        "digitizer range ±" + number(sampler.getRangeV()) + " V ÷ gain"));
                text.add("The digitizer's ±" + number(sampler.getRangeV()) + " V range therefore ends at ±"
                        + number(before) + " V at the amplifier's input: more than that clips.");
            }
        } else {
            text.add("The notebook gives no gain setting for " + Names.shortName(amplifier) + " on this chain.");
        }
        if (!amplifier.getGainSettings().isEmpty()) {
            figures.add(new Figure("Gains available", amplifier.getGainSettings().stream().map(g -> "×" + number(g))
                    .reduce((a, b) -> a + ", " + b).orElse(""), "notebook, amplifier"));
        }
        List<FrequencyResponse> edges = new ArrayList<>();
        if (amplifier.getBandwidthLowHz() != null) {
            figures.add(new Figure("Lower edge (−3 dB)", hz(amplifier.getBandwidthLowHz()), "notebook, amplifier"));
        }
        if (amplifier.getBandwidthHighHz() != null) {
            figures.add(new Figure("Upper edge (−3 dB)", hz(amplifier.getBandwidthHighHz()), "notebook, amplifier"));
            double upper = ChainFigures.frontEndUpperHz(chain);
            text.add(amplifier.getBandwidthHighHz() >= upper
                    ? "Its upper edge at " + hz(amplifier.getBandwidthHighHz()) + " lies above what the sensor passes ("
                            + hz(upper) + "): it does not protect the digitizer from folding."
                    : "Its upper edge at " + hz(amplifier.getBandwidthHighHz()) + " limits the front end to "
                            + hz(upper) + ".");
        }
        for (AnalogFilter f : ChainModel.of(chain).conditioner()) {
            edges.add(f);
        }
        text.add("Foldbook models each edge as first order (an assumption: data sheets rarely give the order).");
        Optional<StageChart> chart = edges.isEmpty() ? Optional.empty()
                : ResponseCharts.of("Conditioner band edges (first order)", chain,
                        edges.size() == 1 ? edges.get(0) : Cascade.of(edges));
        return new StagePage(StagePage.Kind.CONDITIONER, "Conditioner: " + Names.shortName(amplifier), text, figures,
                chart, Optional.empty(), index);
    }

    static StagePage filter(SignalChain chain, Stage stage, int index) {
        AntiAliasFilter filter = (AntiAliasFilter) stage.getDevice();
        ChainModel model = ChainModel.of(chain);
        List<String> text = new ArrayList<>();
        List<Figure> figures = new ArrayList<>();
        double rate = ChainFigures.samplingRateHz(chain);
        double upper = ChainFigures.frontEndUpperHz(chain);
        if (filter.getFamily() == FilterFamily.NONE) {
            text.add(Names.shortName(filter) + " is in bypass on this chain: it passes everything.");
            if (rate > 0 && upper > rate / 2) {
                text.add("So nothing stops the front end's " + hz(rate / 2) + " – " + hz(upper)
                        + " from folding back onto the baseband.");
            }
            figures.add(new Figure("Filter", "in bypass (no filtering)", "notebook, filter family NONE"));
            return new StagePage(StagePage.Kind.ANTI_ALIAS_FILTER, "Anti-alias filter: " + Names.shortName(filter), text,
                    figures, ResponseCharts.of("Anti-alias filter (bypassed: flat)", chain, f -> 1.0), Optional.empty(),
                    index);
        }
        double cutoff = ChainFigures.effectiveCutoffHz(stage);
        figures.add(new Figure("Filter", Names.familyText(filter) + " low-pass", "notebook, filter"));
        figures.add(new Figure("Cutoff", hz(cutoff), stage.getCutoffHz() != null ? "stage setting" : "device cutoff"));
        Optional<AnalogFilter> response = model.antiAlias();
        if (response.isEmpty()) {
            text.add(Names.shortName(filter) + " is not described well enough to be modelled (" + model.antiAliasState()
                    + "): its family, order, cutoff or ripple is missing in the notebook.");
            return new StagePage(StagePage.Kind.ANTI_ALIAS_FILTER, "Anti-alias filter: " + Names.shortName(filter), text,
                    figures, Optional.empty(), Optional.empty(), index);
        }
        AnalogFilter h = response.get();
        text.add(Names.shortName(filter) + " is a " + Names.familyText(filter) + " low-pass with its cutoff at "
                + hz(cutoff) + ": it passes the band below and attenuates what lies above, ever more steeply.");
        if (rate > 0) {
            double nyquist = rate / 2;
            double atNyquist = h.attenuationDb(nyquist);
            figures.add(new Figure("Attenuation at Nyquist", db(atNyquist) + " at " + hz(nyquist), "filter model"));
            text.add("At this chain's Nyquist frequency " + hz(nyquist) + " it attenuates " + db(atNyquist) + ".");
            double image = rate - cutoff;
            if (image > nyquist) {
                figures.add(new Figure("Attenuation at fs − cutoff", db(h.attenuationDb(image)) + " at " + hz(image),
                        "content there folds onto the cutoff"));
                text.add("Content at " + hz(image) + " (rate − cutoff) would land on the cutoff; there the filter gives "
                        + db(h.attenuationDb(image)) + ".");
            }
        }
        if (upper > 0) {
            figures.add(new Figure("Attenuation at the front end's top", db(h.attenuationDb(upper)) + " at " + hz(upper),
                    "filter model"));
        }
        ChainFigures.need(chain).ifPresent(n -> text.add("The digitizer needs " + db(n.requiredDb())
                + " on everything that folds into the band you keep (see the digitizer's page)."));
        return new StagePage(StagePage.Kind.ANTI_ALIAS_FILTER, "Anti-alias filter: " + Names.shortName(filter), text,
                figures, ResponseCharts.of("Anti-alias filter " + Names.familyText(filter) + " @ " + hz(cutoff), chain, h),
                Optional.empty(), index);
    }

    private static double orNaN(Double value) {
        return value == null ? Double.NaN : value;
    }
}
