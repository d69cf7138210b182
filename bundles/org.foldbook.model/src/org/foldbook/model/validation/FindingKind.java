package org.foldbook.model.validation;

import java.util.Optional;

import org.eclipse.emf.common.util.Diagnostic;
import org.foldbook.model.util.NotebookValidator;

/**
 * The kinds of finding the notebook rules report. Each diagnostic a rule adds carries its kind's
 * {@link #code()} (EMF diagnostics hold an int); the codes are stable, so saved reports and tests keep
 * their meaning. {@link #of(Diagnostic)} tells the kind of a diagnostic back.
 */
public enum FindingKind {
    RATE_NOT_POSITIVE(1),
    CUTOFF_AT_OR_ABOVE_NYQUIST(2),
    UNPROTECTED_BAND_FOLDS(3),
    NO_SAMPLING_STAGE(4),
    INDEX_OUTSIDE_RECORDING(5),
    RECORDING_FILE_MISSING(6),
    RECORDING_CHECKSUM_CHANGED(7),
    EXPOSURE_LONGER_THAN_FRAME(8),
    UNIT_MISMATCH(9),
    RIG_OUTSIDE_VALIDITY(10),
    RIG_VALIDITY_REVERSED(11),
    RECORDING_NOT_CHECKABLE(12),
    PROTECTION_SHORT_OF_NEED(13);

    private final int code;

    FindingKind(int code) {
        this.code = code;
    }

    /** The code the rule's diagnostic carries. */
    public int code() {
        return code;
    }

    /** The kind with this code, if any. */
    public static Optional<FindingKind> ofCode(int code) {
        for (FindingKind kind : values()) {
            if (kind.code == code) {
                return Optional.of(kind);
            }
        }
        return Optional.empty();
    }

    /** The kind of a notebook-rule diagnostic; empty for diagnostics of other sources (e.g. EMF's own). */
    public static Optional<FindingKind> of(Diagnostic diagnostic) {
        if (diagnostic == null || !NotebookValidator.DIAGNOSTIC_SOURCE.equals(diagnostic.getSource())) {
            return Optional.empty();
        }
        return ofCode(diagnostic.getCode());
    }
}
