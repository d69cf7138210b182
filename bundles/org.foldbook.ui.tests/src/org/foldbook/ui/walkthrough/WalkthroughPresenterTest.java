package org.foldbook.ui.walkthrough;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.foldbook.dsp.fold.ApparentMotion;
import org.foldbook.model.Notebook;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Quantities;
import org.foldbook.model.edit.NotebookEditing;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The walkthrough's pages on the demo notebook (SYNTHETIC gearbox stand), without a display. Check values
 * are worked by hand from published formulas, each named beside it: Butterworth |H|² = 1/(1+(f/fc)^2n)
 * (any filter handbook, e.g. Williams &amp; Taylor, Electronic Filter Design Handbook); the ideal quantiser's
 * SNR 20·log10(2^N·√1.5) = 6.02·N + 1.76 dB (Bennett 1948; Kester, Analog Devices MT-001); the fold formula
 * f − k·fs, k = round(f/fs) (Oppenheim &amp; Schafer, Discrete-Time Signal Processing, ch. 4); a box-car of
 * length T: |sin(πfT)/(πfT)| (rectangular-window transform).
 */
class WalkthroughPresenterTest {

    private Notebook notebook;
    private Rig rig;

    @BeforeEach
    void build() {
        notebook = GearboxDemo.build();
        rig = notebook.getRigs().get(0);
    }

    private SignalChain chain(String id) {
        return rig.getChains().stream().filter(c -> id.equals(c.getId())).findFirst().orElseThrow();
    }

    private static double butterworthDb(int order, double cutoff, double f) {
        return 10 * Math.log10(1 + Math.pow(f / cutoff, 2 * order));
    }

    @Test
    @DisplayName("housing chain: cautions, sensor, conditioner, filter, digitizer, each with its hand-worked numbers")
    void housingChain() {
        Walkthrough w = Walkthrough.of(rig, chain("CH-HZ"), WhatIf.NONE, null);
        assertEquals(List.of(StagePage.Kind.CAUTIONS, StagePage.Kind.SENSOR, StagePage.Kind.CONDITIONER,
                StagePage.Kind.ANTI_ALIAS_FILTER, StagePage.Kind.DIGITIZER), w.pages().stream().map(StagePage::kind).toList());
        assertEquals(List.of("Cautions: gearbox stand GB-2", "Sensor: ACC-H1", "Conditioner: CAMP-2",
                "Anti-alias filter: LP-A", "Digitizer: DAQ-8"), w.pages().stream().map(StagePage::title).toList());

        StagePage sensor = w.page(StagePage.Kind.SENSOR);
        assertEquals("1 Hz – 20 kHz", sensor.figure("Usable band"));
        assertEquals("32 kHz, Q 25", sensor.figure("Mounted resonance"));
        assertTrue(sensor.chart().isPresent()); // the modelled resonance
        assertEquals("32 kHz", sensor.figure("Front end passes up to")); // max(20 kHz, 32 kHz), under the 100 kHz edge

        StagePage amp = w.page(StagePage.Kind.CONDITIONER);
        assertEquals("×10 (20.0 dB)", amp.figure("Gain")); // 20·log10(10) = 20 dB
        assertEquals("±1 V", amp.figure("Full scale before the gain")); // ±10 V range / 10

        StagePage filter = w.page(StagePage.Kind.ANTI_ALIAS_FILTER);
        // Butterworth 4 @ 10 kHz: 9.14 dB at 12.8 kHz, 15.57 dB at 15.6 kHz (= 25.6 − 10), 40.41 dB at 32 kHz
        assertEquals(Quantities.db(butterworthDb(4, 10000, 12800)) + " at 12.8 kHz", filter.figure("Attenuation at Nyquist"));
        assertEquals("9.1 dB at 12.8 kHz", filter.figure("Attenuation at Nyquist"));
        assertEquals("15.6 dB at 15.6 kHz", filter.figure("Attenuation at fs − cutoff"));
        assertEquals(Quantities.db(butterworthDb(4, 10000, 32000)) + " at 32 kHz",
                filter.figure("Attenuation at the front end's top"));
        StageChart chart = filter.chart().orElseThrow();
        // the fold-back band is the front end above Nyquist; with 32 kHz > fs it lands on all of 0 – 12.8 kHz
        assertEquals(2, chart.bands().size());
        assertEquals(12800, chart.bands().get(0).lowX(), 1e-9);
        assertEquals(32000, chart.bands().get(0).highX(), 1e-9);
        assertEquals(0, chart.bands().get(1).lowX(), 1e-9);
        assertEquals(12800, chart.bands().get(1).highX(), 1e-9);
        StageChart.Line response = chart.line("response");
        for (int i = 1; i < response.x().length; i += 97) { // the drawn curve is the Butterworth magnitude
            assertEquals(-butterworthDb(4, 10000, response.x()[i]), response.y()[i], 1e-9);
        }

        StagePage daq = w.page(StagePage.Kind.DIGITIZER);
        assertEquals("25.6 kS/s", daq.figure("Sampling rate"));
        assertEquals("12.8 kHz", daq.figure("Nyquist frequency"));
        // 6.02·24 + 1.76: exactly 20·log10(2^24·√1.5) = 146.25 dB
        assertEquals(Quantities.db(20 * Math.log10(Math.pow(2, 24) * Math.sqrt(1.5))), daq.figure("Ideal quantiser range"));
        assertEquals("110 dB range + −30 dBFS content = 80 dB", daq.figure("Needed attenuation"));
        // 25.6 kHz (= fs) lies inside the front end and folds onto 0 Hz: no alias-free band at all
        assertEquals("none (limited by content at 25.6 kHz)", daq.figure("Alias-free band"));
        // least attenuation of anything folding onto 0 – 12.8 kHz: 9.14 dB at 12.8 kHz, minus 80 dB
        assertEquals(Quantities.signedDb(butterworthDb(4, 10000, 12800) - 80) + " (short of the need)",
                daq.figure("Protection margin"));
        // 0 – 10 kHz stays clean once fs − 10 kHz is above the front end's 32 kHz (the filter gives < 80 dB below it)
        assertEquals("42 kS/s", daq.figure("Lowest safe rate for 0 – 10 kHz"));
        // the resonance folds to |32 − 25.6| = 6.4 kHz, at −30 − 40.41 = −70.41 dBFS: 39.6 dB over the −110 dBFS floor
        assertTrue(daq.paragraphs().contains("The sensor's resonance at 32 kHz lands at 6.4 kHz, attenuated 40.4 dB: "
                + "at -70.41 dBFS, 39.6 dB above the noise floor."), daq.paragraphs().toString());
        assertTrue(daq.paragraphs().contains("Folds: the front end's 12.8 kHz – 32 kHz lands on 0 Hz – 12.8 kHz of the baseband."),
                daq.paragraphs().toString());
    }

