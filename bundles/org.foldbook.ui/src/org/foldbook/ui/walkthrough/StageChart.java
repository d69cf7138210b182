package org.foldbook.ui.walkthrough;

import java.util.List;

/**
 * What a walkthrough chart shows, as numbers: lines, dashed reference lines, points and shaded bands
 * along x. Free of SWT: the part draws it through {@code PlotView}, the export through JFreeChart.
 *
 * @param lines  the series, in drawing order
 * @param bands  shaded x intervals (the bands that fold back, where they land)
 * @param xRange {lo, hi}
 * @param yRange {lo, hi}
 */
public record StageChart(String title, String xTitle, String yTitle, List<Line> lines, List<Band> bands,
        double[] xRange, double[] yRange) {

    /** How a line is drawn. */
    public enum Style {
        LINE, MARKER, POINTS
    }

    /** A named series; x and y have the same length. */
    public record Line(String name, double[] x, double[] y, Style style) {
        public Line {
            if (x.length != y.length) {
                throw new IllegalArgumentException("line '" + name + "': " + x.length + " x values but " + y.length
                        + " y values");
            }
        }
    }

    /** A shaded interval [lowX, highX]; {@code folds} tells the colour: true for the source, false for where it lands. */
    public record Band(String name, double lowX, double highX, boolean folds) {
    }

    public StageChart {
        lines = List.copyOf(lines);
        bands = List.copyOf(bands);
    }

    /** The line named {@code name}, or null. */
    public Line line(String name) {
        return lines.stream().filter(l -> l.name().equals(name)).findFirst().orElse(null);
    }
}
