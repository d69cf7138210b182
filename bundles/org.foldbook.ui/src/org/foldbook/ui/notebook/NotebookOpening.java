package org.foldbook.ui.notebook;

import java.nio.file.Path;

import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/**
 * Starts an {@link OpenNotebookJob} whose result becomes the {@link CurrentNotebook} on the UI
 * thread; a failure is shown in an error dialog naming the file and the problem (the open notebook,
 * if any, stays open and the file is left as it was).
 */
public final class NotebookOpening {

    private NotebookOpening() {
    }

    public static void open(Path file, CurrentNotebook current, UISynchronize sync) {
        schedule(OpenNotebookJob.of(file, d -> sync.asyncExec(() -> current.open(d)),
                problem -> sync.asyncExec(() -> report(current, problem))));
    }

    public static void openDemo(Path folder, CurrentNotebook current, UISynchronize sync) {
        schedule(OpenNotebookJob.demo(folder, d -> sync.asyncExec(() -> current.open(d)),
                problem -> sync.asyncExec(() -> report(current, problem))));
    }

    private static void schedule(OpenNotebookJob job) {
        job.schedule();
    }

    private static void report(CurrentNotebook current, String problem) {
        current.failed(problem);
        Display display = Display.getCurrent();
        Shell parent = display == null ? null : display.getActiveShell();
        MessageDialog.openError(parent, "Cannot open the notebook",
                problem + "\n\nThe file was not changed. If it is damaged, its previous version may be in the"
                        + " .bak file beside it.");
    }
}
