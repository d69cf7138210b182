package org.foldbook.model.validation;

import static org.foldbook.model.SyntheticNotebooks.day;
import static org.foldbook.model.SyntheticNotebooks.vibrationChain;
import static org.foldbook.model.SyntheticNotebooks.videoChain;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.ecore.util.Diagnostician;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Camera;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.Experiment;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Notebook;
import org.foldbook.model.Recording;
import org.foldbook.model.Rig;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.SyntheticNotebooks;
import org.foldbook.model.persistence.NotebookStore;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each rule of the notebook, firing and not firing, through EMF's Diagnostician (so the generated
 * validator's delegation is exercised, not only the rule classes). The synthetic bench notebook is
 * valid; each test breaks one thing.
 */
class NotebookRulesTest {

    @TempDir
    Path folder;

    Notebook notebook;
    Recording recording;

    @BeforeEach
    void saveValidBench() throws IOException {
        notebook = SyntheticNotebooks.bench();
        recording = notebook.getExperiments().get(0).getRecordings().get(0);
        Path data = folder.resolve("data/run1.wav");
        Files.createDirectories(data.getParent());
        Files.write(data, new byte[0]); // its logged SHA-256 is that of the empty message
        recording.setSizeBytes(0L); // size unknown: only the checksum is compared
        NotebookStore.save(notebook, folder.resolve("bench.foldbook"));
    }

    /** Every finding of the whole notebook, as (code, severity, message). */
    private List<Diagnostic> findings() {
        Diagnostic root = Diagnostician.INSTANCE.validate(notebook);
        List<Diagnostic> all = new ArrayList<>();
        collect(root, all);
        return all;
    }

    private static void collect(Diagnostic diagnostic, List<Diagnostic> into) {
        for (Diagnostic child : diagnostic.getChildren()) {
            into.add(child);
            collect(child, into);
        }
    }

    private List<Diagnostic> withCode(FindingKind kind) {
        return findings().stream().filter(d -> FindingKind.of(d).orElse(null) == kind).toList();
    }

    private Diagnostic single(FindingKind kind) {
        List<Diagnostic> found = withCode(kind);
        assertEquals(1, found.size(), () -> "expected one finding " + kind + ", got " + findings());
        return found.get(0);
    }

    @Test
    @DisplayName("the synthetic bench notebook is valid: no finding at all")
    void benchIsClean() {
        assertEquals(List.of(), findings().stream().map(Diagnostic::getMessage).toList());
    }

