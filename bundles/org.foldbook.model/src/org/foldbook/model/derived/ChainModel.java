package org.foldbook.model.derived;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.Cascade;
import org.foldbook.dsp.filter.DigitizerDigitalFilter;
import org.foldbook.dsp.filter.ExposureBoxcar;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.filter.SensorAndConditioner;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Digitizer;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;

/**
 * The one mapping from a notebook signal chain to the DSP core's chain elements. The derived figures
 * ({@link ChainFigures}), the stepped-rate simulation of the workbench and of the command line all
 * take the chain from here, so they cannot disagree about what a stage does.
 *
 * <p>Stage settings override device values (cutoff, rate, exposure). Elements, in signal order:
 * the sensor's mounted resonance (only when its Q is given), the conditioner's band edges (first-order
 * high- and low-pass at the stated −3 dB points: an assumption, data sheets rarely state the order),
 * the anti-alias filter (unless bypassed, undescribed or absent), a digitizer's built-in digital
 * filter (its edges scale with the rate) and a camera's exposure (box-car).
 *
 * @param chainId          the chain's id (or name when it has none)
 * @param sampler          what samples the chain
 * @param samplingRateHz   the rate in effect, NaN when unknown
 * @param sensorResonance  the resonance as a filter, when its frequency and Q are known
 * @param conditioner      the amplifiers' band edges, in signal order
 * @param antiAlias        the anti-alias low-pass in effect
 * @param antiAliasState   why {@code antiAlias} is or is not there
 * @param digitizerFilter  a digitizer's built-in filter, edges as fractions of its rate
 * @param exposureSeconds  a camera's exposure, 0 when none
 * @param deviceIds        ids of every device the chain passes through, in signal order
 * @param notes            what the notebook leaves open, in words
 */
