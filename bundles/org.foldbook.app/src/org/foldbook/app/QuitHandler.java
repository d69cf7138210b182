package org.foldbook.app;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.workbench.IWorkbench;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

/**
 * Closes the workbench (File ▸ Quit, Ctrl+Q). Parts with unsaved changes (an edited notebook) are
 * offered for saving first; cancelling that keeps the workbench open, so no edit is lost.
 */
public class QuitHandler {
    @Execute
    public void execute(IWorkbench workbench, EPartService partService) {
        if (!partService.saveAll(true)) {
            return;
        }
        workbench.close();
    }
}
