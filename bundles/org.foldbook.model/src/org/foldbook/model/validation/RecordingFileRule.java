package org.foldbook.model.validation;

import static org.foldbook.model.validation.FindingKind.RECORDING_CHECKSUM_CHANGED;
import static org.foldbook.model.validation.FindingKind.RECORDING_FILE_MISSING;
import static org.foldbook.model.validation.FindingKind.RECORDING_NOT_CHECKABLE;
import static org.foldbook.model.validation.FindingReport.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Map;

import org.eclipse.emf.common.util.Diagnostic;
import org.eclipse.emf.common.util.DiagnosticChain;
import org.foldbook.io.Sha256;
import org.foldbook.model.Recording;
import org.foldbook.model.persistence.RecordingFiles;

/** The data file a recording names is still there and still holds the bytes it was logged with. */
public final class RecordingFileRule {

    private RecordingFileRule() {
    }

    public static boolean fileMatchesChecksum(Recording recording, DiagnosticChain diagnostics,
            Map<Object, Object> context) {
        Path file;
        try {
            file = RecordingFiles.resolve(recording);
        } catch (IllegalArgumentException | IllegalStateException e) {
            return report(diagnostics, Diagnostic.WARNING, RECORDING_NOT_CHECKABLE, recording,
                    "its file cannot be checked: " + e.getMessage(),
                    "Save the notebook next to its data and give the path relative to it");
        }
        if (!Files.isRegularFile(file)) {
            return report(diagnostics, Diagnostic.ERROR, RECORDING_FILE_MISSING, recording,
                    "the data file " + file + " does not exist",
                    "Put the file back at that path, or correct the path (relative to the notebook file)");
        }
        if (recording.getSha256() == null || recording.getSha256().isBlank()) {
            return report(diagnostics, Diagnostic.WARNING, RECORDING_CHECKSUM_CHANGED, recording,
                    "no SHA-256 was logged, so a changed file would go unnoticed",
                    "Log the recording's checksum now, while the file is known to be the original");
        }
        long size;
        String actual;
        try {
            size = Files.size(file);
            if (recording.getSizeBytes() > 0 && size != recording.getSizeBytes()) {
                // cheaper than hashing, and says more
                return report(diagnostics, Diagnostic.ERROR, RECORDING_CHECKSUM_CHANGED, recording,
                        "the data file " + file + " is now " + size + " bytes, but " + recording.getSizeBytes()
                                + " bytes were logged",
                        "Restore the original file from a backup; if the change is intended, log it as a new"
                                + " recording");
            }
            actual = Sha256.ofFile(file);
        } catch (IOException e) {
            return report(diagnostics, Diagnostic.ERROR, RECORDING_FILE_MISSING, recording,
                    "the data file " + file + " cannot be read (" + e.getMessage() + ")",
                    "Check the file's permissions and the disk");
        }
        if (actual.equals(recording.getSha256().strip().toLowerCase(Locale.ROOT))) {
            return true;
        }
        return report(diagnostics, Diagnostic.ERROR, RECORDING_CHECKSUM_CHANGED, recording,
                "the content of " + file + " changed since it was logged (SHA-256 now " + actual + ", logged "
                        + recording.getSha256() + ")",
                "Restore the original file from a backup; if the change is intended, log it as a new recording");
    }
}
