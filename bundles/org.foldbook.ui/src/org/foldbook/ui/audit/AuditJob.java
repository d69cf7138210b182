package org.foldbook.ui.audit;

import java.nio.file.Path;
import java.util.concurrent.CancellationException;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.audit.AuditPolicy;
import org.foldbook.audit.AuditProgress;
import org.foldbook.audit.Auditor;
import org.foldbook.audit.NotebookAudit;
import org.foldbook.model.Notebook;
import org.foldbook.model.persistence.NotebookStore;

/**
 * Audits the open notebook in the background: on a copy taken on the UI thread (in a resource at the
 * same file, so recording paths resolve alike), with progress per channel and per block read, and a
 * cancel that stops between blocks. The result goes to {@code deliver}, which hops to the UI thread.
 */
final class AuditJob extends Job {
    private final Notebook snapshot;
    private final Path file;
    private final Consumer<NotebookAudit> deliver;

    /** Takes the snapshot now; call on the UI thread. */
    AuditJob(Notebook notebook, Path file, Consumer<NotebookAudit> deliver) {
        super("Auditing the recordings of " + file.getFileName());
        this.snapshot = EcoreUtil.copy(notebook);
        NotebookStore.createResource(NotebookStore.newResourceSet(), file).getContents().add(snapshot);
        this.file = file;
        this.deliver = deliver;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor sub = SubMonitor.convert(monitor, getName(), 1000);
        AuditProgress progress = new AuditProgress() {
            private int shown = -1;

            @Override
            public void channel(String what, int done, int total) {
                sub.subTask(what);
                int at = total == 0 ? 1000 : done * 1000 / total;
                if (at > shown) {
                    sub.worked(at - Math.max(shown, 0));
                    shown = at;
                }
            }

            @Override
            public boolean cancelled() {
                return sub.isCanceled();
            }
        };
        try {
            deliver.accept(new Auditor(AuditPolicy.DEFAULT).audit(snapshot, file, Auditor.Scope.ALL, progress));
            return Status.OK_STATUS;
        } catch (CancellationException e) {
            return Status.CANCEL_STATUS;
        }
    }
}
