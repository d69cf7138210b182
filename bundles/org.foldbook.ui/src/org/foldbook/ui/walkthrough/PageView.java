package org.foldbook.ui.walkthrough;

import java.util.function.Consumer;

import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.jface.resource.JFaceResources;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Spinner;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.eclipse.swtchart.Range;
import org.foldbook.ui.chart.PlotView;

/**
 * One walkthrough page drawn: heading, sentences, figures table on the left; the stage's chart on the
 * right, and for a camera the animation with its frame-rate control. Draws what a {@link StagePage} holds.
 */
final class PageView {

    private final SashForm sash;
    private final Composite left;
    private final Label title;
    private final Text text;
    private final Table figures;
    private final Composite right;
    private final PlotView plot;
    private final Composite motionArea;
    private final MotionView motion;
    private final Spinner frameRate;

    PageView(Composite parent, Consumer<String> onFrameRate) {
        sash = new SashForm(parent, SWT.HORIZONTAL);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(sash);
        left = new Composite(sash, SWT.NONE);
        GridLayoutFactory.fillDefaults().margins(4, 4).spacing(4, 6).applyTo(left);
        title = new Label(left, SWT.NONE);
        title.setFont(JFaceResources.getFontRegistry().getBold(JFaceResources.HEADER_FONT));
        GridDataFactory.fillDefaults().grab(true, false).applyTo(title);
        text = new Text(left, SWT.MULTI | SWT.WRAP | SWT.READ_ONLY | SWT.V_SCROLL);
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 160).applyTo(text);
        figures = new Table(left, SWT.BORDER | SWT.FULL_SELECTION | SWT.V_SCROLL);
        figures.setHeaderVisible(true);
        figures.setLinesVisible(true);
        for (String column : new String[] { "Figure", "Value", "How" }) {
            TableColumn c = new TableColumn(figures, SWT.LEFT);
            c.setText(column);
            c.setWidth(column.equals("Value") ? 230 : 190);
        }
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 150).applyTo(figures);

        right = new Composite(sash, SWT.NONE);
        GridLayoutFactory.fillDefaults().margins(4, 4).spacing(4, 4).applyTo(right);
        plot = new PlotView(right, "", "Frequency (Hz)", "Gain (dB)");
        GridDataFactory.fillDefaults().grab(true, true).hint(300, 200).applyTo(plot.control());
        motionArea = new Composite(right, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(3).applyTo(motionArea);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(motionArea);
        new Label(motionArea, SWT.NONE).setText("Film at:");
        frameRate = new Spinner(motionArea, SWT.BORDER);
        frameRate.setDigits(1);
        frameRate.setValues(10000, 10, 200000, 1, 5, 100);
        frameRate.setToolTipText("Frame rate of the what-if (0.5 frames/s steps; type any value)");
        frameRate.addListener(SWT.Selection, e -> onFrameRate.accept(String.valueOf(frameRate.getSelection() / 10.0)));
        new Label(motionArea, SWT.NONE).setText("frames/s (a what-if: the notebook keeps its own)");
        motion = new MotionView(motionArea);
        GridDataFactory.fillDefaults().span(3, 1).grab(true, true).hint(300, 180).applyTo(motion.control());
        sash.setWeights(52, 48);
    }

    /** Draws {@code page} (null: empty). */
    void show(StagePage page) {
        figures.removeAll();
        plot.clear();
        if (page == null) {
            title.setText("Open a notebook with a rig to walk through it.");
            text.setText("");
            plot.setRanges(null, null);
            showMotion(null);
            return;
        }
        title.setText(page.title());
        StringBuilder words = new StringBuilder();
        for (String p : page.paragraphs()) { // a blank line between paragraphs, none inside a list
            if (!words.isEmpty()) {
                words.append(System.lineSeparator());
                if (!p.startsWith("• ")) {
                    words.append(System.lineSeparator());
                }
            }
            words.append(p);
        }
        text.setText(words.toString());
        for (StagePage.Figure f : page.figures()) {
            new TableItem(figures, SWT.NONE).setText(new String[] { f.name(), f.value(), f.how() });
        }
        page.chart().ifPresentOrElse(this::draw, () -> plot.setRanges(null, null));
        plot.control().setVisible(page.chart().isPresent());
        ((org.eclipse.swt.layout.GridData) plot.control().getLayoutData()).exclude = page.chart().isEmpty();
        showMotion(page.motion().orElse(null));
        boolean table = !page.figures().isEmpty();
        figures.setVisible(table);
        ((org.eclipse.swt.layout.GridData) figures.getLayoutData()).exclude = !table;
        // a page with nothing to draw (the cautions) gets the whole width for its words
        sash.setMaximizedControl(page.chart().isEmpty() && page.motion().isEmpty() ? left : null);
        title.getParent().layout(true, true);
        right.layout(true, true);
    }

    private void showMotion(FilmedMotion m) {
        motionArea.setVisible(m != null);
        ((org.eclipse.swt.layout.GridData) motionArea.getLayoutData()).exclude = m == null;
        motion.show(m);
        if (m != null && !frameRate.isFocusControl()) {
            frameRate.setSelection((int) Math.round(10 * m.seen().frameRateHz()));
        }
    }

    private void draw(StageChart chart) {
        plot.control().getTitle().setText(chart.title());
        plot.control().getAxisSet().getXAxis(0).getTitle().setText(chart.xTitle());
        plot.control().getAxisSet().getYAxis(0).getTitle().setText(chart.yTitle());
        for (StageChart.Band b : chart.bands()) {
            plot.addBand(b.lowX(), b.highX(), b.folds() ? 1 : 4);
        }
        int colour = 0;
        for (StageChart.Line l : chart.lines()) {
            switch (l.style()) {
                case MARKER -> plot.addMarker(l.name(), l.x(), l.y());
                case POINTS -> plot.addPoints(l.name(), l.x(), l.y(), colour++, null);
                case LINE -> plot.addLine(l.name(), l.x(), l.y(), colour++, 2);
            }
        }
        plot.setRanges(new Range(chart.xRange()[0], chart.xRange()[1]), new Range(chart.yRange()[0], chart.yRange()[1]));
    }

    PlotView plot() {
        return plot;
    }

    MotionView motion() {
        return motion;
    }

    Spinner frameRate() {
        return frameRate;
    }

    Table figures() {
        return figures;
    }
}
