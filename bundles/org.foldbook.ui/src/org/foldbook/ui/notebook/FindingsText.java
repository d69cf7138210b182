package org.foldbook.ui.notebook;

import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;

/** The words of the findings list, without SWT. */
final class FindingsText {

    private FindingsText() {
    }

    static String severity(int severity) {
        return switch (severity) {
            case Diagnostic.ERROR -> "Error";
            case Diagnostic.WARNING -> "Warning";
            case Diagnostic.INFO -> "Note";
            default -> "Problem";
        };
    }

    /** The line above the list after a check. */
    static String status(List<Finding> list) {
        if (list.isEmpty()) {
            return "No findings: every rule passes and every recording matches its checksum.";
        }
        long errors = list.stream().filter(f -> f.severity() == Diagnostic.ERROR).count();
        long warnings = list.stream().filter(f -> f.severity() == Diagnostic.WARNING).count();
        return errors + " error(s), " + warnings + " warning(s). Double-click a finding to select its object.";
    }

    /** The whole message of a finding, for the wrapped line under the list. */
    static String full(Finding f) {
        return f.object() + ": " + f.message();
    }
}
