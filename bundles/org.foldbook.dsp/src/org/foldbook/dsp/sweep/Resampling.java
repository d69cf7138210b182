package org.foldbook.dsp.sweep;

import java.util.Objects;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.SecondOrderSections;
import org.foldbook.dsp.resample.BareSampler;
import org.foldbook.dsp.resample.Resampler;

/**
 * One way of taking the recording to a lower rate in a sweep: which re-sampler serves a rate, what is
 * done once to the whole recording first, and the power gain |H(f)|² the way applies to source content at
 * f before it is sampled (for the spectral preview and for the expected attenuation in verdicts).
 * Implementations are immutable and thread-safe.
 */
public interface Resampling {

    /** Short name used in JSON and on the command line, e.g. {@code bare}. */
    String name();

    /**
     * Work done once per sweep on the whole recording, before any rate (e.g. the modelled analog filter,
     * realised at the source rate). Returns {@code source} itself when there is none, else one new array:
     * the only copy of the recording a sweep ever makes.
     */
    default double[] prepare(double[] source, double sourceRate) {
        return source;
    }

    /** The re-sampler for one rate (designed here, so its cost counts as part of the sweep). */
    Resampler forRate(RateStep step);

    /** |H(f)|² applied to source content at {@code frequencyHz} on its way to {@code step}'s rate. */
    double powerGain(double frequencyHz, RateStep step);

    /** Mode 1: a digitizer with no anti-alias filter (windowed-sinc evaluation, see {@link BareSampler}). */
    static Resampling bare() {
        return Bare.INSTANCE;
    }

    /**
     * Mode 2: the chain's own analog filter, realised at the source rate ({@link AnalogFilter#toDigital}, the
     * bilinear transform pre-warped at the cutoff), then sampled bare. Valid only as far as the source
     * rate's headroom allows: the realisation follows the analog model closely well below the source Nyquist
     * frequency and not near it, so content the model would attenuate close to fs0/2 is not represented.
     */
    static Resampling modelledFilter(AnalogFilter filter) {
        return new ModelledFilter(filter);
    }

    /** The bare sampler. */
    final class Bare implements Resampling {
        static final Bare INSTANCE = new Bare();

        private Bare() {
        }

        @Override
        public String name() {
            return "bare";
        }

        @Override
        public Resampler forRate(RateStep step) {
            return BareSampler.of(step.ratio());
        }

        /** 1: nothing is filtered (the interpolator's own roll-off above 0.39·fs0 is not modelled). */
        @Override
        public double powerGain(double frequencyHz, RateStep step) {
            return 1.0;
        }
    }

    /** The modelled analog filter at the source rate, then the bare sampler. */
    final class ModelledFilter implements Resampling {
        private final AnalogFilter filter;

        ModelledFilter(AnalogFilter filter) {
            this.filter = Objects.requireNonNull(filter, "filter");
        }

        public AnalogFilter filter() {
            return filter;
        }

        @Override
        public String name() {
            return "modelled";
        }

        @Override
        public double[] prepare(double[] source, double sourceRate) {
            SecondOrderSections sos = filter.toDigital(sourceRate);
            double[] y = new double[source.length];
            sos.newFilter().filter(source, 0, y, 0, source.length);
            return y;
        }

        @Override
        public Resampler forRate(RateStep step) {
            return BareSampler.of(step.ratio());
        }

        /** |H(f)|² of the analog model (what the chain does, not its realisation). */
        @Override
        public double powerGain(double frequencyHz, RateStep step) {
            double m = filter.magnitude(frequencyHz);
            return m * m;
        }
    }
}
