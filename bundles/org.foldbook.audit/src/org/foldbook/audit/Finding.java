package org.foldbook.audit;

import java.util.List;
import java.util.Optional;

/**
 * One audit finding, an immutable value.
 *
 * @param kind       what was found
 * @param severity   how much it matters
 * @param subject    the notebook object it is about, for people (e.g. "channel 'housing Z' of run 1")
 * @param subjectRef the object's URI fragment in the notebook resource, for selecting it; empty when none
 * @param message    the finding in one or two sentences, numbers included
 * @param figures    the numbers it rests on
 */
public record Finding(AuditKind kind, Severity severity, String subject, String subjectRef, String message,
        List<Figure> figures) {

    public Finding {
        figures = List.copyOf(figures);
    }

    /** The figure called {@code name}, if the finding has one. */
    public Optional<Figure> figure(String name) {
        return figures.stream().filter(f -> f.name().equals(name)).findFirst();
    }

    /** The value of figure {@code name}; NaN when absent. */
    public double value(String name) {
        return figure(name).map(Figure::value).orElse(Double.NaN);
    }
}
