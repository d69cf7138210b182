package org.foldbook.ui.notebook;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swt.widgets.Tree;
import org.eclipse.swt.widgets.TreeItem;
import org.eclipse.swtchart.Chart;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.SignalChain;
import org.foldbook.demo.GearboxDemo;
import static org.foldbook.ui.testing.Widgets.find;
import static org.foldbook.ui.testing.Widgets.findAll;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.io.TempDir;

/**
 * The notebook part in a real SWT shell on the demo notebook (needs a display; the test command
 * provides Xvfb). Check values are worked out by hand: Nyquist = fs/2 (sampling theorem); the
 * 4th-order Butterworth at 10 kHz attenuates 10·log10(1 + (12.8/10)^8) = 9.14 dB at 12.8 kHz
 * (Butterworth magnitude, any filter handbook); a 0.8 ms exposure is a box-car whose magnitude at
 * 500 Hz is sin(0.4π)/(0.4π) = 0.7568, i.e. 2.42 dB (rectangular-window transform, common practice).
 */
class NotebookPartTest {

    private static final long WAIT_NANOS = 120_000_000_000L;

    @TempDir
    Path folder;

    private Display display;
    private Shell shell;
    private NotebookPart part;
    private NotebookDocument document;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1300, 850);
        shell.setLayout(new org.eclipse.swt.layout.FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        part = new NotebookPart();
        Composite host = new Composite(shell, SWT.NONE);
        part.createControls(host);
        part.show(document);
        shell.layout(true, true);
    }

    @AfterEach
    void close() {
        part.dispose();
        shell.dispose();
        document.dispose();
    }

    @Test
    @DisplayName("the tree shows inventory, rigs with chains, experiments with channels")
    void treeContent() {
        Tree tree = find(shell, Tree.class);
        assertEquals(1, tree.getItemCount());
        TreeItem root = tree.getItem(0);
        assertEquals(document.notebook().getTitle(), root.getText(0));
        assertEquals(List.of("Inventory (10)", "Rigs (1)", "Experiments (3)"), texts(root.getItems()));
        TreeItem rig = root.getItem(1).getItem(0);
        assertEquals("gearbox stand GB-2", rig.getText(0));
        assertEquals(List.of("housing Z, filtered", "bearing Z, filter bypassed", "sound at 0.5 m", "shaft mark camera",
                "housing Z, wide-band survey"),
                texts(rig.getItems()));
        // Nyquist of the vibration chains: 25.6 kS/s / 2 = 12.8 kHz
        assertEquals("Nyquist 12.8 kHz, 4 stages", rig.getItem(0).getText(1));
        TreeItem run = root.getItem(2).getItem(0);
        assertEquals(List.of("housing Z", "bearing Z", "sound 0.5 m", "data/vibration-run1.wav", "data/sound-run1.wav"),
                texts(run.getItems()));
    }

    @Test
    @DisplayName("a channel's figures: 25.6 kS/s, Nyquist 12.8 kHz, Butterworth 4 @ 10 kHz gives 9.1 dB at Nyquist")
    void channelFigures() {
        part.select(channel("housing Z"));
        Map<String, String> rows = figures();
        assertEquals("25.6 kS/s", rows.get("Sample rate"));
        assertEquals("12.8 kHz", rows.get("Nyquist frequency"));
        assertEquals("9.1 dB attenuation", rows.get("Analog filter at Nyquist"));
        assertEquals("32 kHz (sensor band or resonance)", rows.get("Front end passes up to"));
        assertTrue(rows.containsKey("Alias-free band") && rows.containsKey("Protection margin"), rows.toString());
        // the demo's criterion: aliases of −30 dBFS content must fall under a 110 dB dynamic range
        assertEquals("110 dB range + −30 dBFS content = 80 dB", rows.get("Needed attenuation"));
        // Butterworth |H|² = 1/(1+(f/fc)^2n): 9.14 dB at 12.8 kHz, 9.14 − 80 = −70.86 dB (hand-computed)
        assertEquals("-70.9 dB (short of the need)", rows.get("Protection margin"));
        // 25.6 kHz lies inside the front end's 32 kHz and folds onto 0 Hz (sampling theorem)
        assertEquals("none (limited by content at 25.6 kHz)", rows.get("Alias-free band"));
        Chart chart = find(shell, Chart.class);
        // response, the band that folds, the Nyquist line, the needed attenuation
        assertEquals(4, chart.getSeriesSet().getSeries().length);

        part.select(channel("bearing Z"));
        rows = figures();
        assertEquals("none in the chain", rows.get("Analog filter at Nyquist"));
        assertEquals("12.8 kHz – 32 kHz lands in 0 Hz – 12.8 kHz", rows.get("Folds unprotected"));
        assertEquals("-80.0 dB (short of the need)", rows.get("Protection margin")); // |H| = 1: 0 − 80 dB

        part.select(channel("sound 0.5 m"));
        rows = figures();
        // no level stated for the microphone chain: the worst case, a full-scale tone, against 105 dB
        assertEquals("105 dB range + 0 dBFS content (worst case: no level given) = 105 dB", rows.get("Needed attenuation"));
        assertEquals("nothing above Nyquist reaches the digitizer", rows.get("Protection margin"));

        part.select(channel("mark brightness"));
        rows = figures();
        assertEquals("1000 frames/s", rows.get("Frame rate"));
        assertEquals("500 Hz", rows.get("Nyquist frequency"));
        assertEquals("1 ms", rows.get("Frame period"));
        assertEquals("0.8 ms (80 % of the frame period)", rows.get("Exposure"));
        assertEquals("2.4 dB attenuation", rows.get("Exposure smear at Nyquist"));
    }

    @Test
    @DisplayName("a recording shows its logged SHA-256 and rate; the rig its validity and safety notes")
    void otherObjectsShowTheirFacts() throws Exception {
        org.foldbook.model.Recording recording = document.notebook().getExperiments().get(0).getRecordings().get(0);
        part.select(recording);
        Map<String, String> rows = figures();
        String sha = java.util.HexFormat.of().formatHex(java.security.MessageDigest.getInstance("SHA-256")
                .digest(java.nio.file.Files.readAllBytes(folder.resolve("data/vibration-run1.wav")))); // FIPS 180-4, JDK
        assertEquals(sha, rows.get("SHA-256 logged"));
        assertEquals("25.6 kS/s", rows.get("Declared rate"));
        assertEquals("2", rows.get("Channels"));
        part.select(document.notebook().getRigs().get(0));
        rows = figures();
        assertEquals("2026-03-01", rows.get("Valid from"));
        assertTrue(rows.get("Notes").contains("guards closed"), rows.get("Notes"));
        org.foldbook.model.Digitizer daq = (org.foldbook.model.Digitizer) document.notebook().getDevices().stream()
                .filter(d -> "DAQ-8".equals(d.getId())).findFirst().orElseThrow();
        part.select(daq);
        assertEquals("110 dB (specification)", figures().get("Dynamic range"));
        daq.setDynamicRangeDb(null);
        part.select(document.notebook().getRigs().get(0));
        part.select(daq);
        // 20·log10(2^24·√1.5) = 146.26 dB (Kester, Analog Devices MT-001: 6.02·N + 1.76 dB)
        assertEquals("146.3 dB (not given: ideal quantiser, 6.02·N + 1.76 dB)", figures().get("Dynamic range"));
    }

    @Test
    @DisplayName("the findings list the filter short of the need and the bypassed filter; double-click selects its chain")
    void findingsListed() {
        Table findings = findingsTable();
        waitFor(() -> findings.getItemCount() > 0 || statusText().startsWith("No findings"), "validation job");
        assertEquals(2, findings.getItemCount(), statusText());
        TableItem short_ = findings.getItem(0);
        assertEquals("Warning", short_.getText(0));
        assertEquals("housing Z, filtered", short_.getText(1));
        assertTrue(short_.getText(2).startsWith("content that folds is attenuated by as little as 9.1 dB where 80.0 dB is needed"),
                short_.getText(2));
        TableItem item = findings.getItem(1);
        assertEquals("Warning", item.getText(0));
        assertEquals("bearing Z, filter bypassed", item.getText(1));
        assertTrue(item.getText(2).startsWith("no anti-alias filter"), item.getText(2));
        assertTrue(statusText().startsWith("0 error(s), 2 warning(s)"), statusText());

        findings.setSelection(1);
        findings.notifyListeners(SWT.DefaultSelection, new Event());
        SignalChain shown = part.shownChain();
        assertNotNull(shown);
        assertEquals("CH-BZ", shown.getId());
    }

    @Test
    @DisplayName("changing the rate is a command: figures follow, undo and redo restore, the notebook is dirty")
    void editUndoRedo() throws IOException {
        part.select(channel("housing Z"));
        Text rate = findAll(shell, Text.class).get(0);
        rate.setText("51200");
        rate.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(document.isDirty());
        assertEquals("25.6 kHz", figures().get("Nyquist frequency")); // 51.2 kS/s / 2
        document.undo();
        assertEquals("12.8 kHz", figures().get("Nyquist frequency"));
        assertFalse(document.isDirty());
        document.redo();
        assertEquals("25.6 kHz", figures().get("Nyquist frequency"));

        part.persist(); // what the workbench calls when it saves the part
        assertFalse(document.isDirty());
        assertTrue(java.nio.file.Files.readString(document.file()).contains("51200"), "the saved file holds the new rate");

        rate.setText("fast");
        rate.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(findAll(shell, Label.class).stream().anyMatch(l -> l.getText().contains("not a number: 'fast'")));
        rate.setText("100000"); // above the digitizer's 51.2 kS/s
        rate.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(findAll(shell, Label.class).stream().anyMatch(l -> l.getText().contains("above the digitizer's maximum")));
        assertEquals("25.6 kHz", figures().get("Nyquist frequency"));
    }

    @Test
    @DisplayName("changing the out-of-band level is a command: the need follows (110 dB − 50 dBFS = 60 dB), undo restores, empty unsets")
    void editOutOfBandLevel() {
        part.select(channel("housing Z"));
        Text level = findAll(shell, Text.class).get(2);
        assertEquals("-30", level.getText());
        level.setText("-50");
        level.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(document.isDirty());
        assertEquals(-50.0, part.shownChain().getOutOfBandLevelDbfs());
        assertEquals("110 dB range + −50 dBFS content = 60 dB", figures().get("Needed attenuation"));
        document.undo();
        assertEquals("110 dB range + −30 dBFS content = 80 dB", figures().get("Needed attenuation"));
        assertFalse(document.isDirty());

        level.setText("");
        level.notifyListeners(SWT.DefaultSelection, new Event());
        assertNull(part.shownChain().getOutOfBandLevelDbfs());
        assertEquals("110 dB range + 0 dBFS content (worst case: no level given) = 110 dB", figures().get("Needed attenuation"));
        document.undo();
        assertEquals(-30.0, part.shownChain().getOutOfBandLevelDbfs());

        level.setText("loud");
        level.notifyListeners(SWT.DefaultSelection, new Event());
        assertTrue(findAll(shell, Label.class).stream().anyMatch(l -> l.getText().contains("Out-of-band level is not a number: 'loud'")));
        assertEquals(-30.0, part.shownChain().getOutOfBandLevelDbfs());
    }

    @Test
    @DisplayName("the Save, Undo and Redo handlers through E4 injection: enabled when they can act, save is atomic with a .bak")
    void handlersThroughInjection() throws Exception {
        org.eclipse.e4.core.contexts.IEclipseContext context = org.eclipse.e4.core.contexts.EclipseContextFactory.create();
        CurrentNotebook current = new CurrentNotebook();
        context.set(CurrentNotebook.class, current);
        context.set(org.eclipse.e4.ui.services.IServiceConstants.ACTIVE_SHELL, shell);
        Object save = new NotebookHandlers.Save();
        Object undo = new NotebookHandlers.Undo();
        Object redo = new NotebookHandlers.Redo();
        assertEquals(Boolean.FALSE, canExecute(save, context)); // nothing open yet
        current.open(document);
        assertEquals(Boolean.FALSE, canExecute(save, context)); // open but unchanged
        assertEquals(Boolean.FALSE, canExecute(undo, context));

        part.select(channel("housing Z"));
        Text rate = findAll(shell, Text.class).get(0);
        rate.setText("51200");
        rate.notifyListeners(SWT.DefaultSelection, new Event());
        assertEquals(Boolean.TRUE, canExecute(undo, context));
        org.eclipse.e4.core.contexts.ContextInjectionFactory.invoke(undo, org.eclipse.e4.core.di.annotations.Execute.class, context);
        assertEquals("12.8 kHz", figures().get("Nyquist frequency"));
        assertEquals(Boolean.TRUE, canExecute(redo, context));
        org.eclipse.e4.core.contexts.ContextInjectionFactory.invoke(redo, org.eclipse.e4.core.di.annotations.Execute.class, context);
        assertEquals("25.6 kHz", figures().get("Nyquist frequency"));

        byte[] before = java.nio.file.Files.readAllBytes(document.file());
        assertEquals(Boolean.TRUE, canExecute(save, context));
        org.eclipse.e4.core.contexts.ContextInjectionFactory.invoke(save, org.eclipse.e4.core.di.annotations.Execute.class, context);
        assertFalse(document.isDirty());
        assertEquals(Boolean.FALSE, canExecute(save, context));
        Path backup = org.foldbook.model.persistence.NotebookStore.backupOf(document.file());
        assertTrue(java.util.Arrays.equals(before, java.nio.file.Files.readAllBytes(backup)), "the .bak is the previous file");
        NotebookDocument reread = NotebookDocument.load(document.file());
        try {
            SignalChain chain = reread.notebook().getRigs().get(0).getChains().get(0);
            assertEquals(51200.0, org.foldbook.model.derived.ChainFigures.samplingRateHz(chain));
        } finally {
            reread.dispose();
        }
        context.dispose();
    }

    private static Object canExecute(Object handler, org.eclipse.e4.core.contexts.IEclipseContext context) {
        return org.eclipse.e4.core.contexts.ContextInjectionFactory.invoke(handler,
                org.eclipse.e4.core.di.annotations.CanExecute.class, context, Boolean.FALSE);
    }

    @Test
    @DisplayName("a truncated notebook file: the job reports file, line and problem, and leaves the file as it was")
    void damagedFileIsReportedAndKept() throws Exception {
        Path damaged = folder.resolve("damaged.foldbook");
        byte[] whole = java.nio.file.Files.readAllBytes(document.file());
        byte[] truncated = java.util.Arrays.copyOf(whole, whole.length / 2);
        java.nio.file.Files.write(damaged, truncated);
        List<String> problems = new java.util.concurrent.CopyOnWriteArrayList<>();
        List<NotebookDocument> opened = new java.util.concurrent.CopyOnWriteArrayList<>();
        OpenNotebookJob job = OpenNotebookJob.of(damaged, opened::add, problems::add);
        job.schedule();
        job.join();
        assertTrue(opened.isEmpty());
        assertEquals(1, problems.size());
        assertTrue(problems.get(0).contains(damaged.toString()) && problems.get(0).contains("line"), problems.get(0));
        assertTrue(java.util.Arrays.equals(truncated, java.nio.file.Files.readAllBytes(damaged)), "the file was changed");

        // the part of a workbench whose start-up failed to open it says why (besides the dialog)
        CurrentNotebook current = new CurrentNotebook();
        NotebookPart other = new NotebookPart();
        other.current = current;
        Shell second = new Shell(display);
        try {
            other.createControls(second);
            current.failed(problems.get(0));
            assertTrue(findAll(second, Label.class).stream()
                    .anyMatch(l -> l.getText().equals("Could not open the notebook: " + problems.get(0))));
            current.open(NotebookDocument.load(document.file())); // a later open replaces the message
            assertEquals(current.document(), other.document());
        } finally {
            other.dispose();
            second.dispose();
            current.document().dispose();
        }
    }

    private Channel channel(String name) {
        for (Experiment e : document.notebook().getExperiments()) {
            for (Channel c : e.getChannels()) {
                if (name.equals(c.getName())) {
                    return c;
                }
            }
        }
        return fail("no channel " + name);
    }

    /** The figures table: figure → value. */
    private Map<String, String> figures() {
        Table table = findAll(shell, Table.class).get(0);
        Map<String, String> rows = new LinkedHashMap<>();
        for (TableItem item : table.getItems()) {
            rows.put(item.getText(0), item.getText(1));
        }
        return rows;
    }

    private Table findingsTable() {
        List<Table> tables = findAll(shell, Table.class);
        return tables.get(tables.size() - 1);
    }

    private String statusText() {
        return findAll(shell, Label.class).stream().map(Label::getText)
                .filter(t -> t.startsWith("No findings") || t.contains("error(s)") || t.startsWith("Checking"))
                .findFirst().orElse("");
    }


    private static List<String> texts(TreeItem[] items) {
        List<String> out = new ArrayList<>();
        for (TreeItem i : items) {
            out.add(i.getText(0));
        }
        return out;
    }

    private void waitFor(BooleanSupplier condition, String what) {
        Widgets.waitFor(display, condition, what, WAIT_NANOS);
    }
}
