package org.foldbook.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.SignalChain;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.persistence.NotebookStore;
import org.foldbook.model.persistence.RecordingFiles;
import org.foldbook.model.util.NotebookValidator;
import org.foldbook.model.validation.FindingKind;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo notebook as a user gets it: written to a folder, loaded back from the file, validated,
 * its recordings checked byte for byte and tone by tone. Check values are worked out by hand from
 * the sampling theorem (a tone at f sampled at fs appears at |f − k·fs|, Oppenheim and Schafer,
 * Discrete-Time Signal Processing, ch. 4), the Butterworth magnitude |H| = 1/√(1 + (f/fc)^(2n))
 * (any filter handbook), the RIFF/WAVE PCM header layout (Microsoft/IBM Multimedia Programming
 * Interface and Data Specifications 1.0, 1991) and SHA-256 from the JDK's MessageDigest (FIPS 180-4).
 */
class GearboxDemoTest {

    @TempDir
    Path folder;

    Path file;
    Notebook notebook;

    @BeforeEach
    void writeAndLoad() throws IOException {
        file = GearboxDemo.write(folder);
        notebook = NotebookStore.load(file); // a fresh resource set: only what is in the file
    }

    @Test
    @DisplayName("the notebook file loads back with its rig, five chains, three experiments, five channels")
    void loadsBack() {
        assertEquals(folder.toAbsolutePath().normalize().resolve("gearbox-stand.foldbook"), file);
        assertEquals(1, notebook.getRigs().size());
        assertEquals(List.of("CH-HZ", "CH-BZ", "CH-MIC", "CH-CAM", "CH-SURVEY"),
                notebook.getRigs().get(0).getChains().stream().map(SignalChain::getId).toList());
        assertEquals(3, notebook.getExperiments().size());
        assertEquals(5, notebook.getExperiments().stream().mapToInt(e -> e.getChannels().size()).sum());
        for (Experiment e : notebook.getExperiments()) {
            for (Channel c : e.getChannels()) {
                assertTrue(c.getChain() != null && !c.getChain().eIsProxy(), c.getName() + ": chain resolves");
                assertTrue(c.getRecording() != null && !c.getRecording().eIsProxy(), c.getName() + ": recording resolves");
            }
        }
        assertTrue(notebook.getTitle().contains("synthetic"), "the demo says it is synthetic: " + notebook.getTitle());
    }

    @Test
    @DisplayName("validation finds exactly the two intended problems: housing Z filtered but short of 80 dB, bearing Z bypassed")
    void validationFindsTheIntendedProblems() {
        List<Diagnostic> findings = findings(notebook);
        assertEquals(2, findings.size(), findings.toString());
        for (Diagnostic d : findings) {
            assertEquals(NotebookValidator.DIAGNOSTIC_SOURCE, d.getSource());
            assertEquals(Diagnostic.WARNING, d.getSeverity());
        }
        Diagnostic short_ = findings.get(0);
        assertEquals(FindingKind.PROTECTION_SHORT_OF_NEED, FindingKind.of(short_).orElseThrow());
        assertEquals("CH-HZ", ((SignalChain) short_.getData().get(0)).getId());
        // need 110 dB range − 30 dBFS = 80 dB; Butterworth 4 at 10 kHz gives 10·log10(1 + 1.28^8) = 9.1 dB at
        // fs/2 = 12.8 kHz (|H|² = 1/(1+(f/fc)^2n), hand-computed), margin 9.1 − 80 = −70.9 dB
        String m = short_.getMessage();
        for (String part : new String[] { "as little as 9.1 dB", "80.0 dB is needed", "110.0 dB dynamic range",
                "-30.0 dBFS out-of-band content", "protection margin -70.9 dB", "alias-free band none" }) {
            assertTrue(m.contains(part), "'" + part + "' in: " + m);
        }
        // 25.6 kHz is inside the front end's 32 kHz and folds onto 0 Hz (sampling theorem); keeping 0–10 kHz
        // alias-free needs fs − 32 kHz ≥ 10 kHz, i.e. 42 kS/s (worked by hand), under the digitizer's 51.2 kS/s
        assertEquals(List.of(25600.0, 0.0, 10000.0), frequenciesIn(m), m);
        assertTrue(m.contains("42.00 kS/s keeps 0 to 10.00 kHz alias-free"), m);
        assertTrue(m.contains("steeper filter or a lower cutoff, or sample faster"), m);

        Diagnostic bypassed = findings.get(1);
        assertEquals(FindingKind.UNPROTECTED_BAND_FOLDS, FindingKind.of(bypassed).orElseThrow());
        assertEquals("CH-BZ", ((SignalChain) bypassed.getData().get(0)).getId());
        // fs = 25.6 kS/s, front end to max(20 kHz, resonance 32 kHz) = 32 kHz ≥ fs, so the images cover
        // all of [0, fs/2] = [0, 12.8 kHz] (sampling theorem, worked by hand)
        // the message's frequencies, in order: front end upper, band from, band to, lands from, lands to, rate
        List<Double> hz = frequenciesIn(bypassed.getMessage());
        assertEquals(List.of(32000.0, 12800.0, 32000.0, 0.0, 12800.0, 25600.0), hz.subList(0, 6), bypassed.getMessage());
    }

