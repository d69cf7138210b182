package org.foldbook.io.csv;

import java.io.BufferedInputStream;
import java.io.FilterInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.Sha256;
import org.foldbook.io.TimingReport;
import org.foldbook.io.internal.Buffers;

/**
 * Reads comma, semicolon or tab separated recordings, one row per frame. Opening makes one full pass
 * (bounded memory) that validates every cell, detects the header, separator and decimal mark, measures
 * the timing of the time column and computes SHA-256; reading makes a second pass. Rows are split by
 * Apache Commons CSV ({@link CsvRows}), so a quoted cell may hold the separator, doubled quotes or a line
 * break. Blank lines and lines whose first non-blank character is '#' are skipped. Empty cells are missing samples and come back as NaN (counted in
 * {@link RecordingInfo#missingValues()}); text such as "NaN" or "inf" is refused. The time column is not
 * one of the channels; {@link #read(double[][], double[], int, int)} returns it in seconds. Samples are
 * never resampled: irregular time stamps are reported in {@link RecordingInfo#timing()}.
 * Error locations give the line and the 1-based column (field) number.
 */
public final class DelimitedTextReader implements RecordingReader {
    private static final Set<String> TIME_NAMES = Set.of("time", "t", "timestamp");
    private static final Pattern UNIT = Pattern.compile("^(.*?)\\s*(?:\\[([^\\]]*)\\]|\\(([^)]*)\\))\\s*$");

    private final RecordingInfo info;
    private final FileChannel channel;
    private final DelimitedTextSettings settings;
    private final RowFormat format;
    private final double timeFactor;
    private final boolean header;
    private final String sha256;
    private final int[] dataColumns;
    private CsvRows second;
    private double[] row;
    private long framePosition;

    private DelimitedTextReader(RecordingInfo info, FileChannel channel, DelimitedTextSettings settings,
            RowFormat format, double timeFactor, boolean header, String sha256) {
        this.info = info;
        this.channel = channel;
        this.settings = settings;
        this.format = format;
        this.timeFactor = timeFactor;
        this.header = header;
        this.sha256 = sha256;
        this.dataColumns = new int[info.channelCount()];
        for (int c = 0, k = 0; c < format.columns; c++) {
            if (c != format.timeColumn) {
                dataColumns[k++] = c;
            }
        }
        this.row = new double[format.columns];
    }

    public static DelimitedTextReader open(Path file) throws IOException {
        return open(file, DelimitedTextSettings.DETECT, ReadOptions.DEFAULT);
    }

    public static DelimitedTextReader open(Path file, DelimitedTextSettings settings, ReadOptions options)
            throws IOException {
        FileChannel ch = FileChannel.open(file, StandardOpenOption.READ);
        try {
            return scan(file, ch, settings, options);
        } catch (IOException | RuntimeException e) {
            ch.close();
            throw e;
        }
    }

    /** Does not close the channel (Channels.newInputStream would). */
    private static InputStream unclosable(FileChannel ch) {
        return new FilterInputStream(Channels.newInputStream(ch)) {
            @Override
            public void close() {
            }
        };
    }

    private static LineSource lines(Path file, FileChannel ch, DelimitedTextSettings s, MessageDigest md)
            throws IOException {
        ch.position(0);
        InputStream in = new BufferedInputStream(unclosable(ch), 1 << 16);
        if (md != null) {
            in = new DigestInputStream(in, md);
        }
        return new LineSource(file, in, s.charset());
    }

    /** The first line that is neither blank nor a comment (for separator detection), or null. */
    private static String firstContentLine(Path file, FileChannel ch, DelimitedTextSettings s) throws IOException {
        LineSource src = lines(file, ch, s, null);
        String line;
        while ((line = src.next()) != null) {
            if (src.lineNumber() == 1 && !line.isEmpty() && line.charAt(0) == '\uFEFF') {
                line = line.substring(1);
            }
            String t = line.trim();
            if (!t.isEmpty() && t.charAt(0) != '#') {
                return line;
            }
        }
        return null;
    }

    /**
     * Separator: as given, else tab if the first content line holds one outside quotes, else ';' likewise,
     * else ','. Outside quotes, because a quoted header cell such as "x; filtered" names a column.
     */
    static char separatorOf(DelimitedTextSettings s, String first) {
        if (s.separator() != null) {
            return s.separator();
        }
        boolean quoted = false;
        boolean tab = false;
        boolean semicolon = false;
        for (int i = 0; i < first.length(); i++) {
            char c = first.charAt(i);
            if (c == '"') {
                quoted = !quoted; // a doubled quote toggles twice: still inside
            } else if (!quoted) {
                tab |= c == '\t';
                semicolon |= c == ';';
            }
        }
        return tab ? '\t' : semicolon ? ';' : ',';
    }

