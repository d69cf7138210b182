package org.foldbook.ui.testing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.List;

import org.eclipse.jface.dialogs.IDialogConstants;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;
import org.foldbook.ui.preferences.PreferencesDialog;
import org.foldbook.ui.preferences.SpectrumPreferences;

/** Drives Window ▸ Preferences… as a user: opens the dialog, types into its fields, presses OK. */
public final class PreferencesDriver {

    private PreferencesDriver() {
    }

    /**
     * Opens the dialog over {@code parent}, selects peak kind {@code kind} (0 noise-aware, 1 prominence only;
     * negative: unchanged), types {@code margin} (null: unchanged) and presses OK; fails when it stays open.
     */
    public static void apply(Shell parent, SpectrumPreferences preferences, int kind, String margin) {
        PreferencesDialog d = new PreferencesDialog(parent, preferences);
        d.setBlockOnOpen(false);
        d.open();
        Shell shell = d.getShell();
        if (kind >= 0) {
            Combo c = Widgets.find(shell, Combo.class);
            c.select(kind);
            c.notifyListeners(SWT.Selection, new Event());
        }
        List<Text> fields = Widgets.findAll(shell, Text.class);
        assertEquals(3, fields.size(), "margin, running median, longest segment");
        if (margin != null) {
            fields.get(0).setText(margin);
        }
        Button ok = Widgets.findAll(shell, Button.class).stream()
                .filter(b -> IDialogConstants.OK_LABEL.equals(b.getText())).findFirst().orElseGet(() -> fail("no OK"));
        ok.notifyListeners(SWT.Selection, new Event());
        if (!shell.isDisposed()) {
            String problem = String.join(" ", Widgets.findAll(shell, org.eclipse.swt.widgets.Label.class).stream()
                    .map(org.eclipse.swt.widgets.Label::getText).toList());
            d.close();
            fail("the preferences dialog stayed open: " + problem);
        }
    }
}
