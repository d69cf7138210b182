package org.foldbook.ui.simulation;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.emf.common.command.Command;
import org.eclipse.emf.ecore.EStructuralFeature;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.RowLayout;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;
import org.foldbook.model.Channel;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.RateSpacing;
import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.model.SweepPlan;
import org.foldbook.model.derived.Quantities;
import org.foldbook.ui.notebook.NotebookDocument;

/**
 * The plan row of the simulation part: rates (geometric, linear or a list for this run), highest, lowest,
 * count, band of interest and the chain the modelled mode applies. A value is applied on Enter or when the
 * field loses focus, as an undoable command; a typed value that is not usable is reported, not applied.
 */
final class PlanFields {
    private static final NotebookPackage P = NotebookPackage.eINSTANCE;
    private static final String[] SPACINGS = {"geometric", "linear", "list (this run)"};

    private final Composite row;
    private final Consumer<String> problem;
    private final Combo spacing;
    private final Text from;
    private final Text to;
    private final Text count;
    private final Text list;
    private final Text bandLow;
    private final Text bandHigh;
    private final Combo through;
    private final List<SignalChain> chains = new ArrayList<>();
    private NotebookDocument document;
    private Channel channel;
    private boolean showing;

    PlanFields(Composite parent, Consumer<String> problem) {
        this.problem = problem;
        // groups of label and field that wrap as a row when the part is narrow (the Notebook layout's lower
        // stack is wide, the Simulation layout's column is not)
        row = new Composite(parent, SWT.NONE);
        RowLayout wrap = new RowLayout(SWT.HORIZONTAL);
        wrap.wrap = true;
        wrap.center = true;
        wrap.marginLeft = wrap.marginRight = wrap.marginTop = wrap.marginBottom = 0;
        wrap.spacing = 8;
        row.setLayout(wrap);
        Composite rates = group(3);
        new Label(rates, SWT.NONE).setText("Rates:");
        spacing = new Combo(rates, SWT.READ_ONLY);
        spacing.setItems(SPACINGS);
        SimulationPart.name(spacing, "spacing");
        spacing.addListener(SWT.Selection, e -> spacingChosen());
        list = new Text(rates, SWT.BORDER);
        SimulationPart.name(list, "list");
        list.setMessage("rates, S/s");
        GridDataFactory.fillDefaults().hint(110, SWT.DEFAULT).applyTo(list);
        Composite ladder = group(6);
        from = field(ladder, "from", "highest", P.getSweepPlan_MaxRateHz(), 70);
        to = field(ladder, "to", "lowest", P.getSweepPlan_MinRateHz(), 70);
        count = field(ladder, "count", "count", P.getSweepPlan_RateCount(), 36);
        Composite band = group(4);
        bandLow = field(band, "bandLow", "band", P.getSweepPlan_BandLowHz(), 50);
        bandHigh = field(band, "bandHigh", "–", P.getSweepPlan_BandHighHz(), 50);
        Composite chain = group(2);
        new Label(chain, SWT.NONE).setText("through");
        through = new Combo(chain, SWT.READ_ONLY);
        SimulationPart.name(through, "through");
        // chain names are long: a narrow combo keeps the groups on few lines
        GridDataFactory.fillDefaults().hint(190, SWT.DEFAULT).applyTo(through);
        through.addListener(SWT.Selection, e -> throughChosen());
    }

    private Composite group(int columns) {
        Composite g = new Composite(row, SWT.NONE);
        GridLayoutFactory.fillDefaults().numColumns(columns).spacing(4, 2).applyTo(g);
        return g;
    }

    private Text field(Composite group, String id, String label, EStructuralFeature feature, int width) {
        new Label(group, SWT.NONE).setText(label);
        Text t = new Text(group, SWT.BORDER);
        SimulationPart.name(t, id);
        GridDataFactory.fillDefaults().hint(width, SWT.DEFAULT).applyTo(t);
        t.addListener(SWT.DefaultSelection, e -> apply(feature, t));
        t.addListener(SWT.FocusOut, e -> apply(feature, t));
        return t;
    }

