package org.foldbook.ui.parts;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Text;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.recording.RecordingSession;
import org.foldbook.ui.testing.Widgets;

/** A real Fold explorer for tests of other packages: made as the workbench makes it, with a shared session. */
public final class FoldExplorerPartAccess {
    private final FoldExplorerPart part = new FoldExplorerPart();
    private final Composite root;

    public FoldExplorerPartAccess(Composite parent, CurrentNotebook current, RecordingSession session) {
        part.current = current;
        part.session = session;
        root = new Composite(parent, SWT.NONE);
        part.createControls(root);
    }

    public boolean reading() {
        return part.reading();
    }

    /** The tones field as the part shows it. */
    public String tones() {
        return Widgets.findAll(root, Text.class).get(0).getText();
    }

    public void dispose() {
        part.dispose();
    }
}
