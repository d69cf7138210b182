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
    private final List<Band> bands = new ArrayList<>();
    private int nextColour;

    public PlotView(Composite parent, String title, String xTitle, String yTitle) {
        chart = new Chart(parent, SWT.NONE);
        chart.getTitle().setText(title);
        chart.getAxisSet().getXAxis(0).getTitle().setText(xTitle);
        chart.getAxisSet().getYAxis(0).getTitle().setText(yTitle);
        chart.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.getPlotArea().setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.addDisposeListener(e -> colours.forEach(Color::dispose));
        chart.getPlotArea().addCustomPaintListener(new org.eclipse.swtchart.ICustomPaintListener() {
            @Override
            public void paintControl(org.eclipse.swt.events.PaintEvent e) {
                paintBands(e.gc);
            }

            @Override
            public boolean drawBehindSeries() {
                return true;
            }
        });
    }

    /** Shades the x interval [lowX, highX] over the plot's height, lightly, in palette colour {@code index}. */
    public void addBand(double lowX, double highX, int index) {
        bands.add(new Band(lowX, highX, palette(index)));
    }

    /** How many bands are shaded (tests). */
    public int bandCount() {
        return bands.size();
    }

    private record Band(double lowX, double highX, Color colour) {
    }

    private void paintBands(org.eclipse.swt.graphics.GC gc) {
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        int height = chart.getPlotArea().getSize().y;
        int alpha = gc.getAlpha();
        for (Band b : bands) {
            int x0 = xAxis.getPixelCoordinate(b.lowX());
            int x1 = xAxis.getPixelCoordinate(b.highX());
            gc.setBackground(b.colour());
            gc.setAlpha(45);
            gc.fillRectangle(Math.min(x0, x1), 0, Math.abs(x1 - x0), height);
        }
        gc.setAlpha(alpha);
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
        bands.clear();
        nextColour = 0;
    }

    /** Adds a solid line through the given points, in the next palette colour. */
    public void addLine(String name, double[] x, double[] y) {
        line(name, x, y, LineStyle.SOLID, 2, palette(nextColour++));
    }

    /** Adds a line in the palette colour {@code index} (two lines of one thing share a colour). */
    public void addLine(String name, double[] x, double[] y, int index, int width) {
        line(name, x, y, LineStyle.SOLID, width, palette(index));
    }

    /** Adds points without a line (marked peaks, frames), in palette colour {@code index}, each with its label. */
    public void addPoints(String name, double[] x, double[] y, int index, String[] labels) {
        Color colour = palette(index);
        ILineSeries<?> s = line(name, x, y, LineStyle.NONE, 1, colour);
        s.setSymbolType(PlotSymbolType.CIRCLE);
        s.setSymbolColor(colour);
        s.setSymbolSize(4);
        if (labels != null) {
            s.getLabel().setFormats(labels);
            s.getLabel().setVisible(true);
        }
    }

    /** Adds a thin dashed reference line (a limit, a marker) in grey. */
    public void addMarker(String name, double[] x, double[] y) {
        line(name, x, y, LineStyle.DASH, 1, chart.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
    }

    private ILineSeries<?> line(String name, double[] x, double[] y, LineStyle style, int width, Color colour) {
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
        return series;
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
