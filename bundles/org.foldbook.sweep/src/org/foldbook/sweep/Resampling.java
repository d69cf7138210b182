package org.foldbook.sweep;

import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.resample.BareSampler;
import org.foldbook.dsp.resample.ExactChainFilter;
import org.foldbook.dsp.resample.IdealDecimator;
import org.foldbook.dsp.resample.KaiserPolyphaseResampler;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.dsp.resample.ModelledChannelResampler;
import org.foldbook.dsp.resample.ResampleRun;
import org.foldbook.dsp.resample.Resampler;
import org.foldbook.dsp.resample.SampleSink;
import org.foldbook.dsp.resample.SimulationWarning;

/**
 * One way of taking the recording to a lower rate in a sweep: which re-sampler serves a rate, what is
 * done once to the whole recording first, and the power gain |H(f)|² the way applies to source content at
 * f before it is sampled (for the spectral preview and for the expected attenuation in verdicts).
 * Implementations are immutable and thread-safe.
 */
public interface Resampling {

    /** Which way this is; its {@link SimulationMode#word() word} is the mode of the sweep's JSON. */
    SimulationMode mode();

    /**
     * Work done once per sweep on the whole recording, before any rate (e.g. the modelled analog filter,
     * realised at the source rate). Returns {@code source} itself when there is none, else one new array:
     * the only copy of the recording a sweep ever makes.
     */
    default double[] prepare(double[] source, double sourceRate) {
        return source;
    }

    /**
     * {@link #prepare} block by block, for the streaming sweep; null when {@code prepare} returns the source
     * itself. A mode that overrides {@code prepare} overrides this too, so that both give the same series.
     */
    default Preparation blockPrepare(double sourceRate) {
        return null;
    }

    /** The once-per-sweep work of a mode as a stream: consecutive source blocks in, the prepared series out. */
    interface Preparation {
        /** Length of the prepared series of {@code sourceLength} source samples. */
        long outputLength(long sourceLength);

        /** A pass whose prepared samples go to {@code sink} as they are complete. */
        ResampleRun start(SampleSink sink);
    }

    /** The re-sampler for one rate (designed here, so its cost counts as part of the sweep). */
    Resampler forRate(RateStep step);

    /** |H(f)|² applied to source content at {@code frequencyHz} on its way to {@code step}'s rate. */
    double powerGain(double frequencyHz, RateStep step);

    /**
     * True when {@link #powerGain} is a stated bound ("at least so many dB down") rather than the response
     * itself, as for a design that meets a mask: a component not seen after strong attenuation is then removed.
     */
    default boolean powerGainIsUpperBound() {
        return false;
    }

    /** Where this simulation is accurate for a recording at {@code sourceRate}, in words and figures. */
    SimulatorAccuracy accuracy(double sourceRate);

    /** Bands where this simulation cannot honour the chain it models (none for the digital modes). */
    default List<SimulationWarning> warnings(double sourceRate) {
        return List.of();
    }

    /**
     * Mode 1: a digitizer with no anti-alias filter. The recording is first brought to 2·fs0 by the exact
     * filter of an empty chain ({@link ExactChainFilter}: flat to 0.49·fs0, nothing from 0.51·fs0 to 1.49·fs0),
     * then evaluated at the new instants by the 16-tap windowed sinc made for such a series
     * ({@link BareSampler#forDoubledSeries}): every component up to 0.49·fs0 arrives within −100 dB, and the
     * interpolator adds no images of its own.
     */
    static Resampling bare() {
        return new ModelledFilter(ModelledChannel.none(), SimulationMode.BARE);
    }

    /**
     * The windowed-sinc kernel alone on the recording (W = 16, β = 10: the interpolator of a common simulation
     * of this kind), for side-by-side checks: accurate to −100 dB only up to 0.39·fs0; above it content is
     * attenuated and the kernel makes images at fs0 − f.
     */
    static Resampling bareKernel() {
        return Bare.INSTANCE;
    }

    /**
     * Mode 2 with an analog filter only: {@link #modelledChannel} of {@code ModelledChannel.none().withAnalog(filter)}.
     */
    static Resampling modelledFilter(AnalogFilter filter) {
        return new ModelledFilter(ModelledChannel.none().withAnalog(Objects.requireNonNull(filter, "filter")));
    }

    /**
     * Mode 2: the channel's own modelled chain ({@link ModelledChannel}: analog filters, a digitizer's
     * built-in filter, a camera's exposure), then sampled bare. The analog filters and the exposure are
     * applied with their true response ({@link ExactChainFilter}: frequency domain, within 0.1 dB of the model
     * above −120 dB over 0..0.49·fs0) once over the whole recording for all rates, at 2·fs0; the digitizer
     * filter depends on the rate and goes into each rate's sampler ({@link ModelledChannelResampler}). What
     * the source rate cannot honour is in {@link #warnings}.
     */
    static Resampling modelledChannel(ModelledChannel channel) {
        return new ModelledFilter(Objects.requireNonNull(channel, "channel"));
    }

