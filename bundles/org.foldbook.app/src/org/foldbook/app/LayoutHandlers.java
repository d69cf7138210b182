package org.foldbook.app;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.ui.model.application.ui.MUIElement;
import org.eclipse.e4.ui.model.application.ui.advanced.MPerspective;
import org.eclipse.e4.ui.model.application.ui.basic.MWindow;
import org.eclipse.e4.ui.model.application.ui.menu.MToolItem;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;

/**
 * Window ▸ Notebook layout / Simulation layout (and the two buttons above the parts): switch between the two
 * perspectives of Application.e4xmi. The Notebook part and the Rate sweep are shared by both, so the
 * selection, a running sweep and its results stay as they are; only the room they get changes.
 */
public final class LayoutHandlers {
    /** The notebook and its figures on top; recording, rate sweep and fold explorer below. */
    public static final String NOTEBOOK = "org.foldbook.app.perspective.notebook";
    /** The rate sweep over the whole height beside the notebook. */
    public static final String SIMULATION = "org.foldbook.app.perspective.simulation";

    private LayoutHandlers() {
    }

    /** Makes perspective {@code id} of {@code window} the shown one; false when the model has none of that id. */
    static boolean switchTo(String id, MWindow window, EModelService models, EPartService parts) {
        MUIElement found = models.find(id, window);
        if (found instanceof MPerspective perspective) {
            parts.switchPerspective(perspective);
            // the two buttons above the parts say which layout is shown, however it was chosen
            select(models, window, "org.foldbook.app.toolitem.layout.notebook", NOTEBOOK.equals(id));
            select(models, window, "org.foldbook.app.toolitem.layout.simulation", SIMULATION.equals(id));
            return true;
        }
        return false;
    }

    private static void select(EModelService models, MWindow window, String itemId, boolean selected) {
        for (MToolItem item : models.findElements(window, itemId, MToolItem.class, null, EModelService.IN_TRIM)) {
            item.setSelected(selected);
        }
    }

    public static class Notebook {
        @Execute
        public void execute(MWindow window, EModelService models, EPartService parts) {
            switchTo(NOTEBOOK, window, models, parts);
        }
    }

    public static class Simulation {
        @Execute
        public void execute(MWindow window, EModelService models, EPartService parts) {
            switchTo(SIMULATION, window, models, parts);
        }
    }
}
