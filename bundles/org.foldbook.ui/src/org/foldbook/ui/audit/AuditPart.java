package org.foldbook.ui.audit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.program.Program;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.foldbook.audit.HtmlReport;
import org.foldbook.audit.NotebookAudit;
import org.foldbook.ui.export.ExportMenu;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * The audit of the open notebook's recordings before reanalysis: the findings of every channel, the
 * most severe first, from a background {@link AuditJob} (progress in the status line, Stop). Double-
 * clicking a finding selects its object in the Notebook part; Write report writes the self-contained
 * HTML report beside the notebook and opens it in the system browser.
 */
public class AuditPart {
    public static final String PART_ID = "org.foldbook.ui.part.audit";

    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    CurrentNotebook current;
    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    UISynchronize sync;

    private Label status;
    private Button run;
    private Button stop;
    private Button report;
    private Table table;
    private Label detail;
    private final List<AuditRows.Row> rows = new ArrayList<>();
    private NotebookAudit shown;
    private NotebookDocument audited;
    private AuditJob job;
    private Path lastReport;

    @PostConstruct
    public void createControls(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(6, 6).spacing(6, 4).numColumns(4).applyTo(parent);
        status = new Label(parent, SWT.WRAP);
        status.setText("Audits every channel's recording before reanalysis: what the chain lets fold, what the "
                + "data shows, which peaks could be aliases.");
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(status);
        run = button(parent, "Audit notebook", this::audit);
        stop = button(parent, "Stop", () -> {
            if (job != null) {
                job.cancel();
            }
        });
        stop.setEnabled(false);
        report = button(parent, "Write report", this::writeReport);
        report.setEnabled(false);
        table = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String[] c : new String[][] {{"Severity", "80"}, {"Experiment / channel", "260"}, {"Finding", "900"}}) {
            TableColumn col = new TableColumn(table, SWT.LEFT);
            col.setText(c[0]);
            col.setWidth(Integer.parseInt(c[1]));
        }
        GridDataFactory.fillDefaults().span(4, 1).grab(true, true).applyTo(table);
        ExportMenu.attach(table, "Audit findings");
        detail = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).hint(300, SWT.DEFAULT).applyTo(detail);
        table.addListener(SWT.Selection, e -> showDetail(table.getSelectionIndex()));
        table.addListener(SWT.DefaultSelection, e -> selectSubject(table.getSelectionIndex()));
    }

    private static Button button(Composite parent, String text, Runnable action) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        b.addListener(SWT.Selection, e -> action.run());
        return b;
    }

    /** Starts the audit of the open notebook (a running one is cancelled first). */
    public void audit() {
        NotebookDocument doc = current == null ? null : current.document();
        if (doc == null) {
            status.setText("No notebook open.");
            return;
        }
        if (job != null) {
            job.cancel();
        }
        audited = doc;
        AuditJob next = new AuditJob(doc.notebook(), doc.file(), result -> ui(() -> show(result)));
        job = next;
        next.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                ui(() -> {
                    if (job == next) {
                        stop.setEnabled(false);
                        run.setEnabled(true);
                        if (event.getResult().getSeverity() == IStatus.CANCEL) {
                            status.setText("Audit stopped; nothing was changed.");
                        }
                    }
                });
            }
        });
        run.setEnabled(false);
        stop.setEnabled(true);
        status.setText("Auditing " + doc.file().getFileName() + " … (progress below the window; Stop ends it)");
        next.schedule();
    }

    private void show(NotebookAudit audit) {
        shown = audit;
        rows.clear();
        rows.addAll(AuditRows.of(audit));
        table.removeAll();
        for (AuditRows.Row r : rows) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {r.severity(), r.where(), r.message()});
            if (r.rank() == 0) {
                item.setForeground(0, table.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            } else if (r.rank() == 1) {
                item.setForeground(0, table.getDisplay().getSystemColor(SWT.COLOR_DARK_YELLOW));
            }
        }
        status.setText(AuditRows.status(audit) + " Double-click a finding to select its object.");
        report.setEnabled(true);
        showDetail(rows.isEmpty() ? -1 : 0);
        status.getParent().layout(true, true);
    }

    private void showDetail(int index) {
        detail.setText(index >= 0 && index < rows.size() ? rows.get(index).where() + ": " + rows.get(index).message() : "");
        detail.getParent().layout(true, true);
    }

    private void selectSubject(int index) {
        if (index < 0 || index >= rows.size() || audited == null || current == null
                || current.document() != audited) {
            return;
        }
        String ref = rows.get(index).subjectRef();
        EObject object = ref.isEmpty() ? null : audited.notebook().eResource().getEObject(ref);
        if (object != null) {
            current.select(object);
        }
    }

    /** Writes the HTML report beside the notebook in a background job, then opens it in the browser. */
    public void writeReport() {
        if (shown == null || audited == null) {
            return;
        }
        NotebookAudit audit = shown;
        String name = audited.file().getFileName().toString().replaceFirst("\\.foldbook$", "");
        Path out = audited.file().resolveSibling(name + "-audit.html");
        report.setEnabled(false);
        Job write = Job.create("Writing the audit report " + out.getFileName(), monitor -> {
            try {
                HtmlReport.write(audit, out);
                ui(() -> {
                    lastReport = out;
                    status.setText("Report written: " + out);
                    report.setEnabled(true);
                    Program.launch(out.toUri().toString());
                });
                return Status.OK_STATUS;
            } catch (IOException | RuntimeException e) {
                ui(() -> {
                    status.setText("Cannot write the report " + out + ": " + e.getMessage());
                    report.setEnabled(true);
                });
                return Status.OK_STATUS; // said in the part
            }
        });
        write.schedule();
    }

    /** The report last written (tests). */
    Path lastReport() {
        return lastReport;
    }

    /** The rows shown (tests). */
    List<AuditRows.Row> rows() {
        return List.copyOf(rows);
    }

    private void ui(Runnable r) {
        Runnable guarded = () -> {
            if (!table.isDisposed()) {
                r.run();
            }
        };
        if (sync != null) {
            sync.asyncExec(guarded);
        } else {
            table.getDisplay().asyncExec(guarded);
        }
    }

    @PreDestroy
    public void dispose() {
        if (job != null) {
            job.cancel();
        }
    }
}
