package org.foldbook.ui.recording;

import java.util.List;
import java.util.function.Consumer;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.ProgressBar;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swtchart.Range;
import org.foldbook.model.Channel;
import org.foldbook.ui.chart.PlotView;
import org.foldbook.ui.export.ExportMenu;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.preferences.SpectrumPreferences;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * The recording view: the channel selected in the Notebook part, read from its file in a background job —
 * a min/max overview of the whole recording over time and its Welch spectrum in the sensor's units, peaks
 * marked and listed, a readout under the mouse. The read is the {@link RecordingSession}'s, shared with the
 * Fold explorer; peaks follow the spectrum preferences. Only draws; {@link RecordingPresenter} decides what.
 */
public class RecordingPart {
    @Inject
    @Optional
    UISynchronize sync;
    @Inject
    @Optional
    CurrentNotebook current;

    final RecordingPresenter presenter = new RecordingPresenter();
    private final Consumer<Object> onSelection = this::follow;
    Label header;
    Label message;
    Combo levels;
    Button logAxis;
    Button reread;
    Button cancel;
    ProgressBar progress;
    PlotView envelope;
    PlotView spectrum;
    Table peaks;
    Label cursor;
    @Inject
    @Optional
    RecordingSession session;
    @Inject
    @Optional
    SpectrumPreferences preferences;
    /** The session made here when none was shared (a part on its own, in tests). */
    private RecordingSession ownSession;
    private final Consumer<RecordingSession.State> onState = s -> ui(() -> apply(s));
    /** The phase of the session's state drawn last (UI thread). */
    private RecordingSession.Phase shown;
    private Composite charts;
    /** Peaks labelled on the chart (the strongest); the table lists them all. */
    static final int LABELLED_PEAKS = 6;

