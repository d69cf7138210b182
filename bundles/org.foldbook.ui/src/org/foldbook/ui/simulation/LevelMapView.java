package org.foldbook.ui.simulation;

import java.util.List;
import java.util.function.BiConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.foldbook.model.derived.Quantities;

/**
 * Draws a {@link LevelMap}: rows of rates, the peaks seen at each rate as cells shaded by level (pale =
 * weak, dark = strong), the band above each rate's Nyquist greyed, every source peak's fold path as a line,
 * the selected (peak, rate) ringed. A click selects the nearest peak of the clicked rate.
 */
final class LevelMapView {
    private static final int LEFT = 78;
    private static final int TOP = 8;
    private static final int BOTTOM = 22;
    private static final int RIGHT = 10;

    private final Canvas canvas;
    private LevelMap map;
    private int selectedSource = -1;
    private int selectedRate = -1;

    LevelMapView(Composite parent, BiConsumer<Integer, Integer> onPick) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED | SWT.BORDER);
        canvas.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        canvas.addPaintListener(e -> paint(e.gc));
        canvas.addListener(SWT.MouseDown, e -> {
            int[] hit = pick(e.x, e.y);
            if (hit != null) {
                onPick.accept(hit[0], hit[1]);
            }
        });
    }

    Canvas control() {
        return canvas;
    }

    LevelMap map() {
        return map;
    }

    void show(LevelMap next) {
        map = next;
        selectedSource = -1;
        selectedRate = -1;
        canvas.redraw();
    }

    void select(int source, int rateIndex) {
        selectedSource = source;
        selectedRate = rateIndex;
        canvas.redraw();
    }

    /** The ringed (source peak, rate index), or null. */
    int[] selection() {
        return selectedSource < 0 ? null : new int[] {selectedSource, selectedRate};
    }

    /** The (source peak, rate index) under the canvas point, or null. */
    int[] pick(int x, int y) {
        Rectangle a = plotArea();
        if (map == null || map.rowCount() == 0 || x < a.x || x > a.x + a.width || y < a.y || y > a.y + a.height) {
            return null;
        }
        int row = (int) ((y - a.y) / rowHeight(a));
        return map.nearest(row, (x - a.x) / (double) a.width * map.maxHz());
    }

    /** Canvas point of frequency {@code hz} at the centre of the row showing {@code rateIndex}. */
    int[] pointOf(double hz, int rateIndex) {
        Rectangle a = plotArea();
        int row = map.rowOf(rateIndex);
        return new int[] {xOf(a, hz), (int) (a.y + (row + 0.5) * rowHeight(a))};
    }

    private Rectangle plotArea() {
        Rectangle c = canvas.getClientArea();
        return new Rectangle(LEFT, TOP, Math.max(1, c.width - LEFT - RIGHT), Math.max(1, c.height - TOP - BOTTOM));
    }

    private double rowHeight(Rectangle a) {
        return a.height / (double) Math.max(1, map.rowCount());
    }

    private int xOf(Rectangle a, double hz) {
        return a.x + (int) Math.round(hz / map.maxHz() * a.width);
    }

    private void paint(GC gc) {
        if (map == null || map.rowCount() == 0) {
            gc.drawText("Run the simulation (or open a kept run) to see its map.", 10, 10, true);
            return;
        }
        var d = canvas.getDisplay();
        Rectangle a = plotArea();
        double rh = rowHeight(a);
        gc.setAntialias(SWT.ON);
        Color grey = new Color(d, 232, 232, 232);
        try {
            for (int row = 0; row < map.rowCount(); row++) {
                int y = (int) (a.y + row * rh);
                int h = Math.max(1, (int) (a.y + (row + 1) * rh) - y);
                int nyq = xOf(a, map.rateOf(row) / 2);
                gc.setBackground(grey);
                gc.fillRectangle(nyq, y, a.x + a.width - nyq, h);
                int every = (int) Math.ceil((gc.getFontMetrics().getHeight() + 2) / Math.max(1, rh));
                if (row % Math.max(1, every) == 0) {
                    gc.setForeground(d.getSystemColor(SWT.COLOR_BLACK));
                    gc.drawText(Quantities.rate(map.rateOf(row)), 4, y + (h - gc.getFontMetrics().getHeight()) / 2, true);
                }
            }
            for (LevelMap.Cell c : map.cells()) {
                int v = (int) Math.round(210 * (1 - map.shade(c.levelDb())));
                Color shade = new Color(d, v, v, 255 - v / 3);
                gc.setBackground(shade);
                int y = (int) (a.y + c.row() * rh);
                gc.fillRectangle(xOf(a, c.frequencyHz()) - 2, y + 1, 5, Math.max(1, (int) rh - 1));
                shade.dispose();
            }
            Color path = new Color(d, 220, 50, 32);
            gc.setForeground(path);
            for (int id = 0; id < map.sourceCount(); id++) {
                gc.setLineWidth(id == selectedSource ? 3 : 1);
                List<LevelMap.PathPoint> pts = map.path(id);
                for (int i = 1; i < pts.size(); i++) {
                    gc.drawLine(xOf(a, pts.get(i - 1).frequencyHz()), (int) (a.y + (i - 0.5) * rh),
                            xOf(a, pts.get(i).frequencyHz()), (int) (a.y + (i + 0.5) * rh));
                }
            }
            path.dispose();
            gc.setLineWidth(1);
            gc.setForeground(d.getSystemColor(SWT.COLOR_BLACK));
            gc.drawRectangle(a);
            for (int k = 0; k <= 4; k++) {
                double hz = map.maxHz() * k / 4;
                String t = Quantities.hz(hz);
                int x = Math.min(xOf(a, hz) - gc.textExtent(t).x / 2, a.x + a.width - gc.textExtent(t).x);
                gc.drawText(t, Math.max(a.x, x), a.y + a.height + 3, true);
            }
            if (selectedSource >= 0) {
                for (LevelMap.PathPoint p : map.path(selectedSource)) {
                    if (map.rowOf(selectedRate) == p.row()) {
                        gc.setLineWidth(2);
                        gc.setForeground(d.getSystemColor(SWT.COLOR_BLACK));
                        int[] c = pointOf(p.frequencyHz(), selectedRate);
                        gc.drawOval(c[0] - 7, c[1] - 7, 14, 14);
                    }
                }
            }
        } finally {
            grey.dispose();
        }
    }
}
