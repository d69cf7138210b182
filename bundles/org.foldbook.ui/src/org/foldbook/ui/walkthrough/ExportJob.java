package org.foldbook.ui.walkthrough;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.function.Consumer;

import org.eclipse.core.runtime.IProgressMonitor;
import org.eclipse.core.runtime.IStatus;
import org.eclipse.core.runtime.Status;
import org.eclipse.core.runtime.jobs.Job;

/**
 * Writes the printable walkthrough in the background: the pages were computed on the UI thread, the
 * charts are drawn and the page written here (to a temporary file, then moved into place, so a stopped or
 * failed export leaves no half page). {@code done} hears the outcome in words.
 */
final class ExportJob extends Job {

    private final String rig;
    private final List<Walkthrough> walkthroughs;
    private final String source;
    private final Path file;
    private final Consumer<String> done;

    ExportJob(String rig, List<Walkthrough> walkthroughs, String source, Path file, Consumer<String> done) {
        super("Export the walkthrough of " + rig);
        this.rig = rig;
        this.walkthroughs = List.copyOf(walkthroughs);
        this.source = source;
        this.file = file;
        this.done = done;
        setUser(true);
    }

    @Override
    protected IStatus run(IProgressMonitor monitor) {
        monitor.beginTask(getName(), 2);
        try {
            String html = WalkthroughHtml.page(rig, walkthroughs, source);
            monitor.worked(1);
            if (monitor.isCanceled()) {
                done.accept("Export stopped; nothing was written.");
                return Status.CANCEL_STATUS;
            }
            Path tmp = Files.createTempFile(file.toAbsolutePath().getParent(), ".walkthrough", ".tmp");
            try {
                Files.writeString(tmp, html, StandardCharsets.UTF_8);
                Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(tmp);
            }
            done.accept("Walkthrough written to " + file);
            return Status.OK_STATUS;
        } catch (IOException | RuntimeException e) {
            done.accept("Could not write " + file + ": " + e.getMessage());
            return Status.OK_STATUS; // said in the part; no second dialog
        } finally {
            monitor.done();
        }
    }
}
