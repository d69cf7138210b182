package org.foldbook.ui.recording;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;

import java.io.IOException;
import java.nio.file.Path;
import java.util.UUID;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.io.Sha256;
import org.foldbook.model.Channel;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.foldbook.ui.parts.FoldExplorerPartAccess;
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
 * The Recording view under the peak preferences, in real widgets: the margin typed in Window ▸ Preferences…
 * decides how many of the SYNTHETIC recording's four tones ({@link SyntheticTones}: 22, 32, 42, 52 dB over a
 * known white-noise floor at 16384-sample Hann segments) are peaks; the expected counts follow from the Hann
 * window's noise bandwidth (Harris 1978), not from our code. And the view and the Fold explorer share one read.
 */
class RecordingPeakPreferencesTest {
    private static final long WAIT = 120_000_000_000L;

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private NotebookDocument document;
    private CurrentNotebook current;
    private IEclipsePreferences node;
    private SpectrumPreferences preferences;
    private Channel mic;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1400, 900);
        shell.setLayout(new FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        current = new CurrentNotebook();
        current.open(document);
        mic = document.notebook().getExperiments().get(0).getChannels().stream()
                .filter(c -> c.getName().equals("sound 0.5 m")).findFirst().orElseThrow();
        Path wav = folder.resolve(mic.getRecording().getPath());
        SyntheticTones.write(wav);
        mic.getRecording().setSha256(Sha256.ofFile(wav));
        node = InstanceScope.INSTANCE.getNode("org.foldbook.ui.tests." + UUID.randomUUID());
        preferences = new SpectrumPreferences(node);
    }

    @AfterEach
    void close() throws BackingStoreException {
        shell.dispose();
        document.dispose();
        node.removeNode();
    }

    @Test
    void theMarginSetsHowManyPeaksTheViewFinds() {
        RecordingPart part = new RecordingPart();
        part.current = current;
        part.preferences = preferences;
        part.createControls(new Composite(shell, SWT.NONE));
        shell.open();
        try {
            current.select(mic);
            RecordingOverview o = overviewWith(part, preferences.values());
            assertEquals(16384, o.spectrum().transformLength(), "the longest segment giving 4 of 480 000 samples");
            assertEquals(SyntheticTones.expectedPeaks(16384, 12), o.peaks().size(), o.peaks().toString());
            assertEquals(4, o.peaks().size(), "the default 12 dB keeps all four tones");
            for (int i = 0; i < 4; i++) {
                // the sub-bin estimate, within a tenth of a 2.93 Hz line (noise moves it a little)
                assertEquals(SyntheticTones.HZ[i], o.peaks().get(i).frequencyHz(), 0.293, "tone " + i);
            }
            assertEquals(4, part.peaks.getItemCount(), "the table lists them");

            PreferencesDriver.apply(shell, preferences, -1, "37");
            o = overviewWith(part, preferences.values());
            assertEquals(SyntheticTones.expectedPeaks(16384, 37), o.peaks().size(), o.peaks().toString());
            assertEquals(2, part.peaks.getItemCount());

            PreferencesDriver.apply(shell, preferences, -1, "47");
            assertEquals(SyntheticTones.expectedPeaks(16384, 47), overviewWith(part, preferences.values()).peaks().size());
            assertEquals(1, part.peaks.getItemCount());

            // prominence only: the margin no longer decides; the 10 dB prominence keeps the four tones
            PreferencesDriver.apply(shell, preferences, 1, null);
            assertFalse(preferences.values().noiseAware());
            assertEquals(4, overviewWith(part, preferences.values()).peaks().size());
        } finally {
            part.dispose();
        }
    }

    @Test
    void theViewAndTheFoldExplorerShareOneRead() {
        RecordingSession session = new RecordingSession(preferences);
        RecordingPart part = new RecordingPart();
        part.current = current;
        part.session = session;
        part.createControls(new Composite(shell, SWT.NONE));
        FoldExplorerPartAccess fold = new FoldExplorerPartAccess(shell, current, session);
        shell.open();
        try {
            current.select(mic);
            overviewWith(part, preferences.values());
            Widgets.waitFor(display, () -> !fold.reading(), "the fold explorer's peaks", WAIT);
            assertEquals(1, session.reads(), "one pass over the file for both parts");
            assertEquals(String.format(java.util.Locale.ROOT, "%.2f", SyntheticTones.HZ[3]),
                    fold.tones().split(", ")[0], "the strongest tone first");
            // selecting it again reads nothing; other preferences read it once more, for both
            current.select(null);
            current.select(mic);
            assertEquals(1, session.reads());
            preferences.set(new SpectrumSettingsValues(true, 47, 63, 16384));
            overviewWith(part, preferences.values());
            Widgets.waitFor(display, () -> !fold.reading() && fold.tones().split(", ").length == 1,
                    "the fold explorer's peaks with the new margin", WAIT);
            assertEquals(2, session.reads());
        } finally {
            part.dispose();
            fold.dispose();
            session.dispose();
        }
    }

    private RecordingOverview overviewWith(RecordingPart part, SpectrumSettingsValues settings) {
        Widgets.waitFor(display, () -> part.presenter.overview() != null
                && part.presenter.overview().settings().equals(settings) && !part.reading(),
                "the recording view's analysis with " + settings, WAIT);
        return part.presenter.overview();
    }
}
