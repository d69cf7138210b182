package org.foldbook.dsp.resample;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.filter.AnalogFilter;

/**
 * What a channel's chain does to the signal before it is sampled, as far as mode 2 simulates it:
 * analog filters in series (the amplifier's and the anti-alias low-pass), a digitizer's built-in
 * digital filter given relative to the new rate (as data sheets give it), and a camera's exposure
 * time. Every part is optional; an empty model is the bare sampler. Immutable.
 */
public final class ModelledChannel {

    /**
     * A digitizer's built-in digital low-pass, edges as fractions of the digitizer's own (new) rate.
     * Common practice for delta-sigma converters (from memory): pass band 0.45·fs, stop band 0.55·fs,
     * ≥ 90 dB.
     */
    public record DigitizerFilter(double passFraction, double stopFraction, double attenuationDb) {
        public DigitizerFilter {
            Check.inRange("passFraction", passFraction, Double.MIN_NORMAL, 1.0);
            Check.inRange("stopFraction", stopFraction, Double.MIN_NORMAL, 1.0);
            if (!(stopFraction > passFraction)) {
                throw new IllegalArgumentException("stopFraction must exceed passFraction " + passFraction + ", was "
                        + stopFraction);
            }
            Check.inRange("attenuationDb", attenuationDb, 0, 200);
        }
    }

    private final List<AnalogFilter> analog;
    private final DigitizerFilter digitizer;     // null: none
    private final double exposureSeconds;        // 0: none

    private ModelledChannel(List<AnalogFilter> analog, DigitizerFilter digitizer, double exposureSeconds) {
        this.analog = List.copyOf(analog);
        this.digitizer = digitizer;
        this.exposureSeconds = exposureSeconds;
    }

    /** No filtering at all. */
    public static ModelledChannel none() {
        return new ModelledChannel(List.of(), null, 0);
    }

    /** A copy with {@code filter} added after the analog filters already present. */
    public ModelledChannel withAnalog(AnalogFilter filter) {
        Objects.requireNonNull(filter, "filter");
        List<AnalogFilter> a = new ArrayList<>(analog);
        a.add(filter);
        return new ModelledChannel(a, digitizer, exposureSeconds);
    }

    /** A copy with the digitizer's digital filter set. */
    public ModelledChannel withDigitizerFilter(DigitizerFilter filter) {
        return new ModelledChannel(analog, Objects.requireNonNull(filter, "filter"), exposureSeconds);
    }

    /** A copy with a camera exposure (box-car integration) of {@code seconds}, &gt; 0. */
    public ModelledChannel withExposure(double seconds) {
        return new ModelledChannel(analog, digitizer, Check.positive("exposureSeconds", seconds));
    }

    public List<AnalogFilter> analogFilters() {
        return analog;
    }

    /** The digitizer filter, or null when there is none. */
    public DigitizerFilter digitizerFilter() {
        return digitizer;
    }

    /** Exposure time in seconds, 0 when there is none. */
    public double exposureSeconds() {
        return exposureSeconds;
    }

    @Override
    public String toString() {
        return "ModelledChannel[analog=" + analog + ", digitizer=" + digitizer + ", exposure=" + exposureSeconds + " s]";
    }
}
