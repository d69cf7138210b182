package org.foldbook.app;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.workbench.IWorkbench;

/** Closes the workbench (File ▸ Quit, Ctrl+Q). */
public class QuitHandler {
    @Execute
    public void execute(IWorkbench workbench) {
        workbench.close();
    }
}
