package org.foldbook.cli;

import java.nio.file.Path;
import java.util.Optional;

import org.foldbook.sweep.PeakThreshold;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SpectrumSettings;

import picocli.CommandLine.Option;

/**
 * The options of {@code foldbook sweep} (a picocli mixin), with the cross-checks picocli cannot express.
 * Problems found by {@link #check()} are {@link IllegalArgumentException}s naming the option.
 */
final class SweepOptions {
    @Option(names = "--input", paramLabel = "FILE", description = "recording: WAV/RF64, CSV/TSV, HDF5, raw with a "
            + "layout sidecar, or raw little-endian float64 samples with --rate")
    Path input;
    @Option(names = "--notebook", paramLabel = "FILE", description = "a notebook: sweep the --channel's own recording "
            + "(its path taken relative to the notebook, SHA-256 checked first), chain and stored sweep plan")
    Path notebook;
    @Option(names = "--channel", paramLabel = "N|NAME", description = "with --input: the channel, 1-based (default 1); "
            + "with --notebook: the channel's name, or EXPERIMENT/NAME")
    String channel;
    @Option(names = "--accept-changed", description = "with --notebook: go on when the recording's SHA-256 differs "
            + "from the one the notebook logged")
    boolean acceptChanged;
    @Option(names = "--rate", paramLabel = "HZ", converter = CliValues.Positive.class,
            description = "sample rate of a raw float64 recording (checked against a file that states its own)")
    Double rate;
    @Option(names = "--grid", paramLabel = "FILE", description = "rate grid as 'index up down fs' lines")
    Path grid;
    @Option(names = "--from", paramLabel = "HZ", converter = CliValues.Positive.class,
            description = "highest requested rate (default: the recording's)")
    Double from;
    @Option(names = "--to", paramLabel = "HZ", converter = CliValues.Positive.class, description = "lowest requested rate")
    Double to;
    @Option(names = "--steps", paramLabel = "N", converter = CliValues.AtLeastOne.class,
            description = "number of requested rates from --from to --to")
    Integer steps;
    @Option(names = "--spacing", paramLabel = "geom|lin", description = "geom (default, equal ratios) or lin")
    String spacing = "geom";
    @Option(names = "--rates", paramLabel = "HZ,HZ,...", converter = CliValues.PositiveList.class,
            description = "explicit list of requested rates")
    CliValues.HzList rates;
    @Option(names = "--max-denominator", paramLabel = "D", converter = CliValues.AtLeastOne.class,
            description = "bound of the up/down ratios' denominators (default ${DEFAULT-VALUE})")
    int maxDenominator = 1000;
    @Option(names = "--mode", paramLabel = "MODE", converter = CliValues.Mode.class, description = "bare (default "
            + "with --input): no anti-alias filter, exact to 0.49 fs0; modelled: the chain's filter (--filter, "
            + "--digitizer, --exposure; with --notebook the plan's through-chain) with its exact response, then bare; "
            + "ideal: a correct decimator (0.45/0.5 fs, 100 dB); with --input also bare-kernel: the windowed-sinc "
            + "kernel alone (exact to 0.39 fs0), and polyphase-default: the default filter of a common polyphase "
            + "resampler, for side-by-side checks")
    SimulationMode mode;
    @Option(names = "--preview", description = "with --input: fold the source spectrum through the mode's response "
            + "without re-sampling (fast; the mode in the JSON is preview-MODE)")
    boolean preview;
    @Option(names = "--filter", paramLabel = "KIND:...", description = "butterworth:ORDER:HZ, bessel:ORDER:HZ or rc:HZ")
    String filter;
    @Option(names = "--digitizer", paramLabel = "PASS:STOP:DB", description = "a digitizer's built-in filter: pass "
            + "band to PASS*fs, from STOP*fs at least DB down (delta-sigma parts: about 0.45:0.55:90, common practice)")
    String digitizer;
    @Option(names = "--exposure", paramLabel = "SECONDS", converter = CliValues.Positive.class,
            description = "a camera's exposure time (box-car integration)")
    Double exposure;
    @Option(names = "--band", paramLabel = "LO:HI", converter = CliValues.Band.class,
            description = "also report the lowest rate keeping LO..HI Hz alias-free (replaces the plan's band)")
    CliValues.BandHz band;
    @Option(names = "--threads", paramLabel = "N", converter = CliValues.AtLeastOne.class,
            description = "worker threads (default: all cores)")
    Integer threads;
    @Option(names = "--format", paramLabel = "json|csv", description = "json (default) or csv")
    String format = "json";
    @Option(names = "--output", paramLabel = "FILE", description = "write there instead of standard output")
    Path output;
    @Option(names = "--quiet", description = "no progress lines on standard error")
    boolean quiet;
    @Option(names = "--stream", description = "read the recording once in blocks: any length in a small heap "
            + "(about 0.5 MB a rate), the same answers")
    boolean stream;
    @Option(names = "--peaks", paramLabel = "floor|prominence", description = "floor (default): peaks stand "
            + "--peak-margin dB above a running median of the spectrum; prominence: the prominence rule alone")
    String peaks = "floor";
    @Option(names = "--peak-margin", paramLabel = "DB", converter = CliValues.NonNegative.class,
            description = "margin above the floor (default 12)")
    Double peakMargin;
    @Option(names = "--quantisation-step", paramLabel = "LSB", converter = CliValues.Positive.class,
            description = "the digitizer's step in the recording's units: peaks must also stand the margin above "
                    + "its noise density q^2/(6 fs)")
    Double quantisationStep;

    Path input() {
        return input;
    }

    Optional<Double> rate() {
        return Optional.ofNullable(rate);
    }

