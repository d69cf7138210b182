package org.foldbook.io.csv;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.TestFiles;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Quoted cells. The two files in csv/pycsv were written by Python's csv module
 * (releng/reference/csv_files.py): it decides what to quote and doubles quotes inside cells; the values
 * are numpy's float64 shortest repr, so the parsed doubles must equal numpy's dump exactly. The last
 * tests use clearly synthetic inputs written here.
 */
class DelimitedTextQuotingTest {
    @TempDir
    Path dir;

    private void valuesMatchNumpy(DelimitedTextReader r) throws IOException {
        double[][] expected = TestFiles.f64("csv/pycsv/quoted-values.f64", 2);
        double[][] got = TestFiles.readAll(r, 37);
        assertArrayEquals(expected[0], got[0], 0.0);
        assertArrayEquals(expected[1], got[1], 0.0);
    }

    @Test
    @DisplayName("csv.QUOTE_MINIMAL: a ',' and a doubled quote inside quoted header cells name one column each")
    void separatorAndQuoteInsideHeaderCells() throws IOException {
        Path p = TestFiles.copy("csv/pycsv/quoted-header.csv", dir);
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals(List.of(new ChannelInfo("accel, x", "m/s^2"), new ChannelInfo("bridge \"B\"", "mV")),
                    r.info().channels());
            assertEquals(120, r.info().frameCount());
            assertEquals(500.0, r.info().sampleRate(), 1e-6, "the script's t = n / 500 s");
            valuesMatchNumpy(r);
        }
    }

    @Test
    @DisplayName("csv.QUOTE_ALL with ';' and decimal comma, CRLF, a comment first: ';' inside quotes is no separator")
    void everyCellQuoted() throws IOException {
        Path p = TestFiles.copy("csv/pycsv/quoted-all.csv", dir);
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals(List.of(new ChannelInfo("force; left", "N"), new ChannelInfo("force; right", "N")),
                    r.info().channels());
            assertEquals("ms", r.info().timing().orElseThrow().timeUnit());
            assertEquals(500.0, r.info().sampleRate(), 1e-6);
            assertTrue(r.info().scaling().contains("decimal mark ','"), r.info().scaling());
            valuesMatchNumpy(r);
        }
    }

    @Test
    @DisplayName("synthetic: a line break inside a quoted header cell; errors keep the file's line numbers")
    void lineBreakInsideQuotes() throws IOException {
        Path p = Files.writeString(dir.resolve("two-line-header.csv"),
                "time,\"a\nsecond line\"\n  # indented comment\n0,1\n0.001,x\n", StandardCharsets.UTF_8);
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> DelimitedTextReader.open(p));
        assertEquals("line 5, column 2", e.location(), e.getMessage());
        Files.writeString(p, "time,\"a\nsecond line\"\n0,1\n0.001,2\n", StandardCharsets.UTF_8);
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals("a\nsecond line", r.info().channels().get(0).name());
            assertArrayEquals(new double[] {1, 2}, TestFiles.readAll(r, 1)[0], 0.0);
        }
    }

    @Test
    @DisplayName("synthetic: an unclosed quote is an error naming the file and a line, not a silent merge")
    void unclosedQuote() throws IOException {
        Path p = Files.writeString(dir.resolve("open-quote.csv"), "time,a\n0,\"1\n0.001,2\n", StandardCharsets.UTF_8);
        RecordingFormatException e = assertThrows(RecordingFormatException.class,
                () -> DelimitedTextReader.open(p, DelimitedTextSettings.DETECT, ReadOptions.DEFAULT));
        assertTrue(e.getMessage().startsWith(p.toString()), e.getMessage());
        assertTrue(e.location().startsWith("line "), e.getMessage());
    }
}
