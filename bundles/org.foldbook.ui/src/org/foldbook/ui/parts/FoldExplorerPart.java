package org.foldbook.ui.parts;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Range;
import org.foldbook.dsp.NumberText;
import org.foldbook.ui.chart.PlotView;

import jakarta.annotation.PostConstruct;

/**
 * Fold explorer: for a few tones and a sample rate, where each tone appears after sampling and
 * whether it is still at its true frequency. The chart shows apparent frequency against sample rate
 * (the zig-zag each tone draws as the rate falls) with the Nyquist line and the chosen rate; the
 * table gives the figures at the chosen rate. Input errors are shown in the part, never thrown.
 */
public class FoldExplorerPart {
    /** Our own opening scenario: a gearbox test with mesh tones up to 39 kHz, digitized at 48 kS/s. */
    static final String DEFAULT_TONES = "1000, 4700, 13300, 27100, 38900";
    static final String DEFAULT_RATE = "48000";

    private Text tonesField;
    private Text rateField;
    private Label status;
    private Table table;
    private PlotView plot;

    @PostConstruct
    public void createControls(Composite parent) {
        GridLayoutFactory.fillDefaults().numColumns(2).margins(8, 8).spacing(12, 6).applyTo(parent);

        Composite inputs = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(6, 6).applyTo(inputs);
        GridDataFactory.fillDefaults().grab(false, true).hint(380, SWT.DEFAULT).applyTo(inputs);

        new Label(inputs, SWT.NONE).setText("Tones (Hz):");
        tonesField = new Text(inputs, SWT.BORDER);
        tonesField.setText(DEFAULT_TONES);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(tonesField);
        new Label(inputs, SWT.NONE).setText("Sample rate (S/s):");
        rateField = new Text(inputs, SWT.BORDER);
        rateField.setText(DEFAULT_RATE);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(rateField);

        status = new Label(inputs, SWT.WRAP);
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).hint(360, SWT.DEFAULT).applyTo(status);

        table = new Table(inputs, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String title : new String[] {"Tone (Hz)", "Appears at (Hz)", "Zone", "Seen as"}) {
            TableColumn c = new TableColumn(table, SWT.LEFT);
            c.setText(title);
            c.setWidth(title.startsWith("Appears") ? 120 : 80);
        }
        GridDataFactory.fillDefaults().span(2, 1).grab(true, true).applyTo(table);

        plot = new PlotView(parent, "Apparent frequency against sample rate", "Sample rate (S/s)", "Apparent frequency (Hz)");
        GridDataFactory.fillDefaults().grab(true, true).applyTo(plot.control());

        tonesField.addModifyListener(e -> refresh());
        rateField.addModifyListener(e -> refresh());
        refresh();
    }

    private void refresh() {
        double[] tones;
        double rate;
        try {
            tones = parseTones(tonesField.getText());
            rate = parsePositive("sample rate", rateField.getText());
        } catch (IllegalArgumentException e) {
            status.setText(e.getMessage());
            status.getParent().layout();
            return;
        }
        FoldExplorerModel model = new FoldExplorerModel(tones, rate);
        status.setText(String.format(Locale.ROOT, "Nyquist frequency %.6g Hz. %d of %d tones fold.",
                rate / 2, model.foldedCount(), tones.length));
        table.removeAll();
        for (FoldExplorerModel.Row row : model.rows()) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {fmt(row.toneHz()), fmt(row.apparentHz()), Long.toString(row.zone()),
                    row.folded() ? "alias" : "true"});
        }
        plot.clear();
        for (int i = 0; i < tones.length; i++) {
            double[][] xy = model.foldCurve(i);
            plot.addLine(fmt(tones[i]) + " Hz", xy[0], xy[1]);
        }
        double[][] nyq = model.nyquistLine();
        plot.addMarker("Nyquist", nyq[0], nyq[1]);
        double top = model.maxRate() / 2;
        plot.addMarker("chosen rate", new double[] {rate, rate}, new double[] {0, top});
        plot.setRanges(new Range(model.minRate(), model.maxRate()), new Range(0, top * 1.02));
        status.getParent().layout();
    }

    static double[] parseTones(String text) {
        return NumberText.positiveList("tone frequency in Hz", text);
    }

    static double parsePositive(String what, String text) {
        return NumberText.positive(what, text);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
