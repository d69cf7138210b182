package org.foldbook.model.derived;

import java.util.Optional;


import java.util.function.DoubleFunction;

import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.digitizer.AliasAnalysis;
import org.foldbook.dsp.digitizer.IdealQuantiser;
import org.foldbook.dsp.digitizer.RateSearchResult;
import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.BesselNormalization;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Amplifier;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;

/**
 * Figures computed from a signal chain's stages and devices. None of them is stored in the
 * notebook: the generated derived operations of {@link SignalChain} and the validation rules call
 * these, so a changed setting is reflected at once. Filter responses come from
 * {@code org.foldbook.dsp.filter}.
 */
public final class ChainFigures {

    private ChainFigures() {
    }

    /** The last stage whose device samples (digitizer or camera), or null. */
    public static Stage samplingStage(SignalChain chain) {
        Stage found = null;
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() instanceof Digitizer || stage.getDevice() instanceof Camera) {
                found = stage;
            }
        }
        return found;
    }

    /**
     * Sampling (or frame) rate of the chain in Hz: the stage's own setting, else the digitizer's
     * maximum rate or the camera's first frame rate; NaN without a sampling stage or any rate.
     */
    public static double samplingRateHz(SignalChain chain) {
        Stage stage = samplingStage(chain);
        return stage == null ? Double.NaN : stageRateHz(stage);
    }

    /**
     * Rate in effect at a digitizer or camera stage: the stage's own setting, else the digitizer's maximum
     * rate or the camera's first frame rate; NaN for other stages or when none is known.
     */
    public static double stageRateHz(Stage stage) {
        if (stage.getRateHz() != null) {
            return stage.getRateHz();
        }
        Device device = stage.getDevice();
        if (device instanceof Digitizer digitizer) {
            return digitizer.getMaxRateHz();
        }
        if (device instanceof Camera camera) {
            return camera.getFrameRatesHz().isEmpty() ? Double.NaN : camera.getFrameRatesHz().get(0);
        }
        return Double.NaN;
    }

    /** Half the sampling rate (Nyquist frequency), NaN when the rate is unknown. */
    public static double nyquistHz(SignalChain chain) {
        return samplingRateHz(chain) / 2.0;
    }

    /** The first stage holding a sensor, or null. */
    public static Stage sensorStage(SignalChain chain) {
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() instanceof Sensor) {
                return stage;
            }
        }
        return null;
    }

    /** The first stage holding an analog anti-alias filter whose family is not NONE, or null. */
    public static Stage filterStage(SignalChain chain) {
        for (Stage stage : chain.getStages()) {
            if (stage.getDevice() instanceof AntiAliasFilter filter && filter.getFamily() != FilterFamily.NONE) {
                return stage;
            }
        }
        return null;
    }

    /** Cutoff in effect at a filter stage: the stage setting, else the device's own cutoff. */
    public static double effectiveCutoffHz(Stage filterStage) {
        AntiAliasFilter filter = (AntiAliasFilter) filterStage.getDevice();
        return filterStage.getCutoffHz() != null ? filterStage.getCutoffHz() : filter.getCutoffHz();
    }

    /** True when the sampling device filters digitally before decimating (delta-sigma digitizers). */
    public static boolean hasBuiltInDigitalFilter(SignalChain chain) {
        Stage stage = samplingStage(chain);
        return stage != null && stage.getDevice() instanceof Digitizer digitizer && digitizer.isDigitalFilter();
    }

    /**
     * Highest frequency the front end passes: the sensor's usable maximum or its resonance,
     * whichever is higher (a resonance is a strong peak, so it counts), limited by an amplifier's
     * upper bandwidth when one is given. NaN when the sensor states neither.
     */
    public static double frontEndUpperHz(SignalChain chain) {
        Stage stage = sensorStage(chain);
        if (stage == null) {
            return Double.NaN;
        }
        Sensor sensor = (Sensor) stage.getDevice();
        double upper = Double.NaN;
        if (sensor.getUsableMaxHz() != null) {
            upper = sensor.getUsableMaxHz();
        }
        if (sensor.getResonanceHz() != null) {
            upper = Double.isNaN(upper) ? sensor.getResonanceHz() : Math.max(upper, sensor.getResonanceHz());
        }
        for (Stage other : chain.getStages()) {
            if (other.getDevice() instanceof Amplifier amplifier && amplifier.getBandwidthHighHz() != null) {
                upper = Math.min(upper, amplifier.getBandwidthHighHz());
            }
        }
        return upper;
    }

    /**
     * Where front-end content above Nyquist lands after sampling: content in (fs/2, upper] appears
     * at |f − k·fs| (k = round(f/fs), Oppenheim and Schafer ch. 4), i.e. in [fs − upper, fs/2] when
     * upper &lt; fs and anywhere in [0, fs/2] otherwise. Empty when nothing lies above Nyquist.
     */
    public static Optional<Band> foldedBandHz(double upperHz, double samplingRateHz) {
        double nyquist = samplingRateHz / 2.0;
        if (!(upperHz > nyquist)) {
            return Optional.empty();
        }
        // between fs/2 and fs the image runs from fs/2 down to |upper − fs|; from fs on it covers all of [0, fs/2]
        double low = upperHz >= samplingRateHz ? 0.0 : Folding.apparentHz(upperHz, samplingRateHz);
        return Optional.of(new Band(low, nyquist));
    }

    /**
     * Magnitude response of the stage's analog filter, built with {@code org.foldbook.dsp.filter};
     * empty when the family is NONE/UNKNOWN or the parameters needed for the family are missing.
     * Bessel cutoffs are taken as −3 dB points, as data sheets usually quote them (common practice).
     */
    public static Optional<FrequencyResponse> filterResponse(Stage filterStage) {
        AntiAliasFilter filter = (AntiAliasFilter) filterStage.getDevice();
        double cutoff = effectiveCutoffHz(filterStage);
        int order = filter.getOrder();
        if (!(cutoff > 0)) {
            return Optional.empty();
        }
        return switch (filter.getFamily()) {
            case RC -> Optional.of(AnalogLowPass.rc(cutoff));
            case BUTTERWORTH -> order > 0 ? Optional.of(AnalogLowPass.butterworth(order, cutoff)) : Optional.empty();
            case BESSEL -> order > 0
                    ? Optional.of(AnalogLowPass.bessel(order, cutoff, BesselNormalization.MAGNITUDE))
                    : Optional.empty();
            case CHEBYSHEV_I -> order > 0 && filter.getRippleDb() != null
                    ? Optional.of(AnalogLowPass.chebyshev1(order, filter.getRippleDb(), cutoff))
                    : Optional.empty();
            case ELLIPTIC -> order > 0 && filter.getRippleDb() != null && filter.getStopbandDb() != null
                    ? Optional.of(AnalogLowPass.elliptic(order, filter.getRippleDb(), filter.getStopbandDb(), cutoff))
                    : Optional.empty();
            case NONE, UNKNOWN -> Optional.empty();
        };
    }

    /**
     * Attenuation (dB) of the chain's analog filter at the Nyquist frequency: how much the content
     * that would fold first is pushed down. Empty without a usable filter model or a known rate.
     */
    public static Optional<Double> filterAttenuationAtNyquistDb(SignalChain chain) {
        Stage stage = filterStage(chain);
        double nyquist = nyquistHz(chain);
        if (stage == null || Double.isNaN(nyquist)) {
            return Optional.empty();
        }
        return filterResponse(stage).map(response -> response.attenuationDb(nyquist));
    }

    /**
     * The chain's magnitude response before sampling at its own rate, as far as the notebook describes
     * it: {@link ChainModel#protection} (the analog filter, a digitizer's built-in digital filter when
     * its edges and stop-band attenuation are given, a camera's exposure). Elements that are not
     * described are left out, so a chain with none of them is flat (|H| = 1).
     */
    public static FrequencyResponse chainResponse(SignalChain chain) {
        return ChainModel.of(chain).protection(samplingRateHz(chain));
    }

    /**
     * Alias-free band, attenuation at Nyquist and protection margin of a digitizer chain, computed by
     * {@code org.foldbook.dsp.digitizer} for the chain's {@link #need}: the alias of the strongest
     * out-of-band content must fall below the digitizer's noise floor. Empty for camera chains, or
     * when the rate, the resolution or the sensor's upper frequency is not known.
     */
    public static Optional<ProtectionFigures> figures(SignalChain chain) {
        Optional<Need> need = need(chain);
        double rate = samplingRateHz(chain);
        double sensorMax = frontEndUpperHz(chain);
        if (need.isEmpty() || !(sensorMax > 0)) {
            return Optional.empty();
        }
        Digitizer digitizer = (Digitizer) samplingStage(chain).getDevice();
        Need n = need.get();
        return Optional.of(ProtectionFigures.ofDynamicRange(sensorMax, chainResponse(chain),
                digitizer.getResolutionBits(), rate, n.dynamicRangeDb(), n.outOfBandLevelDbfs()));
    }

    /**
     * What the chain's filtering must achieve, and from which figures: the digitizer's dynamic range
     * (its specification, else the ideal quantiser's 6.02·N + 1.76 dB) plus the level of the strongest
     * content above Nyquist (the chain's stated level, else 0 dBFS, the worst case). Empty without a
     * digitizer, a positive rate or a resolution.
     */
    public static Optional<Need> need(SignalChain chain) {
        Stage sampler = samplingStage(chain);
        double rate = samplingRateHz(chain);
        if (sampler == null || !(sampler.getDevice() instanceof Digitizer digitizer) || !(rate > 0)
                || digitizer.getResolutionBits() <= 0 || digitizer.getResolutionBits() > IdealQuantiser.MAX_BITS) {
            return Optional.empty();
        }
        boolean rangeStated = digitizer.getDynamicRangeDb() != null;
        double range = rangeStated ? digitizer.getDynamicRangeDb()
                : new IdealQuantiser(digitizer.getResolutionBits(), 1.0).snrDb();
        boolean levelStated = chain.getOutOfBandLevelDbfs() != null;
        double level = levelStated ? chain.getOutOfBandLevelDbfs() : 0.0;
        return Optional.of(new Need(digitizer.getResolutionBits(), range, rangeStated, level, levelStated,
                ProtectionFigures.requiredAttenuationDb(range, level)));
    }

    /**
     * The band the chain is meant to keep: the analog filter's cutoff, else a built-in digital
     * filter's pass-band edge; NaN when neither is known.
     */
    public static double intendedBandHz(SignalChain chain) {
        Stage filter = filterStage(chain);
        if (filter != null) {
            return effectiveCutoffHz(filter);
        }
        Stage sampler = samplingStage(chain);
        if (sampler != null && sampler.getDevice() instanceof Digitizer digitizer && digitizer.isDigitalFilter()
                && digitizer.getPassbandFraction() != null) {
            return digitizer.getPassbandFraction() * samplingRateHz(chain);
        }
        return Double.NaN;
    }

    /**
     * The lowest rate up to the digitizer's maximum at which {@code bandHz} stays alias-free for the
     * chain's need, by {@code AliasAnalysis.lowestRate} (a built-in digital filter tracks the rate).
     * Empty without a need, a sensor upper frequency, or when the band does not fit under the maximum.
     */
    public static Optional<RateSearchResult> lowestAliasFreeRate(SignalChain chain, double bandHz) {
        Optional<Need> need = need(chain);
        double sensorMax = frontEndUpperHz(chain);
        if (need.isEmpty() || !(sensorMax > 0) || !(bandHz > 0)) {
            return Optional.empty();
        }
        Digitizer digitizer = (Digitizer) samplingStage(chain).getDevice();
        double maxRate = digitizer.getMaxRateHz();
        if (!(maxRate >= 2 * bandHz)) {
            return Optional.empty();
        }
        ChainModel model = ChainModel.of(chain);
        DoubleFunction<FrequencyResponse> atRate = model::protection;
        return Optional.of(AliasAnalysis.lowestRate(atRate, sensorMax, need.get().requiredDb(), bandHz,
                2 * bandHz, maxRate, 1e-6));
    }

    /**
     * The alias criterion of a digitizer chain: needed attenuation = dynamic range + out-of-band level.
     *
     * @param bits               the digitizer's resolution
     * @param dynamicRangeDb     full scale over the noise floor (dB)
     * @param rangeStated        false when it is the ideal quantiser's 6.02·N + 1.76 dB
     * @param outOfBandLevelDbfs the strongest content above Nyquist (dBFS)
     * @param levelStated        false when it is the worst case, 0 dBFS
     * @param requiredDb         the attenuation needed, max(0, range + level)
     */
    public record Need(int bits, double dynamicRangeDb, boolean rangeStated, double outOfBandLevelDbfs,
            boolean levelStated, double requiredDb) {
    }

    /** A closed frequency band in Hz. */
    public record Band(double lowHz, double highHz) {
        @Override
        public String toString() {
            return String.format(java.util.Locale.ROOT, "%.6g–%.6g Hz", lowHz, highHz);
        }
    }
}
