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
    private Object selection;
    private final List<Consumer<CurrentNotebook>> listeners = new ArrayList<>();
    private final List<Consumer<Object>> selectionListeners = new ArrayList<>();

    /** The open notebook, or null while none is open. */
    public NotebookDocument document() {
        return document;
    }

    /** Why the last open failed (shown by the part), or null. */
    public String problem() {
        return problem;
    }

    /**
     * The notebook object the user selected last in the Notebook part (a channel, a chain, a rig …), or
     * null. The other parts follow it: the recording view and the simulation show the selected channel.
     */
    public Object selection() {
        return selection;
    }

    /** Sets the selected notebook object (null: none) and tells the selection listeners when it changed. */
    public void select(Object next) {
        if (next == selection) {
            return;
        }
        selection = next;
        for (Consumer<Object> l : List.copyOf(selectionListeners)) {
            l.accept(next);
        }
    }

    public void addSelectionListener(Consumer<Object> listener) {
        selectionListeners.add(listener);
    }

    public void removeSelectionListener(Consumer<Object> listener) {
        selectionListeners.remove(listener);
    }

    /** Makes {@code next} the open notebook, disposing the previous one (the selection is cleared). */
    public void open(NotebookDocument next) {
        NotebookDocument previous = document;
        document = next;
        problem = null;
        select(null);
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