    private static DelimitedTextReader scan(Path file, FileChannel ch, DelimitedTextSettings s, ReadOptions options)
            throws IOException {
        String firstText = firstContentLine(file, ch, s);
        if (firstText == null) {
            throw RecordingFormatException.atLine(file, 1, 1, "no rows: the file is empty");
        }
        char sep = separatorOf(s, firstText);
        MessageDigest md = options.sha256() ? Sha256.newDigest() : null;
        CsvRows src = new CsvRows(file, lines(file, ch, s, md), sep);
        String[] cells = src.next();
        if (cells == null) {
            throw RecordingFormatException.atLine(file, 1, 1, "no rows: the file is empty");
        }
        long firstLine = src.line();
        boolean header = switch (s.header()) {
        case PRESENT -> true;
        case ABSENT -> false;
        case DETECT -> {
            boolean any = false;
            for (String c : cells) {
                any |= !RowFormat.looksNumeric(c);
            }
            yield any;
        }
        };
        int columns = cells.length;
        String[] names = new String[columns];
        String[] units = new String[columns];
        for (int c = 0; c < columns; c++) {
            names[c] = "col" + (c + 1);
            units[c] = "";
            if (header) {
                Matcher m = UNIT.matcher(cells[c]);
                if (m.matches()) {
                    names[c] = m.group(1);
                    units[c] = (m.group(2) != null ? m.group(2) : m.group(3)).trim();
                } else {
                    names[c] = cells[c];
                }
                if (names[c].isEmpty()) {
                    names[c] = "col" + (c + 1);
                }
            }
        }
        int timeColumn = s.timeColumn();
        if (timeColumn == DelimitedTextSettings.DETECT_TIME) {
            timeColumn = DelimitedTextSettings.NO_TIME;
            for (int c = 0; header && c < columns; c++) {
                if (TIME_NAMES.contains(names[c].toLowerCase(Locale.ROOT))) {
                    timeColumn = c;
                    break;
                }
            }
        }
        if (timeColumn >= columns) {
            throw new IllegalArgumentException("timeColumn: " + timeColumn + " but " + file + " has " + columns
                    + " columns");
        }
        if (timeColumn < 0 && Double.isNaN(s.sampleRate())) {
            throw RecordingFormatException.atLine(file, firstLine, 1,
                    "no time column (a header named time, t or timestamp) and no sample rate given");
        }
        if (columns - (timeColumn >= 0 ? 1 : 0) == 0) {
            throw RecordingFormatException.atLine(file, firstLine, 1, "zero channels: only a time column");
        }
        double timeFactor = 1;
        String timeUnit = "s";
        if (timeColumn >= 0) {
            timeUnit = units[timeColumn].isEmpty() ? "s" : units[timeColumn];
            timeFactor = switch (timeUnit) {
            case "s" -> 1;
            case "ms" -> 1e-3;
            case "us", "\u00b5s", "\u03bcs" -> 1e-6;
            case "ns" -> 1e-9;
            case "min" -> 60;
            default -> throw RecordingFormatException.atLine(file, firstLine, timeColumn + 1,
                    "time unit '" + timeUnit + "' not understood (s, ms, us, ns, min)");
            };
        }
        char decimal = s.decimalSeparator() != null ? s.decimalSeparator() : sep == ',' ? '.' : 0;
        RowFormat format = new RowFormat(sep, decimal, columns, timeColumn);
        TimingAccumulator timing = timeColumn >= 0 ? new TimingAccumulator(timeUnit) : null;
        double[] values = new double[columns];
        long rows = 0;
        long missing = 0;
        long firstDataLine = -1;
        long previousLine = -1;
        String[] row = header ? src.next() : cells;
        while (row != null) {
            long ln = src.line();
            if (firstDataLine < 0) {
                firstDataLine = ln;
            }
            missing += format.parse(file, ln, row, values);
            if (timing != null) {
                double t = values[timeColumn] * timeFactor;
                if (!Double.isFinite(t)) {
                    throw RecordingFormatException.atLine(file, ln, timeColumn + 1, "time stamp "
                            + values[timeColumn] + " " + timeUnit + " is beyond the range of a double in seconds");
                }
                if (timing.count() > 0 && !(t > timing.last())) {
                    throw RecordingFormatException.atLine(file, ln, timeColumn + 1, "time stamp "
                            + values[timeColumn] + " does not increase (previous row at line " + previousLine + ")");
                }
                timing.add(t, previousLine);
            }
            previousLine = ln;
            rows++;
            row = src.next();
        }
        // the digest is complete only once the parser has read to the end (it did: next() gave null)
        if (rows == 0) {
            throw RecordingFormatException.atLine(file, firstLine, 1, "header but no data rows");
        }
        TimingReport report = timing == null ? null : timing.report();
        double rate = s.sampleRate();
        if (Double.isNaN(rate)) {
            if (report == null) {
                throw RecordingFormatException.atLine(file, firstDataLine, timeColumn + 1,
                        "one row only: no sample rate can be derived from the time column; give one");
            }
            rate = report.nominalRate();
            if (!Double.isFinite(rate)) {
                throw RecordingFormatException.atLine(file, firstDataLine, timeColumn + 1, "time stamps "
                        + report.nominalInterval() + " s apart give no finite sample rate");
            }
        }
        List<ChannelInfo> channels = new ArrayList<>();
        for (int c = 0; c < columns; c++) {
            if (c != timeColumn) {
                channels.add(new ChannelInfo(names[c], units[c]));
            }
        }
        String digest = md == null ? null : Sha256.hex(md.digest());
        if (format.decimal == 0) {
            format.decimal = '.';
        }
        RecordingInfo info = new RecordingInfo(file, RecordingFormat.DELIMITED_TEXT, channels, rate, rows,
                SampleType.FLOAT64, "decimal text, decimal mark '" + format.decimal + "', separator "
                        + (sep == '\t' ? "tab" : "'" + sep + "'"),
                Optional.ofNullable(report), missing);
        return new DelimitedTextReader(info, ch, s, format, timeFactor, header, digest);
    }