    @Test
    @DisplayName("figures by hand: housing Z needs 80 dB and has 9.1 dB at 12.8 kHz, 15.6 dB at 15.6 kHz; bearing Z has none; the microphone is protected")
    void figuresMatchHandWorkedValues() {
        SignalChain housing = chain("CH-HZ");
        var need = ChainFigures.need(housing).orElseThrow();
        assertEquals(110, need.dynamicRangeDb(), 0);
        assertTrue(need.rangeStated() && need.levelStated());
        assertEquals(-30, need.outOfBandLevelDbfs(), 0);
        assertEquals(80, need.requiredDb(), 0);
        var f = ChainFigures.figures(housing).orElseThrow();
        // Butterworth |H|² = 1/(1+(f/fc)^2n), n = 4, fc = 10 kHz (any filter handbook), hand-computed:
        // 12.8 kHz: 10·log10(1 + 1.28^8) = 10·log10(8.20576) = 9.1412 dB
        assertEquals(9.1412, f.attenuationAtNyquistDb(), 1e-4);
        assertEquals(9.1412 - 80, f.marginDb(), 1e-4);
        assertEquals(0, f.aliasFreeBandHz(), 0);
        // 15.6 kHz (= 25.6 − 10 kHz, what folds onto the cutoff): 10·log10(1 + 1.56^8) = 10·log10(36.0749) = 15.572 dB
        assertEquals(15.572, ChainFigures.chainResponse(housing).attenuationDb(15_600), 1e-3);
        // 32 kHz resonance: 10·log10(1 + 3.2^8) = 10·log10(10996.1) = 40.412 dB, still 40 dB short of 80
        assertEquals(40.412, ChainFigures.chainResponse(housing).attenuationDb(32_000), 1e-3);
        var lowest = ChainFigures.lowestAliasFreeRate(housing, 10_000).orElseThrow();
        assertTrue(lowest.found());
        assertEquals(42_000, lowest.rateHz(), 42_000 * 1e-6); // fs − 32 kHz = 10 kHz, by hand
        assertTrue(lowest.rateHz() >= 42_000 - 1e-9, "the verified end is at or above the boundary");

        var bearing = ChainFigures.figures(chain("CH-BZ")).orElseThrow();
        assertEquals(80, bearing.requiredAttenuationDb(), 0);
        assertEquals(-80, bearing.marginDb(), 0); // no filter: |H| = 1, margin 0 − 80 dB
        assertEquals(0, bearing.aliasFreeBandHz(), 0);

        SignalChain sound = chain("CH-MIC");
        var micNeed = ChainFigures.need(sound).orElseThrow();
        assertEquals(105, micNeed.requiredDb(), 0); // 105 dB range + 0 dBFS, the worst case (no level stated)
        assertTrue(micNeed.rangeStated() && !micNeed.levelStated());
        var mic = ChainFigures.figures(sound).orElseThrow();
        assertEquals(Double.POSITIVE_INFINITY, mic.marginDb()); // microphone to 20 kHz < fs/2 = 24 kHz
        assertEquals(24_000, mic.aliasFreeBandHz(), 0);
    }

