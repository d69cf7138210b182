package org.foldbook.model.validation;

import org.foldbook.model.derived.Names;
import java.util.Locale;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.ecore.EObject;
import org.foldbook.model.util.NotebookValidator;

/**
 * Builds the diagnostics of the notebook rules: each starts with the object's label and ends with
 * what to do. Codes are stable so that the UI and tests can tell the rules apart.
 */
public final class Findings {

    public static final int RATE_NOT_POSITIVE = 1;
    public static final int CUTOFF_AT_OR_ABOVE_NYQUIST = 2;
    public static final int UNPROTECTED_BAND_FOLDS = 3;
    public static final int NO_SAMPLING_STAGE = 4;
    public static final int INDEX_OUTSIDE_RECORDING = 5;
    public static final int RECORDING_FILE_MISSING = 6;
    public static final int RECORDING_CHECKSUM_CHANGED = 7;
    public static final int EXPOSURE_LONGER_THAN_FRAME = 8;
    public static final int UNIT_MISMATCH = 9;
    public static final int RIG_OUTSIDE_VALIDITY = 10;
    public static final int RIG_VALIDITY_REVERSED = 11;
    public static final int RECORDING_NOT_CHECKABLE = 12;
    public static final int PROTECTION_SHORT_OF_NEED = 13;

    private Findings() {
    }

    /** Adds one finding (when a chain is given) and returns false, so rules can {@code return report(...)}. */
    static boolean report(DiagnosticChain diagnostics, int severity, int code, EObject subject, String problem,
            String remedy) {
        if (diagnostics != null) {
            String message = Names.label(subject) + ": " + problem + ". " + remedy + ".";
            diagnostics.add(new BasicDiagnostic(severity, NotebookValidator.DIAGNOSTIC_SOURCE, code, message,
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
