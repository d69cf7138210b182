package org.foldbook.ui.preferences;

import org.eclipse.jface.dialogs.Dialog;
import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.jface.layout.GridDataFactory;
import org.eclipse.jface.layout.GridLayoutFactory;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

/**
 * Window ▸ Preferences…: the spectrum and peak settings the Recording view, the Rate sweep part and its
 * what-if rate use. Typed numbers go through the project's one parser; a problem is shown in words and the
 * dialog stays open until the values are usable or the user cancels.
 */
public final class PreferencesDialog extends Dialog {
    static final String[] KINDS = {"Noise-aware: a margin over the running noise floor",
            "Prominence only (the side-by-side rule)"};
    static final int DEFAULTS_ID = IDialogConstants.CLIENT_ID + 1;

    private final SpectrumPreferences preferences;
    Combo kind;
    Text margin;
    Text floorBins;
    Text segment;
    Label problem;

    public PreferencesDialog(Shell parent, SpectrumPreferences preferences) {
        super(parent);
        this.preferences = preferences;
    }

    @Override
    protected void configureShell(Shell shell) {
        super.configureShell(shell);
        shell.setText("Foldbook preferences");
    }

    @Override
    protected boolean isResizable() {
        return true;
    }

    @Override
    protected Control createDialogArea(Composite parent) {
        Composite area = (Composite) super.createDialogArea(parent);
        Composite c = new Composite(area, SWT.NONE);
        GridLayoutFactory.swtDefaults().numColumns(2).spacing(8, 6).applyTo(c);
        GridDataFactory.fillDefaults().grab(true, true).applyTo(c);

        heading(c, "Spectral peaks (Recording view, Rate sweep, what-if rate)");
        new Label(c, SWT.NONE).setText("Peaks are:");
        kind = new Combo(c, SWT.READ_ONLY);
        kind.setItems(KINDS);
        new Label(c, SWT.NONE).setText("Margin over the floor (dB):");
        margin = field(c);
        new Label(c, SWT.NONE).setText("Running median of the floor (bins, odd):");
        floorBins = field(c);
        explain(c, "A peak must stand the margin above the median of the spectrum over that many bins around it "
                + "(and above the digitizer's quantisation floor where the chain gives it). 12 dB over 63 bins leaves "
                + "about one noise bin in 50 000 above the line. The margin also sets the detection floor the Rate "
                + "sweep's verdicts use, in both kinds.");

        heading(c, "Recording view spectrum");
        new Label(c, SWT.NONE).setText("Longest Welch segment (samples):");
        segment = field(c);
        explain(c, "The view takes the longest power of two up to this that gives at least four segments. Window: "
                + "periodic Hann, half overlap (fixed). The Rate sweep's segment length is the channel's sweep plan's.");

        problem = new Label(c, SWT.WRAP);
        problem.setForeground(c.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).hint(520, SWT.DEFAULT).applyTo(problem);
        problem.setText(preferences.loadProblem() == null ? "" : preferences.loadProblem());

        show(preferences.values());
        return area;
    }

    private static void heading(Composite c, String text) {
        Label l = new Label(c, SWT.NONE);
        l.setText(text);
        l.setFont(org.eclipse.jface.resource.JFaceResources.getBannerFont());
        GridDataFactory.fillDefaults().span(2, 1).indent(0, 6).applyTo(l);
    }

    private static Text field(Composite c) {
        Text t = new Text(c, SWT.BORDER);
        GridDataFactory.fillDefaults().grab(true, false).hint(120, SWT.DEFAULT).applyTo(t);
        return t;
    }

    private static void explain(Composite c, String text) {
        Label l = new Label(c, SWT.WRAP);
        l.setText(text);
        GridDataFactory.fillDefaults().span(2, 1).grab(true, false).hint(520, SWT.DEFAULT).applyTo(l);
    }

    private void show(SpectrumSettingsValues v) {
        kind.select(v.noiseAware() ? 0 : 1);
        margin.setText(SpectrumSettingsValues.fmt(v.marginDb()));
        floorBins.setText(Integer.toString(v.floorBins()));
        segment.setText(Integer.toString(v.recordingMaxSegment()));
    }

    @Override
    protected void createButtonsForButtonBar(Composite parent) {
        createButton(parent, DEFAULTS_ID, "Defaults", false);
        super.createButtonsForButtonBar(parent);
    }

    @Override
    protected void buttonPressed(int buttonId) {
        if (buttonId == DEFAULTS_ID) {
            show(SpectrumSettingsValues.DEFAULT);
            problem.setText("");
            return;
        }
        super.buttonPressed(buttonId);
    }

    @Override
    protected void okPressed() {
        if (apply()) {
            super.okPressed();
        }
    }

    /** Validates and stores the typed values; false (the problem shown) when they are not usable. */
    boolean apply() {
        SpectrumSettingsValues next;
        try {
            next = SpectrumSettingsValues.parse(kind.getSelectionIndex() == 0, margin.getText(), floorBins.getText(),
                    segment.getText());
        } catch (IllegalArgumentException e) {
            problem.setText(e.getMessage());
            problem.getParent().layout();
            return false;
        }
        String notSaved = preferences.set(next);
        problem.setText(notSaved == null ? "" : notSaved);
        return notSaved == null;
    }

    /** The dialog's Defaults, for tests: as pressing the button. */
    void pressDefaults() {
        buttonPressed(DEFAULTS_ID);
    }

    /** The dialog's OK, for tests: as pressing the button. */
    void pressOk() {
        okPressed();
    }

}
