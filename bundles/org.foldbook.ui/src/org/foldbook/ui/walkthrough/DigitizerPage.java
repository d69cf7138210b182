package org.foldbook.ui.walkthrough;

import static org.foldbook.model.derived.Quantities.db;
import static org.foldbook.model.derived.Quantities.hz;
import static org.foldbook.model.derived.Quantities.number;
import static org.foldbook.model.derived.Quantities.rate;
import static org.foldbook.model.derived.Quantities.signedDb;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.foldbook.dsp.digitizer.IdealQuantiser;
import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.digitizer.RateSearchResult;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.model.derived.Names;
import org.foldbook.ui.notebook.ChainSummary;
import org.foldbook.ui.walkthrough.StagePage.Figure;

/**
 * The digitizer's page: rate and Nyquist, the attenuation its range needs, the alias-free band and the
 * protection margin ({@link ChainFigures#figures}), what folds where, and the lowest rate that keeps the
 * band the chain is meant to keep alias-free ({@link ChainFigures#lowestAliasFreeRate}).
 */
final class DigitizerPage {

    private DigitizerPage() {
    }

    static StagePage of(SignalChain chain, Stage stage, int index) {
        Digitizer digitizer = (Digitizer) stage.getDevice();
        List<String> text = new ArrayList<>();
        List<Figure> figures = new ArrayList<>();
        double fs = ChainFigures.stageRateHz(stage);
        String name = Names.shortName(digitizer);
        figures.add(new Figure("Sampling rate", rate(fs), stage.getRateHz() != null ? "stage setting" : "device maximum"));
        figures.add(new Figure("Nyquist frequency", hz(fs / 2), "fs / 2"));
        text.add(name + " takes " + rate(fs) + ": it can only represent frequencies up to half of that, "
                + hz(fs / 2) + " (Nyquist). Anything above folds back: a tone at f appears at |f − k·fs|.");
        if (stage.getRangeV() != null) {
            figures.add(new Figure("Input range", "±" + number(stage.getRangeV()) + " V", "stage setting"));
        }
        int bits = digitizer.getResolutionBits();
        if (bits > 0 && bits <= IdealQuantiser.MAX_BITS) {
            figures.add(new Figure("Resolution", bits + " bits", "notebook, digitizer"));
            figures.add(new Figure("Ideal quantiser range", db(new IdealQuantiser(bits, 1.0).snrDb()),
                    "6.02·N + 1.76 dB"));
        }
        if (digitizer.isDigitalFilter()) {
            if (digitizer.getPassbandFraction() != null && digitizer.getStopbandFraction() != null
                    && digitizer.getStopbandAttenuationDb() != null) {
                String pass = hz(digitizer.getPassbandFraction() * fs);
                String stop = hz(digitizer.getStopbandFraction() * fs);
                String att = db(digitizer.getStopbandAttenuationDb());
                figures.add(new Figure("Built-in digital filter", "passes to " + pass + ", " + att + " from " + stop,
                        "notebook edges × rate"));
                text.add("Its built-in digital filter passes up to " + pass + " and attenuates " + att + " from " + stop
                        + "; its edges follow the rate.");
            } else {
                text.add("It filters digitally, but the notebook gives no edges or attenuation for that filter.");
            }
        }
        ChainFigures.need(chain).ifPresent(n -> {
            figures.add(new Figure("Needed attenuation", ChainSummary.needText(n), "dynamic range + out-of-band level"));
            text.add("For an alias to disappear under the noise floor, what folds must be attenuated by "
                    + db(n.requiredDb()) + " (" + ChainSummary.needText(n) + ").");
        });
        Optional<ProtectionFigures> protection = ChainFigures.figures(chain);
        protection.ifPresent(p -> {
            figures.add(new Figure("Attenuation at Nyquist", db(p.attenuationAtNyquistDb()), "whole chain before sampling"));
            String band = p.aliasFreeBandHz() > 0 ? "0 – " + hz(p.aliasFreeBandHz()) : "none";
            if (!Double.isNaN(p.limitingSourceHz())) {
                band += " (limited by content at " + hz(p.limitingSourceHz()) + ")";
            }
            figures.add(new Figure("Alias-free band", band, "fold arithmetic over the under-attenuated bands"));
            String margin = Double.isInfinite(p.marginDb()) ? "nothing above Nyquist reaches the digitizer"
                    : signedDb(p.marginDb()) + (p.marginDb() >= 0 ? " (protected)" : " (short of the need)");
            figures.add(new Figure("Protection margin", margin, "least attenuation of what folds − need"));
            text.add(p.aliasFreeBandHz() >= p.nyquistHz() ? "Nothing folds into the baseband under-attenuated: all of 0 – "
                    + hz(p.nyquistHz()) + " is alias-free."
                    : "Alias-free band: " + band + "; protection margin " + margin + ".");
        });
        text.addAll(foldsWhere(chain, fs));
        lowestSafeRate(chain).ifPresent(f -> figures.add(f));
        FrequencyResponse response = ChainModel.of(chain).protection(fs);
        return new StagePage(StagePage.Kind.DIGITIZER, "Digitizer: " + name, text, figures,
                ResponseCharts.of("What protects the digitizer at " + rate(fs), chain, response), Optional.empty(),
                index);
    }

