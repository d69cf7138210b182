package org.foldbook.ui.simulation;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import org.eclipse.emf.common.command.CommandStackListener;
import org.eclipse.emf.edit.command.AddCommand;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;
import org.foldbook.channel.ChannelDataException;
import org.foldbook.channel.SimulationArchive;
import org.foldbook.channel.WhatIfRate;
import org.foldbook.model.Channel;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SimulationRun;
import org.foldbook.model.derived.Quantities;
import org.foldbook.sweep.PeakThreshold;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SweepResult;
import org.foldbook.ui.export.ExportMenu;
import org.foldbook.ui.notebook.CurrentNotebook;
import org.foldbook.ui.notebook.NotebookDocument;
import org.foldbook.ui.preferences.SpectrumPreferences;
import org.foldbook.ui.preferences.SpectrumSettingsValues;

import org.eclipse.e4.core.di.annotations.Optional;

import jakarta.annotation.PostConstruct;
import jakarta.annotation.PreDestroy;
import jakarta.inject.Inject;

/**
 * Simulation part ("Rate sweep"): the selected channel's stored sweep plan, edited in place (undoable
 * commands), run as a job with progress and cancel; the rate × frequency map with the fold paths, the
 * verdict table (linked both ways with the map), the lowest safe rates, and the what-if rate. A finished
 * run is kept beside the notebook and shown again on reopening (marked stale when its inputs changed).
 */
public class SimulationPart {
    /** Key of {@link Control#getData(String)} naming the controls, for tests and the self-check. */
    public static final String ID = "foldbook.simulation";

    @Inject
    CurrentNotebook current;
    @Inject
    @Optional
    SpectrumPreferences preferences;

    private NotebookDocument document;
    private Channel channel;
    private SweepResult result;
    private List<VerdictRows.Row> rows = List.of();
    private SimulationJob job;
    private WhatIfRate whatIf;

    private Label channelLabel;
    private Label status;
    private Combo mode;
    private PlanFields plan;
    private Button run;
    private Button cancel;
    private LevelMapView map;
    private Table table;
    private Text summary;
    private WhatIfPane whatIfPane;
    private final CommandStackListener stackListener = e -> refreshPlan();
    private final Consumer<SpectrumSettingsValues> preferencesListener = v -> preferencesChanged();
    private final Consumer<Object> selectionListener = this::follow;
    // the Notebook part may select a channel while the open is announced: keep what is selected then
    private final Consumer<CurrentNotebook> notebookListener = c -> show(c.document(),
            c.selection() instanceof Channel ch ? ch : null);

