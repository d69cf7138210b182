package org.foldbook.cli;

import java.io.PrintStream;
import java.util.Arrays;

import org.foldbook.dsp.fft.RealFft;

/**
 * Headless entry point: {@code Main <command> [options]}. Plain Java, no display; prints results to
 * standard output (or a file) and messages to standard error. Exit codes: 0 done, 2 bad arguments or
 * input, 3 a file could not be read or written, 4 cancelled.
 */
public final class Main {
    static final int OK = 0;
    static final int BAD_INPUT = 2;
    static final int IO_ERROR = 3;
    static final int CANCELLED = 4;

    private Main() {
    }

    public static void main(String[] args) {
        // decided once for this front end: the sweep runs rates in parallel, so one transform = one thread
        RealFft.configureThreads(1);
        System.exit(run(args, System.out, System.err));
    }

    /** Runs one command; returns the exit code (the JVM is left running, so tests can call it). */
    static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0 || args[0].equals("-h") || args[0].equals("--help")) {
            err.println("usage: foldbook <command> [options]\ncommands:\n  sweep   stepped-rate simulation of a "
                    + "recording or a notebook channel, per-rate peaks and verdicts as JSON\n"
                    + "  demo    write the demo notebook and its recordings into a folder\n"
                    + "run 'foldbook <command> --help' for its options");
            return args.length == 0 ? BAD_INPUT : OK;
        }
        String[] rest = Arrays.copyOfRange(args, 1, args.length);
        return switch (args[0]) {
            case "sweep" -> SweepCommand.run(rest, out, err);
            case "demo" -> DemoCommand.run(rest, out, err);
            default -> {
                err.println("foldbook: unknown command '" + args[0] + "' (known: sweep, demo)");
                yield BAD_INPUT;
            }
        };
    }
}
