package org.foldbook.cli;

import java.nio.file.Path;
import java.util.Locale;
import java.util.Optional;

import org.foldbook.sweep.PeakThreshold;
import org.foldbook.sweep.SpectrumSettings;

/**
 * The options of {@code foldbook sweep}, parsed and checked. Every problem is an
 * {@link IllegalArgumentException} naming the option and the value.
 *
 * @param input      recording: WAV (any layout the io bundle reads), or raw little-endian float64 when
 *                   {@code rate} is given and the file is not RIFF/RF64
 * @param rate       sample rate of a raw recording, S/s (empty for WAV)
 * @param channel    1-based channel to sweep
 * @param grid       a grid file of {@code index up down fs} lines (empty: use from/to/steps or rates)
 * @param from       highest requested rate (NaN: the recording's rate)
 * @param to         lowest requested rate
 * @param steps      number of requested rates
 * @param spacing    {@code geom} or {@code lin}
 * @param rates      explicit requested rates (empty array: none)
 * @param maxDen     denominator bound of the up/down ratios
 * @param mode       bare, bare-kernel, modelled, ideal, polyphase-default or preview
 * @param filter     chain filter for modelled/preview: {@code butterworth:ORDER:HZ}, {@code bessel:ORDER:HZ},
 *                   {@code rc:HZ}
 * @param digitizer  digitizer built-in filter for modelled/preview: pass fraction, stop fraction (of the new
 *                   rate), attenuation dB; empty: none
 * @param exposure   camera exposure time in seconds for modelled/preview (0: none)
 * @param bandLow    band summary low edge (NaN: no band)
 * @param bandHigh   band summary high edge
 * @param threads    worker threads
 * @param format     json or csv
 * @param output     output file (empty: standard output)
 * @param quiet      no progress lines on standard error
 * @param stream     read the recording once in blocks (StreamingSweep)
 * @param threshold  the peak rule ({@code --peaks}, {@code --peak-margin}, {@code --quantisation-step})
 */
