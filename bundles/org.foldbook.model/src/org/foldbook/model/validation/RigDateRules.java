package org.foldbook.model.validation;

import static org.foldbook.model.validation.FindingKind.RIG_OUTSIDE_VALIDITY;
import static org.foldbook.model.validation.FindingKind.RIG_VALIDITY_REVERSED;
import static org.foldbook.model.validation.FindingReport.report;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.model.Experiment;
import org.foldbook.model.Rig;
import org.foldbook.model.derived.Names;

/**
 * A rig's configuration holds over a range of days (both ends inclusive, compared as UTC dates); an
 * experiment dated outside it used a configuration the notebook does not describe.
 */
public final class RigDateRules {

    private RigDateRules() {
    }

    static LocalDate day(Date date) {
        return date.toInstant().atZone(ZoneOffset.UTC).toLocalDate();
    }

    public static boolean validityOrdered(Rig rig, DiagnosticChain diagnostics, Map<Object, Object> context) {
        if (rig.getValidFrom() == null || rig.getValidUntil() == null
                || !day(rig.getValidUntil()).isBefore(day(rig.getValidFrom()))) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, RIG_VALIDITY_REVERSED, rig,
                "valid until " + day(rig.getValidUntil()) + ", before its start " + day(rig.getValidFrom()),
                "Swap the two dates or correct the one mistyped");
    }

    public static boolean rigValidOnDate(Experiment experiment, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Rig rig = experiment.getRig();
        if (rig == null || experiment.getDate() == null) {
            return true;
        }
        LocalDate when = day(experiment.getDate());
        boolean afterStart = rig.getValidFrom() == null || !when.isBefore(day(rig.getValidFrom()));
        boolean beforeEnd = rig.getValidUntil() == null || !when.isAfter(day(rig.getValidUntil()));
        if (afterStart && beforeEnd) {
            return true;
        }
        String range = (rig.getValidFrom() == null ? "…" : day(rig.getValidFrom()).toString()) + " to "
                + (rig.getValidUntil() == null ? "now" : day(rig.getValidUntil()).toString());
        return report(diagnostics, Diagnostic.ERROR, RIG_OUTSIDE_VALIDITY, experiment,
                "dated " + when + ", but " + Names.label(rig) + " is valid only from " + range,
                "Link the experiment to the rig configuration in use on " + when
                        + ", or correct the experiment's date or the rig's validity");
    }
}
