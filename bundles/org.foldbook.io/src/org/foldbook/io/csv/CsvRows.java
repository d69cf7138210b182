package org.foldbook.io.csv;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Iterator;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.foldbook.io.RecordingFormatException;

/**
 * Rows of a delimited text file, split by Apache Commons CSV (quoted cells may hold the separator,
 * doubled quotes and line breaks), with our line rules underneath: {@link LineSource} decodes line by
 * line (so a bad byte or a NUL is reported at its line), a BOM is dropped, and blank lines and lines
 * whose first non-blank character is '#' are skipped. Line numbers stay those of the file, because every
 * line reaches the parser, skipped ones as empty lines; a row's line is the line it starts on.
 */
final class CsvRows implements AutoCloseable {
    /** Text a quoted cell may run on for before an unclosed quote is assumed (bounds memory). */
    static final int MAX_ROW_CHARS = 1 << 22;

    private final Path file;
    private final LinesReader lines;
    private final CSVParser parser;
    private final Iterator<CSVRecord> records;
    private long rowLine;
    private long endOfLastRow;

    CsvRows(Path file, LineSource source, char separator) throws IOException {
        this.file = file;
        this.lines = new LinesReader(source);
        CSVFormat format = CSVFormat.Builder.create()
                .setDelimiter(separator)
                .setQuote('"')
                .setIgnoreEmptyLines(true)
                .setIgnoreSurroundingSpaces(true)
                .setTrim(true)
                .get();
        this.parser = format.parse(lines);
        this.records = parser.iterator();
    }

    /** The next row's cells (trimmed, quotes removed), or null at the end of the file. */
    String[] next() throws IOException {
        CSVRecord record;
        try {
            lines.rowStarts();
            if (!records.hasNext()) {
                return null;
            }
            record = records.next();
        } catch (UncheckedIOException e) {
            throw translate(e.getCause());
        }
        String[] cells = record.values();
        long end = parser.getCurrentLineNumber();
        long breaks = 0;
        for (String cell : cells) {
            breaks += cell.chars().filter(c -> c == '\n').count();
        }
        // the parser has read the row's terminating line break: the row ends on line 'end'
        rowLine = Math.max(endOfLastRow + 1, end - breaks);
        endOfLastRow = end;
        return cells;
    }

    /** 1-based line on which the row last returned starts. */
    long line() {
        return rowLine;
    }

    private RecordingFormatException translate(IOException e) {
        if (e instanceof RecordingFormatException ours) {
            return ours;
        }
        long line = Math.max(1, parser.getCurrentLineNumber() + 1);
        String why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new RecordingFormatException(file, "line " + line, "cannot split the row into cells (" + why
                + "); is a quote not closed?", e);
    }

    @Override
    public void close() throws IOException {
        parser.close();
    }

    /** Feeds the parser the file's lines, each ended by '\n'; skipped lines go in empty. */
    private final class LinesReader extends Reader {
        private final LineSource source;
        private String current = "";
        private int pos;
        private boolean ended;
        private long charsSinceRowStart;

        LinesReader(LineSource source) {
            this.source = source;
        }

        void rowStarts() {
            charsSinceRowStart = 0;
        }

        @Override
        public int read(char[] buf, int off, int len) throws IOException {
            if (len == 0) {
                return 0;
            }
            if (pos == current.length() && !refill()) {
                return -1;
            }
            int n = Math.min(len, current.length() - pos);
            current.getChars(pos, pos + n, buf, off);
            pos += n;
            charsSinceRowStart += n;
            if (charsSinceRowStart > MAX_ROW_CHARS + 2L * LineSource.MAX_LINE) {
                throw RecordingFormatException.atLine(file, source.lineNumber(), 1, "a row runs on for more than "
                        + MAX_ROW_CHARS + " characters since line " + (endOfLastRow + 1) + ": a quote is not closed");
            }
            return n;
        }

        private boolean refill() throws IOException {
            if (ended) {
                return false;
            }
            String line = source.next();
            if (line == null) {
                ended = true;
                return false;
            }
            if (source.lineNumber() == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF') {
                line = line.substring(1);
            }
            String t = line.trim();
            current = t.isEmpty() || t.charAt(0) == '#' ? "\n" : line + "\n";
            pos = 0;
            return true;
        }

        @Override
        public void close() {
            // the file channel belongs to the reader that opened it
        }
    }
}