    @Override
    public RecordingInfo info() {
        return info;
    }

    @Override
    public long framePosition() {
        return framePosition;
    }

    /** Index of the time column in the file, or -1. */
    public int timeColumn() {
        return format.timeColumn;
    }

    @Override
    public int read(double[][] channels, int offset, int maxFrames) throws IOException {
        return read(channels, null, offset, maxFrames);
    }

    /**
     * As {@link #read(double[][], int, int)}, also delivering the time stamps in seconds into
     * {@code times[offset..]} when {@code times} is not null (NaN-free; requires a time column).
     */
    public int read(double[][] channels, double[] times, int offset, int maxFrames) throws IOException {
        Buffers.checkChannels(channels, offset, maxFrames, info.channelCount());
        if (times != null) {
            if (format.timeColumn < 0) {
                throw new IllegalArgumentException("times: " + info.file() + " has no time column");
            }
            if (times.length - (long) offset < maxFrames) {
                throw new IllegalArgumentException("times: length " + times.length + " has no room for "
                        + maxFrames + " frames at offset " + offset);
            }
        }
        int n = 0;
        while (n < maxFrames && nextRow()) {
            for (int k = 0; k < dataColumns.length; k++) {
                channels[k][offset + n] = row[dataColumns[k]];
            }
            if (times != null) {
                times[offset + n] = row[format.timeColumn] * timeFactor;
            }
            n++;
        }
        return n == 0 && maxFrames > 0 ? -1 : n;
    }

    @Override
    public int readInterleaved(double[] interleaved, int offset, int maxFrames) throws IOException {
        int ch = info.channelCount();
        Buffers.checkInterleaved(interleaved, offset, maxFrames, ch);
        int n = 0;
        while (n < maxFrames && nextRow()) {
            for (int k = 0; k < ch; k++) {
                interleaved[offset + n * ch + k] = row[dataColumns[k]];
            }
            n++;
        }
        return n == 0 && maxFrames > 0 ? -1 : n;
    }

    private boolean nextRow() throws IOException {
        if (framePosition == info.frameCount()) {
            return false;
        }
        if (second == null) {
            second = new CsvRows(info.file(), lines(info.file(), channel, settings, null), format.separator);
            if (header && second.next() == null) {
                throw changed(1);
            }
        }
        String[] cells = second.next();
        if (cells == null) {
            throw changed(second.line());
        }
        format.parse(info.file(), second.line(), cells, row);
        framePosition++;
        return true;
    }

    private RecordingFormatException changed(long line) {
        return RecordingFormatException.atLine(info.file(), line, 1,
                "file ends early: it changed since it was opened");
    }

    @Override
    public String sha256Hex() throws IOException {
        return sha256 != null ? sha256 : Sha256.ofChannel(channel);
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
