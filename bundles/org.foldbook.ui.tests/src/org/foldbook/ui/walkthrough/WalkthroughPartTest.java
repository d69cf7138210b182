package org.foldbook.ui.walkthrough;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.foldbook.ui.testing.Widgets.find;
import static org.foldbook.ui.testing.Widgets.findAll;

import java.io.IOException;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The walkthrough part in a real SWT shell on the demo notebook (needs a display; the tests run under
 * Xvfb): stepping through a chain with the buttons, the what-if typed into its field, Keep this and undo,
 * and the camera's animation with another frame rate. Values worked by hand as in
 * {@link WalkthroughPresenterTest} (fold formula, Butterworth magnitude).
 */
class WalkthroughPartTest {

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private WalkthroughPart part;
    private NotebookDocument document;
    private CurrentNotebook current;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1360, 620);
        shell.setLayout(new FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        current = new CurrentNotebook();
        current.open(document);
        part = new WalkthroughPart();
        part.current = current;
        Composite host = new Composite(shell, SWT.NONE);
        part.createControls(host);
        shell.open();
        shell.layout(true, true);
        pump(100);
    }

    @AfterEach
    void close() {
        part.dispose();
        shell.dispose();
        document.dispose();
    }

    @Test
    @DisplayName("Next steps through the housing chain, the picture follows, the pages show the notebook's numbers")
    void stepsThroughAChain() {
        Button next = button("Next ▶");
        Button back = button("◀ Back");
        assertEquals("Cautions: gearbox stand GB-2", part.session().page().title());
        assertFalse(back.isEnabled());
        String[] titles = { "Sensor: ACC-H1", "Conditioner: CAMP-2", "Anti-alias filter: LP-A", "Digitizer: DAQ-8" };
        for (int i = 0; i < titles.length; i++) {
            click(next);
            assertEquals(titles[i], part.session().page().title());
            assertEquals(i + 1, part.picture().highlighted());
        }
        assertFalse(next.isEnabled());
        assertEquals("25.6 kS/s", figures().get("Sampling rate"));
        assertEquals("none (limited by content at 25.6 kHz)", figures().get("Alias-free band"));
        assertEquals(2, part.pageView().plot().bandCount()); // folds back, lands in
        click(back);
        assertEquals("Anti-alias filter: LP-A", part.session().page().title());
        screenshot("walkthrough-filter.png");
        assertEquals("9.1 dB at 12.8 kHz", figures().get("Attenuation at Nyquist")); // 10·log10(1 + 1.28^8)
    }

    @Test
    @DisplayName("the what-if typed in changes the page at once; Keep this is one undoable edit")
    void whatIfAndKeep() {
        part.session().goTo(4);
        click(button("Next ▶")); // already last: stays
        Text rate = find(shell, Text.class, t -> t.getText().equals("25600"));
        rate.setText("51200");
        pump(50);
        assertEquals("51.2 kS/s", figures().get("Sampling rate"));
        assertEquals("0 – 19.2 kHz (limited by content at 32 kHz)", figures().get("Alias-free band")); // 51.2 − 32
        assertEquals(25600, ChainFigures.samplingRateHz(document.notebook().getRigs().get(0).getChains().get(0)), 0);
        rate.setText("fast");
        pump(20);
        assertEquals("51.2 kS/s", figures().get("Sampling rate")); // a bad value changes nothing
        click(button("Keep this"));
        assertTrue(document.canUndo());
        assertTrue(document.isDirty());
        assertEquals(51200, ChainFigures.samplingRateHz(document.notebook().getRigs().get(0).getChains().get(0)), 0);
        assertEquals("51.2 kS/s", figures().get("Sampling rate"));
        document.undo(); // what Edit ▸ Undo runs
        pump(20);
        assertEquals(25600, ChainFigures.samplingRateHz(document.notebook().getRigs().get(0).getChains().get(0)), 0);
        assertEquals("25.6 kS/s", figures().get("Sampling rate"));
    }

    @Test
    @DisplayName("camera chain: the mark turns forward at 1000 frames/s, backward at 25 frames/s; the animation runs")
    void cameraChain() {
        Combo chains = find(shell, Combo.class, c -> c.getItemCount() == 5);
        chains.select(3);
        Widgets.select(chains);
        click(button("Next ▶"));
        assertEquals("Camera: CAM-HS", part.session().page().title());
        assertEquals("+24.5 rev/s (forward)", figures().get("Apparent rotation"));
        assertNotNull(part.pageView().motion().motion());
        Spinner fps = part.pageView().frameRate();
        assertTrue(fps.isVisible());
        fps.setSelection(250); // 25.0 frames/s
        Widgets.select(fps);
        pump(300); // a few animation ticks on the UI thread
        screenshot("walkthrough-camera.png");
        // 24.5 − round(24.5/25)·25 = −0.5 (fold formula)
        assertEquals("−0.5 rev/s (backward)", figures().get("Apparent rotation"));
        assertEquals(-0.5, part.pageView().motion().motion().seen().apparentRevolutionsPerSecond(), 1e-12);
        assertEquals(1000, ChainFigures.samplingRateHz(document.notebook().getRigs().get(0).getChains().get(3)), 0);
    }

    @Test
    @DisplayName("Export page writes the rig's walkthrough in a job and says where")
    void export() throws Exception {
        Path file = folder.resolve("walkthrough.html");
        ExportJob job = part.exportTo(file);
        job.schedule();
        job.join();
        pump(100);
        org.jsoup.nodes.Document page = org.jsoup.Jsoup.parse(file.toFile(), "UTF-8");
        assertEquals(5, page.select("section.chain").size()); // the demo rig's five chains
        assertEquals(1 + 4 + 4 + 2 + 1 + 3, page.select("section.stage").size()); // cautions + every stage
        // the job tells the part through Display.asyncExec
        Widgets.waitFor(display, () -> !findAll(shell, Label.class, l -> l.getText().startsWith("Walkthrough written to "))
                .isEmpty(), "saying where the page went", 20_000_000_000L);
        java.nio.file.Files.createDirectories(Path.of("target", "screenshots")); // kept for a person to look at
        java.nio.file.Files.copy(file, Path.of("target", "screenshots", "walkthrough-gb-2.html"),
                java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }

    private Map<String, String> figures() {
        Table table = part.pageView().figures();
        Map<String, String> rows = new LinkedHashMap<>();
        for (TableItem item : table.getItems()) {
            rows.put(item.getText(0), item.getText(1));
        }
        return rows;
    }

    private Button button(String text) {
        return Widgets.button(shell, text);
    }

    private void click(Button b) {
        if (b.isEnabled()) {
            Widgets.select(b);
        }
        pump(20);
    }

    private void pump(long millis) {
        Widgets.pump(display, millis);
    }

    private void screenshot(String name) {
        Widgets.screenshot(shell, name);
    }
}
