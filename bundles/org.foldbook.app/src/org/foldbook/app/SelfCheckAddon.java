package org.foldbook.app;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.e4.ui.di.UIEventTopic;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.e4.ui.model.application.ui.basic.MPart;
import org.eclipse.e4.ui.model.application.ui.basic.MTrimmedWindow;
import org.eclipse.e4.ui.workbench.IWorkbench;
import org.eclipse.e4.ui.workbench.UIEvents;
import org.eclipse.e4.ui.workbench.modeling.EModelService;
import org.eclipse.e4.ui.workbench.modeling.EPartService;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

import jakarta.inject.Inject;

/**
 * Installation self-check ({@code ./foldbook --self-check DIR}): once the workbench has started, it
 * records which windows and parts were really rendered, saves a screenshot of the main window, then
 * shows every part in turn (parts sharing a stack are tabs) and saves a screenshot of each
 * ({@code part-<id>.png}), then the Simulation layout ({@code perspective-simulation.png}), writes the report to DIR and closes the workbench. It lets a person (or the build's smoke test) see that the
 * product starts on this machine's display without clicking anything. Inactive unless the system
 * property {@value #PROPERTY} names a folder.
 */
public class SelfCheckAddon {
    /** System property naming the output folder; the addon does nothing without it. */
    public static final String PROPERTY = "foldbook.selfCheck";
    /** Where parts are looked for: the perspectives, and the window's shared parts (Notebook, Rate sweep). */
    private static final int EVERYWHERE = EModelService.ANYWHERE | EModelService.IN_SHARED_ELEMENTS;
    /** Delay before the check, so that the first layout and paint have happened. */
    private static final int SETTLE_MILLIS = 2500;
    /** Time a part gets, once shown, to read its data and draw. */
    private static final int PART_SETTLE_MILLIS = 2000;

    @Inject
    private MApplication application;
    @Inject
    private EModelService modelService;
    @Inject
    @Optional
    public void startupComplete(@UIEventTopic(UIEvents.UILifeCycle.APP_STARTUP_COMPLETE) Object event) {
        String folder = System.getProperty(PROPERTY);
        if (folder == null || folder.isBlank()) {
            return;
        }
        // The workbench service exists only once start-up is complete, so it is looked up here.
        IWorkbench workbench = application.getContext().get(IWorkbench.class);
        Display display = Display.getCurrent();
        display.timerExec(SETTLE_MILLIS, () -> {
            if (System.getProperty(SelfCheckSimulation.PROPERTY) != null) {
                showSimulationPart();   // a tab behind another: rendered once shown
            }
            SelfCheckSimulation.drive(display, application.getContext(), mainShell(), () -> {
                try {
                    runCheck(display, Path.of(folder));
                } finally {
                    workbench.close();
                }
            });
        });
    }

    private void showSimulationPart() {
        EPartService parts = mainWindowParts();
        for (MPart part : modelService.findElements(application, "org.foldbook.ui.part.simulation", MPart.class, null,
                EVERYWHERE)) {
            if (parts != null) {
                parts.showPart(part, EPartService.PartState.VISIBLE);
            }
        }
    }

