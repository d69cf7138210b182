package org.foldbook.channel;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.foldbook.model.Channel;
import org.foldbook.model.RateSpacing;
import org.foldbook.model.SignalChain;
import org.foldbook.model.SweepPlan;
import org.foldbook.model.WindowKind;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * The stepped-rate simulation of a notebook channel: its stored sweep plan and its chain, through
 * {@link ChainModel} (the one mapper), turned into the sweep's ladder, operator and settings. The
 * workbench's simulation part and {@code foldbook sweep --notebook} both start here.
 */
public final class ChannelSimulation {
    /** Denominator bound of the rate ratios (as the command line's default). */
    public static final int MAX_DENOMINATOR = 1000;
    /** Rates of a channel without a stored plan: its rate down to a sixteenth, geometric. */
    static final int DEFAULT_STEPS = 20;
    static final double DEFAULT_LOWEST_FRACTION = 1.0 / 16;

    private ChannelSimulation() {
    }

    /** The modes the channel's plan asks for, in the notebook's order; all three without a plan. */
    public static List<SimulationMode> plannedModes(Channel channel) {
        SweepPlan plan = channel.getSweepPlan();
        if (plan == null || plan.getModes().isEmpty()) {
            return SimulationMode.notebookModes();
        }
        return NotebookModes.of(plan.getModes());
    }

    /** The mode a run of the channel starts in: the modelled one when the plan asks for it, else the plan's first. */
    public static SimulationMode defaultMode(Channel channel) {
        List<SimulationMode> planned = plannedModes(channel);
        return planned.contains(SimulationMode.MODELLED) ? SimulationMode.MODELLED : planned.get(0);
    }

    /** The chain whose elements the modelled mode applies: the plan's through-chain, else the channel's own. */
    public static SignalChain throughChain(Channel channel) {
        SweepPlan plan = channel.getSweepPlan();
        return plan != null && plan.getThroughChain() != null ? plan.getThroughChain() : channel.getChain();
    }

    /**
     * The set-up for {@code mode} (one a notebook keeps) of a recording at {@code sourceRateHz}.
     *
     * @throws IllegalArgumentException when the plan is unusable (naming the field and value), or for a mode
     *                                  a notebook does not keep
     */
    public static SimulationSetup setup(Channel channel, SimulationMode mode, double sourceRateHz) {
        if (!(sourceRateHz > 0) || Double.isInfinite(sourceRateHz)) {
            throw new IllegalArgumentException("source rate must be positive and finite, was " + sourceRateHz);
        }
        SweepPlan plan = channel.getSweepPlan();
        List<String> notes = new ArrayList<>();
        RateLadder ladder = ladder(plan, sourceRateHz, notes);
        SpectrumSettings settings = settings(plan, notes);
        Resampling resampling;
        String chainText;
        switch (mode) {
            case BARE -> {
                resampling = Resampling.bare();
                chainText = "no chain";
            }
            case MODELLED -> {
                SignalChain through = throughChain(channel);
                if (through == null) {
                    throw new IllegalArgumentException("channel '" + channel.getName()
                            + "' has no chain to model (set the channel's chain or the plan's through-chain)");
                }
                ChainModel target = ChainModel.of(through);
                ChainModel recorded = channel.getChain() == null ? null : ChainModel.of(channel.getChain());
                ChainModel.Simulation sim = target.simulationAfter(recorded);
                notes.addAll(target.notes());
                notes.addAll(sim.notes());
                resampling = Resampling.modelledChannel(sim.channel());
                chainText = target.signature();
            }
            case IDEAL -> {
                resampling = Resampling.idealDecimator();
                chainText = "ideal decimator";
            }
            default -> throw new IllegalArgumentException("mode " + mode.word() + " is not one a notebook keeps (those are "
                    + SimulationMode.words(SimulationMode.notebookModes()) + ")");
        }
        double low = Double.NaN;
        double high = Double.NaN;
        if (plan != null && plan.getBandLowHz() != null && plan.getBandHighHz() != null) {
            low = plan.getBandLowHz();
            high = plan.getBandHighHz();
            if (!(low >= 0) || !(high > low)) {
                throw new IllegalArgumentException("sweep plan band of interest must have 0 <= low < high, was "
                        + low + ".." + high);
            }
        }
        String signature = String.format(Locale.ROOT, "%s | %s | rates %d from %.9g to %.9g S/s | segment %d",
                mode.word(), chainText, ladder.size(), ladder.steps().get(0).effectiveRate(),
                ladder.steps().get(ladder.size() - 1).effectiveRate(), settings.maxSegment());
        return new SimulationSetup(mode, ladder, resampling, settings, low, high, notes, signature);
    }

    /** Runs the set-up on the channel's samples (the band summary added when the set-up has a band). */
    public static SweepResult run(ChannelData data, SimulationSetup setup, SweepEngine engine, SweepProgress progress) {
        if (data.rateHz() != setup.ladder().sourceRate()) {
            throw new IllegalArgumentException("the set-up is for " + setup.ladder().sourceRate()
                    + " S/s, the data is at " + data.rateHz() + " S/s");
        }
        SweepResult result = engine.run(data.samples(), setup.ladder(), setup.resampling(), setup.settings(), progress);
        return setup.hasBand() ? result.withBand(setup.bandLowHz(), setup.bandHighHz()) : result;
    }

    private static RateLadder ladder(SweepPlan plan, double sourceRate, List<String> notes) {
        if (plan == null || !(plan.getMinRateHz() > 0) || plan.getRateCount() < 1) {
            notes.add(String.format(Locale.ROOT, "no stored sweep plan: %d rates from %.6g down to %.6g S/s",
                    DEFAULT_STEPS, sourceRate, sourceRate * DEFAULT_LOWEST_FRACTION));
            return RateLadder.geometric(sourceRate, sourceRate, sourceRate * DEFAULT_LOWEST_FRACTION, DEFAULT_STEPS,
                    MAX_DENOMINATOR);
        }
        double from = plan.getMaxRateHz() > 0 ? plan.getMaxRateHz() : sourceRate;
        if (from > sourceRate) {
            notes.add(String.format(Locale.ROOT, "the plan starts at %.6g S/s, above the recording's %.6g S/s: "
                    + "starts at the recording's rate", from, sourceRate));
            from = sourceRate;
        }
        double to = plan.getMinRateHz();
        if (to > from) {
            throw new IllegalArgumentException("sweep plan: lowest rate " + to + " S/s is above the highest " + from
                    + " S/s");
        }
        int steps = plan.getRateCount();
        return plan.getSpacing() == RateSpacing.LINEAR
                ? RateLadder.linear(sourceRate, from, to, steps, MAX_DENOMINATOR)
                : RateLadder.geometric(sourceRate, from, to, steps, MAX_DENOMINATOR);
    }

    private static SpectrumSettings settings(SweepPlan plan, List<String> notes) {
        SpectrumSettings d = SpectrumSettings.DEFAULT;
        if (plan == null) {
            return d;
        }
        int segment = plan.getSegmentLength();
        if (segment < 8 || Integer.bitCount(segment) != 1) {
            throw new IllegalArgumentException("sweep plan: segment length must be a power of two >= 8, was " + segment);
        }
        if (plan.getWindow() != null && plan.getWindow() != WindowKind.HANN) {
            notes.add("the sweep's spectra use Hann segments; the plan's " + plan.getWindow().getLiteral()
                    + " window is not applied");
        }
        return new SpectrumSettings(segment, d.prominenceDb(), d.matchBins());
    }
}
