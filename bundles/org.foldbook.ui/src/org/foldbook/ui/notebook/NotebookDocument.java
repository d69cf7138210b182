package org.foldbook.ui.notebook;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStack;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.foldbook.model.Notebook;
import org.foldbook.model.edit.NotebookEditing;
import org.foldbook.model.persistence.NotebookLoadException;
import org.foldbook.model.persistence.NotebookStore;

/**
 * One open notebook: its file, its editing domain and command stack. Every change goes through
 * {@link #execute(Command)}, so it can be undone and redone; saving is atomic
 * ({@link NotebookStore#save(Notebook)}). Touch it from the UI thread only.
 */
public final class NotebookDocument {

    private final Path file;
    private final AdapterFactoryEditingDomain domain;
    private final Notebook notebook;

    private NotebookDocument(Path file, AdapterFactoryEditingDomain domain, Notebook notebook) {
        this.file = file;
        this.domain = domain;
        this.notebook = notebook;
    }

    /** Reads {@code file} into a new editing domain; the file is never written by a load. */
    public static NotebookDocument load(Path file) throws NotebookLoadException {
        Path absolute = file.toAbsolutePath().normalize();
        AdapterFactoryEditingDomain domain = NotebookEditing.newEditingDomain();
        try {
            return new NotebookDocument(absolute, domain, NotebookStore.load(domain.getResourceSet(), absolute));
        } catch (NotebookLoadException | RuntimeException e) {
            ((org.eclipse.emf.edit.provider.ComposedAdapterFactory) domain.getAdapterFactory()).dispose();
            throw e;
        }
    }

    public Path file() {
        return file;
    }

    public Notebook notebook() {
        return notebook;
    }

    public AdapterFactoryEditingDomain domain() {
        return domain;
    }

    /** Runs {@code command} on the command stack (it is not run when it cannot execute). */
    public void execute(Command command) {
        domain.getCommandStack().execute(command);
    }

    public boolean canUndo() {
        return domain.getCommandStack().canUndo();
    }

    public boolean canRedo() {
        return domain.getCommandStack().canRedo();
    }

    public void undo() {
        domain.getCommandStack().undo();
    }

    public void redo() {
        domain.getCommandStack().redo();
    }

    /** True when there are changes since the last load or save. */
    public boolean isDirty() {
        return ((BasicCommandStack) domain.getCommandStack()).isSaveNeeded();
    }

    /** Saves atomically to {@link #file()} (the previous version is kept as {@code .bak}). */
    public void save() throws IOException {
        NotebookStore.save(notebook, file);
        ((BasicCommandStack) domain.getCommandStack()).saveIsDone();
    }

    public void addCommandStackListener(CommandStackListener listener) {
        domain.getCommandStack().addCommandStackListener(listener);
    }

    public void removeCommandStackListener(CommandStackListener listener) {
        domain.getCommandStack().removeCommandStackListener(listener);
    }

    public CommandStack commandStack() {
        return domain.getCommandStack();
    }

    /** Releases the item providers; the document must not be used afterwards. */
    public void dispose() {
        ((org.eclipse.emf.edit.provider.ComposedAdapterFactory) domain.getAdapterFactory()).dispose();
    }
}
