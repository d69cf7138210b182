package org.foldbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** The headless sweep command end to end: files in, JSON out (read back with Jackson), exit codes. */
class SweepCommandTest {
    @TempDir
    Path dir;

    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    /** Clearly synthetic: a sine of {@code f} Hz, amplitude {@code a}, n samples at fs, plus seeded noise (std 1e-4). */
    static double[] sine(int n, double fs, double f, double a) {
        java.util.Random rnd = new java.util.Random(n + (long) f);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = a * Math.sin(2 * Math.PI * f * i / fs + 0.3) + 1e-4 * rnd.nextGaussian();
        }
        return x;
    }

    /** The JSON read back with Jackson. */
    static JsonNode json(Run r) throws IOException {
        assertEquals(0, r.code(), r.err());
        return new ObjectMapper().readTree(r.out());
    }

    /** id of the source peak nearest {@code f} Hz in the JSON's source peak list. */
    static int sourceId(JsonNode json, double f) {
        int best = -1;
        double dist = Double.POSITIVE_INFINITY;
        for (JsonNode p : json.get("source").get("peaks")) {
            double d = Math.abs(p.get("frequency").asDouble() - f);
            if (d < dist) {
                dist = d;
                best = p.get("id").asInt();
            }
        }
        assertTrue(dist < 10, "no source peak near " + f + " Hz");
        return best;
    }

    /** The rate entry at {@code fs} S/s. */
    static JsonNode rate(JsonNode json, double fs) {
        for (JsonNode r : json.get("rates")) {
            if (Math.abs(r.get("rate").asDouble() - fs) < 1e-6) {
                return r;
            }
        }
        throw new AssertionError("no rate " + fs + " in " + json.get("rates"));
    }

    /** What the rate entry says of source peak {@code id}. */
    static JsonNode source(JsonNode rate, int id) {
        for (JsonNode s : rate.get("sources")) {
            if (s.get("sourcePeak").asInt() == id) {
                return s;
            }
        }
        throw new AssertionError("source peak " + id + " not in " + rate.get("sources"));
    }

    /** Writes 16-bit mono PCM WAV with the JDK's own writer (javax.sound.sampled), independent of our reader. */
    static void writeWav(Path file, double[] x, float fs) throws IOException {
        ByteBuffer b = ByteBuffer.allocate(2 * x.length).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : x) {
            b.putShort((short) Math.round(v * 32767));
        }
        AudioFormat fmt = new AudioFormat(fs, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(b.array()), fmt, x.length)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, file.toFile());
        }
    }

    @Test
    @DisplayName("WAV in (javax.sound writer), JSON out: 1500 Hz at 19 kS/s folds to 400 Hz at 1.9 kS/s "
            + "(the common-practice 1.5 Hz at 1.9 S/s example, scaled by 1000)")
    void wavFoldsLikeTheFormula() throws IOException {
        Path wav = dir.resolve("tone.wav");
        writeWav(wav, sine(1 << 16, 19000, 1500, 0.5), 19000f);
        JsonNode json = json(run("sweep", "--input", wav.toString(), "--rates", "19000,1900", "--quiet"));
        assertEquals("foldbook-sweep", json.get("format").asText());
        JsonNode low = rate(json, 1900);
        assertEquals(1, low.get("up").asInt());
        assertEquals(10, low.get("down").asInt());
        // 16-bit quantisation of a tone commensurate with the rate adds small spurs (peaks of their own);
        // track the tone's own source peak
        int id = sourceId(json, 1500);
        JsonNode tone = source(low, id);
        assertEquals("folds", tone.get("verdict").asText(), tone.toString());
        // fold formula |f - k fs| of the source peak's estimated frequency (about 1500 Hz): |f - 1900|, about 400 Hz
        double f = json.get("source").get("peaks").get(id).get("frequency").asDouble();
        assertEquals(Math.abs(f - 1900), tone.get("apparentFrequency").asDouble(), 1e-6);
        assertEquals(400, tone.get("observedFrequency").asDouble(), 19000.0 / 4096);
    }

    @Test
    @DisplayName("--stream: the same JSON as the in-memory sweep, WAV (javax.sound writer) and raw float64, "
            + "bare and modelled")
    void streamingGivesTheSameJson() throws IOException {
        Path wav = dir.resolve("long.wav");
        double[] x = sine(200_000, 48_000, 7_300, 0.4);
        writeWav(wav, x, 48_000f);
        ByteBuffer b = ByteBuffer.allocate(8 * x.length).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : x) {
            b.putDouble(v);
        }
        Path raw = dir.resolve("long.f64");
        Files.write(raw, b.array());
        for (String[] input : new String[][] {{"--input", wav.toString()}, {"--input", raw.toString(), "--rate", "48000"}}) {
            for (String[] mode : new String[][] {{"--mode", "bare"}, {"--mode", "modelled", "--filter", "butterworth:4:9000"}}) {
                java.util.List<String> args = new java.util.ArrayList<>(java.util.List.of("sweep", "--to", "6000",
                        "--steps", "7", "--quiet"));
                args.addAll(java.util.List.of(input));
                args.addAll(java.util.List.of(mode));
                Run inMemory = run(args.toArray(String[]::new));
                args.add("--stream");
                Run streamed = run(args.toArray(String[]::new));
                assertEquals(0, inMemory.code(), inMemory.err());
                assertEquals(0, streamed.code(), streamed.err());
                assertTrue(inMemory.out().contains("\"rates\""), inMemory.out());
                assertEquals(inMemory.out(), streamed.out(), String.join(" ", args));
            }
        }
        Run r = run("sweep", "--input", wav.toString(), "--to", "6000", "--steps", "3", "--preview", "--stream");
        assertEquals(Main.BAD_INPUT, r.code(), r.err());
        assertTrue(r.err().contains("--stream"), r.err());
    }

    @Test
    @DisplayName("raw float64 + a grid file of 'index up down fs' lines; CSV output to a file")
    void rawAndGridFile() throws IOException {
        double[] x = sine(1 << 15, 8000, 3000, 1.0);
        ByteBuffer b = ByteBuffer.allocate(8 * x.length).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : x) {
            b.putDouble(v);
        }
        Path raw = dir.resolve("rec.f64");
        Files.write(raw, b.array());
        Path grid = dir.resolve("grid.txt");
        Files.writeString(grid, "0 1 1 8000.000000000\n1 1 2 4000.000000000\n");
        Path csv = dir.resolve("out.csv");
        Run r = run("sweep", "--input", raw.toString(), "--rate", "8000", "--grid", grid.toString(), "--mode", "ideal",
                "--format", "csv", "--output", csv.toString(), "--quiet");
        assertEquals(0, r.code(), r.err());
        String text = Files.readString(csv);
        assertTrue(text.startsWith("index,up,down,rate_hz,"), text);
        // the ideal decimator removes 3 kHz before 4 kS/s (stop band from 2 kHz): removed, not folded to 1 kHz
        assertTrue(text.lines().anyMatch(l -> l.matches("1,1,2,4000\\.0,(999\\.99|1000\\.0)[0-9]*,,removed,0,.*")),
                text);
        // and at 8 kS/s it survives
        assertTrue(text.lines().anyMatch(l -> l.startsWith("0,1,1,8000.0,") && l.contains(",survives,0,")), text);
    }

    @Test
    @DisplayName("bad arguments: exit 2 with a message naming the option")
    void badArguments() throws IOException {
        Run r = run("sweep", "--rates", "100");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--input"), r.err());
        Path junk = dir.resolve("junk.bin");
        Files.write(junk, new byte[64]);
        r = run("sweep", "--input", junk.toString(), "--rates", "100");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--rate"), r.err());
        r = run("sweep", "--input", junk.toString(), "--rate", "1000", "--to", "100");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--steps"), r.err());
        r = run("sweep", "--input", junk.toString(), "--rate", "1000", "--rates", "100", "--mode", "modelled");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--filter"), r.err());
        // the mode words are the sweep's (SimulationMode); a wrong one is named with the words there are
        r = run("sweep", "--input", junk.toString(), "--rate", "1000", "--rates", "100", "--mode", "filtered");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("--mode") && r.err().contains("'filtered'")
                && r.err().contains("bare, modelled, ideal, bare-kernel, polyphase-default"), r.err());
        r = run("frobnicate");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("frobnicate"), r.err());
    }

    @Test
    @DisplayName("modelled Butterworth chain and the spectral preview: 15 kHz at 12 kS/s folds to 3 kHz, 55.9 dB down "
            + "(fold formula, Butterworth closed form); 1 kHz survives; the band's lowest alias-free rate")
    void modelledAndPreview() throws IOException {
        Path wav = dir.resolve("two.wav");
        double[] a = sine(1 << 16, 48000, 1000, 0.4);
        double[] c = sine(1 << 16, 48000, 15000, 0.4);
        for (int i = 0; i < a.length; i++) {
            a[i] += c[i];
        }
        writeWav(wav, a, 48000f);
        // Butterworth |H|^2 = 1/(1 + (f/fc)^(2n)) (any filter handbook): n = 4, fc = 3 kHz
        double at15k = 10 * Math.log10(1 + Math.pow(15000.0 / 3000.0, 8)); // 55.918 dB
        double at1k = 10 * Math.log10(1 + Math.pow(1000.0 / 3000.0, 8)); // 0.00066 dB
        for (String mode : new String[] {"modelled", "preview"}) {
            List<String> args = new ArrayList<>(List.of("sweep", "--input", wav.toString(), "--rates", "48000,12000",
                    "--mode", "modelled", "--filter", "butterworth:4:3000", "--band", "0:2000", "--quiet"));
            if (mode.equals("preview")) {
                args.add("--preview");
            }
            JsonNode json = json(run(args.toArray(String[]::new)));
            assertEquals(mode.equals("preview") ? "preview-modelled" : "modelled", json.get("mode").asText());
            JsonNode low = rate(json, 12000);
            int id = sourceId(json, 15000);
            JsonNode high = source(low, id);
            assertEquals("folds", high.get("verdict").asText(), mode + ": " + high);
            // fold formula |f - k fs| of the source peak's estimate (about 15 kHz): |f - 12000|, about 3000 Hz
            double f = json.get("source").get("peaks").get(id).get("frequency").asDouble();
            assertEquals(Math.abs(f - 12000), high.get("apparentFrequency").asDouble(), 1e-6, mode);
            assertEquals(3000, high.get("apparentFrequency").asDouble(), 0.5, mode);
            assertEquals(-at15k, high.get("predictedGainDb").asDouble(), 0.1, mode + ": " + high);
            assertEquals(-at15k, high.get("gainDb").asDouble(), 1.0, mode + ": " + high);
            JsonNode tone = source(low, sourceId(json, 1000));
            assertEquals("survives", tone.get("verdict").asText(), mode + ": " + tone);
            assertEquals(-at1k, tone.get("predictedGainDb").asDouble(), 0.01, mode + ": " + tone);
            // measured: within 1 dB (the tone is off the bin centre at 12 kS/s, a Hann window's scalloping)
            assertEquals(-at1k, tone.get("gainDb").asDouble(), 1.0, mode + ": " + tone);
            JsonNode band = json.get("summary").get("band");
            assertEquals(0, band.get("low").asDouble(), 0);
            assertEquals(2000, band.get("high").asDouble(), 0);
        }
    }

    @Test
    @DisplayName("--peaks prominence lists the floor's wiggles as source peaks; the default floor rule only the tone")
    void peakRuleOption() throws IOException {
        // one Welch segment (4096 samples): the noise bins scatter as a periodogram's do, so the prominence rule
        // alone takes dozens of them for peaks; 12 dB over the running median leaves about 0.04 per spectrum
        double[] x = sine(4096, 8000, 1000, 0.5);
        ByteBuffer b = ByteBuffer.allocate(8 * x.length).order(ByteOrder.LITTLE_ENDIAN);
        for (double v : x) {
            b.putDouble(v);
        }
        Path raw = dir.resolve("tone.f64");
        Files.write(raw, b.array());
        Run floor = run("sweep", "--input", raw.toString(), "--rate", "8000", "--rates", "4000", "--quiet");
        Run prom = run("sweep", "--input", raw.toString(), "--rate", "8000", "--rates", "4000", "--quiet",
                "--peaks", "prominence");
        assertEquals(0, floor.code(), floor.err());
        assertEquals(0, prom.code(), prom.err());
        JsonNode f = json(floor);
        int nFloor = f.get("source").get("peaks").size();
        int nProm = json(prom).get("source").get("peaks").size();
        assertEquals(1, nFloor, f.get("source").toString());
        assertTrue(nProm > 10, "prominence alone finds the noise's own peaks: " + nProm);
        assertTrue(f.get("source").get("peakRule").asText().startsWith("peaks stand 12.0 dB above"),
                f.get("source").get("peakRule").asText());
        Run bad = run("sweep", "--input", raw.toString(), "--rate", "8000", "--rates", "4000", "--peak-margin", "-1");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--peak-margin"), bad.err());
    }
}
