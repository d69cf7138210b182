package org.foldbook.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.foldbook.ui.testing.Widgets.find;
import static org.foldbook.ui.testing.Widgets.findAll;
import static org.foldbook.ui.testing.Widgets.waitFor;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Chart;
import org.foldbook.model.Channel;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fold explorer part in a real SWT shell (needs a display; the test command provides Xvfb).
 * Check values are fold facts of common practice (docs/REFERENCES.md): a 1.5 Hz tone sampled at
 * 1.9 S/s appears at 0.4 Hz, and 27.1 kHz
 * at 48 kS/s appears at 48 − 27.1 = 20.9 kHz.
 */
class FoldExplorerPartTest {
    private Display display;
    private Shell shell;

    @BeforeEach
    void open() {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1000, 700);
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    @Test
    void defaultScenarioListsEveryToneWithItsAlias() {
        new FoldExplorerPart().createControls(shell);
        shell.layout(true, true);
        Table table = find(shell, Table.class);
        assertEquals(5, table.getItemCount());
        // 27.1 kHz at 48 kS/s: second Nyquist zone, appears at 48 − 27.1 = 20.9 kHz (common practice)
        assertEquals("27100.0", table.getItem(3).getText(0));
        assertEquals("20900.0", table.getItem(3).getText(1));
        assertEquals("2", table.getItem(3).getText(2));
        assertEquals("alias", table.getItem(3).getText(3));
        assertEquals("true", table.getItem(0).getText(3));
        Chart chart = find(shell, Chart.class);
        // five tone curves, the Nyquist line and the chosen-rate marker
        assertEquals(7, chart.getSeriesSet().getSeries().length);
    }

    @Test
    void editingTheFieldsRecomputes() {
        new FoldExplorerPart().createControls(shell);
        List<Text> fields = findAll(shell, Text.class);
        fields.get(0).setText("1.5");
        fields.get(1).setText("1.9");
        Table table = find(shell, Table.class);
        assertEquals(1, table.getItemCount());
        // 1.5 Hz sampled at 1.9 S/s appears at 0.4 Hz (common practice)
        assertEquals("0.400000", table.getItem(0).getText(1));
        assertEquals("alias", table.getItem(0).getText(3));
    }

    @Test
    void badInputIsShownNotThrown() {
        new FoldExplorerPart().createControls(shell);
        List<Text> fields = findAll(shell, Text.class);
        fields.get(1).setText("-3");
        Label status = find(shell, Label.class, l -> (l.getStyle() & SWT.WRAP) != 0);
        assertTrue(status.getText().startsWith("Sample rate must be a positive number"), status.getText());
        fields.get(1).setText("fast");
        assertTrue(status.getText().contains("not a number"), status.getText());
    }

    @Test
    void followsTheSelectedChannelsPeaksRateAndChain(@TempDir Path dir)
            throws IOException {
        var document = NotebookDocument.load(GearboxDemo.write(dir));
        try {
            var current = new CurrentNotebook();
            current.open(document);
            FoldExplorerPart part = new FoldExplorerPart();
            part.current = current;
            part.createControls(shell);
            Channel housing = document.notebook().getExperiments().get(0).getChannels().get(0);
            assertEquals("housing Z", housing.getName());
            current.select(housing);
            waitFor(display, () -> !part.reading(), "reading the peaks", 120_000_000_000L);
            List<Text> fields = findAll(shell, Text.class);
            assertEquals("25600.0", fields.get(1).getText(), "the channel's rate (GearboxDemo: 25.6 kS/s)");
            Table table = find(shell, Table.class);
            assertEquals(FoldExplorerPart.SOURCE_PEAKS, table.getItemCount());
            boolean mesh = false;
            boolean alias = false;
            for (var item : table.getItems()) {
                double f = Double.parseDouble(item.getText(0));
                mesh |= Math.abs(f - 906.5) < 0.5; // 37 teeth × 24.5 Hz
                if (Math.abs(f - 10189.5) < 2) { // 17 × 906.5 = 15 410.5 Hz folded at 25.6 kS/s: 25 600 − 15 410.5
                    alias = true;
                    // 4-pole Butterworth at 10 kHz: 10·log10(1 + (f/fc)^8) dB (Butterworth magnitude, any filter handbook)
                    double expected = 10 * Math.log10(1 + Math.pow(f / 10000, 8));
                    assertEquals(expected, Double.parseDouble(item.getText(4)), 0.06, "chain attenuation at " + f);
                }
            }
            assertTrue(mesh, "the 906.5 Hz mesh is a source peak");
            assertTrue(alias, "the folded 17th mesh harmonic is a source peak of the recording");
            Chart chart = find(shell, Chart.class);
            // eight tone curves, the Nyquist line, the chosen rate and the channel's rate
            assertEquals(FoldExplorerPart.SOURCE_PEAKS + 3, chart.getSeriesSet().getSeries().length);
            part.dispose();
        } finally {
            document.dispose();
        }
    }
}
