package org.foldbook.io.csv;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;
import java.util.Properties;

import org.foldbook.io.ChannelInfo;
import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.TestFiles;
import org.foldbook.io.TimingReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Delimited text written by releng/reference/io_files.py (numpy 1.24, shortest round-trip repr, so the
 * parsed doubles must equal numpy's float64 dump exactly) in both number conventions, plus synthetic
 * broken inputs written here.
 */
class DelimitedTextReaderTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "dot-comma.csv       | accel | m/s^2 | v     | V   | s",
            "comma-semicolon.csv | force | N     | angle | deg | ms"})
    void bothLocalesMatchNumpy(String name, String n1, String u1, String n2, String u2, String timeUnit)
            throws IOException {
        Path p = TestFiles.copy("csv/numpy/" + name, dir);
        double[][] expected = TestFiles.f64("csv/numpy/signals-200x2.f64", 2);
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            RecordingInfo info = r.info();
            assertEquals(List.of(new ChannelInfo(n1, u1), new ChannelInfo(n2, u2)), info.channels());
            assertEquals(200, info.frameCount());
            assertEquals(0, r.timeColumn());
            TimingReport t = info.timing().orElseThrow();
            assertEquals(timeUnit, t.timeUnit());
            // the script wrote t = n / 1000 s: a 1 ms grid, up to decimal rounding of the printed stamps
            assertEquals(1000.0, info.sampleRate(), 1e-6);
            assertTrue(t.isRegular());
            assertEquals(0, t.gapCount());
            double[][] got = new double[2][200];
            double[] times = new double[200];
            int at = 0;
            int n;
            while ((n = r.read(got, times, at, Math.min(33, 200 - at))) > 0) {
                at += n;
            }
            assertEquals(200, at);
            assertArrayEquals(expected[0], got[0], 0.0);
            assertArrayEquals(expected[1], got[1], 0.0);
            assertEquals(0.199, times[199], 1e-15);
            assertEquals(-1, r.read(got, 0, 1));
        }
    }

    @Test
    void noHeaderNeedsARate() throws IOException {
        Path p = TestFiles.copy("csv/numpy/no-header.tsv", dir);
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> DelimitedTextReader.open(p));
        assertTrue(e.getMessage().contains("no sample rate given"), e.getMessage());
        try (DelimitedTextReader r = DelimitedTextReader.open(p, DelimitedTextSettings.DETECT.withSampleRate(1000),
                ReadOptions.DEFAULT)) {
            assertEquals(List.of(new ChannelInfo("col1", ""), new ChannelInfo("col2", "")), r.info().channels());
            assertTrue(r.info().timing().isEmpty());
            double[] inter = TestFiles.readAllInterleaved(r, 64);
            double[][] expected = TestFiles.f64("csv/numpy/signals-200x2.f64", 2);
            for (int f = 0; f < 200; f++) {
                assertEquals(expected[0][f], inter[2 * f], 0.0);
                assertEquals(expected[1][f], inter[2 * f + 1], 0.0);
            }
        }
    }

    @Test
    void missingCellsBecomeNaNAndAreCounted() throws IOException {
        Path p = TestFiles.copy("csv/numpy/missing-cells.csv", dir);
        double[][] expected = TestFiles.f64("csv/numpy/missing-cells.f64", 2); // NaN where numpy wrote NaN
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals(3, r.info().missingValues());
            double[][] got = TestFiles.readAll(r, 1000);
            assertArrayEquals(expected[0], got[0], 0.0);
            assertArrayEquals(expected[1], got[1], 0.0);
            assertTrue(Double.isNaN(got[1][17]) && Double.isNaN(got[1][18]) && Double.isNaN(got[0][5]));
        }
    }

    @Test
    void jitterAndGapsAreReportedNotResampled() throws IOException {
        Path p = TestFiles.copy("csv/numpy/jitter-gaps.csv", dir);
        Properties ref = new Properties();
        ref.load(new StringReader(new String(TestFiles.bytes("csv/numpy/jitter-gaps.properties"), StandardCharsets.UTF_8)));
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            TimingReport t = r.info().timing().orElseThrow();
            assertEquals(Long.parseLong(ref.getProperty("rows")), r.info().frameCount(), "rows: every stamp kept");
            assertEquals(Double.parseDouble(ref.getProperty("nominalInterval")), t.nominalInterval(), 1e-15, "numpy median");
            assertEquals(Double.parseDouble(ref.getProperty("maxJitter")), t.maxJitter(), 1e-15, "numpy max |dev|");
            assertEquals(Double.parseDouble(ref.getProperty("rmsJitter")), t.rmsJitter(), 1e-12, "numpy rms dev");
            assertEquals(Long.parseLong(ref.getProperty("gapCount")), t.gapCount());
            String[] lines = ref.getProperty("gapLines").split(",");
            String[] missing = ref.getProperty("gapMissing").split(",");
            for (int i = 0; i < lines.length; i++) {
                assertEquals(Long.parseLong(lines[i]), t.gaps().get(i).line(), "gap " + i + " line");
                assertEquals(Long.parseLong(missing[i]), t.gaps().get(i).missingSamples(), "gap " + i + " size");
            }
            assertFalse(t.isRegular());
            assertEquals(Double.parseDouble(ref.getProperty("firstTime")), t.firstTime(), 0.0);
            assertEquals(Double.parseDouble(ref.getProperty("lastTime")), t.lastTime(), 0.0);
            double[][] got = TestFiles.readAll(r, 128);
            assertArrayEquals(TestFiles.f64("csv/numpy/jitter-gaps.f64", 1)[0], got[0], 0.0, "values as stored");
        }
    }

    @Test
    void sha256OfTheTextFile() throws Exception {
        Path p = TestFiles.copy("csv/numpy/dot-comma.csv", dir);
        String jdk = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p)));
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals(jdk, r.sha256Hex());
        }
        try (DelimitedTextReader r = DelimitedTextReader.open(p, DelimitedTextSettings.DETECT, ReadOptions.DEFAULT.withSha256(false))) {
            assertEquals(jdk, r.sha256Hex(), "computed by a second pass when streaming hashing was off");
        }
    }

    private RecordingFormatException fails(String text, DelimitedTextSettings s) throws IOException {
        Path p = dir.resolve("bad.csv");
        Files.writeString(p, text, StandardCharsets.UTF_8);
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> {
            try (DelimitedTextReader r = DelimitedTextReader.open(p, s, ReadOptions.DEFAULT)) {
                TestFiles.readAll(r, 10);
            }
        });
        assertTrue(e.getMessage().startsWith(p.toString()), e.getMessage());
        return e;
    }

    // synthetic broken inputs
    @Test
    void badCellsNameLineAndColumn() throws IOException {
        DelimitedTextSettings d = DelimitedTextSettings.DETECT;
        RecordingFormatException e = fails("time,a,b\n0,1,2\n0.001,1,x2\n", d);
        assertEquals("line 3, column 3", e.location());
        assertTrue(e.problem().contains("'x2' is not a number"), e.problem());
        e = fails("time;a\n0;1,5\n0,001;NaN\n", d);
        assertEquals("line 3, column 2", e.location());
        assertTrue(e.problem().contains("NaN"), e.problem());
        e = fails("time;a\n0;1,5\n0,001;1.5\n", d);
        assertEquals("line 3, column 2", e.location(), "dot in a comma-decimal file");
        e = fails("time,a\n0,1\n0.001,1,3\n", d);
        assertTrue(e.problem().contains("row has 3 cells"), e.problem());
        e = fails("time,a\n0,1\n0,2\n", d);
        assertTrue(e.problem().contains("does not increase"), e.problem());
        e = fails("time,a\n0,1\n,2\n", d);
        assertTrue(e.problem().contains("time stamp missing"), e.problem());
        e = fails("time [h],a\n0,1\n1,2\n", d);
        assertTrue(e.problem().contains("time unit 'h'"), e.problem());
        e = fails("", d);
        assertTrue(e.problem().contains("empty"), e.problem());
        e = fails("time,a\n", d);
        assertTrue(e.problem().contains("no data rows"), e.problem());
        e = fails("time\n0\n1\n", d);
        assertTrue(e.problem().contains("zero channels"), e.problem());
        e = fails("a,b\n1,2\n\u0000\u0001\u0002\n", d.withSampleRate(10));
        assertTrue(e.problem().contains("binary"), e.problem());
        e = fails("1e5,2\n1e,3\n", d.withSampleRate(10));
        assertEquals("line 2, column 1", e.location());
    }

    @Test
    void crlfBomCommentsAndQuotedCells() throws IOException {
        // synthetic: a spreadsheet-style export with BOM, CRLF, a comment line, quoted header cells, a lone CR
        Path p = dir.resolve("export.csv");
        Files.write(p, "\uFEFF# exported\r\n\"time [ms]\";\"p [kPa]\"\r\n0;1,25\r\n\r\n2;-3,5e-1\r4;\"7\"\r\n"
                .getBytes(StandardCharsets.UTF_8));
        try (DelimitedTextReader r = DelimitedTextReader.open(p)) {
            assertEquals(List.of(new ChannelInfo("p", "kPa")), r.info().channels());
            assertEquals(3, r.info().frameCount());
            assertEquals(500.0, r.info().sampleRate(), 1e-9, "2 ms between stamps");
            double[][] v = new double[1][3];
            double[] t = new double[3];
            assertEquals(3, r.read(v, t, 0, 3));
            assertArrayEquals(new double[] {1.25, -0.35, 7}, v[0], 0.0);
            assertArrayEquals(new double[] {0, 0.002, 0.004}, t, 0.0);
        }
    }

    @Test
    void invalidUtf8IsReportedWithItsLine() throws IOException {
        Path p = dir.resolve("latin1.csv");
        Files.write(p, "t,a\n0,1\n1,2 \u00b5\n".getBytes(StandardCharsets.ISO_8859_1));
        RecordingFormatException e = assertThrows(RecordingFormatException.class, () -> DelimitedTextReader.open(p));
        assertTrue(e.location().startsWith("line 3"), e.getMessage());
    }

    @Test
    void settingsAreChecked() {
        assertThrows(IllegalArgumentException.class, () -> DelimitedTextSettings.DETECT.withSampleRate(-1));
        assertThrows(IllegalArgumentException.class, () -> DelimitedTextSettings.DETECT.withSeparators('|', null));
        assertThrows(IllegalArgumentException.class, () -> DelimitedTextSettings.DETECT.withSeparators(';', ';'));
    }
}
