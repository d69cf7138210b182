package org.foldbook.model.validation;

import java.util.Locale;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.derived.Names;
import org.foldbook.model.util.NotebookValidator;

/**
 * Builds the diagnostics of the notebook rules: each starts with the object's label and ends with
 * what to do, and carries its {@link FindingKind}'s code.
 */
final class FindingReport {

    private FindingReport() {
    }

    /** Adds one finding (when a chain is given) and returns false, so rules can {@code return report(...)}. */
    static boolean report(DiagnosticChain diagnostics, int severity, FindingKind kind, EObject subject, String problem,
            String remedy) {
        if (diagnostics != null) {
            String message = Names.label(subject) + ": " + problem + ". " + remedy + ".";
            diagnostics.add(new BasicDiagnostic(severity, NotebookValidator.DIAGNOSTIC_SOURCE, kind.code(), message,
                    new Object[] { subject }));
        }
        return severity < Diagnostic.ERROR;
    }

    /** A frequency for a message, e.g. "12.5 kHz". */
    static String hz(double value) {
        if (Math.abs(value) >= 1e3) {
            return String.format(Locale.ROOT, "%.4g kHz", value / 1e3);
        }
        return String.format(Locale.ROOT, "%.4g Hz", value);
    }
}
