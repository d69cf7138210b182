package org.foldbook.ui.chart;

import java.util.ArrayList;
import java.util.List;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;

/**
 * Foldbook's one chart viewer: every view draws through it, so axes, colours and line styles look
 * the same everywhere. It wraps SWTChart and exposes only what our views need (named x/y lines,
 * markers, fixed or automatic ranges). Colours it allocates are disposed with the control.
 */
public final class PlotView {
    /** Our palette: distinguishable in print and for common colour-vision deficiencies. */
    private static final RGB[] PALETTE = {
        new RGB(0, 90, 181), new RGB(220, 50, 32), new RGB(0, 140, 90), new RGB(150, 60, 170),
        new RGB(230, 140, 0), new RGB(60, 60, 60), new RGB(0, 160, 200), new RGB(170, 110, 60)};

    private final Chart chart;
    private final List<Color> colours = new ArrayList<>();
    private int nextColour;

    public PlotView(Composite parent, String title, String xTitle, String yTitle) {
        chart = new Chart(parent, SWT.NONE);
        chart.getTitle().setText(title);
        chart.getAxisSet().getXAxis(0).getTitle().setText(xTitle);
        chart.getAxisSet().getYAxis(0).getTitle().setText(yTitle);
        chart.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.getPlotArea().setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.addDisposeListener(e -> colours.forEach(Color::dispose));
    }

    /** The SWT control, for layout data. */
    public Chart control() {
        return chart;
    }

    /** Removes every line; the next line gets the first palette colour again. */
    public void clear() {
        for (var s : chart.getSeriesSet().getSeries()) {
            chart.getSeriesSet().deleteSeries(s.getId());
        }
        nextColour = 0;
    }

    /** Adds a solid line through the given points, in the next palette colour. */
    public void addLine(String name, double[] x, double[] y) {
        line(name, x, y, LineStyle.SOLID, 2, palette(nextColour++));
    }

    /** Adds a thin dashed reference line (a limit, a marker) in grey. */
    public void addMarker(String name, double[] x, double[] y) {
        line(name, x, y, LineStyle.DASH, 1, chart.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
    }

    private void line(String name, double[] x, double[] y, LineStyle style, int width, Color colour) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("line '" + name + "': " + x.length + " x values but " + y.length + " y values");
        }
        ILineSeries<?> series = (ILineSeries<?>) chart.getSeriesSet().createSeries(SeriesType.LINE, name);
        series.setXSeries(x);
        series.setYSeries(y);
        series.setLineStyle(style);
        series.setLineWidth(width);
        series.setLineColor(colour);
        series.setSymbolType(PlotSymbolType.NONE);
        series.setAntialias(SWT.ON);
    }

    /** Fixes both axis ranges (null keeps the automatic range of that axis), then redraws. */
    public void setRanges(Range x, Range y) {
        chart.getAxisSet().adjustRange();
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        IAxis yAxis = chart.getAxisSet().getYAxis(0);
        if (x != null) {
            xAxis.setRange(x);
        }
        if (y != null) {
            yAxis.setRange(y);
        }
        chart.redraw();
    }

    private Color palette(int index) {
        Color c = new Color(chart.getDisplay(), PALETTE[index % PALETTE.length]);
        colours.add(c);
        return c;
    }
}
