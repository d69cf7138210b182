package org.foldbook.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.foldbook.channel.ChannelData;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelSimulation;
import org.foldbook.channel.ReadProgress;
import org.foldbook.channel.SimulationSetup;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * {@code foldbook sweep --notebook FILE --channel NAME}: the channel's own recording, chain and stored
 * sweep plan, through the same channel services as the workbench ({@link ChannelReader},
 * {@link ChannelSimulation}); flags may replace the rates, the band and the mode.
 */
final class NotebookSweep {

    private NotebookSweep() {
    }

    /** Runs the channel's stored plan; {@code o} has been checked, its --notebook and --channel are set. */
    static int run(SweepOptions o, PrintWriter out, PrintWriter err) throws IOException {
        Notebook notebook = NotebookStore.load(o.notebook);
        Channel channel = find(notebook, o.channel, o.notebook);
        SimulationMode mode = o.mode != null ? o.mode : ChannelSimulation.defaultMode(channel);
        ChannelData data = ChannelReader.read(channel, new ChannelReader.ReadRequest(o.acceptChanged),
                ReadProgress.NONE);
        if (data.checksumChanged() && !o.quiet()) {
            err.println("foldbook sweep: " + data.file() + " changed since it was logged (--accept-changed)");
        }
        SimulationSetup setup = ChannelSimulation.setup(channel, mode, data.rateHz());
        int maxDen = o.maxDen();
        if (o.steps() > 0 || o.rates().length > 0) {
            double from = Double.isNaN(o.from()) ? data.rateHz() : o.from();
            RateLadder ladder = o.rates().length > 0 ? RateLadder.ofRates(data.rateHz(), o.rates(), maxDen)
                    : o.spacing().equals("lin") ? RateLadder.linear(data.rateHz(), from, o.to(), o.steps(), maxDen)
                    : RateLadder.geometric(data.rateHz(), from, o.to(), o.steps(), maxDen);
            setup = setup.withLadder(ladder);
        }
        if (!Double.isNaN(o.bandLow())) {
            setup = setup.withBand(o.bandLow(), o.bandHigh());
        }
        if (o.peakRuleGiven()) {
            setup = setup.withSettings(setup.settings().withThreshold(o.threshold()));
        }
        if (!o.quiet()) {
            for (String note : setup.notes()) {
                err.println("note: " + note);
            }
        }
        SweepResult result;
        try (SweepEngine engine = new SweepEngine(o.threads())) {
            result = ChannelSimulation.run(data, setup, engine, o.quiet() ? SweepProgress.NONE : new SweepProgress() {
                @Override
                public synchronized void rateDone(RateResult r, int done, int total) {
                    err.printf(Locale.ROOT, "rate %d/%d done: %.6g S/s, %d peaks%n", done, total,
                            r.step().effectiveRate(), r.observed().size());
                }
            });
        }
        SweepCommand.write(o, result, out);
        return Main.OK;
    }

    /** The channel called {@code name} (or EXPERIMENT/NAME); an error naming the choices otherwise. */
    static Channel find(Notebook notebook, String name, Path file) {
        List<Channel> found = new ArrayList<>();
        List<String> all = new ArrayList<>();
        for (Experiment e : notebook.getExperiments()) {
            for (Channel c : e.getChannels()) {
                String full = e.getName() + "/" + c.getName();
                all.add("'" + full + "'");
                if (name.equals(c.getName()) || name.equals(full)) {
                    found.add(c);
                }
            }
        }
        if (found.size() == 1) {
            return found.get(0);
        }
        throw new IllegalArgumentException("--channel '" + name + "': " + (found.isEmpty() ? "no such channel"
                : found.size() + " channels have that name; give EXPERIMENT/NAME") + " in " + file
                + " (channels: " + String.join(", ", all) + ")");
    }
}
