package org.foldbook.io.csv;

import java.nio.charset.Charset;
import java.nio.charset.StandardCharsets;
import java.util.Objects;

import org.foldbook.io.RecordingDescriptor;

/**
 * How to read a delimited text recording. Everything left at its default is detected from the file.
 *
 * @param separator        ',', ';' or '\t'; null = detect (tab, else ';', else ',')
 * @param decimalSeparator '.' or ','; null = detect (',' only possible when the separator is not ',')
 * @param header           whether the first non-blank line names the columns
 * @param timeColumn       0-based column of time stamps; {@link #DETECT_TIME} = a header named time/t/timestamp,
 *                         {@link #NO_TIME} = none (then {@code sampleRate} is required)
 * @param sampleRate       samples per second; NaN = from the time column's nominal interval
 */
public record DelimitedTextSettings(Character separator, Character decimalSeparator, Header header,
        int timeColumn, double sampleRate, Charset charset) implements RecordingDescriptor {

    public static final int DETECT_TIME = -2;
    public static final int NO_TIME = -1;

    /** Header handling. */
    public enum Header {
        /** A first line with any non-numeric cell is a header. */
        DETECT, PRESENT, ABSENT
    }

    public static final DelimitedTextSettings DETECT = new DelimitedTextSettings(null, null, Header.DETECT,
            DETECT_TIME, Double.NaN, StandardCharsets.UTF_8);

    public DelimitedTextSettings {
        if (separator != null && separator != ',' && separator != ';' && separator != '\t') {
            throw new IllegalArgumentException("separator: '" + separator + "' is not ',', ';' or tab");
        }
        if (decimalSeparator != null && decimalSeparator != '.' && decimalSeparator != ',') {
            throw new IllegalArgumentException("decimalSeparator: '" + decimalSeparator + "' is not '.' or ','");
        }
        if (separator != null && decimalSeparator != null && separator.charValue() == decimalSeparator.charValue()) {
            throw new IllegalArgumentException("decimalSeparator: '" + decimalSeparator + "' equals the separator");
        }
        Objects.requireNonNull(header, "header");
        Objects.requireNonNull(charset, "charset");
        if (!LineSource.asciiCompatible(charset)) {
            throw new IllegalArgumentException("charset: " + charset + " does not store CR, LF, digits and separators"
                    + " as ASCII bytes (UTF-16/32 are not supported)");
        }
        if (timeColumn < DETECT_TIME) {
            throw new IllegalArgumentException("timeColumn: " + timeColumn + " is below " + DETECT_TIME);
        }
        if (!Double.isNaN(sampleRate) && !(sampleRate > 0 && Double.isFinite(sampleRate))) {
            throw new IllegalArgumentException("sampleRate: " + sampleRate + " is not a positive finite rate");
        }
    }

    public DelimitedTextSettings withSampleRate(double rate) {
        return new DelimitedTextSettings(separator, decimalSeparator, header, timeColumn, rate, charset);
    }

    public DelimitedTextSettings withTimeColumn(int column) {
        return new DelimitedTextSettings(separator, decimalSeparator, header, column, sampleRate, charset);
    }

    public DelimitedTextSettings withSeparators(Character separator, Character decimal) {
        return new DelimitedTextSettings(separator, decimal, header, timeColumn, sampleRate, charset);
    }

    public DelimitedTextSettings withHeader(Header h) {
        return new DelimitedTextSettings(separator, decimalSeparator, h, timeColumn, sampleRate, charset);
    }
}
