package org.foldbook.ui.walkthrough;

import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Function;

import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Names;
import org.foldbook.model.derived.Quantities;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * The rig walkthrough: pick a rig and one of its chains (or select a channel in the Notebook part), then
 * step from the cautions through every stage, each page computed from the notebook. The what-if bar tries
 * another rate or cutoff at once without touching the notebook; "Keep this" writes it as one undoable
 * command. The part wires widgets to a {@link WalkthroughSession}; {@link PageView} and {@link ChainPicture}
 * draw.
 */
public class WalkthroughPart {

    /** The part's id in the application model. */
    public static final String PART_ID = "org.foldbook.ui.part.walkthrough";
    static final String HINT = "Type a rate or a cutoff to try it here; the notebook changes only with Keep this (Ctrl+Z undoes it).";

    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    CurrentNotebook current;
    @Inject
    @org.eclipse.e4.core.di.annotations.Optional
    UISynchronize sync;

    private final WalkthroughSession session = new WalkthroughSession();
    private Combo rigs;
    private Combo chains;
    private ChainPicture picture;
    private Text rateField;
    private Label rateUnit;
    private Text cutoffField;
    private Button reset;
    private Button keep;
    private Label status;
    private PageView page;
    private Button back;
    private Button next;
    private Label step;
    private boolean updating;
    private String message; // a problem with the typed value, or what Keep this did; null: the hint
    private boolean problem;
    private NotebookDocument document;

    private final CommandStackListener onChange = e -> {
        session.recompute();
        refresh();
    };
    private final Consumer<CurrentNotebook> onOpen = c -> {
        if (c.document() != document) {
            show(c.document());
        }
    };
    private final Consumer<Object> onSelect = s -> {
        if (!rigs.isDisposed() && session.follow(s)) {
            refresh();
        }
    };

