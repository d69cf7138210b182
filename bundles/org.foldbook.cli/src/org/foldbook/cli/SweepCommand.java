package org.foldbook.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.Callable;

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

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code foldbook sweep}: reads a recording (through {@code Recordings.open}) or a notebook channel and a
 * rate grid, runs the stepped-rate simulation, writes JSON or CSV.
 */
@Command(name = "sweep", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Stepped-rate simulation: re-samples a recording at a ladder of lower rates and says, for every "
                + "spectral peak of the source, whether it survives, folds (where to), is removed, buried, hidden or "
                + "merged. JSON out (layout: org.foldbook.sweep package-info).",
            "  foldbook sweep --input FILE [--rate HZ] [--channel N] (--grid FILE | --to HZ --steps N | --rates ...) [--mode MODE] [--preview]",
            "  foldbook sweep --notebook FILE --channel NAME [--mode bare|modelled|ideal] [--accept-changed]"},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:done", "2:usage or input error (the message names the option or the file)"})
final class SweepCommand implements Callable<Integer> {
    @Mixin
    SweepOptions o;
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws IOException {
        o.check();
        PrintWriter err = spec.commandLine().getErr();
        if (o.notebook != null) {
            return NotebookSweep.run(o, spec.commandLine().getOut(), err);
        }
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
        write(o, result, spec.commandLine().getOut());
        return Main.OK;
    }

    /** The result as JSON or CSV, to --output or standard output. */
    static void write(SweepOptions o, SweepResult result, PrintWriter out) throws IOException {
        String text = o.format().equals("csv") ? result.toCsv() : result.toJson() + "\n";
        if (o.output().isPresent()) {
            Files.writeString(o.output().get(), text, StandardCharsets.UTF_8);
        } else {
            out.print(text);
            out.flush();
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
            case BARE -> Resampling.bare();
            case BARE_KERNEL -> Resampling.bareKernel();
            case MODELLED -> Resampling.modelledChannel(channel(o));
            case IDEAL -> Resampling.idealDecimator();
            case POLYPHASE_DEFAULT -> Resampling.polyphaseDefault();
        };
    }

    private static SweepResult sweep(SweepOptions o, RecordingLoader.Loaded rec, RateLadder ladder, PrintWriter err) {
        Resampling mode = mode(o);
        SourceSpectrum ref = SourceSpectrum.of(rec.samples(), rec.rate(), o.spectrumSettings());
        if (o.preview()) {
            return new FoldPreview(ref).preview(ladder, mode);
        }
        try (SweepEngine engine = new SweepEngine(o.threads())) {
            return engine.run(rec.samples(), ref, ladder, mode, progress(o, err));
        }
    }

    static SweepProgress progress(SweepOptions o, PrintWriter err) {
        return o.quiet() ? SweepProgress.NONE : new SweepProgress() {
            @Override
            public synchronized void rateDone(RateResult r, int done, int total) {
                err.printf("rate %d/%d done: %.6g S/s, %d peaks%n", done, total, r.step().effectiveRate(),
                        r.observed().size());
            }
        };
    }
}