    /**
     * Mode 3: what a correct digital down-sampler gives ({@link IdealDecimator}: multi-stage polyphase, pass
     * band to 0.45·fs, at least 100 dB from fs/2 on).
     */
    static Resampling idealDecimator() {
        return new Ideal(IdealDecimator.Spec.DEFAULT);
    }

    /** Mode 3 with another pass band / stop band / attenuation. */
    static Resampling idealDecimator(IdealDecimator.Spec spec) {
        return new Ideal(spec);
    }

    /** The ideal decimator; designs are kept per ratio, as the preview asks for the same rates again. */
    final class Ideal implements Resampling {
        private final IdealDecimator.Spec spec;
        private final java.util.Map<Long, IdealDecimator> designs = new java.util.concurrent.ConcurrentHashMap<>();

        Ideal(IdealDecimator.Spec spec) {
            this.spec = Objects.requireNonNull(spec, "spec");
        }

        public IdealDecimator.Spec spec() {
            return spec;
        }

        @Override
        public SimulationMode mode() {
            return SimulationMode.IDEAL;
        }

        private IdealDecimator design(RateStep step) {
            return designs.computeIfAbsent((long) step.up() << 32 | step.down(),
                    k -> IdealDecimator.of(step.ratio(), spec));
        }

        @Override
        public Resampler forRate(RateStep step) {
            return design(step);
        }

        /**
         * |H|² from the stated response, not the design: 1 in the pass band (ripple ≤ 0.001 dB), the stated
         * attenuation from the stop edge on (the design meets it or does better), log-linear between. Exact
         * evaluation ({@link IdealDecimator#magnitude}) costs the prototype's length per frequency, too slow
         * for a preview of thousands of bins.
         */
        @Override
        public double powerGain(double frequencyHz, RateStep step) {
            double fs = Math.min(step.effectiveRate(), step.sourceRate());
            double u = Math.abs(frequencyHz) / fs;
            if (u <= spec.passFraction()) {
                return 1.0;
            }
            double t = Math.min(1.0, (u - spec.passFraction()) / (spec.stopFraction() - spec.passFraction()));
            return Math.pow(10, -spec.attenuationDb() * t / 10);
        }

        @Override
        public boolean powerGainIsUpperBound() {
            return true;
        }

        @Override
        public SimulatorAccuracy accuracy(double sourceRate) {
            return new SimulatorAccuracy(spec.passFraction(), Double.NaN, -spec.attenuationDb(), String.format(
                    java.util.Locale.ROOT, "a correct decimator: pass band to %.3g of each new rate, at least %.0f dB "
                            + "from %.3g of it; what it shows is what an ideal anti-alias stage would keep",
                    spec.passFraction(), spec.attenuationDb(), spec.stopFraction()));
        }
    }

    /**
     * The peer-compatible filtered mode: scipy.signal.resample_poly's default design (Kaiser β = 5,
     * 20·max(up, down)+1 taps, see {@link KaiserPolyphaseResampler#resamplePolyDefaults}), so its per-rate
     * peaks can be compared with the peer's mode b bin for bin.
     */
    static Resampling polyphaseDefault() {
        return PolyphaseDefault.INSTANCE;
    }

    /** scipy's resample_poly defaults. */
    final class PolyphaseDefault implements Resampling {
        static final PolyphaseDefault INSTANCE = new PolyphaseDefault();
        // |H| of that design in dB at fractions of the new rate (scipy.signal.freqz for R = 20, as
        // documented with KaiserPolyphaseResampler); beyond 0.6 the stop band lies near -65 dB.
        private static final double[] AT = {0.0, 0.40, 0.45, 0.50, 0.55, 0.60, 0.65};
        private static final double[] DB = {0.0, 0.0, -0.66, -6.0, -22.6, -55.0, -65.0};

        private PolyphaseDefault() {
        }

        @Override
        public SimulationMode mode() {
            return SimulationMode.POLYPHASE_DEFAULT;
        }

        @Override
        public Resampler forRate(RateStep step) {
            return KaiserPolyphaseResampler.resamplePolyDefaults(step.ratio());
        }

        /** Piecewise-linear dB model of the design's response, tabulated at fractions of the new rate. */
        @Override
        public double powerGain(double frequencyHz, RateStep step) {
            if (step.up() == 1 && step.down() == 1) {
                return 1.0;
            }
            double u = Math.abs(frequencyHz) / step.effectiveRate();
            if (u >= AT[AT.length - 1]) {
                return Math.pow(10, DB[DB.length - 1] / 10);
            }
            int i = 1;
            while (u > AT[i]) {
                i++;
            }
            double t = (u - AT[i - 1]) / (AT[i] - AT[i - 1]);
            double db = DB[i - 1] + t * (DB[i] - DB[i - 1]);
            return Math.pow(10, db / 10);
        }

