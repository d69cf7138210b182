package org.foldbook.ui.notebook;

import java.nio.file.Path;

import org.eclipse.core.runtime.Platform;
import org.eclipse.e4.ui.di.UISynchronize;
import org.eclipse.e4.ui.model.application.MApplication;
import org.eclipse.osgi.service.datalocation.Location;

import org.foldbook.dsp.fft.RealFft;
import org.foldbook.ui.preferences.SpectrumPreferences;
import org.foldbook.ui.recording.RecordingSession;

import jakarta.annotation.PostConstruct;

/**
 * Start-up (an addon of Application.e4xmi, so it runs before any part is drawn): puts the
 * {@link CurrentNotebook}, the {@link SpectrumPreferences} and the shared {@link RecordingSession} into the
 * application context and opens a notebook in the background —
 * the {@code .foldbook} file named on the command line, or else the demo notebook in
 * {@code <workspace>/demo/}, written there on first start.
 */
public class NotebookStartupAddon {

    /** Sub-folder of the workspace (the -data folder) holding the demo notebook. */
    public static final String DEMO_FOLDER = "demo";

    @PostConstruct
    public void start(MApplication application, UISynchronize sync) {
        // decided once for the workbench: parts run whole sweeps in parallel over rates, one thread per transform
        RealFft.configureThreads(1);
        CurrentNotebook current = new CurrentNotebook();
        application.getContext().set(CurrentNotebook.class, current);
        // the spectrum preferences, and the one read of the selected channel the parts share
        SpectrumPreferences preferences = SpectrumPreferences.workbench();
        application.getContext().set(SpectrumPreferences.class, preferences);
        application.getContext().set(RecordingSession.class, new RecordingSession(preferences));
        Path requested = StartupArguments.notebookPath(Platform.getApplicationArgs());
        if (requested != null) {
            NotebookOpening.open(requested, current, sync);
        } else {
            NotebookOpening.openDemo(workspace().resolve(DEMO_FOLDER), current, sync);
        }
    }

    /** The instance location (-data), else ~/.foldbook/workspace. */
    static Path workspace() {
        Location location = Platform.getInstanceLocation();
        if (location != null && location.getURL() != null && "file".equals(location.getURL().getProtocol())) {
            return Path.of(location.getURL().getPath());
        }
        return Path.of(System.getProperty("user.home"), ".foldbook", "workspace");
    }
}
