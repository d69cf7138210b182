package org.foldbook.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.foldbook.audit.AuditProgress;
import org.foldbook.audit.Auditor;
import org.foldbook.audit.BatchAudit;
import org.foldbook.audit.NotebookAudit;
import org.foldbook.audit.Severity;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code foldbook audit NOTEBOOK|DIR}: the audit of old recordings before reanalysis, headless, over
 * {@link BatchAudit} (the same {@link Auditor} the workbench would use).
 */
@Command(name = "audit", mixinStandardHelpOptions = true,
        description = {"Audits the recordings of a notebook (or of every notebook in a folder, searched recursively) "
                + "before reanalysis: chain figures, bands that fold, data problems (clipping, DC, unused bits, "
                + "dropouts, flat runs, energy near Nyquist, changed files) and, per spectral peak, every true "
                + "frequency that could appear there. Prints a summary per notebook; writes an HTML report a "
                + "group can file and the same findings as JSON.",
            "The figures do not replace the cautions of your lab: rigs near mains or high energy follow local "
                + "rules and the instructions of qualified staff."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:nothing at or above --fail-on", "1:findings at or above --fail-on",
            "2:usage or input error (the message names the file and the problem)"})
final class AuditCommand implements Callable<Integer> {
    @Parameters(paramLabel = "NOTEBOOK|DIR", description = "a notebook, or a folder searched for *.foldbook")
    Path input;
    @Option(names = "--experiment", paramLabel = "NAME", description = "audit only this experiment")
    String experiment;
    @Option(names = "--channel", paramLabel = "NAME", description = "audit only channels of this name")
    String channel;
    @Option(names = "--report", paramLabel = "FILE", description = "write a self-contained HTML report "
            + "(several notebooks: -2, -3 … added to the name)")
    Path report;
    @Option(names = "--json", paramLabel = "FILE", description = "write the findings as JSON (layout foldbook-audit/1)")
    Path json;
    @Option(names = "--fail-on", paramLabel = "warning|error", defaultValue = "warning",
            description = "the lowest severity that makes the exit code 1 (default ${DEFAULT-VALUE})")
    String failOn;
    @Option(names = "--quiet", description = "no progress line on a terminal")
    boolean quiet;
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        Severity threshold = switch (failOn) {
            case "warning" -> Severity.WARNING;
            case "error" -> Severity.ERROR;
            default -> throw new IllegalArgumentException("--fail-on is warning or error, was '" + failOn + "'");
        };
        boolean terminal = !quiet && System.console() != null;
        AuditProgress progress = !terminal ? AuditProgress.NONE : new AuditProgress() {
            @Override
            public void channel(String what, int done, int total) {
                err.printf(Locale.ROOT, "\raudit %d/%d %-60.60s", done + 1, total, what);
                err.flush();
            }
        };
        BatchAudit.Outcome o = BatchAudit.run(
                new BatchAudit.Request(input, new Auditor.Scope(experiment, channel), report, json, threshold), progress);
        if (terminal) {
            err.println();
        }
        if (o.exitCode() == BatchAudit.INPUT_ERROR) {
            err.println("foldbook audit: " + o.error());
            return Main.BAD_INPUT;
        }
        for (NotebookAudit a : o.audits()) {
            out.printf(Locale.ROOT, "%s: %s (%d channel(s))%n", a.file(), a.summary(), a.channels().size());
        }
        for (Path p : o.written()) {
            out.println("wrote " + p);
        }
        return o.exitCode() == BatchAudit.FINDINGS ? Main.FINDINGS : Main.OK;
    }
}
