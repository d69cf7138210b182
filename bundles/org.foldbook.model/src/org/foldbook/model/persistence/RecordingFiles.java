package org.foldbook.model.persistence;

import java.nio.file.Path;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.resource.Resource;
import org.foldbook.model.Recording;

/**
 * Recording paths are stored relative to the notebook file's folder, with '/' separators, so a
 * notebook and its data can move together.
 */
public final class RecordingFiles {

    private RecordingFiles() {
    }

    /** Folder holding the notebook file of this object's resource. */
    public static Path notebookFolder(Resource resource) {
        if (resource == null || resource.getURI() == null || !resource.getURI().isFile()) {
            throw new IllegalStateException("the notebook has not been saved to a file yet"
                    + (resource == null || resource.getURI() == null ? "" : " (it is at " + resource.getURI() + ")"));
        }
        URI uri = resource.getURI();
        return Path.of(uri.toFileString()).toAbsolutePath().getParent();
    }

    /** Absolute path of the recording's data file. */
    public static Path resolve(Recording recording) {
        String path = recording.getPath();
        if (path == null || path.isBlank()) {
            throw new IllegalArgumentException("recording path is empty");
        }
        Path relative = Path.of(path.replace('/', java.io.File.separatorChar));
        if (relative.isAbsolute()) {
            throw new IllegalArgumentException("recording path '" + path + "' is absolute, not relative to the notebook");
        }
        return notebookFolder(recording.eResource()).resolve(relative).normalize();
    }

    /** The path of {@code dataFile} relative to the notebook's folder, in the stored '/' form. */
    public static String relativeTo(Path notebookFile, Path dataFile) {
        Path folder = notebookFile.toAbsolutePath().getParent();
        Path relative = folder.relativize(dataFile.toAbsolutePath().normalize());
        return relative.toString().replace(java.io.File.separatorChar, '/');
    }
}
