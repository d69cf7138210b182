package org.foldbook.ui.preferences;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.UUID;

import org.eclipse.core.runtime.preferences.IEclipsePreferences;
import org.eclipse.core.runtime.preferences.InstanceScope;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.osgi.service.prefs.BackingStoreException;

/**
 * Window ▸ Preferences… in a real SWT dialog (under Xvfb): typed values go through the project's number
 * parser and a problem is named in words while the dialog stays open; usable values are kept in the Eclipse
 * preferences (instance scope) and read back; a damaged stored value gives the defaults and says why.
 */
class PreferencesDialogTest {
    private Shell shell;
    private IEclipsePreferences node;
    private SpectrumPreferences preferences;

    @BeforeEach
    void open() {
        shell = new Shell(Display.getDefault());
        node = InstanceScope.INSTANCE.getNode("org.foldbook.ui.tests." + UUID.randomUUID());
        preferences = new SpectrumPreferences(node);
    }

    @AfterEach
    void close() throws BackingStoreException {
        shell.dispose();
        node.removeNode();
    }

    @Test
    void typedValuesAreCheckedAndProblemsNamedInWords() {
        SpectrumSettingsValues before = preferences.values();
        PreferencesDialog d = new PreferencesDialog(shell, preferences);
        d.setBlockOnOpen(false);
        d.open();
        assertEquals("12", d.margin.getText(), "the default margin (PeakThreshold.DEFAULT)");
        d.margin.setText("twelve");
        d.pressOk();
        assertEquals("Peak margin in dB is not a number: 'twelve'.", d.problem.getText());
        assertFalse(d.getShell().isDisposed(), "the dialog stays open");
        d.floorBins.setText("64");
        d.margin.setText("12");
        d.pressOk();
        assertTrue(d.problem.getText().contains("odd number of bins"), d.problem.getText());
        d.floorBins.setText("63");
        d.segment.setText("3000");
        d.pressOk();
        assertTrue(d.problem.getText().contains("power of two"), d.problem.getText());
        d.margin.setText("\u22123");   // the typographic minus is read as a minus
        d.segment.setText("8192");
        d.pressOk();
        assertTrue(d.problem.getText().contains("between 0 and 200 dB, was -3 dB"), d.problem.getText());
        assertEquals(before, preferences.values(), "nothing applied while a value is wrong");
        d.margin.setText("18.5");
        d.pressOk();
        assertTrue(d.getShell() == null || d.getShell().isDisposed(), "closed once the values are usable");
        assertEquals(new SpectrumSettingsValues(true, 18.5, 63, 8192), preferences.values());
    }

    @Test
    void defaultsButtonPutsBackTheSweepsRule() {
        preferences.set(new SpectrumSettingsValues(false, 30, 31, 1024));
        PreferencesDialog d = new PreferencesDialog(shell, preferences);
        d.setBlockOnOpen(false);
        d.open();
        assertEquals("30", d.margin.getText());
        assertEquals(1, d.kind.getSelectionIndex());
        d.pressDefaults();
        d.pressOk();
        assertEquals(SpectrumSettingsValues.DEFAULT, preferences.values());
        assertEquals(12.0, preferences.values().threshold().marginDb());
        assertEquals(63, preferences.values().threshold().floorWindowBins());
    }

    @Test
    void valuesAreKeptInTheBundlesPreferencesAndUnusableOnesNamed() {
        assertEquals(SpectrumSettingsValues.DEFAULT, preferences.values());
        int[] heard = {0};
        preferences.addListener(v -> heard[0]++);
        assertNull(preferences.set(new SpectrumSettingsValues(false, 20, 31, 4096)));
        assertEquals(1, heard[0], "listeners hear a change");
        assertNull(preferences.set(new SpectrumSettingsValues(false, 20, 31, 4096)));
        assertEquals(1, heard[0], "and nothing when nothing changed");
        assertEquals("prominence", node.get("peaks.kind", null));
        SpectrumPreferences again = new SpectrumPreferences(node);
        assertEquals(new SpectrumSettingsValues(false, 20, 31, 4096), again.values());
        assertNull(again.loadProblem());

        node.put("peaks.floorBins", "sixty-three");
        SpectrumPreferences broken = new SpectrumPreferences(node);
        assertEquals(SpectrumSettingsValues.DEFAULT, broken.values());
        assertNotNull(broken.loadProblem());
        assertTrue(broken.loadProblem().contains("not a whole number: 'sixty-three'"), broken.loadProblem());
    }
}
