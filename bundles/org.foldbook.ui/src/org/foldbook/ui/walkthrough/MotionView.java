package org.foldbook.ui.walkthrough;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.foldbook.model.derived.Quantities;

/**
 * The filmed part, animated: on the left the true motion, on the right what the film shows (the frame
 * last taken, its mark smeared over the exposure), both in the same slow motion so the screen's own
 * refresh does not fold it again. Driven by {@link Display#timerExec}: the UI thread never waits.
 */
final class MotionView {

    private static final int TICK_MILLIS = 40;

    private final Canvas canvas;
    private FilmedMotion motion;
    private long startNanos;
    private final Runnable tick = this::tick;

    MotionView(Composite parent) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
        canvas.setBackground(parent.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        canvas.addPaintListener(e -> paint(e.gc));
        canvas.addDisposeListener(e -> canvas.getDisplay().timerExec(-1, tick));
    }

    Canvas control() {
        return canvas;
    }

    /** Animates {@code next} (null: stops and clears). */
    void show(FilmedMotion next) {
        boolean was = motion != null;
        motion = next;
        if (next != null && !was) {
            startNanos = System.nanoTime();
            canvas.getDisplay().timerExec(TICK_MILLIS, tick);
        } else if (next == null) {
            canvas.getDisplay().timerExec(-1, tick);
        }
        canvas.redraw();
    }

    /** The motion shown, or null (tests). */
    FilmedMotion motion() {
        return motion;
    }

    private void tick() {
        if (canvas.isDisposed() || motion == null) {
            return;
        }
        if (canvas.isVisible()) {
            canvas.redraw();
        }
        canvas.getDisplay().timerExec(TICK_MILLIS, tick);
    }

    private void paint(GC gc) {
        if (motion == null) {
            return;
        }
        Rectangle area = canvas.getClientArea();
        double slow = motion.slowMotion();
        double t = (System.nanoTime() - startNanos) / 1e9 / slow; // time on the part, slowed down
        long frame = (long) Math.floor(t * motion.seen().frameRateHz());
        int d = Math.max(40, Math.min(area.width / 2 - 30, area.height - 50));
        gc.setAntialias(SWT.ON);
        gc.drawText("true motion (slowed ×" + Quantities.number(slow) + ")", 10, 4, true);
        gc.drawText("on film: " + motion.shortWord() + " (frame " + frame + ")", area.width / 2 + 10, 4, true);
        disc(gc, 10 + (area.width / 2 - 20 - d) / 2, 24, d, motion.trueAngleDeg(t), 0);
        disc(gc, area.width / 2 + 10 + (area.width / 2 - 20 - d) / 2, 24, d, motion.filmedAngleDeg(frame),
                motion.smearDegrees());
    }

    /** A disc with its marks at {@code angle} (degrees, counter-clockwise), each smeared over {@code smear} degrees. */
    private void disc(GC gc, int x, int y, int d, double angle, double smear) {
        Display display = canvas.getDisplay();
        gc.setBackground(display.getSystemColor(SWT.COLOR_WIDGET_LIGHT_SHADOW));
        gc.fillOval(x, y, d, d);
        gc.setForeground(display.getSystemColor(SWT.COLOR_DARK_GRAY));
        gc.setLineWidth(1);
        gc.drawOval(x, y, d, d);
        int marks = motion.seen().repeatsPerRevolution();
        double cx = x + d / 2.0;
        double cy = y + d / 2.0;
        double r = d / 2.0 - 4;
        gc.setForeground(display.getSystemColor(SWT.COLOR_DARK_RED));
        gc.setLineWidth(Math.max(3, d / 30));
        for (int k = 0; k < marks; k++) {
            double a = Math.toRadians(angle + k * motion.pitchDegrees());
            gc.drawLine((int) cx, (int) cy, (int) (cx + r * Math.cos(a)), (int) (cy - r * Math.sin(a)));
            if (smear > 0.5) { // the streak the exposure leaves: the mark's path while the shutter is open
                gc.drawArc((int) (cx - r), (int) (cy - r), (int) (2 * r), (int) (2 * r),
                        (int) Math.round(angle + k * motion.pitchDegrees()),
                        (int) Math.round(Math.copySign(Math.max(1, smear), motion.seen().revolutionsPerSecond())));
            }
        }
    }
}
