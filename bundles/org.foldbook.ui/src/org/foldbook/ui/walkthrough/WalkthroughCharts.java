package org.foldbook.ui.walkthrough;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Rectangle2D;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * A walkthrough chart as an SVG element for the printable page: JFreeChart lays out and draws axes,
 * legend, lines and the shaded bands; JFreeSVG records the drawing as SVG. Nothing here writes SVG text
 * by hand. Free of SWT; safe off the UI thread.
 */
public final class WalkthroughCharts {

    static final int WIDTH = 760;
    static final int HEIGHT = 380;
    /** The workbench's palette (PlotView), so print and screen agree. */
    private static final Color[] PALETTE = { new Color(0, 90, 181), new Color(220, 50, 32), new Color(0, 140, 90),
        new Color(150, 60, 170), new Color(230, 140, 0), new Color(60, 60, 60) };

    private WalkthroughCharts() {
    }

    /** The chart drawn by JFreeChart into an SVG element ({@code <svg …>…</svg>}). */
    public static String svg(StageChart chart) {
        return svg(jfree(chart));
    }

    static String svg(JFreeChart chart) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setGeomDoubleConverter(v -> Double.toString(Math.round(v * 10) / 10.0)); // 0.1 px is finer than print
        chart.draw(g, new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        return g.getSVGElement();
    }

    /** The JFreeChart of a walkthrough chart. */
    static JFreeChart jfree(StageChart chart) {
        NumberAxis x = new NumberAxis(chart.xTitle());
        x.setRange(chart.xRange()[0], chart.xRange()[1]);
        NumberAxis y = new NumberAxis(chart.yTitle());
        y.setRange(chart.yRange()[0], chart.yRange()[1]);
        XYPlot plot = new XYPlot();
        plot.setDomainAxis(x);
        plot.setRangeAxis(y);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(215, 215, 215));
        plot.setRangeGridlinePaint(new Color(215, 215, 215));
        int colour = 0;
        for (int i = 0; i < chart.lines().size(); i++) {
            StageChart.Line line = chart.lines().get(i);
            XYSeries series = new XYSeries(line.name(), false, true);
            for (int k = 0; k < line.x().length; k++) {
                series.add(line.x()[k], line.y()[k]);
            }
            XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(line.style() != StageChart.Style.POINTS,
                    line.style() == StageChart.Style.POINTS);
            switch (line.style()) {
                case MARKER -> {
                    r.setSeriesPaint(0, new Color(96, 96, 96));
                    r.setSeriesStroke(0, new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                            new float[] { 6f, 4f }, 0f));
                }
                case POINTS -> {
                    r.setSeriesPaint(0, PALETTE[colour++ % PALETTE.length]);
                    r.setSeriesShape(0, new Ellipse2D.Double(-3.5, -3.5, 7, 7));
                }
                case LINE -> {
                    r.setSeriesPaint(0, PALETTE[colour++ % PALETTE.length]);
                    r.setSeriesStroke(0, new BasicStroke(1.8f));
                }
            }
            plot.setDataset(i, new XYSeriesCollection(series));
            plot.setRenderer(i, r);
        }
        for (StageChart.Band band : chart.bands()) {
            Color c = band.folds() ? PALETTE[1] : PALETTE[4];
            IntervalMarker m = new IntervalMarker(band.lowX(), band.highX(), new Color(c.getRed(), c.getGreen(), c.getBlue(), 50));
            m.setLabel(band.name());
            m.setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, 10));
            m.setLabelAnchor(band.folds() ? RectangleAnchor.TOP_LEFT : RectangleAnchor.BOTTOM_LEFT);
            m.setLabelTextAnchor(band.folds() ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
            plot.addDomainMarker(m, Layer.BACKGROUND);
        }
        JFreeChart result = new JFreeChart(chart.title(), new Font(Font.SANS_SERIF, Font.BOLD, 14), plot, true);
        result.setBackgroundPaint(Color.WHITE);
        return result;
    }
}
