package org.foldbook.ui.notebook;

import org.eclipse.emf.ecore.EObject;

/**
 * One validation diagnostic as the findings list shows it.
 *
 * @param severity EMF's {@code Diagnostic.ERROR}, {@code WARNING} or {@code INFO}
 * @param code     the diagnostic's code: for the notebook's own rules the stable code of their {@code org.foldbook.model.validation.FindingKind}
 * @param subject  the object of the open notebook it is about (null if it could not be mapped back)
 * @param object   a short name of the subject
 * @param message  the rule's message: what is wrong and what to do
 */
public record Finding(int severity, int code, EObject subject, String object, String message) {
}
