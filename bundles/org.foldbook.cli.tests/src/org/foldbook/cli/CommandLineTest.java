package org.foldbook.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.cli.SweepCommandTest.Run;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** The command set: generated help, exit codes 0/1/2, the demo writer and the fold calculator. */
class CommandLineTest {
    @TempDir
    Path dir;

    private static Run run(String... args) {
        return SweepCommandTest.run(args);
    }

    @Test
    @DisplayName("every command answers --help with its generated usage and exit 0; no command or an unknown one is exit 2")
    void helpAndUsageErrors() {
        for (String cmd : new String[] {"sweep", "fold", "demo"}) {
            Run r = run(cmd, "--help");
            assertEquals(Main.OK, r.code(), r.err());
            assertTrue(r.out().startsWith("Usage: foldbook " + cmd), r.out());
            assertTrue(r.out().contains("Exit codes:"), r.out());
        }
        Run top = run("--help");
        assertEquals(Main.OK, top.code());
        assertTrue(top.out().contains("sweep") && top.out().contains("fold") && top.out().contains("demo"), top.out());
        assertTrue(top.out().contains("findings"), top.out());
        assertEquals(Main.BAD_INPUT, run().code());
        Run unknown = run("sweep", "--input", "x.wav", "--rates", "100", "--max-den", "5");
        assertEquals(Main.BAD_INPUT, unknown.code());
        assertTrue(unknown.err().contains("--max-den"), unknown.err());
        Run notANumber = run("fold", "--rate", "fast", "1000");
        assertEquals(Main.BAD_INPUT, notANumber.code());
        assertTrue(notANumber.err().contains("--rate") && notANumber.err().contains("'fast'"), notANumber.err());
        Run missing = run("sweep", "--input", dir.resolve("none.wav").toString(), "--rates", "100");
        assertEquals(Main.BAD_INPUT, missing.code());
        assertTrue(missing.err().contains(dir.resolve("none.wav").toString()), missing.err());
    }

    @Test
    @DisplayName("demo DIR writes the notebook and its recordings, and refuses (exit 2, nothing touched) when they are there")
    void demoNeverOverwrites() throws IOException {
        Run first = run("demo", dir.toString());
        assertEquals(Main.OK, first.code(), first.err());
        Path notebook = dir.resolve("gearbox-stand.foldbook");
        assertEquals(notebook.toString(), first.out().strip());
        Path survey = dir.resolve("data/survey-run3.wav");
        assertTrue(Files.size(survey) > 0);
        byte[] before = Files.readAllBytes(survey);
        long total;
        try (var files = Files.walk(dir)) {
            total = files.filter(Files::isRegularFile).mapToLong(p -> p.toFile().length()).sum();
        }
        assertTrue(total < 10_000_000, "demo data stays small: " + total + " bytes");
        Run again = run("demo", dir.toString());
        assertEquals(Main.BAD_INPUT, again.code());
        assertTrue(again.err().contains("not overwriting") && again.err().contains(notebook.toString()), again.err());
        assertArrayEquals(before, Files.readAllBytes(survey));
    }

    @Test
    @DisplayName("fold: 22.1 kHz and 60 kHz at 25.6 kS/s appear at 3.5 and 8.8 kHz (fold formula); every candidate "
            + "in 0-30 kHz that lands there; LP-A's attenuation from the Butterworth closed form")
    void foldCalculator() throws IOException {
        Run r = run("fold", "--rate", "25600", "--band", "0:30000", "--filter", "butterworth:4:10000",
                "--format", "json", "22100", "60000");
        assertEquals(Main.OK, r.code(), r.err());
        JsonNode json = new ObjectMapper().readTree(r.out());
        assertEquals(12800, json.get("nyquist").asDouble(), 0);
        JsonNode bearing = json.get("tones").get(0);
        // |f - k fs|, k = round(f/fs): |22100 - 25600| = 3500; zone 2 (12.8-25.6 kHz), mirrored
        assertEquals(3500, bearing.get("apparent").asDouble(), 1e-9);
        assertEquals(2, bearing.get("zone").asInt());
        assertTrue(bearing.get("mirrored").asBoolean());
        // k fs ± 3500 within 0..30 kHz: 3500, 22100, 29100
        double[] cands = new double[bearing.get("candidates").size()];
        for (int i = 0; i < cands.length; i++) {
            cands[i] = bearing.get("candidates").get(i).get("frequency").asDouble();
        }
        assertArrayEquals(new double[] {3500, 22100, 29100}, cands, 1e-9);
        // Butterworth |H|^2 = 1/(1 + (f/fc)^8): at 22.1 kHz 10 log10(1 + 2.21^8) = 27.6 dB
        assertEquals(10 * Math.log10(1 + Math.pow(2.21, 8)), bearing.get("attenuationDb").asDouble(), 1e-6);
        JsonNode inverter = json.get("tones").get(1);
        assertEquals(8800, inverter.get("apparent").asDouble(), 1e-9); // |60000 - 2·25600|
        assertEquals(5, inverter.get("zone").asInt());
        assertEquals(10 * Math.log10(1 + Math.pow(6, 8)), inverter.get("attenuationDb").asDouble(), 1e-6);
        // the band stops at 30 kHz: the 60 kHz tone's own frequency is outside it, its in-band images are listed
        assertEquals(8800, inverter.get("candidates").get(0).get("frequency").asDouble(), 1e-9);

        Run text = run("fold", "--rate", "25600", "22100");
        assertEquals(Main.OK, text.code(), text.err());
        assertTrue(text.out().contains("22100 Hz -> appears at 3500 Hz (Nyquist zone 2, mirrored)"), text.out());
    }
}
