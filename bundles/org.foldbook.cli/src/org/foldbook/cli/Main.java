package org.foldbook.cli;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;

import org.foldbook.dsp.fft.RealFft;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.HelpCommand;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * Headless entry point, {@code foldbook <command> [options]}: plain Java, no display. Each command is a
 * picocli class listed in {@code subcommands} below (a new one, e.g. the audit, is one more entry there
 * and its word in the {@code ./foldbook} script); picocli parses the options and writes the usage.
 * Results go to standard output (or a file), messages to standard error.
 */
@Command(name = "foldbook", mixinStandardHelpOptions = true, version = "foldbook 0.1",
        description = "Headless commands of Foldbook (no display needed).",
        subcommands = {SweepCommand.class, AuditCommand.class, FoldCommand.class, DemoCommand.class, HelpCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:done (for a command with a threshold: nothing at or above it)",
            "1:findings at or above the command's threshold (a report, not a failure)",
            "2:usage or input error: a bad option, a missing, unreadable, corrupt or changed file, an output "
                    + "that cannot be written; the message names the file and the problem"})
public final class Main implements Runnable {
    /** The command did what was asked. */
    public static final int OK = 0;
    /** A command with a threshold found something at or above it. */
    public static final int FINDINGS = 1;
    /** Usage or input error (including files that cannot be read or written). */
    public static final int BAD_INPUT = 2;

    @Spec
    CommandSpec spec;

    public static void main(String[] args) {
        // decided once for this front end: the sweep runs rates in parallel, so one transform = one thread
        RealFft.configureThreads(1);
        System.exit(run(args, System.out, System.err));
    }

    /** Runs one command; returns the exit code (the JVM is left running, so tests can call it). */
    static int run(String[] args, PrintStream out, PrintStream err) {
        PrintWriter o = new PrintWriter(new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8), true);
        PrintWriter e = new PrintWriter(new java.io.OutputStreamWriter(err, StandardCharsets.UTF_8), true);
        CommandLine cl = new CommandLine(new Main());
        cl.setOut(o);
        cl.setErr(e);
        cl.setExitCodeExceptionMapper(t -> BAD_INPUT);
        cl.setExecutionExceptionHandler((ex, line, parsed) -> {
            String name = line.getCommandSpec().qualifiedName();
            line.getErr().println(name + ": " + describe(ex));
            if (ex instanceof IllegalArgumentException) {
                line.getErr().println("run '" + name + " --help' for the options");
            }
            line.getErr().flush();
            return BAD_INPUT;
        });
        cl.setParameterExceptionHandler((ParameterException ex, String[] a) -> {
            CommandLine line = ex.getCommandLine();
            line.getErr().println(line.getCommandSpec().qualifiedName() + ": " + ex.getMessage());
            line.getErr().println("run '" + line.getCommandSpec().qualifiedName() + " --help' for the options");
            line.getErr().flush();
            return BAD_INPUT;
        });
        int code = cl.execute(args);
        o.flush();
        e.flush();
        return code;
    }

    private static String describe(Exception ex) {
        if (ex instanceof java.util.concurrent.CancellationException) {
            return "cancelled";
        }
        String m = ex.getMessage();
        return m == null || m.isBlank() ? ex.getClass().getSimpleName() : m;
    }

    /** {@code foldbook} alone: the list of commands, exit 2. */
    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getErr());
        throw new ParameterException(spec.commandLine(), "name a command");
    }
}
