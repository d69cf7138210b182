package org.foldbook.model.persistence;

import java.io.IOException;
import java.nio.file.Path;

import org.foldbook.model.Notebook;

/**
 * The one way a front end saves a notebook and tells the person how it went: the write is
 * {@link NotebookStore}'s atomic save (temporary file, then a move; the previous version kept as .bak),
 * so a failed save leaves the file on disk as it was, and the outcome says so in one wording. UI-free:
 * the workbench shows {@link Outcome#message()} in its dialog, a command line would print it.
 */
public final class NotebookSaving {

    /** Title for a dialog or a log line about a failed save. */
    public static final String FAILURE_TITLE = "Cannot save the notebook";

    private NotebookSaving() {
    }

    /** One save: writes the notebook (and marks whatever "unsaved" state the caller keeps as saved). */
    @FunctionalInterface
    public interface Write {
        void run() throws IOException;
    }

    /**
     * How a save went.
     *
     * @param file    the notebook file
     * @param problem null when saved, else what went wrong
     */
    public record Outcome(Path file, String problem) {
        public boolean saved() {
            return problem == null;
        }

        /** For the person: the file, the problem and what became of the file and the changes. */
        public String message() {
            return saved() ? "Saved " + file
                    : file + ": " + problem + "\n\nThe file on disk is unchanged; your changes are still open here.";
        }
    }

    /** Saves {@code notebook} to {@code file} atomically. */
    public static Outcome save(Notebook notebook, Path file) {
        if (notebook == null) {
            throw new IllegalArgumentException("notebook: null");
        }
        return save(file, () -> NotebookStore.save(notebook, file));
    }

    /**
     * Runs {@code write} (which must save through {@link NotebookStore}, e.g. a document's save that also
     * clears its dirty state) and turns any failure into an outcome; nothing is thrown for a failed write.
     */
    public static Outcome save(Path file, Write write) {
        if (file == null) {
            throw new IllegalArgumentException("file: null");
        }
        if (write == null) {
            throw new IllegalArgumentException("write: null");
        }
        try {
            write.run();
            return new Outcome(file, null);
        } catch (IOException | RuntimeException e) {
            String what = e.getMessage() == null || e.getMessage().isBlank() ? e.getClass().getSimpleName()
                    : e.getMessage();
            return new Outcome(file, what);
        }
    }
}
