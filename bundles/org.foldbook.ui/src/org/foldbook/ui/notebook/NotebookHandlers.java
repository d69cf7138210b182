package org.foldbook.ui.notebook;

import java.nio.file.Path;

import org.eclipse.e4.core.di.annotations.CanExecute;
import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.services.IServiceConstants;
import org.eclipse.jface.dialogs.MessageDialog;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Shell;
import org.foldbook.model.persistence.NotebookSaving;
import org.foldbook.model.persistence.NotebookStore;

import jakarta.inject.Named;

/**
 * The File and Edit handlers of the notebook (bound in Application.e4xmi). They act on the
 * {@link CurrentNotebook} of the application context; undo and redo go through the notebook's
 * command stack.
 */
public final class NotebookHandlers {

    private NotebookHandlers() {
    }

    /** File ▸ Open notebook…: a file dialog, then the notebook is read in the background. */
    public static final class Open {
        @Execute
        public void execute(@Named(IServiceConstants.ACTIVE_SHELL) Shell shell, CurrentNotebook current,
                UISynchronize sync) {
            NotebookDocument open = current.document();
            if (open != null && open.isDirty() && !MessageDialog.openQuestion(shell, "Unsaved changes",
                    open.file().getFileName() + " has unsaved changes. Open another notebook and lose them?")) {
                return;
            }
            FileDialog dialog = new FileDialog(shell, SWT.OPEN);
            dialog.setText("Open notebook");
            dialog.setFilterExtensions(new String[] { "*." + NotebookStore.FILE_EXTENSION, "*" });
            dialog.setFilterNames(new String[] { "Foldbook notebooks (*." + NotebookStore.FILE_EXTENSION + ")",
                    "All files" });
            if (open != null) {
                dialog.setFilterPath(open.file().getParent().toString());
            }
            String chosen = dialog.open();
            if (chosen != null) {
                NotebookOpening.open(Path.of(chosen), current, sync);
            }
        }
    }

    /** File ▸ Save (Ctrl+S): atomic save; the previous version is kept as .bak. */
    public static final class Save {
        @CanExecute
        public boolean canExecute(@Optional CurrentNotebook current) {
            return current != null && current.document() != null && current.document().isDirty();
        }

        @Execute
        public void execute(@Named(IServiceConstants.ACTIVE_SHELL) Shell shell, CurrentNotebook current) {
            NotebookDocument document = current.document();
            NotebookSaving.Outcome outcome = NotebookSaving.save(document.file(), document::save);
            if (outcome.saved()) {
                current.saved();
            } else {
                MessageDialog.openError(shell, NotebookSaving.FAILURE_TITLE, outcome.message());
            }
        }
    }

    /** Edit ▸ Undo (Ctrl+Z). */
    public static final class Undo {
        @CanExecute
        public boolean canExecute(@Optional CurrentNotebook current) {
            return current != null && current.document() != null && current.document().canUndo();
        }

        @Execute
        public void execute(CurrentNotebook current) {
            current.document().undo();
        }
    }

    /** Edit ▸ Redo (Ctrl+Shift+Z). */
    public static final class Redo {
        @CanExecute
        public boolean canExecute(@Optional CurrentNotebook current) {
            return current != null && current.document() != null && current.document().canRedo();
        }

        @Execute
        public void execute(CurrentNotebook current) {
            current.document().redo();
        }
    }
}
