package org.foldbook.ui.notebook;

import org.foldbook.model.derived.Names;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.OperationCanceledException;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.eclipse.emf.common.util.TreeIterator;
import org.eclipse.emf.ecore.EClass;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.persistence.NotebookStore;

/**
 * Validates a notebook in the background: the rules stream every recording's file through SHA-256,
 * which can take long for big recordings. The job works on a copy taken on the UI thread (so edits
 * made meanwhile cannot race with it), reports progress per object, stops when cancelled, and hands
 * the findings, mapped back to the objects of the open notebook, to {@code deliver} — which must hop
 * to the UI thread itself (the part passes a UISynchronize/Display.asyncExec wrapper).
 */
public final class ValidationJob extends Job {

    /** Progress for the part's status line: objects done, objects in all, what is being checked. */
    public interface Progress {
        void update(int done, int total, String what);
    }

    private final Notebook snapshot;
    private final Resource original;
    private final Consumer<List<Finding>> deliver;
    private final Progress progress;

    /** Takes the snapshot now; call on the UI thread. */
    public ValidationJob(NotebookDocument document, Consumer<List<Finding>> deliver, Progress progress) {
        super("Checking notebook " + document.file().getFileName());
        this.original = document.notebook().eResource();
        this.snapshot = snapshot(document.notebook(), document.file());
        this.deliver = deliver;
        this.progress = progress;
        setUser(true);
    }

    /** A deep copy in a resource at the same file URI, so recording paths resolve the same way. */
    private static Notebook snapshot(Notebook notebook, Path file) {
        Notebook copy = EcoreUtil.copy(notebook);
        NotebookStore.createResource(NotebookStore.newResourceSet(), file).getContents().add(copy);
        return copy;
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        int total = 1;
        for (TreeIterator<EObject> it = snapshot.eAllContents(); it.hasNext(); it.next()) {
            total++;
        }
        SubMonitor sub = SubMonitor.convert(monitor, getName(), total);
        int[] done = { 0 };
        int all = total;
        Diagnostician diagnostician = new Diagnostician() {
            @Override
            public boolean validate(EClass eClass, EObject eObject, DiagnosticChain diagnostics,
                    Map<Object, Object> context) {
                if (sub.isCanceled()) {
                    throw new OperationCanceledException();
                }
                String what = eObject instanceof Recording ? "checksum of " + Names.label(eObject) : Names.label(eObject);
                sub.subTask(what);
                progress.update(done[0], all, what);
                boolean valid = super.validate(eClass, eObject, diagnostics, context);
                sub.worked(1);
                done[0]++;
                return valid;
            }
        };
        Diagnostic root;
        try {
            root = diagnostician.validate(snapshot);
        } catch (OperationCanceledException e) {
            progress.update(done[0], all, null);
            return Status.CANCEL_STATUS;
        }
        List<Finding> findings = new ArrayList<>();
        collect(root, findings);
        progress.update(all, all, null);
        deliver.accept(findings);
        return Status.OK_STATUS;
    }

    private void collect(Diagnostic diagnostic, List<Finding> into) {
        for (Diagnostic child : diagnostic.getChildren()) {
            if (child.getSeverity() != Diagnostic.OK) {
                EObject copy = child.getData().isEmpty() || !(child.getData().get(0) instanceof EObject o) ? null : o;
                EObject subject = copy == null || copy.eResource() == null ? null
                        : original.getEObject(copy.eResource().getURIFragment(copy));
                String label = copy == null ? "notebook" : Names.label(copy);
                String message = child.getMessage();
                if (message.startsWith(label + ": ")) {
                    message = message.substring(label.length() + 2);
                }
                into.add(new Finding(child.getSeverity(), child.getCode(), subject,
                        copy == null ? "notebook" : Names.shortName(copy), message));
            }
            collect(child, into);
        }
    }
}
