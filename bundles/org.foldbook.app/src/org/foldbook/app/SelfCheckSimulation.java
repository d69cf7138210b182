package org.foldbook.app;

import java.util.List;

import org.eclipse.e4.core.contexts.IEclipseContext;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.simulation.SimulationPart;

/**
 * Optional step of the self-check ({@value #PROPERTY}=channel name): selects that channel of the open
 * notebook, presses the Rate sweep part's Run as a user would and waits (the UI stays live) until the part
 * reports the end of the run and the what-if rate's exact spectrum, so the screenshot shows a finished
 * simulation. Gives up after {@value #LIMIT_MILLIS} ms and lets the check go on.
 */
final class SelfCheckSimulation {
    static final String PROPERTY = "foldbook.selfCheck.simulate";
    private static final int LIMIT_MILLIS = 120_000;
    private static final int POLL_MILLIS = 250;

    private SelfCheckSimulation() {
    }

    /** Runs {@code then} at once without the property, else once the simulation has finished (or failed). */
    static void drive(Display display, IEclipseContext context, Shell shell, Runnable then) {
        String name = System.getProperty(PROPERTY);
        CurrentNotebook current = context.get(CurrentNotebook.class);
        if (name == null || name.isBlank() || current == null || current.document() == null) {
            then.run();
            return;
        }
        Channel channel = null;
        for (Experiment e : current.document().notebook().getExperiments()) {
            for (Channel c : e.getChannels()) {
                if (name.equals(c.getName())) {
                    channel = c;
                }
            }
        }
        Button run = shell == null ? null : (Button) find(shell, "run");
        if (channel == null || run == null) {
            then.run();
            return;
        }
        current.select(channel);
        run.notifyListeners(SWT.Selection, new Event());
        long end = System.currentTimeMillis() + LIMIT_MILLIS;
        display.timerExec(POLL_MILLIS, new Runnable() {
            @Override
            public void run() {
                String status = text(shell, "status");
                String whatIf = text(shell, "whatIfState");
                boolean finished = !status.startsWith("Simulating") && whatIf.startsWith("exact");
                boolean failed = !status.startsWith("Simulating") && !status.startsWith("Done");
                if (finished || failed || System.currentTimeMillis() > end) {
                    then.run();
                } else {
                    display.timerExec(POLL_MILLIS, this);
                }
            }
        });
    }

    /** The text of the simulation part's label {@code id}, empty when the part is not shown. */
    static String text(Shell shell, String id) {
        Control c = find(shell, id);
        return c instanceof Label l ? l.getText() : "";
    }

    private static Control find(Control c, String id) {
        if (id.equals(c.getData(SimulationPart.ID))) {
            return c;
        }
        if (c instanceof Composite comp) {
            for (Control child : List.of(comp.getChildren())) {
                Control f = find(child, id);
                if (f != null) {
                    return f;
                }
            }
        }
        return null;
    }
}
