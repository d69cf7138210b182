package org.foldbook.ui.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.util.ArrayList;
import java.util.List;
import java.util.function.BooleanSupplier;

import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swtchart.Chart;

/** What the real-widget tests need to find controls and to wait for background work, in one place. */
public final class Widgets {

    private Widgets() {
    }

    /** The first control of {@code type} under {@code root} (depth first, charts not entered); fails if none. */
    public static <T extends Control> T find(Control root, Class<T> type) {
        List<T> all = findAll(root, type);
        return all.isEmpty() ? fail("no " + type.getSimpleName()) : all.get(0);
    }

    /** Every control of {@code type} under {@code root}, depth first; a chart's own widgets are not entered. */
    public static <T extends Control> List<T> findAll(Control root, Class<T> type) {
        List<T> found = new ArrayList<>();
        collect(root, type, found);
        return found;
    }

    private static <T extends Control> void collect(Control c, Class<T> type, List<T> found) {
        if (type.isInstance(c)) {
            found.add(type.cast(c));
        }
        if (c instanceof Composite comp && !(c instanceof Chart)) {
            for (Control child : comp.getChildren()) {
                collect(child, type, found);
            }
        }
    }

    /** Runs the event loop until {@code condition} holds; fails naming {@code what} after {@code nanos}. */
    public static void waitFor(Display display, BooleanSupplier condition, String what, long nanos) {
        long end = System.nanoTime() + nanos;
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > end) {
                fail(what + " did not finish");
            }
            if (!display.readAndDispatch()) {
                try {
                    Thread.sleep(5);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    fail("interrupted");
                }
            }
        }
    }
}