record SweepOptions(Path input, Optional<Double> rate, int channel, Optional<Path> grid, double from, double to,
        int steps, String spacing, double[] rates, int maxDen, String mode, Optional<String> filter,
        Optional<double[]> digitizer, double exposure, double bandLow,
        double bandHigh, int threads, String format, Optional<Path> output, boolean quiet, boolean stream,
        PeakThreshold threshold) {

    static final String USAGE = """
            usage: foldbook sweep --input FILE [--rate HZ] [--channel N]
                     (--grid FILE | --to HZ --steps N [--from HZ] [--spacing geom|lin] | --rates HZ,HZ,...)
                     [--max-denominator D] [--mode bare|bare-kernel|modelled|ideal|polyphase-default|preview]
                     [--filter KIND:...]
                     [--digitizer PASS:STOP:DB] [--exposure SECONDS]
                     [--band LO:HI] [--threads N] [--format json|csv] [--output FILE] [--quiet] [--stream]
                     [--peaks floor|prominence] [--peak-margin DB] [--quantisation-step LSB]
              --input FILE    WAV recording, or raw little-endian float64 samples (then --rate is required)
              --rate HZ       sample rate of a raw float64 recording
              --channel N     channel to sweep, 1-based (default 1)
              --grid FILE     rate grid as 'index up down fs' lines (e.g. written by the peer tool)
              --from/--to/--steps  requested rates from..to (from defaults to the recording's rate)
              --spacing       geom (default, equal ratios) or lin
              --rates         explicit list of requested rates
              --max-denominator D  bound of the ratio denominators (default 1000)
              --mode          bare (default): no anti-alias filter, exact to 0.49 fs0; bare-kernel: the
                              windowed-sinc kernel alone (side-by-side checks, exact to 0.39 fs0); modelled: the --filter chain with its
                              exact response, then bare; ideal: a correct decimator (0.45/0.5 fs, 100 dB);
                              polyphase-default: the default filter of a common polyphase resampler, for
                              side-by-side checks; preview: fold the source PSD through --filter (or none)
              --filter        butterworth:ORDER:CUTOFF_HZ, bessel:ORDER:CUTOFF_HZ or rc:CUTOFF_HZ
              --digitizer P:S:DB  a digitizer's built-in filter: pass band to P*fs, S*fs on at least DB dB down
                              (delta-sigma parts: about 0.45:0.55:90, common practice)
              --exposure S    a camera's exposure time in seconds (box-car integration)
              --band LO:HI    also report the lowest rate keeping LO..HI Hz alias-free
              --threads N     worker threads (default: all cores)
              --format        json (default) or csv
              --output FILE   write there instead of standard output
              --stream        read the recording once in blocks instead of into memory: any length in a
                              small heap (about 0.5 MB a rate), the same answers
              --peaks         floor (default): peaks stand --peak-margin dB (default 12) above a running
                              median of the spectrum; prominence: the prominence rule alone (side-by-side)
              --quantisation-step LSB  the digitizer's step in the recording's units: peaks must also
                              stand the margin above its noise density q^2/(6 fs)
            """;

    /** The spectrum rules these options ask for. */
    SpectrumSettings spectrumSettings() {
        SpectrumSettings d = SpectrumSettings.DEFAULT;
        return threshold.noiseAware() ? d.withThreshold(threshold)
                : SpectrumSettings.PROMINENCE_ONLY.withThreshold(threshold);
    }

    static SweepOptions parse(String[] args) {
        Path input = null;
        Double rate = null;
        int channel = 1;
        Path grid = null;
        double from = Double.NaN;
        double to = Double.NaN;
        int steps = -1;
        String spacing = "geom";
        double[] rates = new double[0];
        int maxDen = 1000;
        String mode = "bare";
        String filter = null;
        double[] digitizer = null;
        double exposure = 0;
        double bandLow = Double.NaN;
        double bandHigh = Double.NaN;
        int threads = Runtime.getRuntime().availableProcessors();
        String format = "json";
        Path output = null;
        boolean quiet = false;
        boolean stream = false;
        PeakThreshold threshold = PeakThreshold.DEFAULT;
        for (int i = 0; i < args.length; i++) {
            String a = args[i];
            if (a.equals("--quiet")) {
                quiet = true;
                continue;
            }
            if (a.equals("--stream")) {
                stream = true;
                continue;
            }
            if (!a.startsWith("--")) {
                throw new IllegalArgumentException("unexpected argument '" + a + "'");
            }
            if (i + 1 >= args.length) {
                throw new IllegalArgumentException(a + " needs a value");
            }
            String v = args[++i];
            switch (a) {
                case "--input" -> input = Path.of(v);
                case "--rate" -> rate = positive(a, v);
                case "--channel" -> channel = integer(a, v, 1);
                case "--grid" -> grid = Path.of(v);
                case "--from" -> from = positive(a, v);
                case "--to" -> to = positive(a, v);
                case "--steps" -> steps = integer(a, v, 1);
                case "--spacing" -> spacing = oneOf(a, v, "geom", "lin");
                case "--rates" -> {
                    String[] parts = v.split(",");
                    rates = new double[parts.length];
                    for (int k = 0; k < parts.length; k++) {
                        rates[k] = positive(a, parts[k].strip());
                    }
                }
                case "--max-denominator" -> maxDen = integer(a, v, 1);
                case "--mode" -> mode = oneOf(a, v, "bare", "bare-kernel", "modelled", "ideal", "polyphase-default", "preview");
                case "--filter" -> filter = v;
                case "--digitizer" -> {
                    String[] p = v.split(":");
                    if (p.length != 3) {
                        throw new IllegalArgumentException("--digitizer must be PASS:STOP:DB, was '" + v + "'");
                    }
                    digitizer = new double[] {positive(a, p[0]), positive(a, p[1]), positive(a, p[2])};
                }
                case "--exposure" -> exposure = positive(a, v);
                case "--peaks" -> threshold = oneOf(a, v, "floor", "prominence").equals("floor")
                        ? new PeakThreshold(true, threshold.marginDb(), threshold.floorWindowBins(), threshold.quantisationStep())
                        : new PeakThreshold(false, threshold.marginDb(), threshold.floorWindowBins(), threshold.quantisationStep());
                case "--peak-margin" -> threshold = threshold.withMarginDb(nonNegative(a, v));
                case "--quantisation-step" -> threshold = threshold.withQuantisationStep(positive(a, v));
                case "--band" -> {
                    String[] p = v.split(":");
                    if (p.length != 2) {
                        throw new IllegalArgumentException("--band must be LO:HI in Hz, was '" + v + "'");
                    }
                    bandLow = number(a, p[0]);
                    bandHigh = number(a, p[1]);
                    if (!(bandLow >= 0 && bandHigh > bandLow)) {
                        throw new IllegalArgumentException("--band needs 0 <= LO < HI, was '" + v + "'");
                    }
                }
                case "--threads" -> threads = integer(a, v, 1);
                case "--format" -> format = oneOf(a, v, "json", "csv");
                case "--output" -> output = Path.of(v);
                default -> throw new IllegalArgumentException("unknown option " + a);
            }
        }
        if (input == null) {
            throw new IllegalArgumentException("--input is required");
        }
        int ways = (grid != null ? 1 : 0) + (steps > 0 || !Double.isNaN(to) ? 1 : 0) + (rates.length > 0 ? 1 : 0);
        if (ways != 1) {
            throw new IllegalArgumentException("give exactly one rate grid: --grid FILE, --to HZ --steps N, or --rates");
        }
        if ((steps > 0) != !Double.isNaN(to)) {
            throw new IllegalArgumentException("--to and --steps go together");
        }
        if (mode.equals("modelled") && filter == null && digitizer == null && exposure == 0) {
            throw new IllegalArgumentException(
                    "--mode modelled needs --filter (e.g. butterworth:4:8000), --digitizer or --exposure");
        }
        if (stream && mode.equals("preview")) {
            throw new IllegalArgumentException("--stream works with the time-domain modes, not --mode preview");
        }
        return new SweepOptions(input, Optional.ofNullable(rate), channel, Optional.ofNullable(grid), from, to,
                steps, spacing, rates, maxDen, mode, Optional.ofNullable(filter),
                Optional.ofNullable(digitizer), exposure, bandLow, bandHigh, threads, format,
                Optional.ofNullable(output), quiet, stream, threshold);
    }

    private static double number(String opt, String v) {
        try {
            double d = Double.parseDouble(v);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(opt + " must be a number, was '" + v + "'");
        }
    }

    private static double positive(String opt, String v) {
        double d = number(opt, v);
        if (!(d > 0)) {
            throw new IllegalArgumentException(opt + " must be > 0, was '" + v + "'");
        }
        return d;
    }

    private static double nonNegative(String opt, String v) {
        double d = number(opt, v);
        if (!(d >= 0) || Double.isInfinite(d)) {
            throw new IllegalArgumentException(opt + " must be a finite number >= 0, was '" + v + "'");
        }
        return d;
    }

    private static int integer(String opt, String v, int min) {
        try {
            int n = Integer.parseInt(v);
            if (n < min) {
                throw new IllegalArgumentException(opt + " must be >= " + min + ", was " + n);
            }
            return n;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(opt + " must be an integer, was '" + v + "'");
        }
    }

    private static String oneOf(String opt, String v, String... allowed) {
        String l = v.toLowerCase(Locale.ROOT);
        for (String s : allowed) {
            if (s.equals(l)) {
                return s;
            }
        }
        throw new IllegalArgumentException(opt + " must be one of " + String.join(", ", allowed) + ", was '" + v + "'");
    }
}