    @Test
    @DisplayName("rate ≤ 0: recording, digitizer, camera, stage, sweep plan each reported, naming the object")
    void ratesMustBePositive() {
        recording.setDeclaredRateHz(0);
        ((Digitizer) notebook.getDevices().get(3)).setMaxRateHz(-1);
        ((Camera) notebook.getDevices().get(4)).getFrameRatesHz().add(0.0);
        vibrationChain(notebook).getStages().get(3).setRateHz(-20000.0);
        notebook.getExperiments().get(0).getChannels().get(0).getSweepPlan().setMinRateHz(0);
        List<String> messages = withCode(FindingKind.RATE_NOT_POSITIVE).stream().map(Diagnostic::getMessage).toList();
        assertEquals(5, messages.size(), messages::toString);
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("recording 'data/run1.wav'")), messages::toString);
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("digitizer 'ADC-1'")), messages::toString);
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("camera 'CAM-1'")), messages::toString);
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("stage 4 [digitizer 'ADC-1'")), messages::toString);
        assertTrue(messages.stream().anyMatch(m -> m.startsWith("sweep plan of channel 'plate Z'")), messages::toString);
        assertTrue(messages.stream().allMatch(m -> m.contains("Enter") || m.contains("Give") || m.contains("Remove")),
                messages::toString);
    }

    @Test
    @DisplayName("cutoff at Nyquist fires: 10 kHz cutoff at 20 kS/s (Nyquist = fs/2, Oppenheim & Schafer ch. 4); 9.99 kHz does not")
    void cutoffAtNyquist() {
        Stage filter = vibrationChain(notebook).getStages().get(2);
        filter.setCutoffHz(9990.0);
        assertEquals(List.of(), withCode(FindingKind.CUTOFF_AT_OR_ABOVE_NYQUIST));
        filter.setCutoffHz(10000.0);
        Diagnostic finding = single(FindingKind.CUTOFF_AT_OR_ABOVE_NYQUIST);
        assertEquals(Diagnostic.ERROR, finding.getSeverity());
        assertTrue(finding.getMessage().startsWith("chain 'vibration Z' of rig 'bench A'"), finding.getMessage());
        assertTrue(finding.getMessage().contains("cutoff 10.00 kHz is at or above the Nyquist frequency 10.00 kHz"),
                finding.getMessage());
        // the stage setting wins over the device's own cutoff; unset, the device's applies
        filter.setCutoffHz(null);
        ((AntiAliasFilter) filter.getDevice()).setCutoffHz(12000.0);
        single(FindingKind.CUTOFF_AT_OR_ABOVE_NYQUIST);
    }

    @Test
    @DisplayName("no filter, sensor flat to 40 kHz at 20 kS/s: warns that 10–40 kHz folds into 0–10 kHz (docs/REFERENCES.md, common practice)")
    void unprotectedSensorBand() {
        SignalChain chain = vibrationChain(notebook);
        Sensor sensor = (Sensor) chain.getStages().get(0).getDevice();
        sensor.setUsableMaxHz(40000.0);
        sensor.setResonanceHz(null);
        // with the Butterworth in the chain: protected, no warning
        assertEquals(List.of(), withCode(FindingKind.UNPROTECTED_BAND_FOLDS));
        chain.getStages().remove(2);
        Diagnostic finding = single(FindingKind.UNPROTECTED_BAND_FOLDS);
        assertEquals(Diagnostic.WARNING, finding.getSeverity());
        assertTrue(finding.getMessage().contains("from 10.00 kHz to 40.00 kHz will fold into 0.000 Hz to 10.00 kHz"),
                finding.getMessage());
        assertTrue(finding.getMessage().contains("Add a low-pass filter"), finding.getMessage());
    }

    @Test
    @DisplayName("resonance at 15 kHz, 20 kS/s, no filter: band 10–15 kHz lands in 5–10 kHz (fold |f − fs|, Oppenheim & Schafer ch. 4)")
    void partialFoldBand() {
        SignalChain chain = vibrationChain(notebook);
        chain.getStages().remove(2);
        Sensor sensor = (Sensor) chain.getStages().get(0).getDevice();
        assertEquals(List.of(), withCode(FindingKind.UNPROTECTED_BAND_FOLDS), "resonance 9 kHz is below Nyquist");
        sensor.setResonanceHz(15000.0);
        assertTrue(single(FindingKind.UNPROTECTED_BAND_FOLDS).getMessage().contains("into 5.000 kHz to 10.00 kHz"));
        // an amplifier rolling off at 9.5 kHz bounds what reaches the digitizer: no warning
        ((org.foldbook.model.Amplifier) chain.getStages().get(1).getDevice()).setBandwidthHighHz(9500.0);
        assertEquals(List.of(), withCode(FindingKind.UNPROTECTED_BAND_FOLDS));
    }

    @Test
    @DisplayName("a delta-sigma digitizer's built-in filter counts as protection; family NONE does not")
    void builtInFilterProtects() {
        SignalChain chain = vibrationChain(notebook);
        ((Sensor) chain.getStages().get(0).getDevice()).setUsableMaxHz(40000.0);
        ((AntiAliasFilter) chain.getStages().get(2).getDevice()).setFamily(FilterFamily.NONE);
        single(FindingKind.UNPROTECTED_BAND_FOLDS);
        ((Digitizer) chain.getStages().get(3).getDevice()).setDigitalFilter(true);
        assertEquals(List.of(), withCode(FindingKind.UNPROTECTED_BAND_FOLDS));
    }

    @Test
    @DisplayName("filtered but short of the need: 100 dB range − 40 dBFS = 60 dB, Butterworth 4 at 4 kHz gives 31.8 dB at 10 kHz; names 26.50 kS/s")
    void protectionShortOfNeed() {
        SignalChain chain = vibrationChain(notebook);
        Sensor sensor = (Sensor) chain.getStages().get(0).getDevice();
        Digitizer digitizer = (Digitizer) chain.getStages().get(3).getDevice();
        sensor.setUsableMaxHz(40000.0);
        sensor.setResonanceHz(null);
        digitizer.setDynamicRangeDb(100.0);
        // no out-of-band level stated: the table shows the worst case, the rule stays quiet
        assertEquals(List.of(), withCode(FindingKind.PROTECTION_SHORT_OF_NEED));
        chain.setOutOfBandLevelDbfs(-40.0);
        Diagnostic finding = single(FindingKind.PROTECTION_SHORT_OF_NEED);
        assertEquals(Diagnostic.WARNING, finding.getSeverity());
        String m = finding.getMessage();
        // Butterworth |H|² = 1/(1+(f/fc)^2n): 10·log10(1 + 2.5^8) = 31.84 dB at 10 kHz; margin 31.84 − 60 = −28.2 dB
        assertTrue(m.contains("as little as 31.8 dB where 60.0 dB is needed (100.0 dB dynamic range + -40.0 dBFS out-of-band content)"), m);
        assertTrue(m.contains("protection margin -28.2 dB"), m);
        // 60 dB is reached at 4 kHz·(10^6 − 1)^(1/8) = 22.494 kHz; 0–4 kHz stays clean once fs − 22.494 kHz ≥ 4 kHz,
        // i.e. fs ≥ 26.494 kS/s (hand-worked), rounded up to 26.50 kS/s
        assertTrue(m.contains("26.50 kS/s keeps 0 to 4.000 kHz alias-free"), m);
        // with enough attenuation (content at −80 dBFS needs 20 dB only) the rule is quiet
        chain.setOutOfBandLevelDbfs(-80.0);
        assertEquals(List.of(), withCode(FindingKind.PROTECTION_SHORT_OF_NEED));
        // an unfiltered chain is the other rule's business
        chain.setOutOfBandLevelDbfs(-40.0);
        chain.getStages().remove(2);
        assertEquals(List.of(), withCode(FindingKind.PROTECTION_SHORT_OF_NEED));
        single(FindingKind.UNPROTECTED_BAND_FOLDS);
    }

    @Test
    @DisplayName("no rate up to the digitizer's maximum helps a filter whose cutoff is too high for the need")
    void protectionShortOfNeedWithoutARate() {
        SignalChain chain = vibrationChain(notebook);
        Sensor sensor = (Sensor) chain.getStages().get(0).getDevice();
        sensor.setUsableMaxHz(200000.0);
        sensor.setResonanceHz(null);
        chain.setOutOfBandLevelDbfs(0.0);
        // 146 dB (ideal 24-bit) at 0 dBFS: Butterworth 4 at 4 kHz reaches it only near 4 kHz·10^(146.26/80) = 270 kHz,
        // beyond the sensor's 200 kHz: every rate up to 51.2 kS/s leaves 200 kHz content folding under-attenuated
        String m = single(FindingKind.PROTECTION_SHORT_OF_NEED).getMessage();
        assertTrue(m.contains("ideal 24-bit SNR") && m.contains("no rate up to the digitizer's 51.20 kS/s"), m);
    }

    @Test
    @DisplayName("a chain without digitizer or camera is an error")
    void chainMustSample() {
        SignalChain chain = vibrationChain(notebook);
        chain.getStages().remove(3);
        Diagnostic finding = single(FindingKind.NO_SAMPLING_STAGE);
        assertTrue(finding.getMessage().startsWith("chain 'vibration Z'"), finding.getMessage());
        assertTrue(finding.getMessage().contains("Add the digitizer or camera"), finding.getMessage());
    }

    @Test
    @DisplayName("channel index must lie in 0..channelCount−1")
    void indexInsideRecording() {
        Channel channel = notebook.getExperiments().get(0).getChannels().get(0);
        channel.setChannelIndex(2);
        Diagnostic finding = single(FindingKind.INDEX_OUTSIDE_RECORDING);
        assertTrue(finding.getMessage().startsWith("channel 'plate Z' of experiment 'run 1'"), finding.getMessage());
        assertTrue(finding.getMessage().contains("indices 0 to 1"), finding.getMessage());
        channel.setChannelIndex(-1);
        single(FindingKind.INDEX_OUTSIDE_RECORDING);
        channel.setChannelIndex(0);
        assertEquals(List.of(), withCode(FindingKind.INDEX_OUTSIDE_RECORDING));
    }

    @Test
    @DisplayName("recording file missing, or its content no longer matching the logged SHA-256, is an error")
    void recordingFile() throws IOException {
        Path data = folder.resolve("data/run1.wav");
        Files.write(data, "abc".getBytes(StandardCharsets.US_ASCII));
        recording.setSizeBytes(0L);
        Diagnostic changed = single(FindingKind.RECORDING_CHECKSUM_CHANGED);
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        assertTrue(changed.getMessage().contains("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"),
                changed.getMessage());
        assertTrue(changed.getMessage().contains("Restore the original"), changed.getMessage());
        // a logged size that differs is reported without hashing
        recording.setSizeBytes(44L);
        assertTrue(single(FindingKind.RECORDING_CHECKSUM_CHANGED).getMessage().contains("is now 3 bytes, but 44 bytes"));
        recording.setSizeBytes(3L);
        assertTrue(single(FindingKind.RECORDING_CHECKSUM_CHANGED).getMessage().contains("SHA-256 now"));
        Files.delete(data);
        Diagnostic missing = single(FindingKind.RECORDING_FILE_MISSING);
        assertTrue(missing.getMessage().contains(data.toString()), missing.getMessage());
        Files.write(data, new byte[0]);
        recording.setSizeBytes(0L);
        assertEquals(List.of(), withCode(FindingKind.RECORDING_FILE_MISSING));
        assertEquals(List.of(), withCode(FindingKind.RECORDING_CHECKSUM_CHANGED));
    }

    @Test
    @DisplayName("camera exposure longer than the frame period: 10 ms at 120 frames/s (period 8.333 ms) fires, 8 ms does not")
    void exposureVersusFramePeriod() {
        Stage frames = videoChain(notebook).getStages().get(0);
        frames.setExposureS(0.008);
        assertEquals(List.of(), withCode(FindingKind.EXPOSURE_LONGER_THAN_FRAME));
        frames.setExposureS(0.010);
        Diagnostic finding = single(FindingKind.EXPOSURE_LONGER_THAN_FRAME);
        assertTrue(finding.getMessage().contains("frame period 8.333 ms"), finding.getMessage());
        assertTrue(finding.getMessage().contains("lower the frame rate to at most 100.0 Hz"), finding.getMessage());
    }

    @Test
    @DisplayName("channel unit must match the sensor's (spacing and superscripts aside)")
    void unitsMatch() {
        Channel channel = notebook.getExperiments().get(0).getChannels().get(0);
        channel.setUnit("m/s\u00B2");
        assertEquals(List.of(), withCode(FindingKind.UNIT_MISMATCH));
        channel.setUnit("g");
        Diagnostic finding = single(FindingKind.UNIT_MISMATCH);
        assertTrue(finding.getMessage().contains("unit 'g' differs from 'm/s^2' measured by sensor 'ACC-1'"),
                finding.getMessage());
    }

    @Test
    @DisplayName("rig used outside its validity dates (inclusive ends) is an error")
    void rigValidity() {
        Experiment experiment = notebook.getExperiments().get(0);
        Rig rig = experiment.getRig();
        experiment.setDate(day(2026, 12, 31));
        assertEquals(List.of(), withCode(FindingKind.RIG_OUTSIDE_VALIDITY), "last valid day is inside");
        experiment.setDate(day(2027, 1, 1));
        Diagnostic finding = single(FindingKind.RIG_OUTSIDE_VALIDITY);
        assertTrue(finding.getMessage().contains("dated 2027-01-01, but rig 'bench A' is valid only from 2026-01-01 to 2026-12-31"),
                finding.getMessage());
        rig.setValidUntil(null);
        assertEquals(List.of(), withCode(FindingKind.RIG_OUTSIDE_VALIDITY), "open-ended rig");
        experiment.setDate(day(2025, 12, 31));
        single(FindingKind.RIG_OUTSIDE_VALIDITY);
        rig.setValidUntil(day(2025, 6, 1));
        single(FindingKind.RIG_VALIDITY_REVERSED);
    }

    @Test
    @DisplayName("an unsaved notebook's recording cannot be checked: a warning that says to save")
    void unsavedNotebook() {
        Notebook fresh = SyntheticNotebooks.bench();
        notebook = fresh;
        Diagnostic finding = single(FindingKind.RECORDING_NOT_CHECKABLE);
        assertEquals(Diagnostic.WARNING, finding.getSeverity());
        assertTrue(finding.getMessage().contains("Save the notebook"), finding.getMessage());
        assertEquals(1, findings().size(), () -> findings().toString());
    }
}