    @PostConstruct
    public void createControls(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(6, 6).spacing(4, 4).applyTo(parent);
        Composite top = row(parent, 7);
        new Label(top, SWT.NONE).setText("Rig:");
        rigs = new Combo(top, SWT.READ_ONLY);
        GridDataFactory.fillDefaults().hint(220, SWT.DEFAULT).applyTo(rigs);
        new Label(top, SWT.NONE).setText("   Chain:");
        chains = new Combo(top, SWT.READ_ONLY);
        GridDataFactory.fillDefaults().hint(300, SWT.DEFAULT).applyTo(chains);
        Button export = new Button(top, SWT.PUSH);
        export.setText("Export page…");
        export.setToolTipText("The whole rig's walkthrough as one self-contained HTML page with its charts (as the notebook says, without the what-if)");
        export.addListener(SWT.Selection, e -> export());
        rigs.addListener(SWT.Selection, e -> {
            session.pick(session.rigs().get(rigs.getSelectionIndex()), null);
            refresh();
        });
        chains.addListener(SWT.Selection, e -> {
            session.pick(session.rig(), session.rig().getChains().get(chains.getSelectionIndex()));
            refresh();
        });
        picture = new ChainPicture(parent, index -> {
            session.goTo(index);
            refresh();
        });
        GridDataFactory.fillDefaults().grab(true, false).hint(SWT.DEFAULT, picture.preferredHeight())
                .applyTo(picture.control());

        Composite whatIf = row(parent, 9);
        new Label(whatIf, SWT.NONE).setText("What if — rate:");
        rateField = field(whatIf, session::tryRate);
        rateUnit = new Label(whatIf, SWT.NONE);
        rateUnit.setText("S/s");
        new Label(whatIf, SWT.NONE).setText("   filter cutoff:");
        cutoffField = field(whatIf, session::tryCutoff);
        new Label(whatIf, SWT.NONE).setText("Hz");
        reset = new Button(whatIf, SWT.PUSH);
        reset.setText("Back to the notebook");
        reset.addListener(SWT.Selection, e -> {
            session.reset();
            say(Optional.empty());
            refresh(true);
        });
        keep = new Button(whatIf, SWT.PUSH);
        keep.setText("Keep this");
        keep.setToolTipText("Write the rate and cutoff tried here into the notebook (Edit ▸ Undo takes it back)");
        keep.addListener(SWT.Selection, e -> keepWhatIf());
        status = new Label(whatIf, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(status);

        page = new PageView(parent, text -> {
            say(session.tryRate(text));
            refresh();
        });

        Composite nav = row(parent, 3);
        back = new Button(nav, SWT.PUSH);
        back.setText("◀ Back");
        back.addListener(SWT.Selection, e -> {
            session.back();
            refresh();
        });
        step = new Label(nav, SWT.NONE);
        GridDataFactory.fillDefaults().hint(160, SWT.DEFAULT).align(SWT.CENTER, SWT.CENTER).applyTo(step);
        next = new Button(nav, SWT.PUSH);
        next.setText("Next ▶");
        next.addListener(SWT.Selection, e -> {
            session.next();
            refresh();
        });

        if (current != null) {
            current.addListener(onOpen);
            current.addSelectionListener(onSelect);
            show(current.document());
            if (current.selection() != null) {
                session.follow(current.selection());
            }
        }
        refresh(true);
    }

    private static Composite row(Composite parent, int columns) {
        Composite row = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(columns).spacing(6, 4).applyTo(row);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(row);
        return row;
    }

    private Text field(Composite parent, Function<String, Optional<String>> tryIt) {
        Text t = new Text(parent, SWT.BORDER);
        GridDataFactory.fillDefaults().hint(90, SWT.DEFAULT).applyTo(t);
        t.addListener(SWT.Modify, e -> {
            if (!updating) { // typed: tried at once
                say(tryIt.apply(t.getText()));
                refresh(false);
            }
        });
        return t;
    }

    /** Shows {@code next} (null: none). */
    public void show(NotebookDocument next) {
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
        document = next;
        if (next != null) {
            next.addCommandStackListener(onChange);
        }
        session.setNotebook(next == null ? null : next.notebook());
        refresh(true);
    }

    private void keepWhatIf() {
        if (document == null) {
            return;
        }
        Command command = session.keep(document.domain());
        problem = false;
        if (command == null) {
            message = "Nothing to keep: the notebook already says this.";
        } else {
            document.execute(command); // the command stack listener recomputes
            message = "Kept in the notebook (not yet saved); Edit ▸ Undo takes it back.";
        }
        refresh(true);
    }

    /** Asks for a file, computes every chain's pages of the rig here, writes them in an {@link ExportJob}. */
    private void export() {
        if (session.rig() == null || document == null) {
            return;
        }
        org.eclipse.swt.widgets.FileDialog dialog = new org.eclipse.swt.widgets.FileDialog(rigs.getShell(), SWT.SAVE);
        dialog.setText("Export the walkthrough");
        dialog.setFilterExtensions(new String[] { "*.html" });
        dialog.setFileName("walkthrough-" + Names.shortName(session.rig()).replaceAll("[^A-Za-z0-9.-]+", "-") + ".html");
        dialog.setFilterPath(document.file().getParent().toString());
        dialog.setOverwrite(true);
        String chosen = dialog.open();
        if (chosen != null) {
            exportTo(java.nio.file.Path.of(chosen)).schedule();
        }
    }

    /** The export of the picked rig to {@code file} (not yet scheduled; tests join it). */
    ExportJob exportTo(java.nio.file.Path file) {
        org.foldbook.model.Rig rig = session.rig();
        java.util.List<Walkthrough> all = rig.getChains().stream().map(c -> Walkthrough.of(rig, c, WhatIf.NONE, null))
                .toList();
        String source = "Computed from the notebook " + document.file() + (document.isDirty() ? " (with unsaved changes)" : "")
                + " on " + java.time.LocalDate.now() + ".";
        org.eclipse.swt.widgets.Display display = rigs.getDisplay();
        return new ExportJob(Names.shortName(rig), all, source, file, words -> display.asyncExec(() -> {
            if (!rigs.isDisposed()) {
                message = words;
                problem = words.startsWith("Could not");
                refresh(false);
            }
        }));
    }

    private void say(Optional<String> outcome) {
        message = outcome.orElse(null);
        problem = outcome.isPresent();
    }

    private void refresh() {
        refresh(true);
    }

    /** Draws the session; {@code fields} also rewrites the what-if fields (not while the user types in them). */
    private void refresh(boolean fields) {
        if (rigs.isDisposed()) {
            return;
        }
        updating = true;
        try {
            rigs.setItems(session.rigs().stream().map(Names::shortName).toArray(String[]::new));
            rigs.select(session.rigs().indexOf(session.rig()));
            SignalChain chain = session.chain();
            chains.setItems(session.rig() == null ? new String[0]
                    : session.rig().getChains().stream().map(c -> Names.shortName(c)
                            + (session.channel() != null && session.channel().getChain() == c
                                    ? "  (channel " + session.channel().getName() + ")" : ""))
                            .toArray(String[]::new));
            chains.select(session.rig() == null ? -1 : session.rig().getChains().indexOf(chain));
            Walkthrough w = session.walkthrough();
            picture.show(w == null ? java.util.List.of() : w.pages(), session.pageIndex());
            Stage sampler = chain == null ? null : ChainFigures.samplingStage(chain);
            Stage filter = chain == null ? null : ChainFigures.filterStage(chain);
            rateField.setEnabled(sampler != null);
            cutoffField.setEnabled(filter != null);
            rateUnit.setText(sampler != null && sampler.getDevice() instanceof org.foldbook.model.Camera ? "frames/s" : "S/s");
            if (fields || (!rateField.isFocusControl() && !cutoffField.isFocusControl())) {
                SignalChain tried = w == null ? null : w.tried();
                rateField.setText(tried == null || sampler == null ? "" : Quantities.plain(ChainFigures.samplingRateHz(tried)));
                Stage triedFilter = tried == null ? null : ChainFigures.filterStage(tried);
                cutoffField.setText(triedFilter == null ? "" : Quantities.plain(ChainFigures.effectiveCutoffHz(triedFilter)));
            }
            boolean trying = !session.whatIf().isNone();
            reset.setEnabled(trying);
            keep.setEnabled(trying && document != null);
            status.setText(message != null ? message
                    : trying ? "Trying a change: the pages show it, the notebook does not." : HINT);
            status.setForeground(problem ? status.getDisplay().getSystemColor(SWT.COLOR_DARK_RED) : null);
            page.show(session.page());
            back.setEnabled(session.canGoBack());
            next.setEnabled(session.canGoOn());
            step.setText(w == null ? "" : "Step " + (session.pageIndex() + 1) + " of " + session.pageCount());
            rigs.getParent().getParent().layout(true, true);
        } finally {
            updating = false;
        }
    }

    /** The session behind the widgets (tests). */
    WalkthroughSession session() {
        return session;
    }

    PageView pageView() {
        return page;
    }

    ChainPicture picture() {
        return picture;
    }

    @PreDestroy
    public void dispose() {
        if (current != null) {
            current.removeListener(onOpen);
            current.removeSelectionListener(onSelect);
        }
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
    }
}
