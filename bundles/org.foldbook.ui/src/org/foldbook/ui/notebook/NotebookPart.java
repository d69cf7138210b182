package org.foldbook.ui.notebook;

import org.foldbook.model.derived.Quantities;
import org.foldbook.model.derived.Names;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.function.Consumer;

import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.edit.command.SetCommand;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.jface.viewers.ColumnLabelProvider;
import org.eclipse.jface.viewers.IStructuredSelection;
import org.eclipse.jface.viewers.StructuredSelection;
import org.eclipse.jface.viewers.TreeViewer;
import org.eclipse.jface.viewers.TreeViewerColumn;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Range;
import org.foldbook.dsp.NumberText;
import org.foldbook.dsp.digitizer.ProtectionFigures;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.ui.chart.PlotView;

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
    private static final int CHART_POINTS = 800;
    private static final double CHART_FLOOR_DB = -160;
    private static final String SETTINGS_HINT = "Enter applies a change, Ctrl+Z undoes it.";

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
    private Label title;
    private Label chainPath;
    private Table figures;
    private Composite settings;
    private Text rateField;
    private Text cutoffField;
    private Text levelField;
    private Label settingsStatus;
    private PlotView plot;
    private Label findingsStatus;
    private Button checkButton;
    private Button stopButton;
    private Table findings;
    private Label findingText;

    private NotebookDocument document;
    private SignalChain shownChain;
    private ValidationJob validation;
    private final List<Finding> shownFindings = new ArrayList<>();
    private final CommandStackListener onChange = event -> changed(); // commands run on the UI thread
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
        createDetails(right);
        createFindings(right);
        right.setWeights(60, 40);
        outer.setWeights(34, 66);

        if (current != null) {
            current.addListener(onOpen);
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
        TreeViewerColumn name = new TreeViewerColumn(tree, SWT.LEFT);
        name.getColumn().setText("Notebook");
        name.getColumn().setWidth(250);
        name.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return NotebookTree.name(element);
            }
        });
        TreeViewerColumn summary = new TreeViewerColumn(tree, SWT.LEFT);
        summary.getColumn().setText("Summary");
        summary.getColumn().setWidth(190);
        summary.setLabelProvider(new ColumnLabelProvider() {
            @Override
            public String getText(Object element) {
                return NotebookTree.summary(element);
            }
        });
        tree.addSelectionChangedListener(e -> {
            Object first = ((IStructuredSelection) e.getSelection()).getFirstElement();
            showDetails(first);
            if (current != null) {
                current.select(first);
            }
        });
    }

    private void createDetails(Composite parent) {
        Composite details = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().margins(6, 0).spacing(4, 4).applyTo(details);
        title = new Label(details, SWT.NONE);
        title.setFont(JFaceResources.getFontRegistry().getBold(JFaceResources.DEFAULT_FONT));
        title.setText("Select a chain or a channel to see its figures.");
        GridDataFactory.fillDefaults().grab(true, false).applyTo(title);
        chainPath = new Label(details, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(300, SWT.DEFAULT).applyTo(chainPath);
        settings = new Composite(details, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(9).spacing(6, 4).applyTo(settings);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(settings);
        new Label(settings, SWT.NONE).setText("Sampling rate:");
        rateField = new Text(settings, SWT.BORDER);
        GridDataFactory.fillDefaults().hint(80, SWT.DEFAULT).applyTo(rateField);
        new Label(settings, SWT.NONE).setText("S/s");
        new Label(settings, SWT.NONE).setText("   Filter cutoff:");
        cutoffField = new Text(settings, SWT.BORDER);
        GridDataFactory.fillDefaults().hint(80, SWT.DEFAULT).applyTo(cutoffField);
        new Label(settings, SWT.NONE).setText("Hz");
        new Label(settings, SWT.NONE).setText("   Out-of-band level:");
        levelField = new Text(settings, SWT.BORDER);
        levelField.setToolTipText("Strongest content expected above Nyquist, relative to full scale; empty = 0 dBFS, the worst case");
        GridDataFactory.fillDefaults().hint(60, SWT.DEFAULT).applyTo(levelField);
        new Label(settings, SWT.NONE).setText("dBFS");
        // the hint, or what is wrong with the value typed: one line of its own under the fields, so
        // that a long message fits and the layout does not jump
        settingsStatus = new Label(settings, SWT.NONE);
        GridDataFactory.fillDefaults().span(9, 1).grab(true, false).align(SWT.FILL, SWT.CENTER).applyTo(settingsStatus);
        rateField.addListener(SWT.DefaultSelection, e -> applySetting(rateField, true));
        cutoffField.addListener(SWT.DefaultSelection, e -> applySetting(cutoffField, false));
        levelField.addListener(SWT.DefaultSelection, e -> applyLevel());
        settings.setVisible(false);

        Composite middle = new Composite(details, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(8, 4).applyTo(middle);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(middle);

        figures = new Table(middle, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        figures.setHeaderVisible(true);
        figures.setLinesVisible(true);
        for (String column : new String[] { "Figure", "Value" }) {
            TableColumn c = new TableColumn(figures, SWT.LEFT);
            c.setText(column);
            c.setWidth(column.equals("Figure") ? 200 : 260);
        }
        GridDataFactory.fillDefaults().grab(false, true).hint(480, SWT.DEFAULT).applyTo(figures);

        Composite right = new Composite(middle, SWT.NONE);
        GridLayoutFactory.fillDefaults().spacing(4, 4).applyTo(right);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(right);
        plot = new PlotView(right, "Chain response", "Frequency (Hz)", "Gain (dB)");
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 200).applyTo(plot.control());

    }

    private void createFindings(Composite parent) {
        Composite box = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(4).margins(0, 4).spacing(8, 4).applyTo(box);
        Label heading = new Label(box, SWT.NONE);
        heading.setText("Findings");
        heading.setFont(JFaceResources.getFontRegistry().getBold(JFaceResources.DEFAULT_FONT));
        findingsStatus = new Label(box, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.CENTER).applyTo(findingsStatus);
        checkButton = new Button(box, SWT.PUSH);
        checkButton.setText("Check again");
        checkButton.addListener(SWT.Selection, e -> validate());
        stopButton = new Button(box, SWT.PUSH);
        stopButton.setText("Stop");
        stopButton.setEnabled(false);
        stopButton.addListener(SWT.Selection, e -> {
            if (validation != null) {
                validation.cancel();
            }
        });
        findings = new Table(box, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        findings.setHeaderVisible(true);
        findings.setLinesVisible(true);
        for (String column : new String[] { "Severity", "Object", "Finding" }) {
            TableColumn c = new TableColumn(findings, SWT.LEFT);
            c.setText(column);
            c.setWidth(switch (column) {
                case "Severity" -> 80;
                case "Object" -> 200;
                default -> 900;
            });
        }
        // room for three findings without scrolling: the demo alone has two
        int threeRows = findings.getHeaderHeight() + 3 * findings.getItemHeight() + 2 * findings.getBorderWidth();
        GridDataFactory.fillDefaults().span(4, 1).grab(true, true).hint(SWT.DEFAULT, threeRows).applyTo(findings);
        findingText = new Label(box, SWT.WRAP);
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).hint(400, SWT.DEFAULT).applyTo(findingText);
        findings.addListener(SWT.Selection, e -> showFindingText(findings.getSelectionIndex()));
        findings.addListener(SWT.DefaultSelection, e -> {
            int index = findings.getSelectionIndex();
            if (index >= 0 && index < shownFindings.size() && shownFindings.get(index).subject() != null) {
                select(shownFindings.get(index).subject());
            }
        });
    }

    /** Shows {@code next} (null: none) and starts its validation. */
    public void show(NotebookDocument next) {
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
        cancelValidation();
        document = next;
        shownChain = null;
        shownFindings.clear();
        findings.removeAll();
        findingText.setText("");
        if (next == null) {
            tree.setInput(null);
            fileLabel.setText("No notebook open.");
            showDetails(null);
            return;
        }
        next.addCommandStackListener(onChange);
        tree.setInput(new NotebookTree.Root(next.notebook()));
        tree.expandToLevel(4); // notebook, headings, rigs and experiments, chains and channels
        updateFileLabel();
        showDetails(null);
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
        showDetails(selected != null ? selected : shownChain);
        validate();
    }

    private void showDetails(Object element) {
        SignalChain chain = null;
        String heading = "Select a chain or a channel to see its figures; other entries show their facts.";
        if (element instanceof SignalChain c) {
            chain = c;
            heading = "Chain: " + Names.shortName(c);
        } else if (element instanceof Channel channel && channel.getChain() != null) {
            chain = channel.getChain();
            heading = "Channel: " + channel.getName() + "  (chain " + Names.shortName(chain) + ")";
        } else if (element instanceof Stage stage && stage.eContainer() instanceof SignalChain c) {
            chain = c;
            heading = "Stage of chain " + Names.shortName(c);
        }
        shownChain = chain;
        title.setText(heading);
        figures.removeAll();
        plot.clear();
        settingsStatus.setText(SETTINGS_HINT);
        settingsStatus.setForeground(null);
        if (chain == null) {
            chainPath.setText("");
            settings.setVisible(false);
            plot.setRanges(null, null);
            if (element instanceof org.eclipse.emf.ecore.EObject object) {
                title.setText(Names.kindTitle(object) + ": " + NotebookTree.name(object));
                fill(ObjectSummary.rows(object));
            }
            title.getParent().layout(true, true);
            return;
        }
        chainPath.setText(ChainSummary.path(chain));
        fill(ChainSummary.rows(chain));
        Stage sampler = ChainFigures.samplingStage(chain);
        Stage filter = ChainFigures.filterStage(chain);
        settings.setVisible(sampler != null);
        rateField.setText(sampler == null ? "" : Quantities.plain(ChainFigures.samplingRateHz(chain)));
        cutoffField.setEnabled(filter != null);
        cutoffField.setText(filter == null ? "" : Quantities.plain(ChainFigures.effectiveCutoffHz(filter)));
        levelField.setEnabled(sampler != null && sampler.getDevice() instanceof Digitizer);
        levelField.setText(chain.getOutOfBandLevelDbfs() == null ? "" : Quantities.plain(chain.getOutOfBandLevelDbfs()));
        drawResponse(chain);
        title.getParent().layout(true, true);
    }

    private void fill(List<ChainSummary.Row> rows) {
        for (ChainSummary.Row row : rows) {
            TableItem item = new TableItem(figures, SWT.NONE);
            item.setText(new String[] { row.figure(), row.value() });
        }
        for (TableColumn column : figures.getColumns()) {
            int width = column.getWidth();
            column.pack();
            column.setWidth(Math.max(width, column.getWidth()));
        }
    }

    /** |H(f)| of the chain in dB, the part that folds drawn apart, the Nyquist line and the need. */
    private void drawResponse(SignalChain chain) {
        double rate = ChainFigures.samplingRateHz(chain);
        if (!(rate > 0)) {
            plot.setRanges(null, null);
            return;
        }
        FrequencyResponse response = ChainFigures.chainResponse(chain);
        double upper = ChainFigures.frontEndUpperHz(chain);
        double top = Math.max(1.5 * rate, Double.isNaN(upper) ? 0 : 1.15 * upper);
        double[] x = new double[CHART_POINTS + 1];
        double[] y = new double[CHART_POINTS + 1];
        for (int i = 0; i <= CHART_POINTS; i++) {
            x[i] = top * i / CHART_POINTS;
            y[i] = Math.max(CHART_FLOOR_DB, -response.attenuationDb(x[i]));
        }
        plot.addLine("response", x, y);
        double nyquist = rate / 2;
        boolean protectedChain = ChainFigures.filterStage(chain) != null || ChainFigures.hasBuiltInDigitalFilter(chain);
        if (upper > nyquist) {
            int from = (int) Math.ceil(nyquist / top * CHART_POINTS);
            int to = (int) Math.floor(Math.min(upper, top) / top * CHART_POINTS);
            if (to > from) {
                double[] fx = java.util.Arrays.copyOfRange(x, from, to + 1);
                double[] fy = java.util.Arrays.copyOfRange(y, from, to + 1);
                plot.addLine(protectedChain ? "folds, filtered" : "folds, unfiltered", fx, fy);
            }
        }
        plot.addMarker("Nyquist", new double[] { nyquist, nyquist },
                new double[] { CHART_FLOOR_DB, 5 });
        Optional<ProtectionFigures> f = ChainFigures.figures(chain);
        f.ifPresent(fig -> plot.addMarker(String.format(Locale.ROOT, "need −%.0f dB", fig.requiredAttenuationDb()),
                new double[] { 0, top }, new double[] { -fig.requiredAttenuationDb(), -fig.requiredAttenuationDb() }));
        plot.setRanges(new Range(0, top), new Range(CHART_FLOOR_DB, 5));
    }

    private void applySetting(Text field, boolean rate) {
        SignalChain chain = shownChain;
        if (document == null || chain == null) {
            return;
        }
        Stage stage = rate ? ChainFigures.samplingStage(chain) : ChainFigures.filterStage(chain);
        if (stage == null) {
            return;
        }
        double value;
        try {
            value = NumberText.positive(rate ? "sampling rate" : "filter cutoff", field.getText());
        } catch (IllegalArgumentException e) {
            settingsProblem(e.getMessage());
            return;
        }
        if (rate && stage.getDevice() instanceof Digitizer digitizer && value > digitizer.getMaxRateHz()) {
            settingsProblem("Sampling rate " + Quantities.rate(value) + " is above the digitizer's maximum "
                    + Quantities.rate(digitizer.getMaxRateHz()) + ".");
            return;
        }
        Command command = SetCommand.create(document.domain(), stage,
                rate ? NotebookPackage.Literals.STAGE__RATE_HZ : NotebookPackage.Literals.STAGE__CUTOFF_HZ, value);
        document.execute(command);
    }

    /** The chain's out-of-band level: a number in dBFS, or empty to unset it (0 dBFS, the worst case). */
    private void applyLevel() {
        SignalChain chain = shownChain;
        if (document == null || chain == null) {
            return;
        }
        String text = levelField.getText().trim().replace('−', '-');
        Object value;
        if (text.isEmpty()) {
            if (chain.getOutOfBandLevelDbfs() == null) {
                return;
            }
            value = SetCommand.UNSET_VALUE;
        } else {
            try {
                value = NumberText.finite("out-of-band level", text);
            } catch (IllegalArgumentException e) {
                settingsProblem(e.getMessage());
                return;
            }
        }
        document.execute(SetCommand.create(document.domain(), chain,
                NotebookPackage.Literals.SIGNAL_CHAIN__OUT_OF_BAND_LEVEL_DBFS, value));
    }

    private void settingsProblem(String problem) {
        settingsStatus.setText(problem);
        settingsStatus.setForeground(display.getSystemColor(SWT.COLOR_DARK_RED));
        settingsStatus.getParent().layout();
    }

    /** (Re)starts the validation of the open notebook; a running one is cancelled first. */
    public void validate() {
        cancelValidation();
        if (document == null) {
            return;
        }
        NotebookDocument checked = document;
        ValidationJob job = new ValidationJob(checked, list -> ui(() -> {
            if (document == checked && !findings.isDisposed()) {
                showFindings(list);
            }
        }), (done, total, what) -> ui(() -> progress(done, total, what)));
        validation = job;
        job.addJobChangeListener(new org.eclipse.core.runtime.jobs.JobChangeAdapter() {
            @Override
            public void done(org.eclipse.core.runtime.jobs.IJobChangeEvent event) {
                ui(() -> {
                    if (validation == job && !stopButton.isDisposed()) {
                        stopButton.setEnabled(false);
                        if (event.getResult().getSeverity() == org.eclipse.core.runtime.IStatus.CANCEL) {
                            findingsStatus.setText("Check stopped; the list below may be out of date.");
                        }
                    }
                });
            }
        });
        stopButton.setEnabled(true);
        findingsStatus.setText("Checking…");
        job.schedule();
    }

    private void cancelValidation() {
        if (validation != null) {
            validation.cancel();
            validation = null;
        }
    }

    private void progress(int done, int total, String what) {
        if (findingsStatus.isDisposed() || what == null) {
            return;
        }
        findingsStatus.setText(String.format(Locale.ROOT, "Checking %d of %d: %s", done + 1, total, what));
    }

    private void showFindings(List<Finding> list) {
        shownFindings.clear();
        shownFindings.addAll(list);
        findings.removeAll();
        int errors = 0;
        int warnings = 0;
        for (Finding f : list) {
            TableItem item = new TableItem(findings, SWT.NONE);
            String severity = switch (f.severity()) {
                case Diagnostic.ERROR -> "Error";
                case Diagnostic.WARNING -> "Warning";
                case Diagnostic.INFO -> "Note";
                default -> "Problem";
            };
            errors += f.severity() == Diagnostic.ERROR ? 1 : 0;
            warnings += f.severity() == Diagnostic.WARNING ? 1 : 0;
            item.setText(new String[] { severity, f.object(), f.message() });
            if (f.severity() == Diagnostic.ERROR) {
                item.setForeground(0, display.getSystemColor(SWT.COLOR_DARK_RED));
            } else if (f.severity() == Diagnostic.WARNING) {
                item.setForeground(0, display.getSystemColor(SWT.COLOR_DARK_YELLOW));
            }
        }
        findings.getColumn(2).pack();
        if (!list.isEmpty()) {
            findings.setSelection(0);
        }
        showFindingText(list.isEmpty() ? -1 : 0);
        findingsStatus.setText(list.isEmpty() ? "No findings: every rule passes and every recording matches its checksum."
                : errors + " error(s), " + warnings + " warning(s). Double-click a finding to select its object.");
    }

    /** The whole message of a finding, wrapped, under the list (the list's column holds one line). */
    private void showFindingText(int index) {
        String text = index >= 0 && index < shownFindings.size()
                ? shownFindings.get(index).object() + ": " + shownFindings.get(index).message() : "";
        findingText.setText(text);
        findingText.getParent().layout(true, true);
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
        try {
            document.save();
        } catch (java.io.IOException | RuntimeException e) {
            org.eclipse.jface.dialogs.MessageDialog.openError(fileLabel.getShell(), "Cannot save the notebook",
                    document.file() + ": " + e.getMessage() + "\n\nThe file on disk is unchanged.");
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
        return shownChain;
    }

    @PreDestroy
    public void dispose() {
        cancelValidation();
        if (current != null) {
            current.removeListener(onOpen);
        }
        if (document != null) {
            document.removeCommandStackListener(onChange);
        }
    }
}