    private void runCheck(Display display, Path folder) {
        List<String> report = new ArrayList<>();
        Shell mainShell = null;
        for (MTrimmedWindow window : modelService.findElements(application, null, MTrimmedWindow.class)) {
            boolean shown = window.getWidget() instanceof Shell shell && shell.isVisible();
            report.add("window." + window.getElementId() + "=" + (shown ? "visible" : "not-visible"));
            if (shown && mainShell == null) {
                mainShell = (Shell) window.getWidget();
                report.add("window.title=" + mainShell.getText());
                Rectangle b = mainShell.getBounds();
                report.add("window.size=" + b.width + "x" + b.height);
                Rectangle client = mainShell.getClientArea();
                report.add("window.clientArea=" + client.width + "x" + client.height);
                Rectangle screen = display.getBounds();
                report.add("display.size=" + screen.width + "x" + screen.height);
                report.add("window.location=" + b.x + "," + b.y);
            }
        }
        try {
            Files.createDirectories(folder);
            if (mainShell != null) {
                report.add("screenshot=" + saveScreenshot(display, mainShell, folder.resolve("workbench.png")));
            }
            // then every part brought to the top of its stack in turn (tabs hide each other), given time
            // to read and draw, recorded and photographed on its own
            for (MPart part : new java.util.LinkedHashSet<>(
                    modelService.findElements(application, null, MPart.class, null, EVERYWHERE))) {
                EPartService parts = part.getContext() != null ? part.getContext().get(EPartService.class)
                        : mainWindowParts();
                if (parts != null) {
                    parts.showPart(part, EPartService.PartState.VISIBLE);
                }
                settle(display, PART_SETTLE_MILLIS);
                boolean shown = part.getWidget() instanceof Control c && !c.isDisposed() && c.isVisible();
                report.add("part." + part.getElementId() + "=" + (shown ? "visible" : "not-visible"));
                if (shown) {
                    Path shot = folder.resolve("part-" + part.getElementId() + ".png");
                    report.add("part." + part.getElementId() + ".screenshot="
                            + saveScreenshot(display, (Control) part.getWidget(), shot));
                }
            }
            if (mainShell != null) {
                simulationLayout(display, mainShell, folder, report);
                // after every part was shown: the rate sweep has followed the selected channel by now
                report.add("simulation.status=" + SelfCheckSimulation.text(mainShell, "status"));
                report.add("simulation.whatIf=" + SelfCheckSimulation.text(mainShell, "whatIfState"));
            }
            Files.write(folder.resolve("self-check.properties"), report, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("self-check could not write to " + folder, e);
        }
    }

    /** The Simulation layout (Window ▸ Simulation layout): switched to, recorded and photographed. */
    private void simulationLayout(Display display, Shell mainShell, Path folder, List<String> report) {
        for (MTrimmedWindow window : modelService.findElements(application, null, MTrimmedWindow.class)) {
            if (window.getWidget() != mainShell) {
                continue;
            }
            boolean switched = LayoutHandlers.switchTo(LayoutHandlers.SIMULATION, window, modelService,
                    window.getContext().get(EPartService.class));
            settle(display, PART_SETTLE_MILLIS);
            report.add("perspective.simulation=" + (switched ? "shown" : "missing"));
            for (MPart part : modelService.findElements(application, "org.foldbook.ui.part.simulation", MPart.class,
                    null, EVERYWHERE)) {
                if (part.getWidget() instanceof Control c && !c.isDisposed() && c.isVisible()) {
                    Rectangle b = c.getBounds();
                    report.add("perspective.simulation.sweepSize=" + b.width + "x" + b.height);
                }
            }
            report.add("perspective.simulation.screenshot="
                    + saveScreenshot(display, mainShell, folder.resolve("perspective-simulation.png")));
        }
    }

    private Shell mainShell() {
        for (MTrimmedWindow window : modelService.findElements(application, null, MTrimmedWindow.class)) {
            if (window.getWidget() instanceof Shell shell && shell.isVisible()) {
                return shell;
            }
        }
        return null;
    }

    private EPartService mainWindowParts() {
        for (MTrimmedWindow window : modelService.findElements(application, null, MTrimmedWindow.class)) {
            if (window.getContext() != null) {
                return window.getContext().get(EPartService.class);
            }
        }
        return null;
    }

    /** Runs the event loop for {@code millis}: background reads finish and post their results. */
    private static void settle(Display display, long millis) {
        long end = System.nanoTime() + millis * 1_000_000;
        while (System.nanoTime() < end) {
            if (!display.readAndDispatch()) {
                try {
                    Thread.sleep(10);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }
    }

    /**
     * A control's pixels as a PNG: the window copied from the screen (what a person sees), a part drawn
     * by the control itself into an image (whole, even where the screen cuts the window off).
     */
    private static Path saveScreenshot(Display display, Control control, Path file) {
        control.getShell().forceActive();
        while (display.readAndDispatch()) {
            // let pending paints finish before reading pixels back
        }
        Rectangle outer = control instanceof Shell ? control.getBounds()
                : display.map(control.getParent(), null, control.getBounds());
        Image image = new Image(display, outer.width, outer.height);
        boolean printed = false;
        if (!(control instanceof Shell)) {
            GC own = new GC(image);
            try {
                printed = control.print(own);
            } finally {
                own.dispose();
            }
        }
        if (!printed) {
            GC gc = new GC(display);
            try {
                gc.copyArea(image, outer.x, outer.y);
            } finally {
                gc.dispose();
            }
        }
        try {
            ImageData data = image.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {data};
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            image.dispose();
        }
        return file.getFileName();
    }
}
