package org.foldbook.ui.notebook;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.jobs.IJobChangeEvent;
import org.eclipse.core.runtime.jobs.JobChangeAdapter;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.foldbook.ui.export.ExportMenu;

/**
 * The findings of the notebook's validation: a list with a status line, Check again and Stop. The
 * check runs as a {@link ValidationJob}; results reach the list through {@code ui} (the part's
 * UI-thread executor). Double-clicking a finding hands its object to {@code onSubject}.
 */
final class FindingsPane {

    private final Consumer<Runnable> ui;
    private final Label status;
    private final Button stop;
    private final Table table;
    private final Label text;
    private final List<Finding> shown = new ArrayList<>();
    private NotebookDocument checked;
    private ValidationJob job;

    FindingsPane(Composite parent, Consumer<Object> onSubject, Consumer<Runnable> ui) {
        this.ui = ui;
        Composite box = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(4).margins(0, 4).spacing(8, 4).applyTo(box);
        Label heading = new Label(box, SWT.NONE);
        heading.setText("Findings");
        heading.setFont(JFaceResources.getFontRegistry().getBold(JFaceResources.DEFAULT_FONT));
        status = new Label(box, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.CENTER).applyTo(status);
        Button check = new Button(box, SWT.PUSH);
        check.setText("Check again");
        check.addListener(SWT.Selection, e -> validate(checked));
        stop = new Button(box, SWT.PUSH);
        stop.setText("Stop");
        stop.setEnabled(false);
        stop.addListener(SWT.Selection, e -> {
            if (job != null) {
                job.cancel();
            }
        });
        table = new Table(box, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        ExportMenu.attach(table, "Findings");
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String column : new String[] { "Severity", "Object", "Finding" }) {
            TableColumn c = new TableColumn(table, SWT.LEFT);
            c.setText(column);
            c.setWidth(switch (column) {
                case "Severity" -> 80;
                case "Object" -> 200;
                default -> 900;
            });
        }
        // room for three findings without scrolling: the demo alone has two
        int threeRows = table.getHeaderHeight() + 3 * table.getItemHeight() + 2 * table.getBorderWidth();
        GridDataFactory.fillDefaults().span(4, 1).grab(true, true).hint(SWT.DEFAULT, threeRows).applyTo(table);
        text = new Label(box, SWT.WRAP);
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).hint(400, SWT.DEFAULT).applyTo(text);
        table.addListener(SWT.Selection, e -> showText(table.getSelectionIndex()));
        table.addListener(SWT.DefaultSelection, e -> {
            int index = table.getSelectionIndex();
            if (index >= 0 && index < shown.size() && shown.get(index).subject() != null) {
                onSubject.accept(shown.get(index).subject());
            }
        });
    }

    /** (Re)starts the check of {@code document} (null: clears the list); a running check is cancelled. */
    void validate(NotebookDocument document) {
        cancel();
        checked = document;
        if (document == null) {
            clear();
            return;
        }
        ValidationJob next = new ValidationJob(document, list -> ui.accept(() -> {
            if (checked == document && !table.isDisposed()) {
                show(list);
            }
        }), (done, total, what) -> ui.accept(() -> progress(done, total, what)));
        job = next;
        next.addJobChangeListener(new JobChangeAdapter() {
            @Override
            public void done(IJobChangeEvent event) {
                ui.accept(() -> {
                    if (job == next && !stop.isDisposed()) {
                        stop.setEnabled(false);
                        if (event.getResult().getSeverity() == IStatus.CANCEL) {
                            status.setText("Check stopped; the list below may be out of date.");
                        }
                    }
                });
            }
        });
        stop.setEnabled(true);
        status.setText("Checking…");
        next.schedule();
    }

    void cancel() {
        if (job != null) {
            job.cancel();
            job = null;
        }
    }

    void clear() {
        shown.clear();
        table.removeAll();
        text.setText("");
    }

    boolean isDisposed() {
        return table.isDisposed();
    }

    private void progress(int done, int total, String what) {
        if (status.isDisposed() || what == null) {
            return;
        }
        status.setText(String.format(Locale.ROOT, "Checking %d of %d: %s", done + 1, total, what));
    }

    private void show(List<Finding> list) {
        shown.clear();
        shown.addAll(list);
        table.removeAll();
        for (Finding f : list) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] { FindingsText.severity(f.severity()), f.object(), f.message() });
            if (f.severity() == Diagnostic.ERROR) {
                item.setForeground(0, table.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            } else if (f.severity() == Diagnostic.WARNING) {
                item.setForeground(0, table.getDisplay().getSystemColor(SWT.COLOR_DARK_YELLOW));
            }
        }
        table.getColumn(2).pack();
        if (!list.isEmpty()) {
            table.setSelection(0);
        }
        showText(list.isEmpty() ? -1 : 0);
        status.setText(FindingsText.status(list));
    }

    private void showText(int index) {
        text.setText(index >= 0 && index < shown.size() ? FindingsText.full(shown.get(index)) : "");
        text.getParent().layout(true, true);
    }
}
