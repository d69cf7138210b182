package org.foldbook.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.BesselNormalization;
import org.foldbook.dsp.resample.ModelledChannel;
import org.foldbook.sweep.FoldPreview;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.StreamingSweep;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/** {@code foldbook sweep}: reads a recording and a rate grid, runs the sweep, writes JSON or CSV. */
final class SweepCommand {
    private SweepCommand() {
    }

    static int run(String[] args, PrintStream out, PrintStream err) {
        for (String a : args) {
            if (a.equals("-h") || a.equals("--help")) {
                err.print(SweepOptions.USAGE);
                err.print(NotebookSweep.USAGE);
                return Main.OK;
            }
        }
        if (NotebookSweep.wanted(args)) {
            return NotebookSweep.run(args, out, err);
        }
        try {
            SweepOptions o = SweepOptions.parse(args);
            SweepResult result;
            if (o.stream()) {
                try (RecordingLoader.Streamed rec = RecordingLoader.stream(o.input(), o.rate(), o.channel());
                        StreamingSweep engine = new StreamingSweep(o.threads())) {
                    result = engine.run(rec, ladder(o, rec.rate()), mode(o), o.spectrumSettings(), progress(o, err));
                }
            } else {
                RecordingLoader.Loaded rec = RecordingLoader.load(o.input(), o.rate(), o.channel());
                result = sweep(o, rec, ladder(o, rec.rate()), err);
            }
            if (!Double.isNaN(o.bandLow())) {
                result = result.withBand(o.bandLow(), o.bandHigh());
            }
            String text = o.format().equals("csv") ? result.toCsv() : result.toJson() + "\n";
            if (o.output().isPresent()) {
                Files.writeString(o.output().get(), text, StandardCharsets.UTF_8);
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
        } catch (IOException e) {
            err.println("foldbook sweep: " + e.getMessage());
            return Main.IO_ERROR;
        }
    }

    static RateLadder ladder(SweepOptions o, double sourceRate) throws IOException {
        if (o.grid().isPresent()) {
            Path g = o.grid().get();
            if (!Files.isRegularFile(g)) {
                throw new IllegalArgumentException("--grid " + g + ": no such file");
            }
            try (Reader r = Files.newBufferedReader(g, StandardCharsets.UTF_8)) {
                return RateLadder.readGrid(r, g.toString(), sourceRate);
            }
        }
        if (o.rates().length > 0) {
            return RateLadder.ofRates(sourceRate, o.rates(), o.maxDen());
        }
        double from = Double.isNaN(o.from()) ? sourceRate : o.from();
        return o.spacing().equals("lin") ? RateLadder.linear(sourceRate, from, o.to(), o.steps(), o.maxDen())
                : RateLadder.geometric(sourceRate, from, o.to(), o.steps(), o.maxDen());
    }

    static AnalogFilter filter(String spec) {
        String[] p = spec.split(":");
        try {
            switch (p[0]) {
                case "butterworth" -> {
                    if (p.length == 3) {
                        return AnalogLowPass.butterworth(Integer.parseInt(p[1]), Double.parseDouble(p[2]));
                    }
                }
                case "bessel" -> {
                    if (p.length == 3) {
                        return AnalogLowPass.bessel(Integer.parseInt(p[1]), Double.parseDouble(p[2]),
                                BesselNormalization.MAGNITUDE);
                    }
                }
                case "rc" -> {
                    if (p.length == 2) {
                        return AnalogLowPass.rc(Double.parseDouble(p[1]));
                    }
                }
                default -> {
                }
            }
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("--filter '" + spec + "': not a number in it");
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException("--filter '" + spec + "': " + e.getMessage(), e);
        }
        throw new IllegalArgumentException("--filter must be butterworth:ORDER:HZ, bessel:ORDER:HZ or rc:HZ, was '"
                + spec + "'");
    }

    /** The chain from --filter, --digitizer and --exposure (each optional; none of them: the bare sampler). */
    static ModelledChannel channel(SweepOptions o) {
        ModelledChannel c = ModelledChannel.none();
        if (o.filter().isPresent()) {
            c = c.withAnalog(filter(o.filter().get()));
        }
        if (o.digitizer().isPresent()) {
            double[] d = o.digitizer().get();
            try {
                c = c.withDigitizerFilter(new ModelledChannel.DigitizerFilter(d[0], d[1], d[2]));
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("--digitizer: " + e.getMessage(), e);
            }
        }
        if (o.exposure() > 0) {
            c = c.withExposure(o.exposure());
        }
        return c;
    }

    static Resampling mode(SweepOptions o) {
        return switch (o.mode()) {
            case "bare" -> Resampling.bare();
            case "bare-kernel" -> Resampling.bareKernel();
            case "modelled" -> Resampling.modelledChannel(channel(o));
            case "ideal" -> Resampling.idealDecimator();
            case "polyphase-default" -> Resampling.polyphaseDefault();
            case "preview" -> Resampling.modelledChannel(channel(o));
            default -> throw new IllegalArgumentException("--mode " + o.mode());
        };
    }

    private static SweepResult sweep(SweepOptions o, RecordingLoader.Loaded rec, RateLadder ladder, PrintStream err) {
        Resampling mode = mode(o);
        SourceSpectrum ref = SourceSpectrum.of(rec.samples(), rec.rate(), o.spectrumSettings());
        if (o.mode().equals("preview")) {
            return new FoldPreview(ref).preview(ladder, mode);
        }
        try (SweepEngine engine = new SweepEngine(o.threads())) {
            return engine.run(rec.samples(), ref, ladder, mode, progress(o, err));
        }
    }

    private static SweepProgress progress(SweepOptions o, PrintStream err) {
        return o.quiet() ? SweepProgress.NONE : new SweepProgress() {
            @Override
            public synchronized void rateDone(RateResult r, int done, int total) {
                err.printf("rate %d/%d done: %.6g S/s, %d peaks%n", done, total, r.step().effectiveRate(),
                        r.observed().size());
            }
        };
    }
}