public record ChainModel(String chainId, Sampler sampler, double samplingRateHz, Optional<AnalogFilter> sensorResonance,
        List<AnalogFilter> conditioner, Optional<AnalogFilter> antiAlias, FilterState antiAliasState,
        Optional<ModelledChannel.DigitizerFilter> digitizerFilter, double exposureSeconds, List<String> deviceIds,
        List<String> notes) {

    /** What samples the chain. */
    public enum Sampler {
        DIGITIZER, CAMERA, NONE
    }

    /** The state of a chain's anti-alias filter. */
    public enum FilterState {
        /** A filter of known family, order and cutoff: modelled. */
        MODELLED,
        /** The filter stage's device is of family NONE: in the chain but passing everything. */
        BYPASSED,
        /** Family UNKNOWN, or the parameters its family needs are missing: cannot be modelled. */
        UNDESCRIBED,
        /** No anti-alias filter stage at all. */
        ABSENT
    }

    public ChainModel {
        conditioner = List.copyOf(conditioner);
        deviceIds = List.copyOf(deviceIds);
        notes = List.copyOf(notes);
    }

    /** Maps {@code chain}; never fails on missing settings (they become notes and absent elements). */
    public static ChainModel of(SignalChain chain) {
        List<String> notes = new ArrayList<>();
        List<String> ids = new ArrayList<>();
        for (Stage s : chain.getStages()) {
            if (s.getDevice() != null) {
                ids.add(s.getDevice().getId());
            }
        }
        Optional<AnalogFilter> resonance = Optional.empty();
        Stage sensorStage = ChainFigures.sensorStage(chain);
        if (sensorStage != null) {
            Sensor sensor = (Sensor) sensorStage.getDevice();
            if (sensor.getResonanceHz() != null && sensor.getResonanceHz() > 0) {
                if (sensor.getResonanceQ() != null && sensor.getResonanceQ() > 0) {
                    resonance = Optional.of(SensorAndConditioner.sensorResonance(sensor.getResonanceHz(), sensor.getResonanceQ()));
                } else {
                    notes.add("sensor " + sensor.getId() + ": resonance at " + hz(sensor.getResonanceHz())
                            + " without a Q; its peak is not modelled");
                }
            }
        }
        List<AnalogFilter> conditioner = new ArrayList<>();
        for (Stage s : chain.getStages()) {
            if (s.getDevice() instanceof Amplifier a) {
                if (a.getBandwidthLowHz() != null && a.getBandwidthLowHz() > 0) {
                    conditioner.add(SensorAndConditioner.highPass(a.getBandwidthLowHz()));
                }
                if (a.getBandwidthHighHz() != null && a.getBandwidthHighHz() > 0) {
                    conditioner.add(org.foldbook.dsp.filter.AnalogLowPass.rc(a.getBandwidthHighHz()));
                }
            }
        }
        Optional<AnalogFilter> antiAlias = Optional.empty();
        FilterState state = FilterState.ABSENT;
        for (Stage s : chain.getStages()) {
            if (s.getDevice() instanceof AntiAliasFilter f) {
                if (f.getFamily() == FilterFamily.NONE) {
                    state = FilterState.BYPASSED;
                    notes.add("filter " + f.getId() + " is in bypass: it passes everything");
                    continue;
                }
                Optional<AnalogFilter> model = ChainFigures.filterResponse(s).map(AnalogFilter.class::cast);
                if (model.isPresent()) {
                    antiAlias = model;
                    state = FilterState.MODELLED;
                    break;
                }
                state = FilterState.UNDESCRIBED;
                notes.add("filter " + f.getId() + ": family " + f.getFamily().getLiteral()
                        + " without the order, cutoff or ripple its model needs; treated as absent");
            }
        }
        Stage samplerStage = ChainFigures.samplingStage(chain);
        double rate = ChainFigures.samplingRateHz(chain);
        Sampler sampler = Sampler.NONE;
        Optional<ModelledChannel.DigitizerFilter> digital = Optional.empty();
        double exposure = 0;
        if (samplerStage == null) {
            notes.add("no digitizer or camera stage");
        } else if (samplerStage.getDevice() instanceof Digitizer d) {
            sampler = Sampler.DIGITIZER;
            if (d.isDigitalFilter()) {
                if (d.getPassbandFraction() != null && d.getStopbandFraction() != null
                        && d.getStopbandAttenuationDb() != null) {
                    digital = Optional.of(new ModelledChannel.DigitizerFilter(d.getPassbandFraction(),
                            d.getStopbandFraction(), d.getStopbandAttenuationDb()));
                } else {
                    notes.add("digitizer " + d.getId() + " filters digitally, but its edges or attenuation are not given");
                }
            }
        } else if (samplerStage.getDevice() instanceof Camera c) {
            sampler = Sampler.CAMERA;
            Double e = samplerStage.getExposureS() != null ? samplerStage.getExposureS() : c.getExposureS();
            if (e != null && e > 0) {
                exposure = e;
            } else {
                notes.add("camera " + c.getId() + ": no exposure time; frames taken as instants");
            }
        }
        if (samplerStage != null && !(rate > 0)) {
            notes.add("no sampling rate");
        }
        String id = chain.getId() != null ? chain.getId() : String.valueOf(chain.getName());
        return new ChainModel(id, sampler, rate, resonance, conditioner, antiAlias, state, digital, exposure, ids, notes);
    }

    /**
     * What protects the digitizer at {@code rateHz}: the anti-alias filter, the built-in digital filter
     * (edges × {@code rateHz}) and the exposure. The sensor's resonance and the conditioner are left out:
     * the chain's out-of-band level is stated at the digitizer's input, after them. Flat without elements.
     */
    public FrequencyResponse protection(double rateHz) {
        List<FrequencyResponse> parts = new ArrayList<>();
        antiAlias.ifPresent(parts::add);
        if (digitizerFilter.isPresent() && rateHz > 0) {
            ModelledChannel.DigitizerFilter d = digitizerFilter.get();
            parts.add(DigitizerDigitalFilter.of(rateHz, d.passFraction(), d.stopFraction(), d.attenuationDb()));
        }
        if (exposureSeconds > 0) {
            parts.add(new ExposureBoxcar(exposureSeconds));
        }
        if (parts.isEmpty()) {
            return FLAT;
        }
        return parts.size() == 1 ? parts.get(0) : Cascade.of(parts);
    }

    /** Every element of the chain as the simulation applies it, in signal order. */
    public ModelledChannel modelledChannel() {
        return simulationAfter(null).channel();
    }

    /**
     * The elements the simulation applies to a recording that was made through {@code recordedThrough}
     * (null: a recording that passed none of them, e.g. a synthetic one): elements whose device the
     * recording already passed, with the same settings, are not applied twice; a filter device the
     * recording passed with other settings is applied again and said so. The digitizer's built-in filter
     * always applies (it follows the new rate).
     */
    public Simulation simulationAfter(ChainModel recordedThrough) {
        List<String> said = new ArrayList<>();
        ModelledChannel c = ModelledChannel.none();
        boolean sameSensor = recordedThrough != null && !deviceIds.isEmpty() && !recordedThrough.deviceIds.isEmpty()
                && deviceIds.get(0).equals(recordedThrough.deviceIds.get(0));
        if (sensorResonance.isPresent()) {
            if (sameSensor) {
                said.add("sensor resonance already in the recording (same sensor): not applied again");
            } else {
                c = c.withAnalog(sensorResonance.get());
            }
        }
        for (AnalogFilter f : conditioner) {
            if (recordedThrough != null && recordedThrough.conditioner.stream()
                    .anyMatch(g -> g.description().equals(f.description()))) {
                said.add("conditioner edge '" + f.description() + "' already in the recording: not applied again");
            } else {
                c = c.withAnalog(f);
            }
        }
        if (antiAlias.isPresent()) {
            AnalogFilter f = antiAlias.get();
            Optional<AnalogFilter> before = recordedThrough == null ? Optional.empty() : recordedThrough.antiAlias;
            if (before.isPresent() && before.get().description().equals(f.description())) {
                said.add("anti-alias filter '" + f.description() + "' already in the recording: not applied again");
            } else {
                if (before.isPresent()) {
                    said.add("the recording already passed '" + before.get().description() + "'; '"
                            + f.description() + "' is applied on top (the responses multiply)");
                }
                c = c.withAnalog(f);
            }
        }
        if (digitizerFilter.isPresent()) {
            c = c.withDigitizerFilter(digitizerFilter.get());
        }
        if (exposureSeconds > 0) {
            c = c.withExposure(exposureSeconds);
        }
        return new Simulation(c, said);
    }

    /** A stable one-line description of every element, for telling whether a kept result is stale. */
    public String signature() {
        StringBuilder b = new StringBuilder(chainId).append(" | ").append(sampler).append(' ')
                .append(String.format(Locale.ROOT, "%.9g", samplingRateHz));
        sensorResonance.ifPresent(f -> b.append(" | ").append(f.description()));
        conditioner.forEach(f -> b.append(" | ").append(f.description()));
        antiAlias.ifPresentOrElse(f -> b.append(" | ").append(f.description()),
                () -> b.append(" | filter ").append(antiAliasState));
        digitizerFilter.ifPresent(d -> b.append(" | ").append(d));
        if (exposureSeconds > 0) {
            b.append(String.format(Locale.ROOT, " | exposure %.9g s", exposureSeconds));
        }
        return b.toString();
    }

    /**
     * What the simulation applies, and what it left out or applied again, in words.
     *
     * @param channel the elements, for {@code org.foldbook.sweep.Resampling.modelledChannel}
     * @param notes   elements not applied twice, or applied on top of the recording's own
     */
    public record Simulation(ModelledChannel channel, List<String> notes) {
        public Simulation {
            notes = List.copyOf(notes);
        }
    }

    private static final FrequencyResponse FLAT = frequencyHz -> {
        if (!Double.isFinite(frequencyHz)) {
            throw new IllegalArgumentException("frequencyHz must be finite, was " + frequencyHz);
        }
        return 1.0;
    };

    private static String hz(double f) {
        return String.format(Locale.ROOT, "%.6g Hz", f);
    }
}
