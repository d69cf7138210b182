package org.foldbook.ui.notebook;

import java.util.function.Consumer;

import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.TreeViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.foldbook.model.SignalChain;
import org.foldbook.model.persistence.NotebookSaving;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * The notebook part: a tree of the open notebook (inventory, rigs with their chains and stages,
 * experiments with their channels and recordings), a details pane with the figures of the selected
 * chain or channel — computed on demand, never stored — and its magnitude response, and the findings
 * of the notebook's validation, which runs as a background job and can be stopped. Double-clicking a
 * finding selects its object. The sampling rate, filter cutoff and out-of-band level of a chain can be
 * changed in the details; each change is a command (undo/redo) and the figures and findings follow.
 */
public class NotebookPart {

    /** The part's id in the application model. */
    public static final String PART_ID = "org.foldbook.ui.part.notebook";

    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    UISynchronize sync;
    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    CurrentNotebook current;
    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    MPart part;

    private Display display;
    private Label fileLabel;
    private TreeViewer tree;
    private DetailsPane details;
    private FindingsPane findings;

    private NotebookDocument document;
    private final CommandStackListener onChange = event -> changed(); // commands run on the UI thread
    /** Another part (the audit, a finding) selects a notebook object: the tree reveals it. */
    private final Consumer<Object> onOtherPartsSelection = selected -> {
        if (selected instanceof org.eclipse.emf.ecore.EObject && !tree.getControl().isDisposed()
                && tree.getStructuredSelection().getFirstElement() != selected) {
            tree.setSelection(new StructuredSelection(selected), true);
        }
    };
    private final Consumer<CurrentNotebook> onOpen = c -> {
        if (fileLabel.isDisposed()) {
            return;
        }
        if (c.document() != document) {
            show(c.document());
        } else if (document != null) {
            updateFileLabel(); // saved
        } else if (c.problem() != null) {
            showProblem(c.problem());
        }
    };

    @PostConstruct
    public void createControls(Composite parent) {
        display = parent.getDisplay();
        GridLayoutFactory.fillDefaults().margins(6, 6).spacing(4, 4).applyTo(parent);
        fileLabel = new Label(parent, SWT.WRAP);
        fileLabel.setText("No notebook open. File ▸ Open notebook… (Ctrl+O) opens one.");
        GridDataFactory.fillDefaults().grab(true, false).hint(400, SWT.DEFAULT).applyTo(fileLabel);

        // tree on the left over the full height; details above findings on the right
        SashForm outer = new SashForm(parent, SWT.HORIZONTAL);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(outer);
        createTree(outer);
        SashForm right = new SashForm(outer, SWT.VERTICAL);
        details = new DetailsPane(right);
        findings = new FindingsPane(right, this::select, this::ui);
        right.setWeights(60, 40);
        outer.setWeights(34, 66);

        if (current != null) {
            current.addListener(onOpen);
            current.addSelectionListener(onOtherPartsSelection);
            if (current.document() != null) {
                show(current.document());
            } else if (current.problem() != null) {
                showProblem(current.problem());
            }
        }
    }

    private void createTree(Composite parent) {
        tree = new TreeViewer(parent, SWT.BORDER | SWT.SINGLE | SWT.FULL_SELECTION | SWT.V_SCROLL | SWT.H_SCROLL);
        tree.getTree().setHeaderVisible(true);
        tree.setContentProvider(new NotebookTree());
        column("Notebook", 250, NotebookTree::name);
        column("Summary", 190, NotebookTree::summary);
        tree.addSelectionChangedListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            details.show(first);
            if (current != null) {
                current.select(first);
            }
        });
    }

    private void column(String title, int width, java.util.function.Function<Object, String> text) {
        TreeViewerColumn c = new TreeViewerColumn(tree, SWT.LEFT);
        c.getColumn().setText(title);
        c.getColumn().setWidth(width);
        c.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return text.apply(element);
            }
        });
    }

    /** Shows {@code next} (null: none) and starts its validation. */
    public void show(NotebookDocument next) {
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
        document = next;
        details.setDocument(next);
        findings.cancel();
        findings.clear();
        if (next == null) {
            tree.setInput(null);
            fileLabel.setText("No notebook open.");
            details.show(null);
            return;
        }
        next.addCommandStackListener(onChange);
        tree.setInput(new NotebookTree.Root(next.notebook()));
        tree.expandToLevel(4); // notebook, headings, rigs and experiments, chains and channels
        updateFileLabel();
        details.show(null);
        next.notebook().getExperiments().stream().flatMap(e -> e.getChannels().stream()).findFirst()
                .ifPresent(this::select); // something to read at once
        validate();
    }

    private void showProblem(String problem) {
        fileLabel.setText("Could not open the notebook: " + problem);
        fileLabel.setForeground(display.getSystemColor(SWT.COLOR_DARK_RED));
        fileLabel.getParent().layout(true, true);
    }

    /** Selects and reveals {@code element} in the tree (a model object), which updates the details. */
    public void select(Object element) {
        tree.setSelection(new StructuredSelection(element), true);
        tree.getTree().setFocus();
    }

    private void updateFileLabel() {
        fileLabel.setText(document.file() + (document.isDirty() ? "   (changed, not saved)" : ""));
        fileLabel.setForeground(null);
        if (part != null) {
            part.setDirty(document.isDirty());
        }
    }

    /** After a command ran, was undone or redone: the tree, the figures and the findings follow. */
    private void changed() {
        if (document == null || tree.getControl().isDisposed()) {
            return;
        }
        tree.refresh(true);
        updateFileLabel();
        Object selected = tree.getStructuredSelection().getFirstElement();
        details.show(selected != null ? selected : details.shownChain());
        validate();
    }

    /** (Re)starts the validation of the open notebook; a running one is cancelled first. */
    public void validate() {
        findings.validate(document);
    }

    private void ui(Runnable r) {
        Runnable guarded = () -> {
            if (!findings.isDisposed()) {
                r.run();
            }
        };
        if (sync != null) {
            sync.asyncExec(guarded);
        } else if (!display.isDisposed()) {
            display.asyncExec(guarded);
        }
    }

    /**
     * Called by the workbench when it saves the part (its own save prompt when a window with unsaved
     * changes closes): an atomic save, or an error dialog that keeps the changes open.
     */
    @org.eclipse.e4.ui.di.Persist
    public void persist() {
        if (document == null || !document.isDirty()) {
            return;
        }
        NotebookSaving.Outcome outcome = NotebookSaving.save(document.file(), document::save);
        if (!outcome.saved()) {
            org.eclipse.jface.dialogs.MessageDialog.openError(fileLabel.getShell(), NotebookSaving.FAILURE_TITLE,
                    outcome.message());
        }
        if (current != null) {
            current.saved();
        } else {
            updateFileLabel();
        }
    }

    /** The open document (tests and handlers). */
    public NotebookDocument document() {
        return document;
    }

    /** The element shown in the details pane (tests). */
    SignalChain shownChain() {
        return details.shownChain();
    }

    @PreDestroy
    public void dispose() {
        findings.cancel();
        if (current != null) {
            current.removeListener(onOpen);
            current.removeSelectionListener(onOtherPartsSelection);
        }
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
    }
}
