package org.foldbook.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * The one checked error of the recording readers. Its message always names the file, where in the file
 * the problem was found (byte offset, or line and column for text) and what the problem is, so a lab
 * user can locate it with a hex or text editor.
 */
public class RecordingFormatException extends IOException {
    private static final long serialVersionUID = 1L;

    private final Path file;
    private final String location;
    private final String problem;

    public RecordingFormatException(Path file, String location, String problem) {
        this(file, location, problem, null);
    }

    public RecordingFormatException(Path file, String location, String problem, Throwable cause) {
        super(file + " (" + location + "): " + problem, cause);
        this.file = file;
        this.location = location;
        this.problem = problem;
    }

    /** An error at a byte offset of a binary file. */
    public static RecordingFormatException atByte(Path file, long offset, String problem) {
        return new RecordingFormatException(file, "byte offset " + offset, problem);
    }

    /** An error at a 1-based line and column of a text file. */
    public static RecordingFormatException atLine(Path file, long line, int column, String problem) {
        return new RecordingFormatException(file, "line " + line + ", column " + column, problem);
    }

    public Path file() {
        return file;
    }

    /** Human-readable place of the problem, e.g. "byte offset 44" or "line 3, column 2". */
    public String location() {
        return location;
    }

    public String problem() {
        return problem;
    }
}
