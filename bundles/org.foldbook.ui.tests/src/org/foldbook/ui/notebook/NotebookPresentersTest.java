package org.foldbook.ui.notebook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.util.List;

import org.eclipse.emf.common.command.BasicCommandStack;
import org.eclipse.emf.edit.domain.AdapterFactoryEditingDomain;
import org.eclipse.emf.edit.provider.ComposedAdapterFactory;
import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.Device;
import org.foldbook.model.Digitizer;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Sensor;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.junit.jupiter.api.Test;

/** The SWT-free presenters of the Notebook part, on a synthetic chain worked by hand. */
class NotebookPresentersTest {

    /** Sensor to 32 kHz → Butterworth 4 at 10 kHz → 24-bit digitizer (110 dB) at 25.6 kS/s, content at −30 dBFS. */
    private static SignalChain chain() {
        NotebookFactory f = NotebookFactory.eINSTANCE;
        Sensor s = f.createSensor();
        s.setId("S");
        s.setUsableMaxHz(32000.0);
        AntiAliasFilter lp = f.createAntiAliasFilter();
        lp.setId("LP");
        lp.setFamily(FilterFamily.BUTTERWORTH);
        lp.setOrder(4);
        lp.setCutoffHz(10000);
        Digitizer d = f.createDigitizer();
        d.setId("D");
        d.setResolutionBits(24);
        d.setDynamicRangeDb(110.0);
        d.setMaxRateHz(51200);
        SignalChain c = f.createSignalChain();
        for (Device dev : List.<Device>of(s, lp, d)) {
            Stage st = f.createStage();
            st.setDevice(dev);
            c.getStages().add(st);
        }
        c.getStages().get(2).setRateHz(25600.0);
        c.setOutOfBandLevelDbfs(-30.0);
        return c;
    }

    @Test
    void responseSeriesFollowsTheClosedForm() {
        ChainResponseSeries s = ChainResponseSeries.of(chain()).orElseThrow();
        assertEquals(12800, s.nyquistHz(), 0);
        assertEquals(80, s.needDb(), 1e-12); // 110 dB range + (−30 dBFS) content, worked by hand
        // Butterworth |H|² = 1/(1+(f/fc)^8) at every plotted point (closed form)
        for (int i = 0; i < s.x().length; i += 50) {
            double f = s.x()[i];
            assertEquals(-10 * Math.log10(1 + Math.pow(f / 10000, 8)), s.gainDb()[i], 1e-9, "at " + f + " Hz");
        }
        // the folding part runs from Nyquist to the sensor's 32 kHz
        assertEquals(12800, s.foldsX()[0], s.topHz() / ChainResponseSeries.POINTS);
        assertEquals(32000, s.foldsX()[s.foldsX().length - 1], s.topHz() / ChainResponseSeries.POINTS);
    }

    @Test
    void typedSettingsBecomeCommandsOrProblems() {
        SignalChain c = chain();
        AdapterFactoryEditingDomain domain = new AdapterFactoryEditingDomain(
                new ComposedAdapterFactory(ComposedAdapterFactory.Descriptor.Registry.INSTANCE), new BasicCommandStack());
        ChainSettings.Outcome fast = ChainSettings.rate(domain, c, "102400");
        assertEquals("Sampling rate 102.4 kS/s is above the digitizer's maximum 51.2 kS/s.",
                assertInstanceOf(ChainSettings.Problem.class, fast).text());
        ChainSettings.Outcome ok = ChainSettings.rate(domain, c, "48000");
        domain.getCommandStack().execute(assertInstanceOf(ChainSettings.Apply.class, ok).command());
        assertEquals(48000.0, c.getStages().get(2).getRateHz());
        domain.getCommandStack().undo();
        assertEquals(25600.0, c.getStages().get(2).getRateHz());
        assertInstanceOf(ChainSettings.Problem.class, ChainSettings.cutoff(domain, c, "-1"));
        domain.getCommandStack().execute(
                assertInstanceOf(ChainSettings.Apply.class, ChainSettings.outOfBandLevel(domain, c, "")).command());
        assertEquals(null, c.getOutOfBandLevelDbfs());
        assertInstanceOf(ChainSettings.Nothing.class, ChainSettings.outOfBandLevel(domain, c, " "));
    }
}