    @PostConstruct
    public void createControls(Composite parent) {
        GridLayoutFactory.fillDefaults().margins(6, 6).spacing(6, 4).applyTo(parent);
        Composite head = new Composite(parent, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(6).spacing(6, 2).applyTo(head);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(head);
        channelLabel = new Label(head, SWT.NONE);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(channelLabel);
        new Label(head, SWT.NONE).setText("Reach rates by:");
        mode = new Combo(head, SWT.READ_ONLY);
        mode.setItems(SimulationMode.notebookModes().stream().map(SimulationMode::title).toArray(String[]::new));
        mode.select(SimulationMode.notebookModes().indexOf(SimulationMode.MODELLED));
        name(mode, "mode");
        mode.addListener(SWT.Selection, e -> showKept());
        run = button(head, "Run sweep", "run");
        run.addListener(SWT.Selection, e -> start());
        cancel = button(head, "Stop", "cancel");
        cancel.setEnabled(false);
        cancel.addListener(SWT.Selection, e -> {
            if (job != null) {
                job.cancel();
            }
        });
        status = new Label(head, SWT.WRAP);
        name(status, "status");
        GridDataFactory.fillDefaults().grab(true, false).span(6, 1).applyTo(status);

        plan = new PlanFields(parent, this::problem);
        GridDataFactory.fillDefaults().grab(true, false).applyTo(plan.control());

        SashForm split = new SashForm(parent, SWT.VERTICAL);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(split);
        SashForm sash = new SashForm(split, SWT.HORIZONTAL);
        map = new LevelMapView(sash, this::pickFromMap);
        name(map.control(), "map");
        table = new Table(sash, SWT.BORDER | SWT.FULL_SELECTION | SWT.SINGLE);
        name(table, "verdicts");
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        int[] widths = {80, 80, 80, 80, 70, 360};
        for (int i = 0; i < VerdictRows.COLUMNS.length; i++) {
            TableColumn c = new TableColumn(table, SWT.LEFT);
            c.setText(VerdictRows.COLUMNS[i]);
            c.setWidth(widths[i]);
        }
        ExportMenu.attach(table, "Verdicts per source peak and rate");
        table.addListener(SWT.Selection, e -> {
            int i = table.getSelectionIndex();
            if (i >= 0) {
                map.select(rows.get(i).sourcePeak(), rows.get(i).rateIndex());
            }
        });
        sash.setWeights(45, 55);

        Composite bottom = new Composite(split, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(2).spacing(8, 0).applyTo(bottom);
        summary = new Text(bottom, SWT.MULTI | SWT.READ_ONLY | SWT.WRAP | SWT.V_SCROLL | SWT.BORDER);
        name(summary, "summary");
        GridDataFactory.fillDefaults().grab(false, true).hint(330, SWT.DEFAULT).applyTo(summary);
        whatIfPane = new WhatIfPane(bottom);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(whatIfPane.control());

        split.setWeights(50, 50);

        if (preferences != null) {
            preferences.addListener(preferencesListener);
        }
        if (current != null) {
            current.addSelectionListener(selectionListener);
            current.addListener(notebookListener);
            show(current.document(), current.selection() instanceof Channel c ? c : null);
        } else {
            show(null, null);
        }
    }

    private static Button button(Composite parent, String text, String id) {
        Button b = new Button(parent, SWT.PUSH);
        b.setText(text);
        name(b, id);
        return b;
    }

    static void name(Control c, String id) {
        c.setData(ID, id);
    }

    private void follow(Object selection) {
        if (selection instanceof Channel c && c != channel) {
            show(document, c);
        }
    }

    /** Shows {@code next} of {@code doc} (null: nothing to simulate) and its kept run, if any. */
    public void show(NotebookDocument doc, Channel next) {
        if (document != doc) {
            if (document != null) {
                document.removeCommandStackListener(stackListener);
            }
            document = doc;
            if (doc != null) {
                doc.addCommandStackListener(stackListener);
            }
        }
        if (job != null) {
            job.cancel();
        }
        channel = next;
        whatIf = null;
        whatIfPane.show(null);
        channelLabel.setText(next == null ? "Select a channel in the Notebook part to simulate it."
                : "Channel: " + next.getName() + (next.getRecording() == null ? "" : " (" + next.getRecording().getPath() + ")"));
        run.setEnabled(next != null);
        if (next != null) {
            mode.select(SimulationMode.notebookModes().indexOf(org.foldbook.channel.ChannelSimulation.defaultMode(next)));
        }
        refreshPlan();
        showKept();
        channelLabel.getParent().layout();
    }

    private void refreshPlan() {
        plan.show(document, channel);
    }

    private SimulationMode selectedMode() {
        return SimulationMode.notebookModes().get(mode.getSelectionIndex());
    }

    /** The kept run of the channel in the chosen mode, or an empty view. */
    private void showKept() {
        showResult(null);
        if (channel == null) {
            status.setText("");
            return;
        }
        var kept = SimulationArchive.latest(channel, selectedMode());
        if (kept.isEmpty()) {
            status.setText("No kept run of this channel in " + selectedMode().title()
                    + ". Run the sweep.");
            return;
        }
        try {
            SimulationArchive.Kept k = SimulationArchive.load(kept.get());
            showResult(k.result());
            String stale = SimulationArchive.staleness(kept.get()).map(w -> " STALE: " + w + "; run it again.").orElse("");
            String other = SimulationPlanner.thresholdOf(k.setupSignature()).equals(threshold().toString()) ? ""
                    : " Made with other peak settings (" + k.result().peakRule() + "); the preferences now: "
                            + threshold().describe() + ". Run sweep to apply them.";
            status.setText("Kept run of " + k.finishedOn() + "." + stale + other);
            schedule(new SimulationJob(channel, request(), false, this::finished));
        } catch (ChannelDataException e) {
            status.setText(e.getMessage());
        }
    }

    private SimulationPlanner.Request request() {
        return new SimulationPlanner.Request(selectedMode(), plan.rateList(), threshold());
    }

    /** The peak rule of the preferences (Window ▸ Preferences…); the sweep's default without them. */
    private PeakThreshold threshold() {
        return preferences == null ? PeakThreshold.DEFAULT : preferences.values().threshold();
    }

    /**
     * Other preferences: a shown run was made with the old ones, which the status says (Run sweep applies
     * them); the what-if rate is prepared again with the new rule. A running sweep finishes with the old.
     */
    private void preferencesChanged() {
        if (status.isDisposed() || channel == null || (job != null && job.sweeps()
                && job.getState() != org.eclipse.core.runtime.jobs.Job.NONE)) {
            return;
        }
        showKept();
    }

    private void start() {
        if (channel == null || (job != null && job.sweeps() && job.getState() != org.eclipse.core.runtime.jobs.Job.NONE)) {
            return;
        }
        if (job != null) {
            job.cancel();   // a what-if read of a kept run: the run reads the recording anyway
        }
        SimulationPlanner.Request request;
        try {
            request = request();
        } catch (IllegalArgumentException e) {
            problem(e.getMessage());
            return;
        }
        status.setText("Simulating " + channel.getName() + " in " + request.mode().title() + " …");
        run.setEnabled(false);
        cancel.setEnabled(true);
        schedule(new SimulationJob(channel, request, true, this::finished));
    }

    private void schedule(SimulationJob next) {
        job = next;
        next.schedule();
    }

    private void finished(SimulationJob from, SimulationJob.Outcome o) {
        status.getDisplay().asyncExec(() -> {
            if (status.isDisposed() || from != job) {
                return;   // a job of another channel or one replaced by a newer one
            }
            run.setEnabled(channel != null);
            cancel.setEnabled(false);
            if (o.problem() != null) {
                status.setText(o.problem());
                return;
            }
            if (o.whatIf() != null) {
                whatIf = o.whatIf();
                whatIfPane.show(whatIf);
            }
            if (o.result() != null) {
                keep(o.run());
                showResult(o.result());
                String other = from.request().threshold().equals(threshold()) ? ""
                        : " Made with the peak settings before they changed; Run sweep to apply the new ones.";
                status.setText(String.format(Locale.ROOT, "Done: %d rates from %s to %s, %d source peaks. Kept in %s.%s",
                        o.result().rates().size(), Quantities.rate(o.result().rates().get(0).step().effectiveRate()),
                        Quantities.rate(o.result().rates().get(o.result().rates().size() - 1).step().effectiveRate()),
                        o.result().sources().size(), o.run().getPath(), other));
            }
        });
    }

    /** Refers to the kept run from the experiment (undoable; replaces an older run of the same mode). */
    private void keep(SimulationRun run) {
        var experiment = (org.foldbook.model.Experiment) channel.eContainer();
        var commands = new org.eclipse.emf.common.command.CompoundCommand("Keep simulation of " + channel.getName());
        for (SimulationRun old : new ArrayList<>(experiment.getSimulations())) {
            if (old.getChannel() == channel && old.getMode() == run.getMode()) {
                commands.append(org.eclipse.emf.edit.command.RemoveCommand.create(document.domain(), experiment,
                        NotebookPackage.Literals.EXPERIMENT__SIMULATIONS, old));
            }
        }
        commands.append(AddCommand.create(document.domain(), experiment, NotebookPackage.Literals.EXPERIMENT__SIMULATIONS, run));
        document.execute(commands);
    }

    private void showResult(SweepResult next) {
        result = next;
        rows = next == null ? List.of() : VerdictRows.of(next);
        table.removeAll();
        for (VerdictRows.Row r : rows) {
            new TableItem(table, SWT.NONE).setText(r.cells());
        }
        map.show(next == null ? null : new LevelMap(next));
        if (next == null) {
            summary.setText("");
            return;
        }
        StringBuilder b = new StringBuilder("Lowest rate each peak is still true at:\n");
        VerdictRows.peakSummaries(next).forEach(s -> b.append("  ").append(s).append('\n'));
        String band = VerdictRows.bandSummary(next);
        b.append(band == null ? "No band of interest in the plan." : band).append('\n');
        if (next.summarised() != null && next.summarised().count() > 0) {
            b.append(next.summarised().count()).append(" weaker source peak(s), more than ")
                    .append(Quantities.db(next.summarised().belowDb())).append(" below the strongest, not listed.\n");
        }
        if (next.peakRule() != null && !next.peakRule().isBlank()) {
            b.append("Peaks: ").append(next.peakRule()).append(".\n");
        }
        b.append(next.accuracy().statement()).append('\n');
        next.warnings().forEach(w -> b.append("Caution: ").append(w.text()).append('\n'));
        summary.setText(b.toString());
    }

    private void pickFromMap(int source, int rateIndex) {
        for (int i = 0; i < rows.size(); i++) {
            if (rows.get(i).sourcePeak() == source && rows.get(i).rateIndex() == rateIndex) {
                table.setSelection(i);
                table.showSelection();
                map.select(source, rateIndex);
                return;
            }
        }
    }

    private void problem(String text) {
        status.setText(text);
        status.getParent().layout();
    }

    LevelMapView mapView() {
        return map;
    }

    WhatIfPane whatIfPane() {
        return whatIfPane;
    }

    /** The result shown, or null. */
    public SweepResult result() {
        return result;
    }

    @PreDestroy
    public void dispose() {
        if (job != null) {
            job.cancel();
        }
        whatIfPane.dispose();
        if (preferences != null) {
            preferences.removeListener(preferencesListener);
        }
        if (current != null) {
            current.removeSelectionListener(selectionListener);
            current.removeListener(notebookListener);
        }
        if (document != null) {
            document.removeCommandStackListener(stackListener);
        }
    }
}
