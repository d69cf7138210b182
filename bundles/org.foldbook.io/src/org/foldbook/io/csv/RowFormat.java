package org.foldbook.io.csv;

import java.nio.file.Path;

import org.foldbook.io.RecordingFormatException;

/** Strict number parsing of a row's cells once separator, decimal mark and column count are known. */
final class RowFormat {
    final char separator;
    char decimal; // 0 while not yet decided (no cell has shown a decimal mark yet)
    final int columns;
    final int timeColumn;

    RowFormat(char separator, char decimal, int columns, int timeColumn) {
        this.separator = separator;
        this.decimal = decimal;
        this.columns = columns;
        this.timeColumn = timeColumn;
    }

    /**
     * Parses one data row into {@code out} (length {@link #columns}); missing cells become NaN.
     *
     * @return the number of missing data cells
     */
    int parse(Path file, long line, String[] cells, double[] out) throws RecordingFormatException {
        if (cells.length > columns) {
            throw RecordingFormatException.atLine(file, line, columns + 1,
                    "row has " + cells.length + " cells, but the recording has " + columns + " columns");
        }
        int missing = 0;
        for (int c = 0; c < columns; c++) {
            String cell = c < cells.length ? cells[c] : "";
            if (cell.isEmpty()) {
                if (c == timeColumn) {
                    throw RecordingFormatException.atLine(file, line, c + 1, "time stamp missing");
                }
                out[c] = Double.NaN;
                missing++;
            } else {
                out[c] = number(file, line, c, cell);
            }
        }
        return missing;
    }

    private double number(Path file, long line, int column, String cell) throws RecordingFormatException {
        String lower = cell.toLowerCase(java.util.Locale.ROOT);
        if (lower.contains("nan") || lower.contains("inf")) {
            throw RecordingFormatException.atLine(file, line, column + 1, "cell '" + cell
                    + "' is NaN or infinite; leave a cell empty to mark a missing sample");
        }
        int dot = cell.indexOf('.');
        int comma = cell.indexOf(',');
        if (decimal == 0) {
            if (dot >= 0 && comma < 0) {
                decimal = '.';
            } else if (comma >= 0 && dot < 0 && separator != ',') {
                decimal = ',';
            }
        }
        String s = decimal == ',' ? cell.replace(',', '.') : cell;
        if ((decimal == ',' && dot >= 0) || (decimal != ',' && comma >= 0) || !plainNumber(s)) {
            throw RecordingFormatException.atLine(file, line, column + 1, "cell '" + cell + "' is not a number"
                    + (decimal == 0 ? "" : " (decimal mark '" + decimal + "')"));
        }
        double v = Double.parseDouble(s);
        if (!Double.isFinite(v)) {
            throw RecordingFormatException.atLine(file, line, column + 1, "cell '" + cell
                    + "' is beyond the range of a double");
        }
        return v;
    }

    /** [+-] digits [. digits] [e [+-] digits], at least one digit in the mantissa. */
    static boolean plainNumber(String s) {
        int i = 0;
        int n = s.length();
        if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
            i++;
        }
        int digits = 0;
        while (i < n && Character.isDigit(s.charAt(i)) && s.charAt(i) < 128) {
            i++;
            digits++;
        }
        if (i < n && s.charAt(i) == '.') {
            i++;
            while (i < n && Character.isDigit(s.charAt(i)) && s.charAt(i) < 128) {
                i++;
                digits++;
            }
        }
        if (digits == 0) {
            return false;
        }
        if (i < n && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
            i++;
            if (i < n && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                i++;
            }
            int exp = 0;
            while (i < n && Character.isDigit(s.charAt(i)) && s.charAt(i) < 128) {
                i++;
                exp++;
            }
            if (exp == 0) {
                return false;
            }
        }
        return i == n;
    }

    /** A cell that would pass as a number under either decimal convention (used for header detection). */
    static boolean looksNumeric(String cell) {
        return cell.isEmpty() || plainNumber(cell) || plainNumber(cell.replace(',', '.'));
    }
}
