package org.foldbook.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CancellationException;

import org.foldbook.channel.ChannelData;
import org.foldbook.channel.ChannelDataException;
import org.foldbook.channel.ChannelReader;
import org.foldbook.channel.ChannelSimulation;
import org.foldbook.channel.ReadProgress;
import org.foldbook.channel.SimulationSetup;
import org.foldbook.dsp.NumberText;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.SweepMode;
import org.foldbook.model.persistence.NotebookLoadException;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * {@code foldbook sweep --notebook FILE --channel NAME}: the channel's own recording, chain and stored
 * sweep plan, through the same channel services as the workbench ({@link ChannelReader},
 * {@link ChannelSimulation}); flags may replace the rates, the band and the mode.
 */
final class NotebookSweep {

    static final String USAGE = """
            usage: foldbook sweep --notebook FILE --channel NAME [--mode bare|modelled|ideal] [--accept-changed]
                     [--to HZ --steps N [--from HZ] [--spacing geom|lin] | --rates HZ,HZ,...]
                     [--band LO:HI] [--threads N] [--format json|csv] [--output FILE] [--quiet]
              --notebook FILE   a notebook; the recording path is taken relative to it
              --channel NAME    the channel's name, or EXPERIMENT/NAME when several experiments have one
              --mode            bare (no anti-alias filter), modelled (the plan's through-chain, else the
                                channel's own chain; elements the recording already passed are not applied
                                twice) or ideal (a correct decimator); default: modelled when the plan asks
                                for it, else the plan's first mode
              --accept-changed  go on when the recording's SHA-256 differs from the one the notebook logged
              other options as for --input (they replace the plan's rates or band)
            """;

    private NotebookSweep() {
    }

    static boolean wanted(String[] args) {
        for (String a : args) {
            if (a.equals("--notebook")) {
                return true;
            }
        }
        return false;
    }

    static int run(String[] args, PrintStream out, PrintStream err) {
        try {
            Options o = Options.parse(args);
            Notebook notebook = NotebookStore.load(o.notebook);
            Channel channel = find(notebook, o.channel, o.notebook);
            SweepMode mode = o.mode != null ? o.mode : defaultMode(channel);
            ChannelData data = ChannelReader.read(channel, new ChannelReader.ReadRequest(o.acceptChanged),
                    ReadProgress.NONE);
            if (data.checksumChanged() && !o.quiet) {
                err.println("foldbook sweep: " + data.file() + " changed since it was logged (--accept-changed)");
            }
            SimulationSetup setup = ChannelSimulation.setup(channel, mode, data.rateHz());
            if (o.to > 0 || o.rates.length > 0) {
                double from = Double.isNaN(o.from) ? data.rateHz() : o.from;
                RateLadder ladder = o.rates.length > 0
                        ? RateLadder.ofRates(data.rateHz(), o.rates, ChannelSimulation.MAX_DENOMINATOR)
                        : o.linear ? RateLadder.linear(data.rateHz(), from, o.to, o.steps, ChannelSimulation.MAX_DENOMINATOR)
                        : RateLadder.geometric(data.rateHz(), from, o.to, o.steps, ChannelSimulation.MAX_DENOMINATOR);
                setup = setup.withLadder(ladder);
            }
            if (!Double.isNaN(o.bandLow)) {
                setup = setup.withBand(o.bandLow, o.bandHigh);
            }
            if (!o.quiet) {
                for (String note : setup.notes()) {
                    err.println("note: " + note);
                }
            }
            SweepResult result;
            try (SweepEngine engine = new SweepEngine(o.threads)) {
                result = ChannelSimulation.run(data, setup, engine, o.quiet ? SweepProgress.NONE : new SweepProgress() {
                    @Override
                    public synchronized void rateDone(RateResult r, int done, int total) {
                        err.printf(Locale.ROOT, "rate %d/%d done: %.6g S/s, %d peaks%n", done, total,
                                r.step().effectiveRate(), r.observed().size());
                    }
                });
            }
            String text = o.csv ? result.toCsv() : result.toJson() + "\n";
            if (o.output != null) {
                Files.writeString(o.output, text, StandardCharsets.UTF_8);
            } else {
                out.print(text);
                out.flush();
            }
            return Main.OK;
        } catch (IllegalArgumentException e) {
            err.println("foldbook sweep: " + e.getMessage());
            err.println("run 'foldbook sweep --help' for the options");
            return Main.BAD_INPUT;
        } catch (CancellationException e) {
            err.println("foldbook sweep: cancelled");
            return Main.CANCELLED;
        } catch (NotebookLoadException | ChannelDataException e) {
            err.println("foldbook sweep: " + e.getMessage());
            return Main.BAD_INPUT;
        } catch (IOException e) {
            err.println("foldbook sweep: " + e.getMessage());
            return Main.IO_ERROR;
        }
    }