    @Test
    @DisplayName("every logged size and SHA-256 matches its file; a changed byte is found")
    void checksumsMatchTheFiles() throws Exception {
        List<Recording> recordings = recordings(notebook);
        assertEquals(4, recordings.size());
        for (Recording r : recordings) {
            Path data = RecordingFiles.resolve(r);
            byte[] bytes = Files.readAllBytes(data);
            assertEquals(bytes.length, r.getSizeBytes(), r.getPath());
            String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(bytes)); // FIPS 180-4
            assertEquals(sha, r.getSha256(), r.getPath());
        }
        Path vibration = RecordingFiles.resolve(recordings.get(0));
        byte[] bytes = Files.readAllBytes(vibration);
        bytes[bytes.length - 1] ^= 1;
        Files.write(vibration, bytes);
        assertTrue(findings(notebook).stream().anyMatch(d -> FindingKind.of(d).orElse(null) == FindingKind.RECORDING_CHECKSUM_CHANGED),
                "a flipped bit must be reported");
    }

    @Test
    @DisplayName("writing twice gives the same bytes (fixed seeds)")
    void deterministic(@TempDir Path other) throws IOException {
        Notebook second = NotebookStore.load(GearboxDemo.write(other));
        assertEquals(recordings(notebook).stream().map(Recording::getSha256).toList(),
                recordings(second).stream().map(Recording::getSha256).toList());
    }

    @Test
    @DisplayName("WAV headers follow the RIFF/WAVE PCM layout; recordings last 2 s")
    void wavHeaders() throws IOException {
        // id, channels, rate, bits
        Object[][] expected = { { "REC-VIB", 2, 25600, 24 }, { "REC-MIC", 1, 48000, 24 }, { "REC-CAM", 1, 1000, 16 } };
        List<Recording> recordings = recordings(notebook);
        for (int i = 0; i < expected.length; i++) {
            Recording r = recordings.get(i);
            assertEquals(expected[i][0], r.getId());
            ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(RecordingFiles.resolve(r))).order(ByteOrder.LITTLE_ENDIAN);
            int channels = (int) expected[i][1];
            int rate = (int) expected[i][2];
            int bits = (int) expected[i][3];
            assertEquals("RIFF", tag(b, 0));
            assertEquals(b.capacity() - 8, b.getInt(4));
            assertEquals("WAVE", tag(b, 8));
            assertEquals("fmt ", tag(b, 12));
            assertEquals(16, b.getInt(16));
            assertEquals(1, b.getShort(20)); // WAVE_FORMAT_PCM
            assertEquals(channels, b.getShort(22));
            assertEquals(rate, b.getInt(24));
            assertEquals(rate * channels * bits / 8, b.getInt(28)); // byte rate
            assertEquals(channels * bits / 8, b.getShort(32)); // block align
            assertEquals(bits, b.getShort(34));
            assertEquals("data", tag(b, 36));
            assertEquals(2 * rate * channels * bits / 8, b.getInt(40)); // 2 s of frames
            assertEquals(b.capacity(), 44 + b.getInt(40));
            assertEquals(channels, r.getChannelCount());
            assertEquals(rate, r.getDeclaredRateHz());
        }
    }

    @Test
    @DisplayName("vibration tones: mesh passes, the filtered −30 dBFS resonance image is 40.4 dB down, the bypassed one is not")
    void vibrationTonesFoldWhereTheTheoremSays() throws IOException {
        Recording vibration = recordings(notebook).get(0);
        double[][] x = decode(RecordingFiles.resolve(vibration));
        double fs = 25600;
        // mesh 37 × 24.5 Hz = 906.5 Hz; Butterworth n=4, fc=10 kHz: |H| = 1/√(1+0.09065^8) ≈ 1 − 2e-9
        assertEquals(0.30, amplitude(x[0], 906.5, fs), 1e-3);
        assertEquals(0.30, amplitude(x[1], 906.5, fs), 1e-3);
        // 32 kHz resonance at 25.6 kS/s appears at 32 − 25.6 = 6.4 kHz (sampling theorem);
        // −30 dBFS = 10^(−1.5) = 0.031623 of full scale; filtered: 0.031623/√(1+3.2^8) = 0.031623/104.86
        // = 3.016e-4 (Butterworth magnitude, hand-computed; the tolerance covers the 0.002 RMS noise)
        assertEquals(3.016e-4, amplitude(x[0], 6400, fs), 0.1 * 3.016e-4);
        assertEquals(0.031623, amplitude(x[1], 6400, fs), 1e-3);
        // 17th mesh harmonic 15 410.5 Hz appears at 25 600 − 15 410.5 = 10 189.5 Hz;
        // filtered: 0.02/√(1+1.54105^8) = 0.02/5.728 = 3.492e-3
        assertEquals(3.492e-3, amplitude(x[0], 10189.5, fs), 0.03 * 3.492e-3);
        assertEquals(0.02, amplitude(x[1], 10189.5, fs), 1e-3);
        // nothing at the true frequency's own bin below Nyquist other than noise
        assertTrue(amplitude(x[1], 7000, fs) < 1e-4);
    }

    @Test
    @DisplayName("microphone: the delta-sigma filter removes the 30 kHz hiss that would appear at 18 kHz")
    void deltaSigmaFilterRemovesTheUltrasound() throws IOException {
        double[][] x = decode(RecordingFiles.resolve(recordings(notebook).get(1)));
        assertEquals(0.20, amplitude(x[0], 906.5, 48000), 1e-3);
        // 30 kHz at 48 kS/s would appear at 48 − 30 = 18 kHz; 100 dB down it is 1e-6, below the noise
        assertTrue(amplitude(x[0], 18000, 48000) < 1e-4, "18 kHz image: " + amplitude(x[0], 18000, 48000));
    }

    @Test
    @DisplayName("the JDK's javax.sound.sampled WAV reader reads every demo recording: format, length, samples")
    void jdkAudioSystemReadsTheRecordings() throws Exception {
        // an outside decoder: the JDK's WaveFileReader parses the RIFF header and finds the data chunk
        Object[][] expected = { { "REC-VIB", 2, 25600, 24 }, { "REC-MIC", 1, 48000, 24 }, { "REC-CAM", 1, 1000, 16 } };
        List<Recording> recordings = recordings(notebook);
        for (int i = 0; i < expected.length; i++) {
            Path wav = RecordingFiles.resolve(recordings.get(i));
            try (javax.sound.sampled.AudioInputStream in = javax.sound.sampled.AudioSystem.getAudioInputStream(wav.toFile())) {
                javax.sound.sampled.AudioFormat format = in.getFormat();
                assertEquals(javax.sound.sampled.AudioFormat.Encoding.PCM_SIGNED, format.getEncoding(), wav.toString());
                assertEquals(expected[i][1], format.getChannels());
                assertEquals((int) expected[i][2], format.getSampleRate(), 0);
                assertEquals(expected[i][3], format.getSampleSizeInBits());
                assertTrue(!format.isBigEndian());
                assertEquals(2L * (int) expected[i][2], in.getFrameLength()); // 2 s
                byte[] pcm = in.readAllBytes();
                assertEquals(in.getFrameLength() * format.getFrameSize(), pcm.length);
                if (i == 0) {
                    double[][] x = samples(pcm, format.getChannels(), format.getSampleSizeInBits());
                    // the mesh tone at 906.5 Hz, 0.30 of full scale, in both channels (the demo's scenario)
                    assertEquals(0.30, amplitude(x[0], 906.5, 25600), 1e-3);
                    assertEquals(0.30, amplitude(x[1], 906.5, 25600), 1e-3);
                    assertEquals(0.031623, amplitude(x[1], 6400, 25600), 1e-3); // bypassed −30 dBFS resonance image
                }
            }
        }
    }

    @Test
    @DisplayName("the WAV writer names a bad parameter")
    void writerRejectsBadInput(@TempDir Path tmp) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PcmWavWriter.write(tmp.resolve("x.wav"), 1000, 20, new double[][] { { 0 } }));
        assertTrue(e.getMessage().contains("bits") && e.getMessage().contains("20"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class,
                () -> PcmWavWriter.write(tmp.resolve("x.wav"), 1000, 16, new double[][] { { 0, 1 }, { 0 } }));
        assertTrue(e.getMessage().contains("channels[1]"), e.getMessage());
        // clipping to the largest codes of a 16-bit word: 32767 and −32768
        assertEquals(32767, PcmWavWriter.code(1.5, 32767));
        assertEquals(-32768, PcmWavWriter.code(-1.5, 32767));
    }

    /** Every "number Hz" or "number kHz" of a message, in Hz, in order. */
    private static List<Double> frequenciesIn(String message) {
        List<Double> out = new ArrayList<>();
        var m = java.util.regex.Pattern.compile("(\\d+(?:\\.\\d+)?)\\s*(k?)Hz").matcher(message);
        while (m.find()) {
            out.add(Math.round(Double.parseDouble(m.group(1)) * (m.group(2).isEmpty() ? 1 : 1000) * 1e3) / 1e3);
        }
        return out;
    }

    /** Amplitude of the tone at {@code hz}, from the DFT bin of the whole record (the tones sit on bins). */
    private static double amplitude(double[] x, double hz, double fs) {
        double k = hz * x.length / fs;
        assertEquals(Math.rint(k), k, 1e-9, hz + " Hz is not on a DFT bin");
        double re = 0;
        double im = 0;
        for (int n = 0; n < x.length; n++) {
            double phase = 2 * Math.PI * ((long) k * (long) n % x.length) / x.length;
            re += x[n] * Math.cos(phase);
            im -= x[n] * Math.sin(phase);
        }
        return 2 * Math.hypot(re, im) / x.length;
    }

    /** Little-endian signed PCM samples as full-scale fractions (code / (2^(bits−1) − 1)). */
    private static double[][] decode(Path wav) throws IOException {
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(wav)).order(ByteOrder.LITTLE_ENDIAN);
        int channels = b.getShort(22);
        int bits = b.getShort(34);
        byte[] pcm = new byte[b.getInt(40)];
        b.get(44, pcm);
        return samples(pcm, channels, bits);
    }

    /** Interleaved little-endian signed PCM as full-scale fractions per channel. */
    private static double[][] samples(byte[] pcm, int channels, int bits) {
        ByteBuffer b = ByteBuffer.wrap(pcm);
        int bytes = bits / 8;
        int frames = pcm.length / (channels * bytes);
        double full = (1 << (bits - 1)) - 1;
        double[][] out = new double[channels][frames];
        int at = 0;
        for (int n = 0; n < frames; n++) {
            for (int c = 0; c < channels; c++) {
                int v = 0;
                for (int i = 0; i < bytes; i++) {
                    v |= (b.get(at++) & 0xFF) << (8 * i);
                }
                v = (v << (32 - bits)) >> (32 - bits); // sign-extend
                out[c][n] = v / full;
            }
        }
        return out;
    }

    private static String tag(ByteBuffer b, int at) {
        byte[] t = new byte[4];
        b.get(at, t);
        return new String(t, StandardCharsets.US_ASCII);
    }

    private SignalChain chain(String id) {
        return notebook.getRigs().get(0).getChains().stream().filter(c -> id.equals(c.getId())).findFirst().orElseThrow();
    }

    private static List<Recording> recordings(Notebook notebook) {
        List<Recording> all = new ArrayList<>();
        notebook.getExperiments().forEach(e -> all.addAll(e.getRecordings()));
        return all;
    }

    private static List<Diagnostic> findings(Notebook notebook) {
        List<Diagnostic> all = new ArrayList<>();
        collect(Diagnostician.INSTANCE.validate(notebook), all);
        return all;
    }

    private static void collect(Diagnostic diagnostic, List<Diagnostic> into) {
        for (Diagnostic child : diagnostic.getChildren()) {
            into.add(child);
            collect(child, into);
        }
    }

    @Test
    @DisplayName("survey: where its components land at the everyday 25.6 kS/s, and what LP-A takes off them")
    void surveyScenarioFigures() {
        // fold formula |f − k·fs|, k = round(f/fs) (Oppenheim & Schafer ch. 4), worked by hand
        assertEquals(3500, org.foldbook.dsp.fold.Folding.apparentHz(SurveyScenario.BEARING_HZ, 25600), 1e-9);
        assertEquals(8800, org.foldbook.dsp.fold.Folding.apparentHz(SurveyScenario.INVERTER_HZ, 25600), 1e-9);
        assertEquals(2 * GearboxDemo.MESH_HZ, org.foldbook.dsp.fold.Folding.apparentHz(SurveyScenario.MERGING_HZ, 25600), 1e-9);
        assertEquals(6400, org.foldbook.dsp.fold.Folding.apparentHz(GearboxDemo.RESONANCE_HZ, 25600), 1e-9);
        // LP-A (Butterworth 4 at 10 kHz): 10·log10(1 + (f/fc)^8), the closed form
        SignalChain everyday = notebook.getRigs().get(0).getChains().get(0);
        org.foldbook.dsp.filter.FrequencyResponse lpA = ChainFigures.chainResponse(everyday);
        assertEquals(27.6, lpA.attenuationDb(SurveyScenario.BEARING_HZ), 0.05);
        assertEquals(62.3, lpA.attenuationDb(SurveyScenario.INVERTER_HZ), 0.05);
        org.foldbook.model.Channel survey = notebook.getExperiments().get(2).getChannels().get(0);
        assertEquals(everyday, survey.getSweepPlan().getThroughChain());
        assertEquals(204800, survey.getRecording().getDeclaredRateHz(), 0);
    }
}
