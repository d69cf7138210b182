package org.foldbook.ui.notebook;

import java.util.List;
import java.util.Locale;

import org.eclipse.emf.ecore.EObject;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Range;
import org.foldbook.model.Channel;
import org.foldbook.model.Digitizer;
import org.foldbook.model.SignalChain;
import org.foldbook.model.Stage;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.derived.Names;
import org.foldbook.model.derived.Quantities;
import org.foldbook.ui.chart.PlotView;
import org.foldbook.ui.export.ExportMenu;

/**
 * The details of the selected notebook object: for a chain (or a channel or stage of one) its path,
 * the editable settings, its figures and its response chart; for anything else its facts. Draws what
 * {@link ChainSummary}, {@link ObjectSummary} and {@link ChainResponseSeries} compute; typed settings go
 * through {@link ChainSettings} into the document's command stack.
 */
final class DetailsPane {
    private static final String SETTINGS_HINT = "Enter applies a change, Ctrl+Z undoes it.";

    private final Label title;
    private final Label chainPath;
    private final Composite settings;
    private final Text rateField;
    private final Text cutoffField;
    private final Text levelField;
    private final Label settingsStatus;
    private final Table figures;
    private final PlotView plot;
    private NotebookDocument document;
    private SignalChain shownChain;

    DetailsPane(Composite parent) {
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
        rateField = field("Sampling rate:", "S/s", 80);
        cutoffField = field("   Filter cutoff:", "Hz", 80);
        levelField = field("   Out-of-band level:", "dBFS", 60);
        levelField.setToolTipText("Strongest content expected above Nyquist, relative to full scale; empty = 0 dBFS, the worst case");
        // the hint, or what is wrong with the value typed: one line of its own under the fields, so
        // that a long message fits and the layout does not jump
        settingsStatus = new Label(settings, SWT.NONE);
        GridDataFactory.fillDefaults().span(9, 1).grab(true, false).align(SWT.FILL, SWT.CENTER).applyTo(settingsStatus);
        rateField.addListener(SWT.DefaultSelection, e -> apply(ChainSettings.rate(domain(), shownChain, rateField.getText())));
        cutoffField.addListener(SWT.DefaultSelection,
                e -> apply(ChainSettings.cutoff(domain(), shownChain, cutoffField.getText())));
        levelField.addListener(SWT.DefaultSelection,
                e -> apply(ChainSettings.outOfBandLevel(domain(), shownChain, levelField.getText())));
        settings.setVisible(false);

        Composite middle = new Composite(details, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(8, 4).applyTo(middle);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(middle);
        figures = new Table(middle, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        ExportMenu.attach(figures, "Chain figures");
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

    private Text field(String label, String unit, int width) {
        new Label(settings, SWT.NONE).setText(label);
        Text t = new Text(settings, SWT.BORDER);
        GridDataFactory.fillDefaults().hint(width, SWT.DEFAULT).applyTo(t);
        new Label(settings, SWT.NONE).setText(unit);
        return t;
    }

    /** The document whose command stack takes the settings (null: none open). */
    void setDocument(NotebookDocument next) {
        document = next;
    }

    /** The chain shown, or null. */
    SignalChain shownChain() {
        return shownChain;
    }

    private org.eclipse.emf.edit.domain.EditingDomain domain() {
        return document == null ? null : document.domain();
    }

    private void apply(ChainSettings.Outcome outcome) {
        if (document == null || shownChain == null) {
            return;
        }
        switch (outcome) {
            case ChainSettings.Apply a -> document.execute(a.command());
            case ChainSettings.Problem p -> {
                settingsStatus.setText(p.text());
                settingsStatus.setForeground(settingsStatus.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
                settingsStatus.getParent().layout();
            }
            case ChainSettings.Nothing n -> {
            }
        }
    }

    /** Shows {@code element}'s details (null: the hint). */
    void show(Object element) {
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
            if (element instanceof EObject object) {
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
        draw(chain);
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
    private void draw(SignalChain chain) {
        ChainResponseSeries s = ChainResponseSeries.of(chain).orElse(null);
        if (s == null) {
            plot.setRanges(null, null);
            return;
        }
        double floor = ChainResponseSeries.FLOOR_DB;
        plot.addLine("response", s.x(), s.gainDb());
        if (s.foldsFrom() >= 0) {
            plot.addLine(s.filtered() ? "folds, filtered" : "folds, unfiltered", s.foldsX(), s.foldsGainDb());
        }
        plot.addMarker("Nyquist", new double[] { s.nyquistHz(), s.nyquistHz() }, new double[] { floor, 5 });
        if (!Double.isNaN(s.needDb())) {
            plot.addMarker(String.format(Locale.ROOT, "need −%.0f dB", s.needDb()), new double[] { 0, s.topHz() },
                    new double[] { -s.needDb(), -s.needDb() });
        }
        plot.setRanges(new Range(0, s.topHz()), new Range(floor, 5));
    }
}
