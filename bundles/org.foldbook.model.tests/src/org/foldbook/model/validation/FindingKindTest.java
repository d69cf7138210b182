package org.foldbook.model.validation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;

import org.eclipse.emf.common.util.BasicDiagnostic;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.util.EObjectValidator;
import org.foldbook.model.util.NotebookValidator;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The finding kinds' codes are what diagnostics carry; they must be unique and told back only for our rules. */
class FindingKindTest {

    @Test
    @DisplayName("codes are unique, and each code names its kind again")
    void codesAreUnique() {
        assertEquals(FindingKind.values().length,
                Arrays.stream(FindingKind.values()).mapToInt(FindingKind::code).distinct().count());
        for (FindingKind kind : FindingKind.values()) {
            assertEquals(kind, FindingKind.ofCode(kind.code()).orElseThrow());
        }
        assertTrue(FindingKind.ofCode(0).isEmpty());
    }

    @Test
    @DisplayName("a diagnostic of EMF's own validator with the same number is not one of ours")
    void onlyOurSource() {
        int code = FindingKind.UNIT_MISMATCH.code();
        Diagnostic ours = new BasicDiagnostic(Diagnostic.WARNING, NotebookValidator.DIAGNOSTIC_SOURCE, code, "m", null);
        Diagnostic emf = new BasicDiagnostic(Diagnostic.WARNING, EObjectValidator.DIAGNOSTIC_SOURCE, code, "m", null);
        assertEquals(FindingKind.UNIT_MISMATCH, FindingKind.of(ours).orElseThrow());
        assertTrue(FindingKind.of(emf).isEmpty());
    }
}
