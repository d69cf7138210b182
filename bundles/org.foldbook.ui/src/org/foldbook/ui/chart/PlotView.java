package org.foldbook.ui.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.events.PaintEvent;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swtchart.Chart;
import org.eclipse.swtchart.IAxis;
import org.eclipse.swtchart.ICustomPaintListener;
import org.eclipse.swtchart.ILineSeries;
import org.eclipse.swtchart.ILineSeries.PlotSymbolType;
import org.eclipse.swtchart.ISeries.SeriesType;
import org.eclipse.swtchart.LineStyle;
import org.eclipse.swtchart.Range;
import org.foldbook.ui.export.ChartData;
import org.foldbook.ui.export.ExportMenu;

/**
 * Foldbook's one chart viewer: every view draws through it, so axes, colours and line styles look
 * the same everywhere. It wraps SWTChart and exposes only what our views need (named x/y lines,
 * markers, points, fixed or automatic ranges, a log frequency axis, a cursor). It keeps the numbers it
 * shows, so every chart exports them (context menu: PNG, SVG, CSV, JSON; see {@link ExportMenu}).
 * Colours it allocates are disposed with the control.
 */
public final class PlotView {
    /** Our palette: distinguishable in print and for common colour-vision deficiencies. */
    private static final RGB[] PALETTE = {
        new RGB(0, 90, 181), new RGB(220, 50, 32), new RGB(0, 140, 90), new RGB(150, 60, 170),
        new RGB(230, 140, 0), new RGB(60, 60, 60), new RGB(0, 160, 200), new RGB(170, 110, 60)};
    private static final RGB MARKER_GREY = new RGB(96, 96, 96);

    private final Chart chart;
    private final String title;
    private final String xTitle;
    private String yTitle;
    private final List<Color> colours = new ArrayList<>();
    private final List<ChartData.Series> shown = new ArrayList<>();
    private final List<Band> bands = new ArrayList<>();
    private final List<PointLabel> pointLabels = new ArrayList<>();
    private int nextColour;

    public PlotView(Composite parent, String title, String xTitle, String yTitle) {
        this.title = title;
        this.xTitle = xTitle;
        this.yTitle = yTitle;
        chart = new Chart(parent, SWT.NONE);
        chart.getTitle().setText(title);
        chart.getAxisSet().getXAxis(0).getTitle().setText(xTitle);
        chart.getAxisSet().getYAxis(0).getTitle().setText(yTitle);
        chart.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.getPlotArea().setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        chart.addDisposeListener(e -> colours.forEach(Color::dispose));
        chart.getPlotArea().addCustomPaintListener(new ICustomPaintListener() {
            @Override
            public void paintControl(PaintEvent e) {
                paintBands(e.gc);
            }

            @Override
            public boolean drawBehindSeries() {
                return true;
            }
        });
        chart.getPlotArea().addCustomPaintListener(this::drawLabels);
        ExportMenu.attach(this);
    }

    /** Shades the x interval [lowX, highX] over the plot's height, lightly, in palette colour {@code index}. */
    public void addBand(double lowX, double highX, int index) {
        Color colour = new Color(chart.getDisplay(), PALETTE[index % PALETTE.length]);
        colours.add(colour);
        bands.add(new Band(lowX, highX, colour));
    }

    /** How many bands are shaded (tests). */
    public int bandCount() {
        return bands.size();
    }

    private record Band(double lowX, double highX, Color colour) {
    }

