package org.foldbook.ui.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.foldbook.audit.ChannelAudit;
import org.foldbook.audit.Finding;
import org.foldbook.audit.NotebookAudit;
import org.foldbook.audit.Severity;

/** The audit part's table rows, without SWT: every finding, the most severe first, then in notebook order. */
final class AuditRows {

    /**
     * One row.
     *
     * @param severity   error / warning / note
     * @param where      experiment and channel
     * @param message    the finding in words, numbers included
     * @param subjectRef the notebook object's URI fragment ("" when none)
     * @param rank       for sorting: 0 error, 1 warning, 2 note
     */
    record Row(String severity, String where, String message, String subjectRef, int rank) {
    }

    private AuditRows() {
    }

    static List<Row> of(NotebookAudit audit) {
        List<Row> rows = new ArrayList<>();
        for (ChannelAudit c : audit.channels()) {
            for (Finding f : c.findings()) {
                rows.add(new Row(word(f.severity()), c.experiment() + " / " + c.channel(), f.message(),
                        f.subjectRef() == null || f.subjectRef().isEmpty() ? c.subjectRef() : f.subjectRef(),
                        rank(f.severity())));
            }
        }
        rows.sort(Comparator.comparingInt(Row::rank)); // stable: notebook order within a severity
        return rows;
    }

    /** "Notebook: 3 error(s), 10 warning(s), 18 note(s) in 5 channel(s)." */
    static String status(NotebookAudit audit) {
        return "Notebook: " + audit.summary() + " in " + audit.channels().size() + " channel(s).";
    }

    static String word(Severity s) {
        return switch (s) {
            case ERROR -> "Error";
            case WARNING -> "Warning";
            case INFO -> "Note";
        };
    }

    private static int rank(Severity s) {
        return switch (s) {
            case ERROR -> 0;
            case WARNING -> 1;
            case INFO -> 2;
        };
    }
}