    @PostConstruct
    public void createControls(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(8, 6).spacing(6, 4).applyTo(parent);
        Composite bar = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(7).spacing(8, 0).applyTo(bar);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(bar);
        new Label(bar, SWT.NONE).setText("Levels:");
        levels = new Combo(bar, SWT.READ_ONLY);
        GridDataFactory.fillDefaults().hint(230, SWT.DEFAULT).applyTo(levels);
        logAxis = new Button(bar, SWT.CHECK);
        logAxis.setText("Log frequency axis");
        reread = new Button(bar, SWT.PUSH);
        reread.setText("Read again");
        progress = new ProgressBar(bar, SWT.HORIZONTAL);
        progress.setMaximum(1000);
        GridDataFactory.fillDefaults().align(SWT.FILL, SWT.CENTER).hint(140, SWT.DEFAULT).applyTo(progress);
        cancel = new Button(bar, SWT.PUSH);
        cancel.setText("Cancel reading");
        cancel.setEnabled(false);
        cursor = new Label(bar, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).align(SWT.FILL, SWT.CENTER).applyTo(cursor);

        header = new Label(parent, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(header);
        message = new Label(parent, SWT.WRAP);
        GridDataFactory.fillDefaults().grab(true, false).hint(600, SWT.DEFAULT).applyTo(message);

        // side by side: the part is wide and not tall
        SashForm row = new SashForm(parent, SWT.HORIZONTAL);
        charts = row;
        GridDataFactory.fillDefaults().grab(true, true).applyTo(row);
        envelope = new PlotView(row, "Whole recording (min/max per column)", "Time (s)", "Value");
        spectrum = new PlotView(row, "Spectrum (Welch, rms per line)", "Frequency (Hz)", "Level");
        peaks = new Table(row, SWT.BORDER | SWT.FULL_SELECTION);
        peaks.setHeaderVisible(true);
        peaks.setLinesVisible(true);
        for (String title : new String[] {"Peak (Hz)", "Level", "dBFS"}) {
            TableColumn c = new TableColumn(peaks, SWT.RIGHT);
            c.setText(title);
            c.setWidth(switch (title) {
                case "Peak (Hz)" -> 76;
                case "Level" -> 116;
                default -> 56;
            });
        }
        ExportMenu.attach(peaks, "Spectral peaks");
        envelope.showLegend(false);
        spectrum.showLegend(false);
        row.setWeights(30, 50, 20);

        levels.addListener(SWT.Selection, e -> {
            List<RecordingPresenter.Levels> choices = presenter.choices();
            int i = levels.getSelectionIndex();
            if (i >= 0 && i < choices.size()) {
                presenter.setLevels(choices.get(i));
                render();
            }
        });
        logAxis.addListener(SWT.Selection, e -> {
            presenter.setLogFrequency(logAxis.getSelection());
            render();
        });
        reread.addListener(SWT.Selection, e -> {
            if (presenter.channel() != null) {
                apply(session.reread(presenter.channel()));
            }
        });
        cancel.addListener(SWT.Selection, e -> cancelReading());
        spectrum.onCursor((x, y) -> cursor.setText(presenter.cursorText(x)));

        if (session == null) {
            session = ownSession = new RecordingSession(preferences);
        }
        session.addListener(onState);
        if (current != null) {
            current.addSelectionListener(onSelection);
            follow(current.selection());
        } else {
            render();
        }
    }

    /** Shows the channel {@code selection} stands for (nothing when it is not a channel). */
    public void follow(Object selection) {
        Channel channel = RecordingPresenter.channelOf(selection);
        if (channel == null && presenter.channel() != null && selection != null) {
            return; // a rig or chain selected: keep showing the last channel
        }
        if (channel != presenter.channel()) {
            presenter.follow(channel);
            render();
        }
        if (channel != null) {   // a read of it running or done is reused, a failed one tried again
            apply(session.request(channel));
        }
    }

    /** The session's news about the channel shown (its own thread's or ours): drawn on the UI thread. */
    private void apply(RecordingSession.State s) {
        if (header.isDisposed() || s.channel() != presenter.channel()) {
            return;
        }
        shown = s.phase();
        switch (s.phase()) {
            case READING -> {
                progress.setSelection((int) s.perMille());
                cancel.setEnabled(true);
                if (s.perMille() == 0) {
                    presenter.follow(s.channel());   // a new read (or other preferences): say so while it reads
                    render();
                }
            }
            case DONE -> {
                cancel.setEnabled(false);
                presenter.showOverview(s.overview());
                render();
            }
            case FAILED, CANCELLED -> {
                cancel.setEnabled(false);
                presenter.showProblem(s.problem());
                render();
            }
        }
    }

    /** Asks the running read to stop (its cancellation shows in the part). */
    public void cancelReading() {
        session.cancel();
    }

    /** True until the read of the channel shown has ended and its outcome is drawn. */
    boolean reading() {
        return presenter.channel() != null && shown == RecordingSession.Phase.READING;
    }

    /** The session this view shows. */
    RecordingSession session() {
        return session;
    }

    private void ui(Runnable r) {
        if (header.isDisposed()) {
            return;
        }
        if (sync != null) {
            sync.asyncExec(() -> {
                if (!header.isDisposed()) {
                    r.run();
                }
            });
        } else {
            header.getDisplay().asyncExec(() -> {
                if (!header.isDisposed()) {
                    r.run();
                }
            });
        }
    }

    private void render() {
        RecordingOverview o = presenter.overview();
        message.setText(presenter.message() == null ? "" : presenter.message());
        ((GridData) message.getLayoutData()).exclude = presenter.message() == null;
        message.setVisible(presenter.message() != null);
        header.setText(o == null ? (presenter.channel() == null ? "No channel selected" : "Channel '"
                + presenter.channel().getName() + "'") : presenter.header());
        header.setToolTipText(o == null ? null : presenter.details());
        levels.removeAll();
        for (RecordingPresenter.Levels l : presenter.choices()) {
            levels.add(presenter.label(l));
        }
        levels.select(Math.max(0, presenter.choices().indexOf(presenter.levels())));
        envelope.clear();
        spectrum.clear();
        peaks.removeAll();
        cursor.setText("");
        if (o != null) {
            double[][] env = presenter.envelopeLine();
            envelope.setYTitle(presenter.envelopeUnit());
            envelope.addLine(o.channelName(), env[0], env[1], 0, 1);
            envelope.setRanges(new Range(0, o.durationSeconds()), null);
            double[][] line = presenter.spectrumLine();
            spectrum.setLogX(false);
            spectrum.setYTitle(presenter.unitOfLevels());
            spectrum.addLine("spectrum", line[0], line[1], 0, 1);
            double[][] marked = presenter.peakPoints();
            List<String[]> rows = presenter.peakRows();
            String[] labels = presenter.peakLabels(LABELLED_PEAKS);
            spectrum.addPoints("peaks", marked[0], marked[1], 1, labels);
            for (String[] r : rows) {
                new TableItem(peaks, SWT.NONE).setText(r);
            }
            peaks.getColumn(1).setText(presenter.unitOfLevels());
            double lo = presenter.logFrequency() ? o.spectrum().binWidth() : 0;
            spectrum.setLogX(presenter.logFrequency());
            spectrum.setRanges(new Range(lo, o.rateHz() / 2), yRange(line[1]));
        }
        envelope.control().redraw();
        spectrum.control().redraw();
        peaks.redraw();
        header.getParent().layout(true, true);
    }

    /** Levels from 100 dB below the highest (the noise of a 16-bit file and more) to 10 dB above it. */
    private Range yRange(double[] y) {
        double max = Double.NEGATIVE_INFINITY;
        double min = Double.POSITIVE_INFINITY;
        for (double v : y) {
            max = Math.max(max, v);
            min = Math.min(min, v);
        }
        if (presenter.levels() == RecordingPresenter.Levels.LINEAR) {
            return new Range(0, max * 1.1);
        }
        return new Range(Math.max(min, max - 100), max + 10);
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
}