    /** What lands where: the front end's band above Nyquist, and the sensor's resonance. */
    static List<String> foldsWhere(SignalChain chain, double fs) {
        List<String> out = new ArrayList<>();
        double upper = ChainFigures.frontEndUpperHz(chain);
        if (!(upper > 0) || !(fs > 0)) {
            return out;
        }
        Optional<ChainFigures.Band> folded = ChainFigures.foldedBandHz(upper, fs);
        if (folded.isEmpty()) {
            out.add("Folds: nothing — the front end passes nothing above " + hz(fs / 2) + ".");
            return out;
        }
        ChainFigures.Band b = folded.get();
        out.add("Folds: the front end's " + hz(fs / 2) + " – " + hz(upper) + " lands on " + hz(b.lowHz()) + " – "
                + hz(b.highHz()) + " of the baseband.");
        Stage sensorStage = ChainFigures.sensorStage(chain);
        FrequencyResponse protection = ChainModel.of(chain).protection(fs);
        if (sensorStage != null && ((Sensor) sensorStage.getDevice()).getResonanceHz() != null) {
            double r = ((Sensor) sensorStage.getDevice()).getResonanceHz();
            if (r > fs / 2) {
                double att = protection.attenuationDb(r);
                String line = "The sensor's resonance at " + hz(r) + " lands at " + hz(Folding.apparentHz(r, fs))
                        + ", attenuated " + db(att);
                Optional<ChainFigures.Need> need = ChainFigures.need(chain);
                if (need.isPresent()) {
                    double level = need.get().outOfBandLevelDbfs() - att;
                    double above = level + need.get().dynamicRangeDb();
                    line += ": at " + number(level) + " dBFS, " + (above > 0 ? db(above) + " above" : db(-above) + " below")
                            + " the noise floor";
                }
                out.add(line + ".");
            }
        }
        return out;
    }

    /**
     * The lowest rate up to the digitizer's maximum that keeps the band the chain is meant to keep
     * (the filter's cutoff or a built-in filter's pass band, else the sensor's usable maximum) alias-free.
     */
    static Optional<Figure> lowestSafeRate(SignalChain chain) {
        double band = ChainFigures.intendedBandHz(chain);
        Stage sensorStage = ChainFigures.sensorStage(chain);
        if (Double.isNaN(band) && sensorStage != null && ((Sensor) sensorStage.getDevice()).getUsableMaxHz() != null) {
            band = ((Sensor) sensorStage.getDevice()).getUsableMaxHz();
        }
        if (!(band > 0) || ChainFigures.need(chain).isEmpty() || !(ChainFigures.frontEndUpperHz(chain) > 0)) {
            return Optional.empty();
        }
        Digitizer digitizer = (Digitizer) ChainFigures.samplingStage(chain).getDevice();
        String what = "Lowest safe rate for 0 – " + hz(band);
        Optional<RateSearchResult> r = ChainFigures.lowestAliasFreeRate(chain, band);
        if (r.isEmpty() || !r.get().found()) {
            return Optional.of(new Figure(what, "none up to the digitizer's " + rate(digitizer.getMaxRateHz()),
                    "search up to the digitizer's maximum rate"));
        }
        return Optional.of(new Figure(what, rate(r.get().rateHz()), "bisection on the rate, alias-free verified"));
    }
}
