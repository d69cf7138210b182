package org.foldbook.io.csv;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Path;

import org.foldbook.io.RecordingFormatException;

/**
 * Splits text into lines (\n, \r\n or \r) with 1-based line numbers, refusing absurdly long lines so a
 * binary file mistaken for text cannot exhaust memory.
 */
final class LineSource {
    static final int MAX_LINE = 1 << 16;

    private final Path file;
    private final Reader in;
    private final char[] buf = new char[8192];
    private int pos;
    private int lim;
    private long lineNumber;
    private final StringBuilder line = new StringBuilder();

    LineSource(Path file, Reader in) {
        this.file = file;
        this.in = in;
    }

    /** Line number of the line last returned. */
    long lineNumber() {
        return lineNumber;
    }

    /** The next line without its terminator, or null at the end. */
    String next() throws IOException {
        line.setLength(0);
        boolean any = false;
        while (true) {
            if (pos == lim) {
                try {
                    lim = in.read(buf, 0, buf.length);
                } catch (CharacterCodingException e) {
                    throw RecordingFormatException.atLine(file, lineNumber + 1, line.length() + 1,
                            "bytes that are not valid text in the expected character set (" + e.getMessage() + ")");
                }
                pos = 0;
                if (lim <= 0) {
                    lim = 0;
                    if (!any) {
                        return null;
                    }
                    lineNumber++;
                    return line.toString();
                }
            }
            any = true;
            char c = buf[pos++];
            if (c == '\n' || c == '\r') {
                if (c == '\r') {
                    if (pos == lim) {
                        lim = in.read(buf, 0, buf.length);
                        pos = 0;
                        if (lim < 0) {
                            lim = 0;
                        }
                    }
                    if (pos < lim && buf[pos] == '\n') {
                        pos++;
                    }
                }
                lineNumber++;
                return line.toString();
            }
            if (c == 0) {
                throw RecordingFormatException.atLine(file, lineNumber + 1, line.length() + 1,
                        "NUL character: this is a binary file, not delimited text");
            }
            if (line.length() >= MAX_LINE) {
                throw RecordingFormatException.atLine(file, lineNumber + 1, line.length() + 1,
                        "line longer than " + MAX_LINE + " characters");
            }
            line.append(c);
        }
    }
}