    Composite control() {
        return row;
    }

    /** The list of rates for this run when "list" is chosen, else null (the plan's ladder). */
    double[] rateList() {
        return spacing.getSelectionIndex() == 2 ? SimulationPlanner.rateList(list.getText()) : null;
    }

    void show(NotebookDocument doc, Channel next) {
        document = doc;
        channel = next;
        showing = true;
        try {
            SweepPlan p = next == null ? null : next.getSweepPlan();
            boolean listChosen = spacing.getSelectionIndex() == 2;
            if (!listChosen) {
                spacing.select(p != null && p.getSpacing() == RateSpacing.LINEAR ? 1 : 0);
            }
            from.setText(p == null || !(p.getMaxRateHz() > 0) ? "" : Quantities.plain(p.getMaxRateHz()));
            to.setText(p == null || !(p.getMinRateHz() > 0) ? "" : Quantities.plain(p.getMinRateHz()));
            count.setText(p == null || p.getRateCount() < 1 ? "" : Integer.toString(p.getRateCount()));
            bandLow.setText(p == null || p.getBandLowHz() == null ? "" : Quantities.plain(p.getBandLowHz()));
            bandHigh.setText(p == null || p.getBandHighHz() == null ? "" : Quantities.plain(p.getBandHighHz()));
            chains.clear();
            through.removeAll();
            through.add("its own chain");
            chains.add(null);
            if (next != null && next.eResource() != null) {
                for (var o : next.eResource().getContents()) {
                    if (o instanceof org.foldbook.model.Notebook nb) {
                        for (Rig rig : nb.getRigs()) {
                            for (SignalChain c : rig.getChains()) {
                                chains.add(c);
                                through.add(c.getId() + (c.getName() == null ? "" : " " + c.getName()));
                            }
                        }
                    }
                }
            }
            SignalChain t = p == null ? null : p.getThroughChain();
            through.select(Math.max(0, chains.indexOf(t)));
            for (var g : row.getChildren()) {
                for (var c : ((Composite) g).getChildren()) {
                    c.setEnabled(next != null && doc != null);
                }
            }
            list.setEnabled(next != null && spacing.getSelectionIndex() == 2);
            row.layout(true, true);
        } finally {
            showing = false;
        }
    }

    private void apply(EStructuralFeature feature, Text t) {
        if (showing || channel == null || document == null) {
            return;
        }
        SweepPlan p = channel.getSweepPlan();
        Object now = p == null ? null : p.eGet(feature);
        try {
            Command c = SimulationPlanner.edit(document.domain(), channel, feature, t.getText());
            if (p != null && c instanceof org.eclipse.emf.edit.command.SetCommand s && java.util.Objects.equals(now, s.getValue())) {
                return;
            }
            if (p == null && t.getText().isBlank()) {
                return;
            }
            document.execute(c);
        } catch (IllegalArgumentException e) {
            problem.accept(e.getMessage());
        }
    }

    private void spacingChosen() {
        if (showing || channel == null || document == null) {
            return;
        }
        int i = spacing.getSelectionIndex();
        list.setEnabled(i == 2);
        if (i < 2) {
            RateSpacing s = i == 1 ? RateSpacing.LINEAR : RateSpacing.GEOMETRIC;
            if (channel.getSweepPlan() == null || channel.getSweepPlan().getSpacing() != s) {
                document.execute(SimulationPlanner.spacing(document.domain(), channel, s));
            }
        }
    }

    private void throughChosen() {
        if (showing || channel == null || document == null) {
            return;
        }
        SignalChain c = chains.get(Math.max(0, through.getSelectionIndex()));
        SweepPlan p = channel.getSweepPlan();
        if (p == null ? c != null : p.getThroughChain() != c) {
            document.execute(SimulationPlanner.throughChain(document.domain(), channel, c));
        }
    }
}