    @Test
    @DisplayName("the cautions page carries the rig's notes, the device notes and every general caution")
    void cautions() {
        StagePage page = Walkthrough.of(rig, chain("CH-BZ"), WhatIf.NONE, null).pages().get(0);
        String all = String.join("\n", page.paragraphs());
        assertTrue(all.contains(rig.getNotes()), all);
        assertTrue(all.contains("front-panel bypass was on during run 1"), all); // LP-B's own note
        for (String caution : Cautions.GENERAL) {
            assertTrue(all.contains(caution), caution);
        }
        assertTrue(all.contains("CAMP-2, LP-B"), all);
    }

    @Test
    @DisplayName("what-if: 51.2 kS/s moves the alias-free band to fs − 32 kHz = 19.2 kHz; the notebook keeps 25.6 kS/s")
    void whatIfRate() {
        SignalChain housing = chain("CH-HZ");
        Walkthrough w = Walkthrough.of(rig, housing, new WhatIf(51200.0, null), null);
        StagePage daq = w.page(StagePage.Kind.DIGITIZER);
        assertEquals("51.2 kS/s", daq.figure("Sampling rate"));
        assertEquals("what-if; the notebook says 25600",
                daq.figures().stream().filter(f -> f.name().equals("Sampling rate")).findFirst().orElseThrow().how());
        assertEquals("25.6 kHz", daq.figure("Nyquist frequency"));
        // everything the front end passes (≤ 32 kHz) lands on 51.2 − 32 = 19.2 kHz and above
        assertEquals("0 – 19.2 kHz (limited by content at 32 kHz)", daq.figure("Alias-free band"));
        assertEquals(25600, ChainFigures.samplingRateHz(housing), 0); // untouched
        assertFalse(w.tried() == housing);
    }

    @Test
    @DisplayName("what-if: a 3 kHz cutoff reaches 80 dB at 30 kHz, so the lowest safe rate for 0 – 3 kHz is 33 kS/s")
    void whatIfCutoff() {
        Walkthrough w = Walkthrough.of(rig, chain("CH-HZ"), new WhatIf(null, 3000.0), null);
        // Butterworth 4: 80 dB where (f/fc)^8 = 10^8 − 1, f ≈ 10·fc = 30 kHz; fs − 3 kHz ≥ 30 kHz
        assertEquals("33 kS/s", w.page(StagePage.Kind.DIGITIZER).figure("Lowest safe rate for 0 – 3 kHz"));
        assertEquals(Quantities.db(butterworthDb(4, 3000, 12800)) + " at 12.8 kHz",
                w.page(StagePage.Kind.ANTI_ALIAS_FILTER).figure("Attenuation at Nyquist"));
    }

