package org.foldbook.ui.export;

import java.util.List;

/**
 * What a chart shows, as plain numbers: the source of its CSV, JSON and SVG exports (the PNG is the
 * chart's own pixels). Free of SWT.
 *
 * @param logX   the frequency (x) axis is logarithmic
 * @param xRange the x range shown, {lo, hi}
 * @param yRange the y range shown, {lo, hi}
 */
public record ChartData(String title, String xTitle, String yTitle, List<Series> series, boolean logX,
        double[] xRange, double[] yRange) {

    /** How a series is drawn. */
    public enum Style {
        /** A solid line in a palette colour. */
        LINE,
        /** A thin dashed grey reference line. */
        MARKER,
        /** Points only (marked peaks). */
        POINTS
    }

    /** One named series; x and y have the same length. */
    public record Series(String name, double[] x, double[] y, Style style, int rgb) {
        public Series {
            if (x.length != y.length) {
                throw new IllegalArgumentException("series '" + name + "': " + x.length + " x values but "
                        + y.length + " y values");
            }
        }
    }

    public ChartData {
        series = List.copyOf(series);
    }
}
