package org.foldbook.ui.walkthrough;

import java.util.ArrayList;
import java.util.List;
import java.util.function.IntConsumer;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;

/**
 * The running picture of the chain at the top of the walkthrough: one box per page (cautions, then the
 * stages in signal order) joined by arrows, the current one highlighted. Clicking a box opens its page.
 * Only draws what it is given.
 */
final class ChainPicture {

    private static final int HEIGHT = 64;
    private static final int GAP = 26;

    private final Canvas canvas;
    private final List<String[]> boxes = new ArrayList<>();
    private final List<Rectangle> placed = new ArrayList<>();
    private int current = -1;

    ChainPicture(Composite parent, IntConsumer onPick) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
        canvas.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        canvas.addPaintListener(e -> paint(e.gc));
        canvas.addListener(SWT.MouseUp, e -> {
            for (int i = 0; i < placed.size(); i++) {
                if (placed.get(i).contains(e.x, e.y)) {
                    onPick.accept(i);
                    return;
                }
            }
        });
    }

    Canvas control() {
        return canvas;
    }

    int preferredHeight() {
        return HEIGHT;
    }

    /** One box per page title ("Sensor: ACC-H1" draws as "Sensor" over "ACC-H1"), {@code highlighted} marked. */
    void show(List<StagePage> pages, int highlighted) {
        boxes.clear();
        for (StagePage p : pages) {
            int colon = p.title().indexOf(": ");
            boxes.add(colon < 0 ? new String[] { p.title(), "" }
                    : new String[] { p.title().substring(0, colon), p.title().substring(colon + 2) });
        }
        current = highlighted;
        canvas.redraw();
    }

    /** The box currently highlighted (tests). */
    int highlighted() {
        return current;
    }

    private void paint(GC gc) {
        placed.clear();
        if (boxes.isEmpty()) {
            return;
        }
        Rectangle area = canvas.getClientArea();
        int widest = 0;
        for (String[] b : boxes) {
            widest = Math.max(widest, Math.max(gc.textExtent(b[0]).x, gc.textExtent(b[1]).x));
        }
        int width = Math.min(widest + 20, Math.max(60, (area.width - 12 - GAP * (boxes.size() - 1)) / boxes.size()));
        int x = 6;
        int y = 6;
        int h = HEIGHT - 12;
        gc.setAntialias(SWT.ON);
        for (int i = 0; i < boxes.size(); i++) {
            Rectangle r = new Rectangle(x, y, width, h);
            placed.add(r);
            boolean on = i == current;
            gc.setBackground(canvas.getDisplay().getSystemColor(on ? SWT.COLOR_LIST_SELECTION : SWT.COLOR_WIDGET_LIGHT_SHADOW));
            gc.fillRoundRectangle(r.x, r.y, r.width, r.height, 10, 10);
            gc.setForeground(canvas.getDisplay().getSystemColor(on ? SWT.COLOR_LIST_SELECTION : SWT.COLOR_DARK_GRAY));
            gc.setLineWidth(on ? 3 : 1);
            gc.drawRoundRectangle(r.x, r.y, r.width, r.height, 10, 10);
            gc.setForeground(canvas.getDisplay().getSystemColor(on ? SWT.COLOR_LIST_SELECTION_TEXT : SWT.COLOR_BLACK));
            centred(gc, boxes.get(i)[0], r, r.y + 8);
            centred(gc, boxes.get(i)[1], r, r.y + 8 + gc.getFontMetrics().getHeight());
            if (i + 1 < boxes.size()) {
                int ax = x + width + 4;
                int ay = y + h / 2;
                gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
                gc.setLineWidth(2);
                gc.drawLine(ax, ay, ax + GAP - 8, ay);
                gc.drawLine(ax + GAP - 8, ay, ax + GAP - 14, ay - 5);
                gc.drawLine(ax + GAP - 8, ay, ax + GAP - 14, ay + 5);
            }
            x += width + GAP;
        }
    }

    private static void centred(GC gc, String text, Rectangle r, int y) {
        String shown = text;
        while (shown.length() > 3 && gc.textExtent(shown).x > r.width - 6) {
            shown = shown.substring(0, shown.length() - (shown.endsWith("…") ? 2 : 1)) + "…";
        }
        Point size = gc.textExtent(shown);
        gc.drawText(shown, r.x + (r.width - size.x) / 2, y, true);
    }
}
