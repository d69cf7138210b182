package org.foldbook.ui.preferences;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.di.annotations.Optional;
import org.eclipse.swt.widgets.Shell;

import jakarta.inject.Named;

/** Window ▸ Preferences…: opens {@link PreferencesDialog} on the workbench's {@link SpectrumPreferences}. */
public class PreferencesHandler {
    @Execute
    public void execute(@Named("activeShell") Shell shell, @Optional SpectrumPreferences preferences) {
        new PreferencesDialog(shell, preferences != null ? preferences : SpectrumPreferences.workbench()).open();
    }
}
