package org.foldbook.ui.export;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;

import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.SVGUtils;

/**
 * A chart as a vector drawing: JFreeSVG's {@link SVGGraphics2D} draws frame, ticks, titles and every
 * series from the chart's numbers (no raster, no hand-made SVG text), so it scales for print. Linear
 * axes get 1-2-5 ticks; a logarithmic frequency axis gets decades. Free of SWT.
 */
public final class ChartSvg {
    private static final int WIDTH = 900;
    private static final int HEIGHT = 520;
    private static final int LEFT = 80;
    private static final int RIGHT = 20;
    private static final int TOP = 40;
    private static final int BOTTOM = 60;

    private ChartSvg() {
    }

    public static void write(ChartData chart, Path file) throws IOException {
        SVGUtils.writeToSVG(file.toFile(), draw(chart));
    }

    /** The SVG element of {@code chart} (SVGUtils adds the XML declaration when writing a file). */
    public static String draw(ChartData chart) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, WIDTH, HEIGHT));
        Axis x = new Axis(chart.xRange()[0], chart.xRange()[1], LEFT, WIDTH - RIGHT, chart.logX());
        Axis y = new Axis(chart.yRange()[0], chart.yRange()[1], HEIGHT - BOTTOM, TOP, false);
        Rectangle2D plot = new Rectangle2D.Double(LEFT, TOP, WIDTH - LEFT - RIGHT, HEIGHT - TOP - BOTTOM);

        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 11));
        g.setStroke(new BasicStroke(0.5f));
        for (double t : x.ticks()) {
            double px = x.pixel(t);
            g.setColor(new Color(225, 225, 225));
            g.draw(new Line2D.Double(px, TOP, px, HEIGHT - BOTTOM));
            g.setColor(Color.DARK_GRAY);
            String label = number(t);
            g.drawString(label, (float) (px - g.getFontMetrics().stringWidth(label) / 2.0), HEIGHT - BOTTOM + 16);
        }
        for (double t : y.ticks()) {
            double py = y.pixel(t);
            g.setColor(new Color(225, 225, 225));
            g.draw(new Line2D.Double(LEFT, py, WIDTH - RIGHT, py));
            g.setColor(Color.DARK_GRAY);
            String label = number(t);
            g.drawString(label, (float) (LEFT - 6 - g.getFontMetrics().stringWidth(label)), (float) py + 4);
        }
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(1f));
        g.draw(plot);
        g.setFont(new Font(Font.SANS_SERIF, Font.BOLD, 14));
        g.drawString(chart.title(), (float) (WIDTH / 2.0 - g.getFontMetrics().stringWidth(chart.title()) / 2.0), 24);
        g.setFont(new Font(Font.SANS_SERIF, Font.PLAIN, 12));
        g.drawString(chart.xTitle(), (float) (WIDTH / 2.0 - g.getFontMetrics().stringWidth(chart.xTitle()) / 2.0),
                HEIGHT - 16);
        g.rotate(-Math.PI / 2);
        g.drawString(chart.yTitle(), (float) (-(HEIGHT / 2.0) - g.getFontMetrics().stringWidth(chart.yTitle()) / 2.0), 18);
        g.rotate(Math.PI / 2);

        g.clip(plot);
        for (ChartData.Series s : chart.series()) {
            drawSeries(g, s, x, y);
        }
        return g.getSVGElement();
    }

    private static void drawSeries(SVGGraphics2D g, ChartData.Series s, Axis x, Axis y) {
        g.setColor(new Color(s.rgb()));
        if (s.style() == ChartData.Style.POINTS) {
            for (int i = 0; i < s.x().length; i++) {
                if (x.shows(s.x()[i])) {
                    g.fill(new Ellipse2D.Double(x.pixel(s.x()[i]) - 3.5, y.pixel(s.y()[i]) - 3.5, 7, 7));
                }
            }
            return;
        }
        g.setStroke(s.style() == ChartData.Style.MARKER
                ? new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 4f}, 0f)
                : new BasicStroke(1.5f));
        Path2D.Double path = new Path2D.Double();
        boolean open = false;
        for (int i = 0; i < s.x().length; i++) {
            if (!x.shows(s.x()[i]) || !Double.isFinite(s.y()[i])) {
                open = false;
                continue;
            }
            double px = x.pixel(s.x()[i]);
            double py = y.pixel(s.y()[i]);
            if (open) {
                path.lineTo(px, py);
            } else {
                path.moveTo(px, py);
                open = true;
            }
        }
        g.draw(path);
    }

    static String number(double v) {
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e5 || a < 1e-3) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        String s = String.format(Locale.ROOT, "%.6f", v);
        return s.replaceAll("0+$", "").replaceAll("\\.$", "");
    }

    /** Data to pixels along one axis; log axes map decades evenly. */
    static final class Axis {
        final double lo;
        final double hi;
        final double p0;
        final double p1;
        final boolean log;

        Axis(double lo, double hi, double p0, double p1, boolean log) {
            if (!(hi > lo) || (log && !(lo > 0))) {
                throw new IllegalArgumentException("axis range [" + lo + ", " + hi + "] cannot be drawn"
                        + (log ? " on a log axis" : ""));
            }
            this.lo = lo;
            this.hi = hi;
            this.p0 = p0;
            this.p1 = p1;
            this.log = log;
        }

        boolean shows(double v) {
            return Double.isFinite(v) && (!log || v > 0);
        }

        double pixel(double v) {
            double t = log ? Math.log(v / lo) / Math.log(hi / lo) : (v - lo) / (hi - lo);
            return p0 + t * (p1 - p0);
        }

        double[] ticks() {
            if (log) {
                int a = (int) Math.ceil(Math.log10(lo) - 1e-9);
                int b = (int) Math.floor(Math.log10(hi) + 1e-9);
                double[] t = new double[Math.max(0, b - a + 1)];
                for (int i = 0; i < t.length; i++) {
                    t[i] = Math.pow(10, a + i);
                }
                return t;
            }
            double raw = (hi - lo) / 6;
            double mag = Math.pow(10, Math.floor(Math.log10(raw)));
            double step = raw / mag < 1.5 ? mag : raw / mag < 3.5 ? 2 * mag : raw / mag < 7.5 ? 5 * mag : 10 * mag;
            double first = Math.ceil(lo / step) * step;
            int count = (int) Math.floor((hi - first) / step + 1e-9) + 1;
            double[] t = new double[Math.max(0, count)];
            for (int i = 0; i < t.length; i++) {
                t[i] = first + i * step;
            }
            return t;
        }
    }
}
