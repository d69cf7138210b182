package org.foldbook.ui.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.foldbook.demo.GearboxDemo;
import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Channel;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import static org.foldbook.ui.testing.Widgets.find;
import static org.foldbook.ui.testing.Widgets.findAll;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.foldbook.ui.testing.Widgets;
import org.junit.jupiter.api.io.TempDir;

/** The audit part on the demo, real SWT widgets: run, findings, select, stop, report. */
class AuditPartTest {
    private static final long WAIT_NANOS = 180_000_000_000L;
    @TempDir
    Path folder;
    private Display display;
    private Shell shell;
    private AuditPart part;
    private CurrentNotebook current;
    private NotebookDocument document;

    @BeforeEach
    void open() throws IOException {
        display = Display.getDefault();
        shell = new Shell(display);
        shell.setSize(1200, 700);
        shell.setLayout(new FillLayout());
        document = NotebookDocument.load(GearboxDemo.write(folder));
        current = new CurrentNotebook();
        current.open(document);
        part = new AuditPart();
        part.current = current;
        part.createControls(new Composite(shell, SWT.NONE));
        shell.layout(true, true);
        shell.open();
    }

    @AfterEach
    void close() {
        part.dispose();
        shell.dispose();
        document.dispose();
    }

    @Test
    void auditsTheDemoAndSelectsWhatAFindingIsAbout() throws IOException {
        press("Audit notebook");
        Table table = find(shell, Table.class);
        waitFor(() -> table.getItemCount() > 0, "the audit");
        // the housing channel's 10.19 kHz peak is the 17th mesh harmonic (15.41 kHz) folded at 25.6 kS/s:
        // |15410.5 − 25600| = 10189.5 Hz (fold formula); the survey recording is the evidence
        assertEquals(10189.5, Folding.apparentHz(17 * 906.5, 25600), 1e-9);
        List<AuditRows.Row> rows = part.rows();
        assertEquals("Error", rows.get(0).severity(), "most severe first");
        int folded = -1;
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).where().endsWith("/ housing Z") && rows.get(i).message().contains("10.19 kHz")
                    && rows.get(i).message().contains("probably folded")) {
                folded = i;
            }
        }
        assertTrue(folded >= 0, "a 'probably folded' finding for housing Z at 10.19 kHz: " + rows);
        table.setSelection(folded);
        table.notifyListeners(SWT.DefaultSelection, new Event());
        Channel selected = assertInstanceOf(Channel.class, current.selection());
        assertEquals("housing Z", selected.getName());

        press("Write report");
        waitFor(() -> part.lastReport() != null, "the report");
        String html = Files.readString(part.lastReport());
        assertTrue(html.contains("<svg") && html.contains("housing Z survey"), "plots and every channel");
    }

    @Test
    void stopEndsTheAudit() {
        press("Audit notebook");
        press("Stop");
        Button run = findButton("Audit notebook");
        waitFor(run::isEnabled, "the stop");
        Label status = find(shell, Label.class);
        assertTrue(status.getText().contains("stopped") || part.rows().size() > 0, status.getText());
    }

    private void press(String text) {
        Widgets.select(findButton(text));
    }

    private Button findButton(String text) {
        return Widgets.button(shell, text);
    }

    private void waitFor(BooleanSupplier condition, String what) {
        Widgets.waitFor(display, condition, what, WAIT_NANOS);
    }
}
