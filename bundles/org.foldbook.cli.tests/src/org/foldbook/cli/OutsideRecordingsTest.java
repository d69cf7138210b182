package org.foldbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * CSV and HDF5 recordings written by tools outside Foldbook (Python's csv module and Debian's h5py, by
 * releng/reference/cli_recordings.py; synthetic tones) open in {@code foldbook sweep} through
 * {@code Recordings.open}: the rate and length the files state, numpy's largest peak, and where the 3 kHz
 * tone lands at 4 kS/s by the fold formula.
 */
class OutsideRecordingsTest {
    private static final String FOLDER = "/org/foldbook/cli/recordings/";

    @TempDir
    Path dir;

    private Path copy(String name) throws IOException {
        try (InputStream in = OutsideRecordingsTest.class.getResourceAsStream(FOLDER + name)) {
            assertNotNull(in, name);
            Path file = dir.resolve(name);
            Files.copy(in, file);
            return file;
        }
    }

    @ParameterizedTest
    @CsvSource({"two-tones.csv", "two-tones.h5"})
    @DisplayName("an outside tool's CSV / HDF5 recording sweeps: 3 kHz at 4 kS/s folds to 1 kHz, 700 Hz survives "
            + "(the CSV's rate comes from its time column: 8000 S/s to within rounding)")
    void sweeps(String name) throws IOException {
        Properties expected = new Properties();
        try (InputStream in = OutsideRecordingsTest.class.getResourceAsStream(FOLDER + "expected.properties")) {
            expected.load(in);
        }
        Path file = copy(name);
        JsonNode json = SweepCommandTest.json(SweepCommandTest.run("sweep", "--input", file.toString(), "--rates",
                "4000", "--quiet"));
        JsonNode source = json.get("source");
        assertEquals(Double.parseDouble(expected.getProperty("rate")), source.get("rate").asDouble(), 1e-6, name);
        assertEquals(Long.parseLong(expected.getProperty("frames")), source.get("samples").asLong(), name);
        // numpy: the largest bin of a Hann-windowed FFT of the same samples
        double numpyPeak = Double.parseDouble(expected.getProperty("largestPeakHz"));
        JsonNode strongest = null;
        for (JsonNode p : source.get("peaks")) {
            if (strongest == null || p.get("levelDb").asDouble() > strongest.get("levelDb").asDouble()) {
                strongest = p;
            }
        }
        assertNotNull(strongest, name);
        assertEquals(numpyPeak, strongest.get("frequency").asDouble(), source.get("binWidth").asDouble(), name);
        JsonNode low = SweepCommandTest.rate(json, 4000);
        JsonNode tone = SweepCommandTest.source(low, SweepCommandTest.sourceId(json, 3000));
        assertEquals("folds", tone.get("verdict").asText(), name + ": " + tone);
        assertEquals(1000, tone.get("apparentFrequency").asDouble(), 0.01, name); // |3000 - 4000|
        assertEquals(1000, tone.get("observedFrequency").asDouble(), low.get("binWidth").asDouble(), name);
        JsonNode slow = SweepCommandTest.source(low, SweepCommandTest.sourceId(json, 700));
        assertEquals("survives", slow.get("verdict").asText(), name + ": " + slow);
    }

    @ParameterizedTest
    @CsvSource({"2, 1500"})
    @DisplayName("--channel picks the CSV's second value column (a 1500 Hz tone)")
    void secondColumn(int channel, double hz) throws IOException {
        Path file = copy("two-tones.csv");
        JsonNode json = SweepCommandTest.json(SweepCommandTest.run("sweep", "--input", file.toString(), "--channel",
                String.valueOf(channel), "--rates", "4000", "--quiet"));
        SweepCommandTest.sourceId(json, hz);
        assertEquals(1, json.get("source").get("peaks").size(), json.get("source").toString());
    }
}