        @Override
        public boolean powerGainIsUpperBound() {
            return true;
        }

        @Override
        public SimulatorAccuracy accuracy(double sourceRate) {
            return new SimulatorAccuracy(0.40, Double.NaN, -65, "the default filter of a common polyphase resampler "
                    + "(Kaiser, beta 5): flat to 0.40 of each new rate, -6 dB at half of it, stop band near -65 dB; "
                    + "for side-by-side checks, not a model of any chain");
        }
    }

    /** The bare kernel alone, on the recording at fs0. */
    final class Bare implements Resampling {
        static final Bare INSTANCE = new Bare();

        private Bare() {
        }

        @Override
        public SimulationMode mode() {
            return SimulationMode.BARE_KERNEL;
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

        /** BareSampler's measured accuracy: its error stays below −100 dB re a tone up to 0.39·fs0. */
        @Override
        public SimulatorAccuracy accuracy(double sourceRate) {
            return new SimulatorAccuracy(Double.NaN, 0.39 * sourceRate, -100, String.format(java.util.Locale.ROOT,
                    "the bare kernel alone is accurate to -100 dB re each component up to %.6g Hz (0.39 of the source "
                            + "rate); above it the interpolator attenuates content and adds images of its own at the "
                            + "source rate minus the frequency", 0.39 * sourceRate));
        }
    }

    /** The modelled channel: analog filters and exposure once, exactly, at 2·fs0; the digitizer filter per rate. */
    final class ModelledFilter implements Resampling {
        private final ModelledChannel channel;
        private final SimulationMode mode;
        private final Map<Double, ExactChainFilter> exact = new ConcurrentHashMap<>();
        private final Map<RateStep, ModelledChannelResampler> samplers = new ConcurrentHashMap<>();

        ModelledFilter(ModelledChannel channel) {
            this(channel, SimulationMode.MODELLED);
        }

        ModelledFilter(ModelledChannel channel, SimulationMode mode) {
            this.channel = channel;
            this.mode = mode;
        }

        public ModelledChannel channel() {
            return channel;
        }

        @Override
        public SimulationMode mode() {
            return mode;
        }

        private ExactChainFilter exactAt(double sourceRate) {
            return exact.computeIfAbsent(sourceRate, fs -> ExactChainFilter.of(channel, fs));
        }

        /** The recording through the analog filters and exposure, at 2·fs0 (one array for all rates). */
        @Override
        public double[] prepare(double[] source, double sourceRate) {
            return exactAt(sourceRate).apply(source);
        }

        /** {@link #prepare} as a stream: the same overlap-save pass, fed block by block. */
        @Override
        public Preparation blockPrepare(double sourceRate) {
            ExactChainFilter f = exactAt(sourceRate);
            return new Preparation() {
                @Override
                public long outputLength(long sourceLength) {
                    return ExactChainFilter.FACTOR * sourceLength;
                }

                @Override
                public ResampleRun start(SampleSink sink) {
                    return f.start(sink);
                }
            };
        }

        /** Samples {@link #prepare}'s 2·fs0 series (so its {@code outputLength} counts 2·fs0 inputs). */
        @Override
        public Resampler forRate(RateStep step) {
            return samplers.computeIfAbsent(step, st -> ModelledChannelResampler.of(st.ratio(), st.sourceRate(),
                    channel, ModelledChannelResampler.AnalogStage.ALREADY_APPLIED));
        }

        /** |H(f)|² this mode applies: the analog models and exposure, the source-band edge, the digitizer FIR. */
        @Override
        public double powerGain(double frequencyHz, RateStep step) {
            double m = ((ModelledChannelResampler) forRate(step)).magnitude(frequencyHz);
            return m * m;
        }

        @Override
        public SimulatorAccuracy accuracy(double sourceRate) {
            ExactChainFilter f = exactAt(sourceRate);
            double upTo = ExactChainFilter.EXACT_UP_TO_FRACTION * sourceRate;
            return new SimulatorAccuracy(Double.NaN, upTo, Math.max(ExactChainFilter.TARGET_FLOOR_DB, f.accurateAboveDb()),
                    channel.analogFilters().isEmpty() && !(channel.exposureSeconds() > 0)
                            ? String.format(java.util.Locale.ROOT, "every component up to %.6g Hz (0.49 of the source "
                                    + "rate) is sampled with an error below -100 dB re itself; the simulator adds no "
                                    + "images of its own", upTo)
                            : String.format(java.util.Locale.ROOT, "the chain's response is applied within 0.1 dB "
                                    + "wherever it lies above %.0f dB, up to %.6g Hz (0.49 of the source rate), then "
                                    + "sampled with an error below -100 dB",
                                    Math.max(ExactChainFilter.TARGET_FLOOR_DB, f.accurateAboveDb()), upTo));
        }

        @Override
        public List<SimulationWarning> warnings(double sourceRate) {
            return exactAt(sourceRate).warnings();
        }
    }
}
