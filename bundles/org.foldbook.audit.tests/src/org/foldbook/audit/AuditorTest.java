package org.foldbook.audit;

import static org.foldbook.audit.SyntheticRig.find;
import static org.foldbook.audit.SyntheticRig.of;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.Date;
import java.util.List;
import java.util.Random;

import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.SignalChain;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The audit on synthetic recordings whose truth is known by construction. */
class AuditorTest {
    static final LocalDate DAY = LocalDate.of(2025, 3, 1);

    @TempDir
    Path dir;

    /** Dither at about −86 dBFS RMS (seeded), so the quantiser's error is noise, not spurs. */
    static double dither(Random r) {
        return 5e-5 * r.nextGaussian();
    }

    private ChannelAudit only(Notebook nb, String name) {
        return new Auditor(AuditPolicy.DEFAULT).audit(find(nb, name), AuditProgress.NONE);
    }

    private PeakAssessment peakNear(ChannelAudit a, double hz) {
        return a.peaks().stream().filter(p -> Math.abs(p.frequencyHz() - hz) < 5).findFirst()
                .orElseThrow(() -> new AssertionError("no peak near " + hz + " Hz in " + a.peaks()));
    }

    @Test
    void toneAboveNyquistWithoutFilterIsProbablyFoldedWhereTheFoldFormulaPutsIt() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 20_000);
        SignalChain bare = rig.chain("BARE", 10_000, 0, 0);
        SignalChain survey = rig.chain("WIDE", 48_000, 0, 0);
        Random r = new Random(1);
        double tone = 7_000;
        rig.channel("low", bare, 10_000, 32_768, DAY,
                n -> 0.5 * Math.sin(2 * Math.PI * tone * n / 10_000) + dither(r));
        rig.channel("high", survey, 48_000, 65_536, DAY,
                n -> 0.5 * Math.sin(2 * Math.PI * tone * n / 48_000) + dither(r));
        ChannelAudit a = only(rig.saved(), "low");
        // fold formula |f − round(f/fs)·fs| (Oppenheim and Schafer ch. 4): |7000 − 10000| = 3000 Hz
        PeakAssessment p = peakNear(a, 3_000);
        assertEquals(PeakVerdict.PROBABLY_FOLDED, p.verdict(), p.reasoning());
        assertTrue(p.candidates().stream().anyMatch(c -> c.folded() && Math.abs(c.trueHz() - 7_000) < 5));
        // −6.02 dBFS: a 0.5 full-scale sine (20·log10 0.5), within the Hann scalloping-corrected estimate
        assertEquals(20 * Math.log10(0.5), p.levelDb(), 0.3);
        assertFalse(of(a, AuditKind.UNPROTECTED_BAND).isEmpty());
        assertTrue(a.reference().isPresent());
        assertTrue(a.dataNoise().isPresent());
    }

    @Test
    void withoutAHigherRateRecordingTheSameToneCouldBeFolded() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 20_000);
        SignalChain bare = rig.chain("BARE", 10_000, 0, 0);
        Random r = new Random(2);
        rig.channel("low", bare, 10_000, 32_768, DAY, n -> 0.5 * Math.sin(2 * Math.PI * 7_000 * n / 10_000) + dither(r));
        PeakAssessment p = peakNear(only(rig.saved(), "low"), 3_000);
        assertEquals(PeakVerdict.COULD_BE_FOLDED, p.verdict(), p.reasoning());
        // candidates k·fs ± 3000 up to 20 kHz: 3000, 7000, 13000, 17000
        assertEquals(List.of(3_000.0, 7_000.0, 13_000.0, 17_000.0),
                p.candidates().stream().map(c -> (double) Math.round(c.trueHz() / 10) * 10).toList());
    }

    @Test
    void aProperChainIsTrustworthyAndItsAttenuationAtNyquistIsTheButterworthClosedForm() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        Random r = new Random(3);
        rig.channel("good", good, 8_000, 32_768, DAY, n -> 0.5 * Math.sin(2 * Math.PI * 500 * n / 8_000) + dither(r));
        ChannelAudit a = only(rig.saved(), "good");
        assertEquals(PeakVerdict.TRUSTWORTHY, peakNear(a, 500).verdict());
        Finding band = of(a, AuditKind.ALIAS_FREE_BAND).get(0);
        // Butterworth |H|² = 1/(1+(f/fc)^2n): at 4 kHz, n = 4, fc = 1 kHz: 10·log10(1 + 4^8) = 48.165 dB
        assertEquals(10 * Math.log10(1 + Math.pow(4, 8)), band.value("attenuationAtNyquistDb"), 1e-6);
        assertTrue(of(a, AuditKind.UNPROTECTED_BAND).isEmpty());
        assertTrue(of(a, AuditKind.SUSPECT_PEAK).isEmpty());
        assertTrue(of(a, AuditKind.CLIPPING).isEmpty());
        assertTrue(of(a, AuditKind.CHECKSUM_CHANGED).isEmpty());
    }

    @Test
    void clippingDcDropoutAndRangeUseAreCountedRight() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        Random r = new Random(4);
        // by construction: 50 samples at +full scale from 1000, 20 at −full scale from 5000 → 70 at the rails
        rig.channel("clip", good, 8_000, 16_384, DAY, n -> n >= 1000 && n < 1050 ? 1.0
                : n >= 5000 && n < 5020 ? -1.0 : 0.3 * Math.sin(2 * Math.PI * 500 * n / 8_000));
        rig.channel("dc", good, 8_000, 16_384, DAY, n -> 0.1 + 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000) + dither(r));
        rig.channel("drop", good, 8_000, 16_384, DAY, n -> n >= 2000 && n < 2500 ? 0.0
                : 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000) + dither(r));
        rig.channel("small", good, 8_000, 16_384, DAY, n -> Math.sin(2 * Math.PI * 500 * n / 8_000) / 16);
        Notebook nb = rig.saved();

        Finding clip = of(only(nb, "clip"), AuditKind.CLIPPING).get(0);
        assertEquals(70, clip.value("clippedSamples"));
        assertEquals(50, clip.value("longestRun"));
        assertEquals(1000, clip.value("longestRunStart"));

        Finding dc = of(only(nb, "dc"), AuditKind.DC_OFFSET).get(0);
        assertEquals(0.1, dc.value("mean"), 2e-4);
        assertEquals(-20.0, dc.value("offsetDbfs"), 0.02); // 20·log10(0.1)

        Finding drop = of(only(nb, "drop"), AuditKind.DROPOUT).get(0);
        assertEquals(1, drop.value("dropouts"));
        assertEquals(500, drop.value("longestRun"));
        assertEquals(2000, drop.value("longestRunStart"));

        Finding range = of(only(nb, "small"), AuditKind.RANGE_USE).get(0);
        // a sine of 1/16 full scale spans 2/16 of 2·FS: 16 − 4 = 12 bits; 6.02·12 + 1.76 = 74.0 dB
        assertEquals(12.0, range.value("bitsUsed"), 0.01);
        assertEquals(74.0, range.value("idealSnrDb"), 0.1);
    }

    @Test
    void aChangedFileAndAnExpiredCalibrationAreFound() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        rig.sensor.setCalibrationDate(Date.from(LocalDate.of(2024, 1, 10).atStartOfDay(ZoneOffset.UTC).toInstant()));
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        Random r = new Random(5);
        Channel c = rig.channel("x", good, 8_000, 16_384, DAY, n -> 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000) + dither(r));
        Notebook nb = rig.saved();
        Path wav = dir.resolve("data/x.wav");
        byte[] bytes = Files.readAllBytes(wav);
        bytes[bytes.length - 1] ^= 1; // one bit of the last sample flipped
        Files.write(wav, bytes);
        ChannelAudit a = only(nb, c.getName());
        Finding changed = of(a, AuditKind.CHECKSUM_CHANGED).get(0);
        assertTrue(changed.message().contains(SyntheticRig.sha256(wav)), changed.message());
        Finding cal = of(a, AuditKind.CALIBRATION_EXPIRED).get(0);
        // calibrated 2024-01-10, 12 months → due 2025-01-10; recorded 2025-03-01: 21 + 28 + 1 = 50 days late
        assertEquals(50, cal.value("daysOverdue"));
        assertEquals(Severity.WARNING, cal.severity());
    }

    @Test
    void foldedNoiseFromTheModelMatchesClosedForms() {
        double fs = 10_000;
        // flat chain, white noise to 5·fs/2: folded/in-band = 4, rise 10·log10(5)
        assertEquals(10 * Math.log10(5), FoldedNoise.fromModel(f -> 1.0, fs, 5 * fs / 2).riseDb(), 1e-6);
        // RC at fc: ∫|H|² df = fc·atan(f/fc) (standard integral), so the ratio is a difference of arctangents
        double fc = 2_000, up = 40_000;
        org.foldbook.dsp.filter.FrequencyResponse rc = org.foldbook.dsp.filter.AnalogLowPass.rc(fc);
        double in = fc * Math.atan(fs / 2 / fc), out = fc * (Math.atan(up / fc) - Math.atan(fs / 2 / fc));
        assertEquals(10 * Math.log10(1 + out / in), FoldedNoise.fromModel(rc, fs, up).riseDb(), 1e-6);
    }

    @Test
    void theWholeNotebookIsSummarisedAndAScopeThatMatchesNothingIsAClearError() throws Exception {
        SyntheticRig rig = new SyntheticRig(dir, 3_000);
        SignalChain good = rig.chain("GOOD", 8_000, 4, 1_000);
        rig.channel("a", good, 8_000, 16_384, DAY, n -> 0.25 * Math.sin(2 * Math.PI * 500 * n / 8_000));
        Notebook nb = rig.saved();
        NotebookAudit all = new Auditor(AuditPolicy.DEFAULT).audit(nb, null, Auditor.Scope.ALL, AuditProgress.NONE);
        assertEquals(1, all.channels().size());
        assertEquals(all.channels().get(0).summary(), all.summary());
        IllegalArgumentException e = org.junit.jupiter.api.Assertions.assertThrows(IllegalArgumentException.class,
                () -> new Auditor(AuditPolicy.DEFAULT).audit(nb, null, new Auditor.Scope("nope", null), AuditProgress.NONE));
        assertTrue(e.getMessage().contains("nope"), e.getMessage());
    }
}
