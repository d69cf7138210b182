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
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The headless sweep command end to end: files in, JSON out, exit codes. */
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

    /** id of the source peak nearest {@code f} Hz in the JSON's source peak list. */
    static int sourceId(String json, double f) {
        int start = json.indexOf("\"source\":");
        int end = json.indexOf("\"rates\":");
        Matcher m = Pattern.compile("\\{\"id\":([0-9]+),\"frequency\":([0-9.eE+-]+)").matcher(json.substring(start, end));
        int best = -1;
        double dist = Double.POSITIVE_INFINITY;
        while (m.find()) {
            double d = Math.abs(Double.parseDouble(m.group(2)) - f);
            if (d < dist) {
                dist = d;
                best = Integer.parseInt(m.group(1));
            }
        }
        assertTrue(dist < 10, "no source peak near " + f + " Hz");
        return best;
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

    /** The first number after {@code "key":} at or after {@code from}. */
    static double number(String json, String key, int from) {
        Matcher m = Pattern.compile("\"" + key + "\":(-?[0-9.eE+-]+)").matcher(json);
        assertTrue(m.find(from), key + " not found after " + from);
        return Double.parseDouble(m.group(1));
    }

    @Test
    @DisplayName("WAV in (javax.sound writer), JSON out: 1500 Hz at 19 kS/s folds to 400 Hz at 1.9 kS/s "
            + "(the common-practice 1.5 Hz at 1.9 S/s example, scaled by 1000)")
    void wavFoldsLikeTheFormula() throws IOException {
        Path wav = dir.resolve("tone.wav");
        writeWav(wav, sine(1 << 16, 19000, 1500, 0.5), 19000f);
        Run r = run("sweep", "--input", wav.toString(), "--rates", "19000,1900", "--quiet");
        assertEquals(0, r.code(), r.err());
        String json = r.out();
        assertTrue(json.startsWith("{\"format\":\"foldbook-sweep\""), json);
        int rate1 = json.indexOf("\"index\":1,");
        assertTrue(rate1 > 0, json);
        assertEquals(1, number(json, "up", rate1));
        assertEquals(10, number(json, "down", rate1));
        assertEquals(1900, number(json, "rate", rate1), 1e-9);
        // 16-bit quantisation of a tone commensurate with the rate adds small spurs (peaks of their own);
        // track the tone's own source peak
        int id = sourceId(json, 1500);
        String entry = "{\"sourcePeak\":" + id + ",\"verdict\":";
        int at = json.indexOf(entry, json.indexOf("\"sources\":", rate1));
        assertTrue(at > 0, json);
        assertTrue(json.startsWith(entry + "\"folds\"", at), json.substring(at, at + 120));
        assertEquals(400, number(json, "observedFrequency", at), 19000.0 / 4096);
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
        Run r = run("sweep", "--input", wav.toString(), "--to", "6000", "--steps", "3", "--mode", "preview", "--stream");
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
        r = run("frobnicate");
        assertEquals(2, r.code());
        assertTrue(r.err().contains("frobnicate"), r.err());
    }

    @Test
    @DisplayName("modelled Butterworth chain and the spectral preview both run headless")
    void modelledAndPreview() throws IOException {
        Path wav = dir.resolve("two.wav");
        double[] a = sine(1 << 16, 48000, 1000, 0.4);
        double[] c = sine(1 << 16, 48000, 15000, 0.4);
        for (int i = 0; i < a.length; i++) {
            a[i] += c[i];
        }
        writeWav(wav, a, 48000f);
        for (String mode : new String[] {"modelled", "preview"}) {
            Run r = run("sweep", "--input", wav.toString(), "--to", "8000", "--steps", "4", "--mode", mode,
                    "--filter", "butterworth:4:3000", "--band", "0:2000", "--quiet");
            assertEquals(0, r.code(), mode + ": " + r.err());
            assertTrue(r.out().contains("\"band\":{\"low\":0.0,\"high\":2000.0"), r.out());
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
        int nFloor = floor.out().split("\\{\"id\":").length - 1;
        int nProm = prom.out().split("\\{\"id\":").length - 1;
        assertEquals(1, nFloor, floor.out().substring(0, Math.min(600, floor.out().length())));
        assertTrue(nProm > 10, "prominence alone finds the noise's own peaks: " + nProm);
        assertTrue(floor.out().contains("\"peakRule\":\"peaks stand 12.0 dB above"), floor.out().substring(0, 800));
        Run bad = run("sweep", "--input", raw.toString(), "--rate", "8000", "--rates", "4000", "--peak-margin", "-1");
        assertEquals(2, bad.code());
        assertTrue(bad.err().contains("--peak-margin"), bad.err());
    }
}
