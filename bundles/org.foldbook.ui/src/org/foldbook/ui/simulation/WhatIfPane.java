package org.foldbook.ui.simulation;

import java.util.Locale;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Scale;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Range;
import org.foldbook.channel.WhatIfRate;
import org.foldbook.dsp.NumberText;
import org.foldbook.model.derived.Quantities;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.ui.chart.PlotView;

/**
 * The what-if rate: a slider (geometric, a sixteenth of the recording's rate up to its rate) and a typed
 * rate; each change draws the spectral-fold preview at once with a marker where every source peak lands,
 * then a background job re-samples the recording at that rate and replaces the preview with the exact
 * spectrum (a newer change cancels it).
 */
final class WhatIfPane {
    private static final int STEPS = 1000;
    private static final double LOWEST_FRACTION = 1.0 / 16;

    private final Composite pane;
    private final Scale scale;
    private final Text rate;
    private final Label state;
    private final Label landings;
    private final PlotView plot;
    private final SweepEngine engine = new SweepEngine(1);
    private WhatIfRate model;
    private Job exact;
    private WhatIfRate.Spectrum shown;

    WhatIfPane(Composite parent) {
        pane = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(4).spacing(6, 2).applyTo(pane);
        new Label(pane, SWT.NONE).setText("What-if rate:");
        scale = new Scale(pane, SWT.HORIZONTAL);
        scale.setMinimum(0);
        scale.setMaximum(STEPS);
        SimulationPart.name(scale, "whatIfScale");
        GridDataFactory.fillDefaults().grab(true, false).applyTo(scale);
        rate = new Text(pane, SWT.BORDER);
        SimulationPart.name(rate, "whatIfRate");
        GridDataFactory.fillDefaults().hint(80, SWT.DEFAULT).applyTo(rate);
        state = new Label(pane, SWT.NONE);
        SimulationPart.name(state, "whatIfState");
        GridDataFactory.fillDefaults().hint(170, SWT.DEFAULT).applyTo(state);
        plot = new PlotView(pane, "", "Frequency (Hz)", "Level (dB)");
        SimulationPart.name(plot.control(), "whatIfPlot");
        plot.control().getTitle().setVisible(false);
        plot.control().getLegend().setVisible(false);   // the markers are named in the line below the chart
        GridDataFactory.fillDefaults().span(4, 1).grab(true, true).applyTo(plot.control());
        landings = new Label(pane, SWT.WRAP);
        SimulationPart.name(landings, "whatIfLandings");
        GridDataFactory.fillDefaults().span(4, 1).grab(true, false).applyTo(landings);
        scale.addListener(SWT.Selection, e -> {
            if (model != null) {
                double r = rateAt(scale.getSelection());
                rate.setText(Quantities.plain(Math.rint(r)));
                change(r);
            }
        });
        rate.addListener(SWT.DefaultSelection, e -> typed());
        show(null);
    }

    Composite control() {
        return pane;
    }

    /** Shows what-if answers for {@code next} (null: none until a run or a read has finished). */
    void show(WhatIfRate next) {
        cancelExact();
        model = next;
        scale.setEnabled(next != null);
        rate.setEnabled(next != null);
        plot.clear();
        shown = null;
        if (next == null) {
            state.setText("after a run");
            landings.setText("");
            plot.setRanges(null, null);
            return;
        }
        scale.setSelection(STEPS / 2);
        double r = rateAt(STEPS / 2);
        rate.setText(Quantities.plain(Math.rint(r)));
        change(r);
    }

    private double rateAt(int position) {
        double top = model.sourceRate();
        return top * Math.pow(LOWEST_FRACTION, 1 - position / (double) STEPS);
    }

    private void typed() {
        if (model == null) {
            return;
        }
        try {
            change(NumberText.positive("what-if rate in S/s", rate.getText()));
        } catch (IllegalArgumentException e) {
            state.setText(e.getMessage());
        }
    }

    /** The preview now, the exact spectrum when its job is done. */
    private void change(double r) {
        WhatIfRate.Spectrum s;
        try {
            s = model.preview(r);
        } catch (IllegalArgumentException e) {
            state.setText(e.getMessage());
            return;
        }
        draw(s);
        cancelExact();
        WhatIfRate m = model;
        exact = new Job("Re-sampling at " + Quantities.rate(s.rateHz())) {
            @Override
            protected IStatus run(IProgressMonitor monitor) {
                try {
                    WhatIfRate.Spectrum e = m.exact(r, engine, monitor::isCanceled);
                    pane.getDisplay().asyncExec(() -> {
                        if (!pane.isDisposed() && m == model && shown != null && shown.rateHz() == e.rateHz()) {
                            draw(e);
                        }
                    });
                    return Status.OK_STATUS;
                } catch (java.util.concurrent.CancellationException e) {
                    return Status.CANCEL_STATUS;
                }
            }
        };
        exact.setSystem(true);
        exact.schedule(150);   // a slider drag makes many changes: re-sample only once it rests
    }

    /** The spectrum shown now. */
    WhatIfRate.Spectrum shown() {
        return shown;
    }

    private void draw(WhatIfRate.Spectrum s) {
        shown = s;
        plot.clear();
        plot.addLine(s.exact() ? "spectrum (re-sampled)" : "spectrum (fold preview)", s.frequencyHz(), s.levelDb());
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : s.levelDb()) {
            lo = Math.min(lo, v);
            hi = Math.max(hi, v);
        }
        lo = Math.max(lo, hi - 160);
        StringBuilder text = new StringBuilder();
        for (WhatIfRate.Landing l : s.landings()) {
            plot.addMarker("peak " + (l.sourcePeak() + 1), new double[] {l.landsAtHz(), l.landsAtHz()},
                    new double[] {lo, hi + 5});
            text.append(String.format(Locale.ROOT, "%s → %s %s; ", Quantities.hz(l.sourceHz()), l.verdict(),
                    Quantities.hz(l.landsAtHz())));
        }
        plot.setRanges(new Range(0, s.rateHz() / 2), new Range(lo, hi + 5));
        state.setText((s.exact() ? "exact at " : "preview at ") + Quantities.rate(s.rateHz()));
        landings.setText(text.toString());
        pane.layout();
    }

    private void cancelExact() {
        if (exact != null) {
            exact.cancel();
            exact = null;
        }
    }

    void dispose() {
        cancelExact();
        engine.close();
    }
}