    /** FILTERED when the plan asks for it (the chain's own answer), else the plan's first mode. */
    static SweepMode defaultMode(Channel channel) {
        List<SweepMode> planned = ChannelSimulation.plannedModes(channel);
        return planned.contains(SweepMode.FILTERED) ? SweepMode.FILTERED : planned.get(0);
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

    private static final class Options {
        Path notebook;
        String channel;
        SweepMode mode;
        boolean acceptChanged;
        boolean quiet;
        boolean csv;
        boolean linear;
        double from = Double.NaN;
        double to = -1;
        int steps = -1;
        double[] rates = new double[0];
        double bandLow = Double.NaN;
        double bandHigh = Double.NaN;
        int threads = Runtime.getRuntime().availableProcessors();
        Path output;

        static Options parse(String[] args) {
            Options o = new Options();
            for (int i = 0; i < args.length; i++) {
                String a = args[i];
                switch (a) {
                    case "--accept-changed" -> o.acceptChanged = true;
                    case "--quiet" -> o.quiet = true;
                    default -> {
                        if (!a.startsWith("--")) {
                            throw new IllegalArgumentException("unexpected argument '" + a + "'");
                        }
                        if (i + 1 >= args.length) {
                            throw new IllegalArgumentException(a + " needs a value");
                        }
                        o.set(a, args[++i]);
                    }
                }
            }
            if (o.notebook == null || o.channel == null) {
                throw new IllegalArgumentException("--notebook FILE and --channel NAME go together");
            }
            if ((o.steps > 0) != (o.to > 0)) {
                throw new IllegalArgumentException("--to and --steps go together");
            }
            return o;
        }

        private void set(String a, String v) {
            switch (a) {
                case "--notebook" -> notebook = Path.of(v);
                case "--channel" -> channel = v;
                case "--mode" -> mode = switch (v) {
                    case "bare" -> SweepMode.BARE_SAMPLING;
                    case "modelled" -> SweepMode.FILTERED;
                    case "ideal" -> SweepMode.IDEAL_DECIMATOR;
                    default -> throw new IllegalArgumentException(
                            "--mode with --notebook is bare, modelled or ideal, was '" + v + "'");
                };
                case "--from" -> from = NumberText.positive(a, v);
                case "--to" -> to = NumberText.positive(a, v);
                case "--steps" -> steps = NumberText.atLeast(a, v, 1);
                case "--spacing" -> linear = switch (v) {
                    case "lin" -> true;
                    case "geom" -> false;
                    default -> throw new IllegalArgumentException("--spacing is geom or lin, was '" + v + "'");
                };
                case "--rates" -> rates = NumberText.positiveList(a, v);
                case "--band" -> {
                    String[] p = v.split(":");
                    if (p.length != 2) {
                        throw new IllegalArgumentException("--band must be LO:HI in Hz, was '" + v + "'");
                    }
                    bandLow = NumberText.finite(a, p[0]);
                    bandHigh = NumberText.positive(a, p[1]);
                    if (!(bandLow >= 0 && bandHigh > bandLow)) {
                        throw new IllegalArgumentException("--band needs 0 <= LO < HI, was '" + v + "'");
                    }
                }
                case "--threads" -> threads = NumberText.atLeast(a, v, 1);
                case "--format" -> csv = switch (v) {
                    case "csv" -> true;
                    case "json" -> false;
                    default -> throw new IllegalArgumentException("--format is json or csv, was '" + v + "'");
                };
                case "--output" -> output = Path.of(v);
                default -> throw new IllegalArgumentException("unknown option " + a + " with --notebook");
            }
        }
    }
}
