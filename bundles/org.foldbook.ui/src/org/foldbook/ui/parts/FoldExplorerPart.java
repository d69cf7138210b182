package org.foldbook.ui.parts;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import org.eclipse.e4.core.di.annotations.Optional;
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
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.model.Channel;
import org.foldbook.model.derived.ChainModel;
import org.foldbook.ui.chart.PlotView;
import org.foldbook.ui.export.ExportMenu;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.preferences.SpectrumPreferences;
import org.foldbook.ui.recording.RecordingOverview;
import org.foldbook.ui.recording.RecordingPresenter;
import org.foldbook.ui.recording.RecordingSession;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * Fold explorer: for a few tones and a sample rate, where each tone appears after sampling and
 * whether it is still at its true frequency. The chart shows apparent frequency against sample rate
 * (the zig-zag each tone draws as the rate falls) with the Nyquist line and the chosen rate; the
 * table gives the figures at the chosen rate. Input errors are shown in the part, never thrown.
 *
 * <p>It follows the channel selected in the Notebook part: the tones become the source peaks of the
 * channel's recording (its strongest spectral peaks, read in a background job), the rate the channel's,
 * marked on the chart, and a second chart shows the chain's attenuation of each tone along its fold path
 * ({@link ChainModel#protection}); the table gives it at the chosen rate. The example tones below are
 * shown only until a channel is selected.
 */
public class FoldExplorerPart {
    /** Source peaks taken from a channel's spectrum, strongest first. */
    static final int SOURCE_PEAKS = 8;

    @Inject
    @Optional
    CurrentNotebook current;
    /** Our own opening scenario: a gearbox test with mesh tones up to 39 kHz, digitized at 48 kS/s. */
    static final String DEFAULT_TONES = "1000, 4700, 13300, 27100, 38900";
    static final String DEFAULT_RATE = "48000";

    private Text tonesField;
    private Text rateField;
    private Label status;
    private Table table;
    private PlotView plot;
    private PlotView attenuation;
    private Label source;
    private final Consumer<Object> onSelection = this::follow;
    /** The channel whose peaks are shown, its chain and rate; null: the typed tones alone. */
    private Channel channel;
    private ChainModel chain;
    private double channelRate = Double.NaN;
    /** The read of the selected channel, shared with the Recording view. */
    @Inject
    @Optional
    RecordingSession session;
    @Inject
    @Optional
    SpectrumPreferences preferences;
    private RecordingSession ownSession;
    /** The phase of the session's state shown last (UI thread). */
    private RecordingSession.Phase shown;
    private final Consumer<RecordingSession.State> onState = s -> ui(() -> apply(s));

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
        // after the status label, which stays the first wrapping label of the part
        source = new Label(inputs, SWT.WRAP);
        source.setText("Example tones (a gearbox at 48 kS/s); select a channel in the Notebook part to use its peaks.");
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).hint(360, SWT.DEFAULT).applyTo(source);

        table = new Table(inputs, SWT.BORDER | SWT.FULL_SELECTION);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String title : new String[] {"Tone (Hz)", "Appears at (Hz)", "Zone", "Seen as", "Chain (dB)"}) {
            TableColumn c = new TableColumn(table, SWT.LEFT);
            c.setText(title);
            c.setWidth(switch (title) {
                case "Appears at (Hz)" -> 100;
                case "Zone" -> 44;
                case "Seen as" -> 58;
                default -> 76;
            });
        }
        GridDataFactory.fillDefaults().span(2, 1).grab(true, true).applyTo(table);
        ExportMenu.attach(table, "Fold explorer");

        Composite charts = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).equalWidth(true).spacing(8, 0).applyTo(charts);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(charts);
        plot = new PlotView(charts, "Apparent frequency against sample rate", "Sample rate (S/s)", "Apparent frequency (Hz)");
        GridDataFactory.fillDefaults().grab(true, true).applyTo(plot.control());
        attenuation = new PlotView(charts, "Chain attenuation along each fold path", "Sample rate (S/s)",
                "Attenuation (dB)");
        GridDataFactory.fillDefaults().grab(true, true).applyTo(attenuation.control());

        tonesField.addModifyListener(e -> refresh());
        rateField.addModifyListener(e -> refresh());
        refresh();
        if (session == null) {
            session = ownSession = new RecordingSession(preferences);
        }
        session.addListener(onState);
        if (current != null) {
            current.addSelectionListener(onSelection);
            follow(current.selection());
        }
    }

    /** Takes the tones from the channel {@code selection} stands for (other selections change nothing). */
    public void follow(Object selection) {
        Channel next = RecordingPresenter.channelOf(selection);
        if (next == null || next == channel) {
            return;
        }
        channel = next;
        chain = next.getChain() == null ? null : ChainModel.of(next.getChain());
        source.setText("Reading the peaks of channel '" + next.getName() + "' …");
        apply(session.request(next));
    }

    /** The shared session's news (any thread): a finished read gives the tones, on the UI thread. */
    private void apply(RecordingSession.State s) {
        if (s.channel() != channel) {
            return;
        }
        shown = s.phase();
        switch (s.phase()) {
            case READING -> {
            }
            case DONE -> showPeaks(s.channel(), s.overview());
            case FAILED -> showProblem(s.channel(), s.problem());
            case CANCELLED -> showProblem(s.channel(), "reading was cancelled");
        }
    }

    /** True until the read of the channel whose peaks this part takes has ended and its outcome is shown. */
    boolean reading() {
        return channel != null && shown == RecordingSession.Phase.READING;
    }

    RecordingSession session() {
        return session;
    }

    private void showPeaks(Channel of, RecordingOverview overview) {
        if (of != channel) {
            return;
        }
        List<SpectralPeak> peaks = new ArrayList<>(overview.peaks());
        peaks.sort((a, b) -> Double.compare(b.levelDb(), a.levelDb()));
        StringBuilder tones = new StringBuilder();
        for (SpectralPeak p : peaks.subList(0, Math.min(SOURCE_PEAKS, peaks.size()))) {
            tones.append(tones.length() == 0 ? "" : ", ").append(String.format(Locale.ROOT, "%.2f", p.frequencyHz()));
        }
        channelRate = overview.rateHz();
        source.setText(String.format(Locale.ROOT, "Source peaks of channel '%s': the %d strongest of its recording "
                + "%s, recorded at %.6g S/s (marked). Attenuation: chain %s at each rate.", of.getName(),
                Math.min(SOURCE_PEAKS, peaks.size()), overview.file().getFileName(), channelRate,
                chain == null ? "(none)" : chain.chainId()));
        tonesField.setText(tones.length() == 0 ? "" : tones.toString());
        rateField.setText(String.format(Locale.ROOT, "%.6g", channelRate));
        refresh();
    }

    private void showProblem(Channel of, String problem) {
        if (of != channel) {
            return;
        }
        source.setText("No peaks from channel '" + of.getName() + "': " + problem);
        source.getParent().layout();
    }

    private void ui(Runnable r) {
        if (source.isDisposed()) {
            return;
        }
        source.getDisplay().asyncExec(() -> {
            if (!source.isDisposed()) {
                r.run();
            }
        });
    }

    @PreDestroy
    public void dispose() {
        session.removeListener(onState);
        if (ownSession != null) {
            ownSession.dispose();
        }
        if (current != null) {
            current.removeSelectionListener(onSelection);
        }
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
        FoldExplorerModel model = new FoldExplorerModel(tones, rate, chain == null ? null : chain::protection);
        status.setText(String.format(Locale.ROOT, "Nyquist frequency %.6g Hz. %d of %d tones fold.",
                rate / 2, model.foldedCount(), tones.length));
        table.removeAll();
        for (FoldExplorerModel.Row row : model.rows()) {
            TableItem item = new TableItem(table, SWT.NONE);
            item.setText(new String[] {fmt(row.toneHz()), fmt(row.apparentHz()), Long.toString(row.zone()),
                    row.folded() ? "alias" : "true", model.hasChain() ? decibels(row.attenuationDb()) : "no chain"});
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
        if (Double.isFinite(channelRate)) {
            plot.addMarker("channel's rate", new double[] {channelRate, channelRate}, new double[] {0, top});
        }
        plot.setRanges(new Range(model.minRate(), model.maxRate()), new Range(0, top * 1.02));
        attenuation.clear();
        double highest = 10;
        for (int i = 0; i < tones.length; i++) {
            double[][] xy = model.attenuationCurve(i);
            attenuation.addLine(fmt(tones[i]) + " Hz", xy[0], xy[1]);
            for (double a : xy[1]) {
                highest = Math.max(highest, Math.min(a, 200));
            }
        }
        attenuation.addMarker("chosen rate", new double[] {rate, rate}, new double[] {0, highest});
        attenuation.setRanges(new Range(model.minRate(), model.maxRate()), new Range(-1, highest * 1.05));
        status.getParent().layout();
    }

    static double[] parseTones(String text) {
        return NumberText.positiveList("tone frequency in Hz", text);
    }

    static double parsePositive(String what, String text) {
        return NumberText.positive(what, text);
    }

    /** One decimal; a rounding residue of a flat response reads 0.0, not -0.0. */
    static String decibels(double db) {
        return Double.isInfinite(db) ? "∞" : String.format(Locale.ROOT, "%.1f", Math.abs(db) < 0.05 ? 0.0 : db);
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
