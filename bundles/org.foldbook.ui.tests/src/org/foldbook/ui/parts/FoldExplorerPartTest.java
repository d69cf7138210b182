package org.foldbook.ui.parts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Control;
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
        Text[] fields = findAll(shell, Text.class);
        fields[0].setText("1.5");
        fields[1].setText("1.9");
        Table table = find(shell, Table.class);
        assertEquals(1, table.getItemCount());
        // 1.5 Hz sampled at 1.9 S/s appears at 0.4 Hz (common practice)
        assertEquals("0.400000", table.getItem(0).getText(1));
        assertEquals("alias", table.getItem(0).getText(3));
    }

    @Test
    void badInputIsShownNotThrown() {
        new FoldExplorerPart().createControls(shell);
        Text[] fields = findAll(shell, Text.class);
        fields[1].setText("-3");
        Label status = find(shell, Label.class, l -> (l.getStyle() & SWT.WRAP) != 0);
        assertTrue(status.getText().startsWith("Sample rate must be a positive number"), status.getText());
        fields[1].setText("fast");
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
            long end = System.nanoTime() + 120_000_000_000L;
            while (part.job() != null) {
                assertTrue(System.nanoTime() < end, "reading the peaks did not finish");
                if (!display.readAndDispatch()) {
                    display.sleep();
                }
            }
            Text[] fields = findAll(shell, Text.class);
            assertEquals("25600.0", fields[1].getText(), "the channel's rate (GearboxDemo: 25.6 kS/s)");
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

    private static <T extends Control> T find(Control root, Class<T> type) {
        return find(root, type, c -> true);
    }

    private static <T extends Control> T find(Control root, Class<T> type, java.util.function.Predicate<T> ok) {
        T[] all = findAll(root, type);
        for (T t : all) {
            if (ok.test(t)) {
                return t;
            }
        }
        return fail("no matching " + type.getSimpleName() + " in the part");
    }

    @SuppressWarnings("unchecked")
    private static <T extends Control> T[] findAll(Control root, Class<T> type) {
        java.util.List<T> found = new java.util.ArrayList<>();
        collect(root, type, found);
        return found.toArray((T[]) java.lang.reflect.Array.newInstance(type, 0));
    }

    private static <T extends Control> void collect(Control c, Class<T> type, java.util.List<T> found) {
        if (type.isInstance(c)) {
            found.add(type.cast(c));
        }
        if (c instanceof org.eclipse.swt.widgets.Composite comp && !(c instanceof Chart)) {
            for (Control child : comp.getChildren()) {
                collect(child, type, found);
            }
        }
    }
}