    private void paintBands(GC gc) {
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

    public String title() {
        return title;
    }

    /** Changes the y axis title (e.g. when the level unit changes). */
    public void setYTitle(String text) {
        yTitle = text;
        chart.getAxisSet().getYAxis(0).getTitle().setText(text);
    }

    /** Removes every line; the next line gets the first palette colour again. */
    public void clear() {
        for (var s : chart.getSeriesSet().getSeries()) {
            chart.getSeriesSet().deleteSeries(s.getId());
        }
        shown.clear();
        bands.clear();
        pointLabels.clear();
        nextColour = 0;
    }

    /** Adds a solid line through the given points, in the next palette colour. */
    public void addLine(String name, double[] x, double[] y) {
        RGB rgb = PALETTE[nextColour++ % PALETTE.length];
        line(name, x, y, LineStyle.SOLID, 2, rgb, PlotSymbolType.NONE, ChartData.Style.LINE);
    }

    /** Adds a line in the palette colour {@code index} (two lines of one thing share a colour). */
    public void addLine(String name, double[] x, double[] y, int index, int width) {
        line(name, x, y, LineStyle.SOLID, width, PALETTE[index % PALETTE.length], PlotSymbolType.NONE,
                ChartData.Style.LINE);
    }

    /** Adds a thin dashed reference line (a limit, a marker) in grey. */
    public void addMarker(String name, double[] x, double[] y) {
        line(name, x, y, LineStyle.DASH, 1, MARKER_GREY, PlotSymbolType.NONE, ChartData.Style.MARKER);
    }

    /** Adds points without a line (marked peaks), in palette colour {@code index}; a null label: none. */
    public void addPoints(String name, double[] x, double[] y, int index, String[] labels) {
        line(name, x, y, LineStyle.NONE, 1, PALETTE[index % PALETTE.length], PlotSymbolType.CIRCLE,
                ChartData.Style.POINTS);
        if (labels != null) {
            for (int i = 0; i < x.length && i < labels.length; i++) {
                if (labels[i] != null) {
                    pointLabels.add(new PointLabel(x[i], y[i], labels[i]));
                }
            }
        }
    }

    /** Draws the point labels beside their points, after the series. */
    private void drawLabels(PaintEvent e) {
        IAxis xAxis = chart.getAxisSet().getXAxis(0);
        IAxis yAxis = chart.getAxisSet().getYAxis(0);
        e.gc.setForeground(chart.getDisplay().getSystemColor(SWT.COLOR_BLACK));
        List<Rectangle> drawn = new ArrayList<>();
        List<PointLabel> byHeight = new ArrayList<>(pointLabels);
        byHeight.sort((a, b) -> Double.compare(b.y, a.y)); // the highest points keep their labels
        for (PointLabel l : byHeight) {
            if (isLogX() && !(l.x > 0)) {
                continue;
            }
            var size = e.gc.textExtent(l.text);
            var box = new Rectangle(xAxis.getPixelCoordinate(l.x) + 5,
                    Math.max(0, yAxis.getPixelCoordinate(l.y) - size.y), size.x, size.y);
            if (drawn.stream().noneMatch(box::intersects)) { // a label that would overlap another is left out
                e.gc.drawText(l.text, box.x, box.y, true);
                drawn.add(box);
            }
        }
    }

    private record PointLabel(double x, double y, String text) {
    }

    private ILineSeries<?> line(String name, double[] x, double[] y, LineStyle style, int width, RGB rgb,
            PlotSymbolType symbol, ChartData.Style kind) {
        ChartData.Series data = new ChartData.Series(name, x.clone(), y.clone(), kind,
                (rgb.red << 16) | (rgb.green << 8) | rgb.blue);
        Color colour = new Color(chart.getDisplay(), rgb);
        colours.add(colour);
        ILineSeries<?> series = (ILineSeries<?>) chart.getSeriesSet().createSeries(SeriesType.LINE, name);
        series.setXSeries(x);
        series.setYSeries(y);
        series.setLineStyle(style);
        series.setLineWidth(width);
        series.setLineColor(colour);
        series.setSymbolType(symbol);
        if (symbol != PlotSymbolType.NONE) {
            series.setSymbolColor(colour);
            series.setSymbolSize(4);
        }
        series.setAntialias(SWT.ON);
        shown.add(data);
        return series;
    }

    /** Shows or hides the legend (a chart of one line needs none). */
    public void showLegend(boolean visible) {
        chart.getLegend().setVisible(visible);
    }

    /** A logarithmic or linear x axis; every x shown must then be positive. */
    public void setLogX(boolean log) {
        chart.getAxisSet().getXAxis(0).enableLogScale(log);
    }

    public boolean isLogX() {
        return chart.getAxisSet().getXAxis(0).isLogScaleEnabled();
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

    /** Tells {@code listener} the data coordinates (x, y) under the mouse in the plot area. */
    public void onCursor(BiConsumer<Double, Double> listener) {
        chart.getPlotArea().addMouseMoveListener(e -> listener.accept(
                chart.getAxisSet().getXAxis(0).getDataCoordinate(e.x),
                chart.getAxisSet().getYAxis(0).getDataCoordinate(e.y)));
    }

    /** The numbers shown now, titles and ranges: what the exports write. */
    public ChartData data() {
        Range x = chart.getAxisSet().getXAxis(0).getRange();
        Range y = chart.getAxisSet().getYAxis(0).getRange();
        return new ChartData(title, xTitle, yTitle, shown, isLogX(), new double[] {x.lower, x.upper},
                new double[] {y.lower, y.upper});
    }
}