    /** The 1-based channel of an --input recording. */
    int channel() {
        if (channel == null) {
            return 1;
        }
        try {
            int n = Integer.parseInt(channel.trim());
            if (n >= 1) {
                return n;
            }
        } catch (NumberFormatException e) {
            // named below
        }
        throw new IllegalArgumentException("--channel with --input is a channel number from 1, was '" + channel + "'");
    }

    Optional<Path> grid() {
        return Optional.ofNullable(grid);
    }

    double from() {
        return from == null ? Double.NaN : from;
    }

    double to() {
        return to == null ? Double.NaN : to;
    }

    int steps() {
        return steps == null ? -1 : steps;
    }

    String spacing() {
        return spacing;
    }

    double[] rates() {
        return rates == null ? new double[0] : rates.hz();
    }

    int maxDen() {
        return maxDenominator;
    }

    SimulationMode mode() {
        return mode == null ? SimulationMode.BARE : mode;
    }

    boolean preview() {
        return preview;
    }

    Optional<String> filter() {
        return Optional.ofNullable(filter);
    }

    Optional<double[]> digitizer() {
        if (digitizer == null) {
            return Optional.empty();
        }
        String[] p = digitizer.split(":");
        if (p.length != 3) {
            throw new IllegalArgumentException("--digitizer must be PASS:STOP:DB, was '" + digitizer + "'");
        }
        return Optional.of(new double[] {org.foldbook.dsp.NumberText.positive("--digitizer PASS", p[0]),
            org.foldbook.dsp.NumberText.positive("--digitizer STOP", p[1]),
            org.foldbook.dsp.NumberText.positive("--digitizer DB", p[2])});
    }

    double exposure() {
        return exposure == null ? 0 : exposure;
    }

    double bandLow() {
        return band == null ? Double.NaN : band.low();
    }

    double bandHigh() {
        return band == null ? Double.NaN : band.high();
    }

    int threads() {
        return threads == null ? Runtime.getRuntime().availableProcessors() : threads;
    }

    String format() {
        return format;
    }

    Optional<Path> output() {
        return Optional.ofNullable(output);
    }

    boolean quiet() {
        return quiet;
    }

    boolean stream() {
        return stream;
    }

    /** The peak rule ({@code --peaks}, {@code --peak-margin}, {@code --quantisation-step}). */
    PeakThreshold threshold() {
        PeakThreshold t = PeakThreshold.DEFAULT;
        t = new PeakThreshold(peaks.equals("floor"), t.marginDb(), t.floorWindowBins(), t.quantisationStep());
        if (peakMargin != null) {
            t = t.withMarginDb(peakMargin);
        }
        if (quantisationStep != null) {
            t = t.withQuantisationStep(quantisationStep);
        }
        return t;
    }

    /** Whether --peaks, --peak-margin or --quantisation-step was given. */
    boolean peakRuleGiven() {
        return !peaks.equals("floor") || peakMargin != null || quantisationStep != null;
    }

    /** The spectrum rules these options ask for. */
    SpectrumSettings spectrumSettings() {
        PeakThreshold threshold = threshold();
        SpectrumSettings d = SpectrumSettings.DEFAULT;
        return threshold.noiseAware() ? d.withThreshold(threshold)
                : SpectrumSettings.PROMINENCE_ONLY.withThreshold(threshold);
    }

    /** Checks what picocli cannot: one source, one rate grid, the words of the word-valued options. */
    void check() {
        oneOf("--spacing", spacing, "geom", "lin");
        oneOf("--format", format, "json", "csv");
        oneOf("--peaks", peaks, "floor", "prominence");
        if ((input == null) == (notebook == null)) {
            throw new IllegalArgumentException("give --input FILE or --notebook FILE --channel NAME (one of them)");
        }
        if ((steps != null) != (to != null)) {
            throw new IllegalArgumentException("--to and --steps go together");
        }
        int ways = (grid != null ? 1 : 0) + (steps != null ? 1 : 0) + (rates != null ? 1 : 0);
        if (notebook != null) {
            if (channel == null) {
                throw new IllegalArgumentException("--notebook FILE and --channel NAME go together");
            }
            if (mode != null && !mode.inNotebooks()) {
                throw new IllegalArgumentException("--mode with --notebook is one of "
                        + SimulationMode.words(SimulationMode.notebookModes()) + ", was '" + mode + "'");
            }
            if (preview) {
                throw new IllegalArgumentException("--preview works with --input");
            }
            if (ways > 1 || grid != null) {
                throw new IllegalArgumentException("with --notebook, replace the plan's rates with --to/--steps or --rates");
            }
            for (Object o : new Object[] {filter, digitizer, exposure, rate}) {
                if (o != null) {
                    throw new IllegalArgumentException("with --notebook the chain is the notebook's: --filter, "
                            + "--digitizer, --exposure and --rate do not apply");
                }
            }
            if (stream) {
                throw new IllegalArgumentException("--stream works with --input");
            }
            return;
        }
        if (acceptChanged) {
            throw new IllegalArgumentException("--accept-changed goes with --notebook");
        }
        if (ways != 1) {
            throw new IllegalArgumentException("give exactly one rate grid: --grid FILE, --to HZ --steps N, or --rates");
        }
        if (mode() == SimulationMode.MODELLED && filter == null && digitizer == null && exposure == null) {
            throw new IllegalArgumentException(
                    "--mode modelled needs --filter (e.g. butterworth:4:8000), --digitizer or --exposure");
        }
        if (stream && preview) {
            throw new IllegalArgumentException("--stream re-samples in the time domain; --preview does not");
        }
    }

    private static void oneOf(String opt, String v, String... allowed) {
        for (String s : allowed) {
            if (s.equals(v)) {
                return;
            }
        }
        throw new IllegalArgumentException(opt + " must be one of " + String.join(", ", allowed) + ", was '" + v + "'");
    }
}
