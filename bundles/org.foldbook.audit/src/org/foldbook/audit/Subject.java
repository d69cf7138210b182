package org.foldbook.audit;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.model.derived.Names;

/** Builds the findings about one notebook object (label and URI fragment taken once). */
final class Subject {
    private final String label;
    private final String ref;
    private final List<Finding> out;

    Subject(EObject object, List<Finding> out) {
        this.label = Names.label(object);
        this.ref = object.eResource() == null ? "" : EcoreUtil.getURI(object).fragment();
        this.out = out;
    }

    static List<Finding> list() {
        return new ArrayList<>();
    }

    Finding add(AuditKind kind, String message, Figure... figures) {
        return add(kind, kind.usualSeverity(), message, figures);
    }

    Finding add(AuditKind kind, Severity severity, String message, Figure... figures) {
        Finding f = new Finding(kind, severity, label, ref, message, List.of(figures));
        out.add(f);
        return f;
    }

    static Figure fig(String name, double value, String unit) {
        return new Figure(name, value, unit);
    }
}
