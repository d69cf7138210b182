package org.foldbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.demo.GearboxDemo;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * {@code foldbook sweep --notebook … --channel …} on the demo's survey channel; the JSON is read with
 * Jackson, where the 60 kHz inverter component lands is checked against the fold formula.
 */
class NotebookSweepTest {
    @TempDir
    static Path dir;
    static Path notebook;

    @BeforeAll
    static void demo() throws IOException {
        notebook = GearboxDemo.write(dir);
    }

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Whether the rate at {@code fs} has a peak within two bins of {@code hz}. */
    private static boolean peakNear(JsonNode json, double fs, double hz) {
        for (JsonNode rate : json.get("rates")) {
            if (Math.abs(rate.get("rate").asDouble() - fs) < 1e-6) {
                double bin = rate.get("binWidth").asDouble();
                for (JsonNode p : rate.get("peaks")) {
                    if (Math.abs(p.get("frequency").asDouble() - hz) <= 2 * bin) {
                        return true;
                    }
                }
                return false;
            }
        }
        throw new AssertionError("no rate " + fs + " in the result");
    }

    @Test
    void theStoredPlanRunsBareAndThroughTheEverydayChain() throws IOException {
        double lands = Folding.apparentHz(60000, 25600); // |60000 − 2·25600| = 8800 Hz (fold formula)
        assertEquals(8800, lands, 1e-9);
        Run bare = run("sweep", "--notebook", notebook.toString(), "--channel", "housing Z survey", "--mode", "bare",
                "--quiet");
        assertEquals(0, bare.code(), bare.err());
        JsonNode b = new ObjectMapper().readTree(bare.out());
        assertEquals("bare", b.get("mode").asText());
        assertEquals(16, b.get("rates").size());
        assertEquals(204800, b.get("source").get("rate").asDouble(), 0);
        assertEquals(5000, b.get("summary").get("band").get("high").asDouble(), 0);
        assertTrue(peakNear(b, 25600, lands), "bare: the 60 kHz component at 8.8 kHz");

        Run modelled = run("sweep", "--notebook", notebook.toString(), "--channel", "run 3: wide-band survey at 204.8 kS/s/housing Z survey",
                "--quiet");
        assertEquals(0, modelled.code(), modelled.err());
        JsonNode m = new ObjectMapper().readTree(modelled.out());
        assertEquals("modelled", m.get("mode").asText());
        assertTrue(!peakNear(m, 25600, lands), "through LP-A (62 dB at 60 kHz) nothing at 8.8 kHz");
    }

    @Test
    void badChannelsAndChangedFilesAreNamed() throws IOException {
        // a side-by-side check mode is not one a notebook keeps
        Run kernel = run("sweep", "--notebook", notebook.toString(), "--channel", "housing Z survey", "--mode",
                "bare-kernel");
        assertEquals(Main.BAD_INPUT, kernel.code());
        assertTrue(kernel.err().contains("bare, modelled, ideal") && kernel.err().contains("'bare-kernel'"), kernel.err());
        Run none = run("sweep", "--notebook", notebook.toString(), "--channel", "no such");
        assertEquals(Main.BAD_INPUT, none.code());
        assertTrue(none.err().contains("no such channel") && none.err().contains("housing Z survey"), none.err());
        Path copy = dir.resolve("changed");
        Path nb = GearboxDemo.write(copy);
        Path wav = copy.resolve("data/survey-run3.wav");
        byte[] bytes = Files.readAllBytes(wav);
        bytes[bytes.length - 1] ^= 1;
        Files.write(wav, bytes, StandardOpenOption.TRUNCATE_EXISTING);
        Run changed = run("sweep", "--notebook", nb.toString(), "--channel", "housing Z survey", "--quiet");
        assertEquals(Main.BAD_INPUT, changed.code());
        assertTrue(changed.err().contains(wav.toString()) && changed.err().contains("changed since it was logged"),
                changed.err());
        Run accepted = run("sweep", "--notebook", nb.toString(), "--channel", "housing Z survey", "--accept-changed",
                "--quiet", "--rates", "51200,25600");
        assertEquals(0, accepted.code(), accepted.err());
    }
}
