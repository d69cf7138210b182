package org.foldbook.ui.testing;

import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.BooleanSupplier;
import java.util.function.Predicate;
import java.util.function.Supplier;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Widget;
import org.eclipse.swtchart.Chart;

/**
 * What the real-widget tests need to find controls, to press them and to wait for background work, in
 * one place. Searches go depth first from the root (the root included) and do not enter a chart's own
 * widgets.
 */
public final class Widgets {

    private Widgets() {
    }

    /** The first control of {@code type} under {@code root}; fails if none. */
    public static <T extends Control> T find(Control root, Class<T> type) {
        return find(root, type, c -> true);
    }

    /** The first control of {@code type} under {@code root} that passes {@code test}; fails if none. */
    public static <T extends Control> T find(Control root, Class<T> type, Predicate<? super T> test) {
        List<T> all = findAll(root, type, test);
        return all.isEmpty() ? fail("no matching " + type.getSimpleName()) : all.get(0);
    }

    /** Every control of {@code type} under {@code root}. */
    public static <T extends Control> List<T> findAll(Control root, Class<T> type) {
        return findAll(root, type, c -> true);
    }

    /** Every control of {@code type} under {@code root} that passes {@code test}. */
    public static <T extends Control> List<T> findAll(Control root, Class<T> type, Predicate<? super T> test) {
        List<T> found = new ArrayList<>();
        collect(root, type, test, found);
        return found;
    }

    private static <T extends Control> void collect(Control c, Class<T> type, Predicate<? super T> test,
            List<T> found) {
        if (type.isInstance(c) && test.test(type.cast(c))) {
            found.add(type.cast(c));
        }
        if (c instanceof Composite comp && !(c instanceof Chart)) {
            for (Control child : comp.getChildren()) {
                collect(child, type, test, found);
            }
        }
    }

    /** The control whose data under {@code key} equals {@code id} (how a part names its controls); fails if none. */
    public static Control tagged(Control root, String key, String id) {
        List<Control> all = findAll(root, Control.class, c -> id.equals(c.getData(key)));
        return all.isEmpty() ? fail("no control '" + id + "'") : all.get(0);
    }

    /** The button labelled {@code text}; fails if none. */
    public static Button button(Control root, String text) {
        List<Button> all = findAll(root, Button.class, b -> b.getText().equals(text));
        return all.isEmpty() ? fail("no button '" + text + "'") : all.get(0);
    }

    /** Sends {@code widget} the selection event a click or a keyboard choice sends. */
    public static void select(Widget widget) {
        widget.notifyListeners(SWT.Selection, new Event());
    }

    /** Runs the event loop until {@code condition} holds; fails naming {@code what} after {@code nanos}. */
    public static void waitFor(Display display, BooleanSupplier condition, String what, long nanos) {
        waitFor(display, condition, what, nanos, () -> "");
    }

    /**
     * As {@link #waitFor(Display, BooleanSupplier, String, long)}; the failure also says {@code state}
     * (e.g. the part's status line) as it was at the end.
     */
    public static void waitFor(Display display, BooleanSupplier condition, String what, long nanos,
            Supplier<String> state) {
        long end = System.nanoTime() + nanos;
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > end) {
                String s = state.get();
                fail(what + " did not finish" + (s.isEmpty() ? "" : "; " + s));
            }
            dispatchOrRest(display);
        }
    }

    /** Runs the event loop for {@code millis} (animation ticks, asyncExec calls, layout). */
    public static void pump(Display display, long millis) {
        long end = System.nanoTime() + millis * 1_000_000L;
        while (System.nanoTime() < end) {
            dispatchOrRest(display);
        }
    }

    private static void dispatchOrRest(Display display) {
        if (!display.readAndDispatch()) {
            try {
                Thread.sleep(5);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                fail("interrupted");
            }
        }
    }

    /**
     * The shell's pixels as {@code target/screenshots/NAME} (PNG), for a person to look at (for the README);
     * never compared.
     */
    public static void screenshot(Shell shell, String name) {
        Objects.requireNonNull(name, "name");
        Display display = shell.getDisplay();
        pump(display, 200);
        Rectangle b = shell.getBounds();
        Image image = new Image(display, b.width, b.height);
        GC gc = new GC(display);
        try {
            gc.copyArea(image, b.x, b.y);
            Path dir = Files.createDirectories(Path.of("target", "screenshots"));
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] { image.getImageData() };
            loader.save(dir.resolve(name).toString(), SWT.IMAGE_PNG);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } finally {
            gc.dispose();
            image.dispose();
        }
    }
}
