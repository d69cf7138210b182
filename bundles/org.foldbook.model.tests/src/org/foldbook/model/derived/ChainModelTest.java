package org.foldbook.model.derived;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.foldbook.model.Amplifier;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.junit.jupiter.api.Test;

/** The one chain mapper against hand-worked chains (synthetic devices, values stated beside each check). */
class ChainModelTest {
    private static final NotebookFactory F = NotebookFactory.eINSTANCE;

    private static SignalChain chain(FilterFamily family, Double stageCutoff) {
        Sensor s = F.createSensor();
        s.setId("ACC");
        s.setUsableMaxHz(20000.0);
        s.setResonanceHz(32000.0);
        s.setResonanceQ(20.0);
        Amplifier a = F.createAmplifier();
        a.setId("AMP");
        a.setBandwidthLowHz(0.3);
        a.setBandwidthHighHz(100000.0);
        AntiAliasFilter lp = F.createAntiAliasFilter();
        lp.setId("LP");
        lp.setFamily(family);
        lp.setOrder(4);
        lp.setCutoffHz(5000);
        Digitizer d = F.createDigitizer();
        d.setId("DAQ");
        d.setResolutionBits(24);
        d.setMaxRateHz(51200);
        SignalChain c = F.createSignalChain();
        c.setId("C");
        for (Device dev : List.<Device>of(s, a, lp, d)) {
            Stage st = F.createStage();
            st.setDevice(dev);
            c.getStages().add(st);
        }
        c.getStages().get(2).setCutoffHz(stageCutoff);
        c.getStages().get(3).setRateHz(25600.0);
        return c;
    }

    @Test
    void stageSettingsOverrideDeviceValues() {
        ChainModel m = ChainModel.of(chain(FilterFamily.BUTTERWORTH, 10000.0));
        assertEquals(ChainModel.FilterState.MODELLED, m.antiAliasState());
        assertEquals(25600, m.samplingRateHz());
        // Butterworth closed form |H|² = 1/(1+(f/fc)^2n): n = 4, fc = 10 kHz (the stage's), f = 12.8 kHz → 10·log10(1 + 1.28^8) = 9.1412 dB (worked by hand)
        assertEquals(10 * Math.log10(1 + Math.pow(1.28, 8)), m.protection(25600).attenuationDb(12800), 1e-9);
        assertEquals(9.1412, m.protection(25600).attenuationDb(12800), 1e-4);
    }

    @Test
    void frontEndElementsFollowTheirTextbookForms() {
        ChainModel m = ChainModel.of(chain(FilterFamily.BUTTERWORTH, null));
        // standard second-order system: |H(jω0)| = Q exactly (Ogata, Modern Control Engineering)
        assertEquals(20.0, m.sensorResonance().orElseThrow().magnitude(32000), 1e-9);
        // first-order high-pass s/(s+ωc) at its corner and first-order low-pass at its corner: 1/√2
        assertEquals(Math.sqrt(0.5), m.conditioner().get(0).magnitude(0.3), 1e-12);
        assertEquals(Math.sqrt(0.5), m.conditioner().get(1).magnitude(100000), 1e-12);
        // the simulation applies all of them, in signal order: resonance, two edges, low-pass
        assertEquals(4, m.modelledChannel().analogFilters().size());
        // the protection leaves out the front end (the out-of-band level is stated after it)
        assertEquals(10 * Math.log10(1 + Math.pow(32000.0 / 5000, 8)), m.protection(25600).attenuationDb(32000), 1e-9);
    }

    @Test
    void bypassAndUndescribedAreSaid() {
        ChainModel bypass = ChainModel.of(chain(FilterFamily.NONE, null));
        assertEquals(ChainModel.FilterState.BYPASSED, bypass.antiAliasState());
        assertTrue(bypass.antiAlias().isEmpty());
        assertEquals(1.0, bypass.protection(25600).magnitude(12800), 0);
        ChainModel unknown = ChainModel.of(chain(FilterFamily.UNKNOWN, null));
        assertEquals(ChainModel.FilterState.UNDESCRIBED, unknown.antiAliasState());
        assertTrue(unknown.notes().stream().anyMatch(n -> n.contains("LP")), unknown.notes().toString());
    }

    @Test
    void elementsTheRecordingPassedAreNotAppliedTwice() {
        ChainModel survey = ChainModel.of(chain(FilterFamily.NONE, null));
        ChainModel everyday = ChainModel.of(chain(FilterFamily.BUTTERWORTH, 10000.0));
        ChainModel.Simulation sim = everyday.simulationAfter(survey);
        // same sensor and amplifier: only the everyday low-pass is applied
        assertEquals(1, sim.channel().analogFilters().size());
        assertEquals(3, sim.notes().size(), sim.notes().toString());
        assertEquals(everyday.signature(), ChainModel.of(chain(FilterFamily.BUTTERWORTH, 10000.0)).signature());
        assertTrue(!everyday.signature().equals(survey.signature()));
    }

    @Test
    void derivedFiguresUseTheMapper() {
        SignalChain c = chain(FilterFamily.BUTTERWORTH, 10000.0);
        assertEquals(ChainModel.of(c).protection(25600).attenuationDb(12800),
                ChainFigures.chainResponse(c).attenuationDb(12800), 0);
        // and both agree with the outside value: Butterworth |H|^2 = 1/(1 + (f/fc)^2n), n = 4, fc = 10 kHz
        // (docs/REFERENCES.md, Butterworth)
        assertEquals(10 * Math.log10(1 + Math.pow(12800.0 / 10000.0, 8)),
                ChainFigures.chainResponse(c).attenuationDb(12800), 1e-9);
    }
}
