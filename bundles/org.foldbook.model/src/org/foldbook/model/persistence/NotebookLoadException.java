package org.foldbook.model.persistence;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A notebook file could not be read. The message names the file, the line and column where known,
 * and what is wrong; the file itself is never changed by a failed load.
 */
public class NotebookLoadException extends IOException {

    private static final long serialVersionUID = 1L;

    private final transient Path file;
    private final int line;
    private final int column;

    public NotebookLoadException(Path file, int line, int column, String problem, Throwable cause) {
        super(file + (line > 0 ? ", line " + line + (column > 0 ? ", column " + column : "") : "") + ": " + problem,
                cause);
        this.file = file;
        this.line = line;
        this.column = column;
    }

    public Path file() {
        return file;
    }

    /** 1-based line of the problem, or 0 when not known. */
    public int line() {
        return line;
    }

    /** 1-based column of the problem, or 0 when not known. */
    public int column() {
        return column;
    }
}
