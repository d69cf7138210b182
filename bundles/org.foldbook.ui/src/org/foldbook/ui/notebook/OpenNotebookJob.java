package org.foldbook.ui.notebook;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.SubMonitor;
import org.eclipse.core.runtime.jobs.Job;
import org.foldbook.demo.GearboxDemo;

/**
 * Opens a notebook file in the background (loading parses XML; the demo also writes its recordings
 * first). The result goes to {@code opened}, a failure's message to {@code failed}; both callbacks
 * must hop to the UI thread themselves. A failed load never changes the file.
 */
public final class OpenNotebookJob extends Job {

    private final Path file;
    private final Path demoFolder;
    private final Consumer<NotebookDocument> opened;
    private final Consumer<String> failed;

    private OpenNotebookJob(String name, Path file, Path demoFolder, Consumer<NotebookDocument> opened,
            Consumer<String> failed) {
        super(name);
        this.file = file;
        this.demoFolder = demoFolder;
        this.opened = opened;
        this.failed = failed;
        setUser(true);
    }

    /** Opens {@code file}. */
    public static OpenNotebookJob of(Path file, Consumer<NotebookDocument> opened, Consumer<String> failed) {
        return new OpenNotebookJob("Opening " + file.getFileName(), file, null, opened, failed);
    }

    /**
     * Opens the demo notebook in {@code folder}, writing it there first when it is not there yet (an
     * existing demo, perhaps edited, is never overwritten).
     */
    public static OpenNotebookJob demo(Path folder, Consumer<NotebookDocument> opened, Consumer<String> failed) {
        return new OpenNotebookJob("Opening the demo notebook", folder.resolve(GearboxDemo.NOTEBOOK_FILE), folder,
                opened, failed);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        SubMonitor sub = SubMonitor.convert(monitor, getName(), 2);
        try {
            if (demoFolder != null && !Files.exists(file)) {
                sub.subTask("writing the demo notebook and its recordings into " + demoFolder);
                GearboxDemo.write(demoFolder);
            }
            sub.worked(1);
            if (sub.isCanceled()) {
                return Status.CANCEL_STATUS;
            }
            sub.subTask("reading " + file);
            NotebookDocument document = NotebookDocument.load(file);
            sub.worked(1);
            opened.accept(document);
        } catch (IOException | RuntimeException e) {
            // NotebookLoadException's message names the file, the line and the problem
            String message = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
            failed.accept(message.contains(file.getFileName().toString()) ? message : file + ": " + message);
        }
        return Status.OK_STATUS;
    }
}
