package org.foldbook.ui.simulation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Path;
import java.util.UUID;
import java.util.function.BooleanSupplier;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.io.Sha256;
import org.foldbook.model.Channel;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.foldbook.ui.preferences.SpectrumPreferences;
import org.foldbook.ui.preferences.SpectrumSettingsValues;
import org.foldbook.ui.testing.PreferencesDriver;
import org.foldbook.ui.testing.SyntheticTones;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.service.prefs.BackingStoreException;

/**
 * The Rate sweep part under the peak preferences, in real widgets: the margin typed in Window ▸ Preferences…
 * decides how many of the SYNTHETIC recording's tones ({@link SyntheticTones}; at the sweep's 4096-sample
 * segments 16, 26, 36, 46 dB over the floor, Harris 1978's Hann noise bandwidth) are source peaks; a kept run
 * made under other settings says so until the sweep runs again.
 */
class SweepPeakPreferencesTest {
    private static final long WAIT = 120_000_000_000L;

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private NotebookDocument document;
    private IEclipsePreferences node;
    private SpectrumPreferences preferences;
    private SimulationPart part;
    private Channel mic;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1400, 900);
        shell.setLayout(new FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        CurrentNotebook current = new CurrentNotebook();
        current.open(document);
        mic = document.notebook().getExperiments().get(0).getChannels().stream()
                .filter(c -> c.getName().equals("sound 0.5 m")).findFirst().orElseThrow();
        Path wav = folder.resolve(mic.getRecording().getPath());
        SyntheticTones.write(wav);
        mic.getRecording().setSha256(Sha256.ofFile(wav));
        node = InstanceScope.INSTANCE.getNode("org.foldbook.ui.tests." + UUID.randomUUID());
        preferences = new SpectrumPreferences(node);
        preferences.set(new SpectrumSettingsValues(true, 31, 63, 16384));
        part = new SimulationPart();
        part.current = current;
        part.preferences = preferences;
        part.createControls(new Composite(shell, SWT.NONE));
        shell.open();
    }

    @AfterEach
    void close() throws BackingStoreException {
        part.dispose();
        shell.dispose();
        document.dispose();
        node.removeNode();
    }

    @Test
    void theMarginSetsTheSourcePeaksAndAKeptRunSaysItWasMadeOtherwise() {
        part.show(document, mic);
        Combo mode = (Combo) control("mode");
        mode.select(0);   // bare sampling: the source peaks do not depend on the chain
        mode.notifyListeners(SWT.Selection, new Event());
        Combo spacing = (Combo) control("spacing");
        spacing.select(2);
        spacing.notifyListeners(SWT.Selection, new Event());
        ((Text) control("list")).setText("24000");
        run();
        // the channel has no sweep plan: the sweep's default 4096-sample segments
        assertEquals(SyntheticTones.expectedPeaks(4096, 31), part.result().sources().size(),
                part.result().sources().toString());
        assertEquals(2, part.result().sources().size());
        assertTrue(part.result().peakRule().contains("31.0 dB"), part.result().peakRule());

        PreferencesDriver.apply(shell, preferences, -1, "41");
        waitFor(() -> status().contains("Made with other peak settings"), "the kept run marked");
        assertTrue(status().contains("peaks stand 41.0 dB"), status());
        assertEquals(2, part.result().sources().size(), "the kept run is shown as it was made");

        run();
        assertEquals(SyntheticTones.expectedPeaks(4096, 41), part.result().sources().size());
        assertEquals(1, part.result().sources().size());
        assertFalse(status().contains("other peak settings"), status());
    }

    @Test
    void theDefaultRuleKeepsTheCommandLinesSetUp() {
        var setup = new SimulationPlanner.Request(org.foldbook.sweep.SimulationMode.BARE, null,
                org.foldbook.sweep.PeakThreshold.DEFAULT).setup(mic, SyntheticTones.RATE);
        assertEquals(org.foldbook.channel.ChannelSimulation.setup(mic, org.foldbook.sweep.SimulationMode.BARE,
                SyntheticTones.RATE).signature(), setup.signature());
        var other = new SimulationPlanner.Request(org.foldbook.sweep.SimulationMode.BARE, null,
                new SpectrumSettingsValues(true, 20, 31, 16384).threshold()).setup(mic, SyntheticTones.RATE);
        assertEquals(new SpectrumSettingsValues(true, 20, 31, 16384).threshold().toString(),
                SimulationPlanner.thresholdOf(other.signature()));
        assertEquals(org.foldbook.sweep.PeakThreshold.DEFAULT.toString(), SimulationPlanner.thresholdOf(setup.signature()));
    }

    private void run() {
        Button run = (Button) control("run");
        waitFor(run::isEnabled, "the run button");
        run.notifyListeners(SWT.Selection, new Event());
        waitFor(() -> status().startsWith("Done") || status().equals("Cancelled.") || status().startsWith("/"),
                "the sweep");
        assertTrue(status().startsWith("Done"), status());
    }

    private String status() {
        return ((Label) control("status")).getText();
    }

    private Control control(String id) {
        for (Control c : Widgets.findAll(shell, Control.class)) {
            if (id.equals(c.getData(SimulationPart.ID))) {
                return c;
            }
        }
        return fail("no control '" + id + "'");
    }

    private void waitFor(BooleanSupplier condition, String what) {
        Widgets.waitFor(display, condition, what, WAIT);
    }
}
