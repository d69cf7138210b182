package org.foldbook.ui.notebook;

import static org.foldbook.model.derived.Quantities.plain;
import static org.foldbook.model.derived.Quantities.ms;
import static org.foldbook.model.derived.Quantities.signedDb;
import static org.foldbook.model.derived.Quantities.db;
import static org.foldbook.model.derived.Quantities.number;
import static org.foldbook.model.derived.Quantities.rate;
import static org.foldbook.model.derived.Quantities.hz;
import org.foldbook.model.derived.Names;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.StringJoiner;

import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.ChainFigures.Band;

/**
 * The figures the details pane shows for a chain, as text rows, all computed on demand from the
 * model's {@link ChainFigures} (which uses {@code org.foldbook.dsp}); nothing here is stored. Kept
 * apart from the widgets so that the wording and number formats are tested without a display.
 */
public final class ChainSummary {

    /** One line of the figures table. */
    public record Row(String figure, String value) {
    }

    private ChainSummary() {
    }

    /** The stages as one line, e.g. "ACC-H1 → CAMP-2 ×10 → LP-A Butterworth 4 @ 10 kHz → DAQ-8 @ 25.6 kS/s". */
    public static String path(SignalChain chain) {
        StringJoiner line = new StringJoiner("  →  ");
        for (Stage stage : chain.getStages()) {
            line.add(Names.stageText(stage));
        }
        return line.length() == 0 ? "(no stages)" : line.toString();
    }

    /** The figures of the chain, in reading order. */
    public static List<Row> rows(SignalChain chain) {
        List<Row> rows = new ArrayList<>();
        double rate = ChainFigures.samplingRateHz(chain);
        Stage sampler = ChainFigures.samplingStage(chain);
        if (sampler == null || Double.isNaN(rate)) {
            rows.add(new Row("Sampling", "no digitizer or camera in this chain"));
            return rows;
        }
        boolean camera = sampler.getDevice() instanceof Camera;
        rows.add(new Row(camera ? "Frame rate" : "Sample rate", camera ? number(rate) + " frames/s" : rate(rate)));
        rows.add(new Row("Nyquist frequency", hz(rate / 2)));
        double upper = ChainFigures.frontEndUpperHz(chain);
        if (!Double.isNaN(upper)) {
            rows.add(new Row("Front end passes up to", hz(upper) + " (sensor band or resonance)"));
        }
        Stage filter = ChainFigures.filterStage(chain);
        if (filter != null) {
            Optional<Double> att = ChainFigures.filterAttenuationAtNyquistDb(chain);
            rows.add(new Row("Analog filter at Nyquist", att.map(a -> db(a) + " attenuation")
                    .orElse("filter not fully described")));
        } else {
            rows.add(new Row("Analog filter at Nyquist", "none in the chain"));
        }
        if (camera) {
            cameraRows(chain, sampler, rate, rows);
            return rows;
        }
        Optional<ProtectionFigures> figures = ChainFigures.figures(chain);
        if (figures.isPresent()) {
            ProtectionFigures f = figures.get();
            String whole = db(f.attenuationAtNyquistDb()) + " attenuation";
            if (!rows.get(rows.size() - 1).value().equals(whole)) { // differs when a digital filter adds to it
                rows.add(new Row("Whole chain at Nyquist", whole));
            }
            ChainFigures.need(chain).ifPresent(n -> rows.add(new Row("Needed attenuation", needText(n))));
            String band = f.aliasFreeBandHz() > 0 ? "0 – " + hz(f.aliasFreeBandHz()) : "none";
            if (!Double.isNaN(f.limitingSourceHz())) {
                band += " (limited by content at " + hz(f.limitingSourceHz()) + ")";
            }
            rows.add(new Row("Alias-free band", band));
            rows.add(new Row("Protection margin", Double.isInfinite(f.marginDb()) ? "nothing above Nyquist reaches the digitizer"
                    : signedDb(f.marginDb()) + (f.marginDb() >= 0 ? " (protected)" : " (short of the need)")));
        }
        if (filter == null && !ChainFigures.hasBuiltInDigitalFilter(chain)) {
            Optional<Band> folded = ChainFigures.foldedBandHz(upper, rate);
            rows.add(new Row("Folds unprotected", folded.map(b -> hz(rate / 2) + " – " + hz(upper) + " lands in "
                    + hz(b.lowHz()) + " – " + hz(b.highHz())).orElse("nothing")));
        }
        return rows;
    }

    /**
     * The criterion spelled out: "110 dB range + −30 dBFS content = 80 dB"; figures that were not
     * given say what stands in for them (the ideal quantiser's SNR, a full-scale tone).
     */
    public static String needText(ChainFigures.Need need) {
        String range = number(need.dynamicRangeDb()) + " dB "
                + (need.rangeStated() ? "range" : "ideal " + need.bits() + "-bit SNR (no range given)");
        String level = signed(need.outOfBandLevelDbfs()) + " dBFS "
                + (need.levelStated() ? "content" : "content (worst case: no level given)");
        return range + " + " + level + " = " + number(need.requiredDb()) + " dB";
    }

    /** A number with a true minus sign for the reader: "−30", "0", "6". */
    static String signed(double value) {
        return value < 0 ? "−" + number(-value) : number(value);
    }

    private static void cameraRows(SignalChain chain, Stage sampler, double rate, List<Row> rows) {
        Camera camera = (Camera) sampler.getDevice();
        Double exposure = sampler.getExposureS() != null ? sampler.getExposureS() : camera.getExposureS();
        double period = 1.0 / rate;
        rows.add(new Row("Frame period", ms(period)));
        if (exposure == null) {
            rows.add(new Row("Exposure", "not logged"));
            return;
        }
        rows.add(new Row("Exposure", ms(exposure) + String.format(Locale.ROOT, " (%.0f %% of the frame period)",
                100 * exposure / period)));
        FrequencyResponse response = ChainFigures.chainResponse(chain);
        rows.add(new Row("Exposure smear at Nyquist", db(response.attenuationDb(rate / 2)) + " attenuation"));
    }
}
