package org.foldbook.channel;

import java.util.List;
import java.util.Objects;

import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SpectrumSettings;

/**
 * Everything a stepped-rate simulation of one channel runs with, worked out from the notebook by
 * {@link ChannelSimulation#setup}; the command line may replace parts of it from its flags.
 *
 * @param mode       the way the rates are reached (one a notebook keeps)
 * @param ladder     the rates
 * @param resampling the sweep's operator for {@code mode} (for the modelled mode: the through-chain's elements)
 * @param settings   spectrum and peak settings
 * @param bandLowHz  band of interest, low edge; NaN without a band
 * @param bandHighHz band of interest, high edge; NaN without a band
 * @param notes      what the set-up could not honour or applied with a caveat, in words
 * @param signature  one line describing chain, plan and mode: a kept result with another one is stale
 */
public record SimulationSetup(SimulationMode mode, RateLadder ladder, Resampling resampling, SpectrumSettings settings,
        double bandLowHz, double bandHighHz, List<String> notes, String signature) {

    public SimulationSetup {
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(ladder, "ladder");
        Objects.requireNonNull(resampling, "resampling");
        Objects.requireNonNull(settings, "settings");
        notes = List.copyOf(notes);
    }

    /** True when a band of interest is set. */
    public boolean hasBand() {
        return !Double.isNaN(bandLowHz);
    }

    public SimulationSetup withLadder(RateLadder next) {
        return new SimulationSetup(mode, next, resampling, settings, bandLowHz, bandHighHz, notes,
                signature + " | rates " + next.size() + " overridden");
    }

    public SimulationSetup withResampling(Resampling next, String why) {
        return new SimulationSetup(mode, ladder, next, settings, bandLowHz, bandHighHz, notes,
                signature + " | operator " + next.mode().word() + " (" + why + ")");
    }

    public SimulationSetup withSettings(SpectrumSettings next) {
        return new SimulationSetup(mode, ladder, resampling, next, bandLowHz, bandHighHz, notes,
                signature + " | settings " + next);
    }

    public SimulationSetup withBand(double lowHz, double highHz) {
        return new SimulationSetup(mode, ladder, resampling, settings, lowHz, highHz, notes,
                signature + " | band " + lowHz + ".." + highHz);
    }
}
