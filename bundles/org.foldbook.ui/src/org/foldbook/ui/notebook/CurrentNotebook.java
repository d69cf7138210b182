package org.foldbook.ui.notebook;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

/**
 * The notebook the workbench has open (at most one), shared through the application context by the
 * parts and the File/Edit handlers. Listeners hear when another notebook replaces it. UI thread only.
 */
public final class CurrentNotebook {

    private NotebookDocument document;
    private String problem;
    private final List<Consumer<CurrentNotebook>> listeners = new ArrayList<>();

    /** The open notebook, or null while none is open. */
    public NotebookDocument document() {
        return document;
    }

    /** Why the last open failed (shown by the part), or null. */
    public String problem() {
        return problem;
    }

    /** Makes {@code next} the open notebook, disposing the previous one. */
    public void open(NotebookDocument next) {
        NotebookDocument previous = document;
        document = next;
        problem = null;
        fire();
        if (previous != null && previous != next) {
            previous.dispose();
        }
    }

    /** Records that opening failed; an already open notebook stays open. */
    public void failed(String why) {
        problem = why;
        fire();
    }

    /** Tells the listeners that the open notebook was saved (its dirty state changed without a command). */
    public void saved() {
        fire();
    }

    public void addListener(Consumer<CurrentNotebook> listener) {
        listeners.add(listener);
    }

    public void removeListener(Consumer<CurrentNotebook> listener) {
        listeners.remove(listener);
    }

    private void fire() {
        for (Consumer<CurrentNotebook> l : List.copyOf(listeners)) {
            l.accept(this);
        }
    }
}