    @Test
    @DisplayName("keep this: one undoable command; undo restores rate and cutoff")
    void keepIsUndoable() {
        AdapterFactoryEditingDomain domain = NotebookEditing.newEditingDomain();
        SignalChain housing = chain("CH-HZ");
        WalkthroughSession session = new WalkthroughSession();
        session.setNotebook(notebook);
        session.pick(rig, housing);
        assertTrue(session.tryRate("51200").isEmpty());
        assertTrue(session.tryCutoff("20000").isEmpty());
        assertEquals("Rate 60 kS/s is above the digitizer's maximum 51.2 kS/s.", session.tryRate("60000").orElseThrow());
        assertEquals(51200.0, session.whatIf().rateHz()); // the bad value left the what-if alone
        Command keep = session.keep(domain);
        domain.getCommandStack().execute(keep);
        session.recompute();
        assertEquals(51200, ChainFigures.samplingRateHz(housing), 0);
        assertEquals(20000, ChainFigures.effectiveCutoffHz(ChainFigures.filterStage(housing)), 0);
        assertTrue(session.whatIf().isNone());
        domain.getCommandStack().undo();
        assertEquals(25600, ChainFigures.samplingRateHz(housing), 0);
        assertEquals(10000, ChainFigures.effectiveCutoffHz(ChainFigures.filterStage(housing)), 0);
        assertFalse(domain.getCommandStack().canUndo());
        assertNull(session.keep(domain)); // nothing tried: nothing to keep
    }

    @Test
    @DisplayName("bypassed filter: the page says so and the whole front end above Nyquist folds")
    void bypassed() {
        Walkthrough w = Walkthrough.of(rig, chain("CH-BZ"), WhatIf.NONE, null);
        assertEquals("in bypass (no filtering)", w.page(StagePage.Kind.ANTI_ALIAS_FILTER).figure("Filter"));
        assertEquals("none (limited by content at 25.6 kHz)", w.page(StagePage.Kind.DIGITIZER).figure("Alias-free band"));
        // without a filter 0 – 20 kHz would need fs ≥ 20 + 32 = 52 kS/s, above the digitizer's 51.2 kS/s
        assertEquals("none up to the digitizer's 51.2 kS/s", w.page(StagePage.Kind.DIGITIZER).figure("Lowest safe rate for 0 – 20 kHz"));
    }

    @Test
    @DisplayName("camera: the shaft mark (24.5 Hz, one mark) at 1000 frames/s appears at the signed fold f − k·fps")
    void cameraMark() {
        SignalChain camera = chain("CH-CAM");
        StagePage page = Walkthrough.of(rig, camera, WhatIf.NONE, null).page(StagePage.Kind.CAMERA);
        FilmedMotion m = page.motion().orElseThrow();
        double f = 24.5;
        assertEquals(f - 1000 * Math.round(f / 1000), m.seen().apparentPatternHz(), 1e-12);
        assertEquals("+24.5 rev/s (forward)", page.figure("Apparent rotation"));
        assertEquals("1000 frames/s", page.figure("Frame rate"));
        // 360° × 24.5 rev/s × 0.8 ms = 7.056°, 0.0196 of the (single) mark's pitch
        assertEquals("7.06° (0.0196 of the mark pitch)", page.figure("Smear per frame"));
        // box-car of 0.8 ms at 500 Hz: sin(0.4π)/(0.4π) = 0.7568 → 2.42 dB
        assertEquals(Quantities.db(-20 * Math.log10(Math.sin(0.4 * Math.PI) / (0.4 * Math.PI))), page.figure("Exposure smear at Nyquist"));
        assertTrue(m.faithful());

        // the what-if's frame rates: 25 → −0.5 (backward), 24.5 → still, 24 → +0.5 (slow forward), 49 → flicker
        double[][] cases = { { 25, -0.5 }, { 24.5, 0 }, { 24, 0.5 }, { 49, -24.5 } };
        ApparentMotion[] seen = { ApparentMotion.TURNS_BACKWARD, ApparentMotion.STANDS_STILL, ApparentMotion.TURNS_FORWARD,
                ApparentMotion.FLICKERS_WITHOUT_DIRECTION };
        String[] words = { "backward", "standing still", "slow forward", "flicker" };
        for (int i = 0; i < cases.length; i++) {
            double fps = cases[i][0];
            FilmedMotion tried = Walkthrough.of(rig, camera, new WhatIf(fps, null), null).page(StagePage.Kind.CAMERA)
                    .motion().orElseThrow();
            double k = Math.floor(f / fps + 0.5);
            assertEquals(cases[i][1], f - k * fps, 1e-12); // the hand-worked value is the fold formula's
            assertEquals(cases[i][1], tried.seen().apparentPatternHz(), 1e-9, "fps " + fps);
            assertEquals(seen[i], tried.seen().motion(), "fps " + fps);
            assertEquals(words[i], tried.shortWord(), "fps " + fps);
            assertFalse(tried.faithful());
        }
        // the strobe chart's frame points sit on the true motion at the frame instants
        StageChart strobe = page.chart().orElseThrow();
        StageChart.Line frames = strobe.line("frames");
        for (int n = 0; n < frames.x().length; n++) {
            assertEquals((360 * f * n / 1000) % 360, frames.y()[n], 1e-9);
        }
    }
}
