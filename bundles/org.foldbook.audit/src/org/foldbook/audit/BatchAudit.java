package org.foldbook.audit;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import org.foldbook.model.Notebook;
import org.foldbook.model.persistence.NotebookStore;

/**
 * The audit as the command line runs it, without the argument parsing: a notebook file, or a folder
 * searched recursively for notebooks; each audited; reports written; an exit code. Exit codes:
 * {@link #CLEAN} nothing at or above the threshold, {@link #FINDINGS} something is, {@link #INPUT_ERROR}
 * the input could not be used (the message names the file and the problem).
 */
public final class BatchAudit {
    public static final int CLEAN = 0;
    public static final int FINDINGS = 1;
    public static final int INPUT_ERROR = 2;

    private BatchAudit() {
    }

    /**
     * @param input   a notebook file or a folder
     * @param scope   experiment / channel to audit
     * @param report  HTML report to write, null for none (several notebooks: one file each, "-2", "-3" … added)
     * @param json    JSON to write, null for none (numbered the same way)
     * @param failOn  the lowest severity that makes the exit code {@link #FINDINGS}
     */
    public record Request(Path input, Auditor.Scope scope, Path report, Path json, Severity failOn) {
    }

    /**
     * What came of it.
     *
     * @param exitCode the exit code
     * @param audits   the notebooks audited
     * @param written  the report files written
     * @param error    the input error, empty when none
     */
    public record Outcome(int exitCode, List<NotebookAudit> audits, List<Path> written, String error) {
    }

    /** Every notebook file under {@code input} (or {@code input} itself), in path order. */
    public static List<Path> notebooks(Path input) throws IOException {
        if (Files.isRegularFile(input)) {
            return List.of(input);
        }
        if (!Files.isDirectory(input)) {
            throw new IOException(input + ": no such notebook or folder");
        }
        try (Stream<Path> s = Files.walk(input)) {
            List<Path> found = s.filter(Files::isRegularFile)
                    .filter(p -> p.getFileName().toString().endsWith("." + NotebookStore.FILE_EXTENSION)).sorted().toList();
            if (found.isEmpty()) {
                throw new IOException(input + ": no notebook (*." + NotebookStore.FILE_EXTENSION + ") in this folder or below");
            }
            return found;
        }
    }

    public static Outcome run(Request request, AuditProgress progress) {
        List<NotebookAudit> audits = new ArrayList<>();
        List<Path> written = new ArrayList<>();
        try {
            List<Path> files = notebooks(request.input());
            for (Path f : files) {
                Notebook nb;
                try {
                    nb = NotebookStore.load(f);
                } catch (IOException | RuntimeException e) {
                    return new Outcome(INPUT_ERROR, audits, written, f + ": not a readable notebook: " + e.getMessage());
                }
                audits.add(new Auditor(AuditPolicy.DEFAULT).audit(nb, f, request.scope(), progress));
            }
            for (int i = 0; i < audits.size(); i++) {
                if (request.report() != null) {
                    Path out = numbered(request.report(), i);
                    HtmlReport.write(audits.get(i), out);
                    written.add(out);
                }
                if (request.json() != null) {
                    Path out = numbered(request.json(), i);
                    JsonReport.write(audits.get(i), out);
                    written.add(out);
                }
            }
        } catch (IOException e) {
            return new Outcome(INPUT_ERROR, audits, written, e.getMessage());
        } catch (IllegalArgumentException e) {
            return new Outcome(INPUT_ERROR, audits, written, e.getMessage());
        }
        boolean hit = audits.stream().anyMatch(a -> a.summary().reaches(request.failOn()));
        return new Outcome(hit ? FINDINGS : CLEAN, audits, written, "");
    }

    /** {@code out} for the first notebook; "name-2.ext", "name-3.ext" … for the next. */
    static Path numbered(Path out, int i) {
        if (i == 0) {
            return out;
        }
        String name = out.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String numbered = dot > 0 ? name.substring(0, dot) + "-" + (i + 1) + name.substring(dot) : name + "-" + (i + 1);
        return out.resolveSibling(numbered);
    }
}
