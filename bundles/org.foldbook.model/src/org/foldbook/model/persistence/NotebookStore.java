package org.foldbook.model.persistence;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.Map;
import java.util.UUID;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.xmi.PackageNotFoundException;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookPackage;
import org.xml.sax.SAXParseException;

/**
 * Loads and saves notebook files ({@code .foldbook}).
 *
 * <p>Saving is atomic: the notebook is written to a temporary file in the same folder and forced to
 * disk, the previous file is kept as {@code <name>.bak}, and the temporary file is renamed over the
 * target in one step. A crash at any moment leaves the target either the old or the new notebook.
 *
 * <p>Loading never writes the file. A damaged, foreign or hostile file gives a
 * {@link NotebookLoadException} naming the file, line and problem.
 */
public final class NotebookStore {

    public static final String FILE_EXTENSION = "foldbook";
    public static final String CONTENT_TYPE = "org.foldbook.model.notebook";
    static final String TEMP_SUFFIX = ".saving";

    private NotebookStore() {
    }

    /** A resource set that reads and writes notebooks without the Eclipse extension registry. */
    public static ResourceSet newResourceSet() {
        return configure(new ResourceSetImpl());
    }

    /** Registers the notebook factory (extension, content type) and package in {@code resourceSet}. */
    public static ResourceSet configure(ResourceSet resourceSet) {
        NotebookResourceFactory factory = new NotebookResourceFactory();
        resourceSet.getResourceFactoryRegistry().getExtensionToFactoryMap().put(FILE_EXTENSION, factory);
        resourceSet.getResourceFactoryRegistry().getContentTypeToFactoryMap().put(CONTENT_TYPE, factory);
        resourceSet.getPackageRegistry().put(NotebookPackage.eNS_URI, NotebookPackage.eINSTANCE);
        return resourceSet;
    }

    /** A new, empty notebook resource that will be saved at {@code file}, whatever its file name. */
    public static Resource createResource(ResourceSet resourceSet, Path file) {
        Resource resource = new NotebookResourceFactory().createResource(fileUri(file));
        resourceSet.getResources().add(resource);
        return resource;
    }

    /** Reads the notebook in {@code file} into a new resource set. */
    public static Notebook load(Path file) throws NotebookLoadException {
        return load(newResourceSet(), file);
    }

    /** Reads the notebook in {@code file} into {@code resourceSet}. */
    public static Notebook load(ResourceSet resourceSet, Path file) throws NotebookLoadException {
        if (!Files.isRegularFile(file)) {
            throw new NotebookLoadException(file, 0, 0, "no such file", null);
        }
        Resource resource = createResource(resourceSet, file); // also a .bak or any other name
        try {
            resource.load(null);
        } catch (NotebookLoadException e) {
            resourceSet.getResources().remove(resource);
            throw e;
        } catch (IOException | RuntimeException e) {
            resourceSet.getResources().remove(resource);
            throw LoadProblems.describe(file, resource, e);
        }
        if (resource.getContents().isEmpty()) {
            throw new NotebookLoadException(file, 0, 0, "the file holds no notebook", null);
        }
        EObject root = resource.getContents().get(0);
        if (!(root instanceof Notebook notebook) || resource.getContents().size() > 1) {
            throw new NotebookLoadException(file, 0, 0, "the file's root is " + root.eClass().getName()
                    + (resource.getContents().size() > 1 ? " among " + resource.getContents().size() + " roots" : "")
                    + ", not a single notebook", null);
        }
        return notebook;
    }

    /** Saves the notebook to the file of its resource (atomically). */
    public static void save(Notebook notebook) throws IOException {
        Resource resource = notebook.eResource();
        if (resource == null || !resource.getURI().isFile()) {
            throw new IllegalArgumentException("notebook: it belongs to no file resource; use save(notebook, file)");
        }
        save(notebook, Path.of(resource.getURI().toFileString()));
    }

    /**
     * Saves the notebook to {@code file} atomically. A notebook in no resource is put in a new one at
     * {@code file}; one in a resource elsewhere has its resource moved to {@code file}, so that
     * relative recording paths resolve against the new folder.
     */
    public static void save(Notebook notebook, Path file) throws IOException {
        Path target = file.toAbsolutePath().normalize();
        Resource resource = notebook.eResource();
        if (resource == null) {
            resource = createResource(newResourceSet(), target);
            resource.getContents().add(notebook);
        } else if (!fileUri(target).equals(resource.getURI())) {
            resource.setURI(fileUri(target));
        }
        writeAtomically(resource, target);
        resource.setModified(false);
    }

    /** Where the previous version of {@code file} is kept after a save. */
    public static Path backupOf(Path file) {
        return file.resolveSibling(file.getFileName() + ".bak");
    }

    static void writeAtomically(Resource resource, Path target) throws IOException {
        Path folder = target.getParent();
        Files.createDirectories(folder);
        removeStaleTemporaries(target);
        Path temporary = folder.resolve("." + target.getFileName() + "." + UUID.randomUUID() + TEMP_SUFFIX);
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.CREATE_NEW,
                    StandardOpenOption.WRITE);
                    OutputStream out = new BufferedOutputStream(Channels.newOutputStream(channel), 1 << 16)) {
                resource.save(out, Map.of());
                out.flush();
                channel.force(true);
            }
            if (Files.exists(target)) {
                keepBackup(target);
            }
            moveAtomically(temporary, target);
            forceFolder(folder);
        } finally {
            Files.deleteIfExists(temporary);
        }
    }

    /** Replaces {@code name.bak} by the current file, itself atomically (hard link, else a copy). */
    private static void keepBackup(Path target) throws IOException {
        Path backup = backupOf(target);
        Path staging = target.resolveSibling("." + target.getFileName() + "." + UUID.randomUUID() + ".bak" + TEMP_SUFFIX);
        try {
            try {
                Files.createLink(staging, target);
            } catch (UnsupportedOperationException | IOException noLink) {
                Files.deleteIfExists(staging);
                Files.copy(target, staging);
                try (FileChannel channel = FileChannel.open(staging, StandardOpenOption.WRITE)) {
                    channel.force(true);
                }
            }
            moveAtomically(staging, backup);
        } finally {
            Files.deleteIfExists(staging);
        }
    }

    private static void moveAtomically(Path from, Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            throw new IOException("cannot save " + to + ": its file system cannot rename atomically, so a save"
                    + " could leave a torn file; save the notebook on a local disk", e);
        }
    }

    /** Makes the rename itself durable (POSIX: fsync of the folder). Not possible on every OS: then skipped. */
    private static void forceFolder(Path folder) {
        try (FileChannel channel = FileChannel.open(folder, StandardOpenOption.READ)) {
            channel.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Windows cannot open a folder as a channel; the rename is still atomic there.
        }
    }

    /** Temporary files left by a save that was killed (ours only: ".<name>.<uuid>.saving"). */
    private static void removeStaleTemporaries(Path target) throws IOException {
        String prefix = "." + target.getFileName() + ".";
        try (DirectoryStream<Path> stream = Files.newDirectoryStream(target.getParent(),
                entry -> entry.getFileName().toString().startsWith(prefix)
                        && entry.getFileName().toString().endsWith(TEMP_SUFFIX))) {
            for (Path stale : stream) {
                try {
                    Files.deleteIfExists(stale);
                } catch (NoSuchFileException | FileAlreadyExistsException e) {
                    // another save cleaned it up first
                }
            }
        }
    }

    static URI fileUri(Path file) {
        return URI.createFileURI(file.toAbsolutePath().normalize().toString());
    }

    /** Turns EMF's load failures into one clear message. */
    static final class LoadProblems {

        private LoadProblems() {
        }

        static NotebookLoadException describe(Path file, Resource resource, Exception failure) {
            Throwable cause = failure;
            for (Throwable t = failure; t != null; t = t.getCause()) {
                if (t instanceof SAXParseException || t instanceof Resource.Diagnostic) {
                    cause = t;
                    break;
                }
            }
            if (cause == failure && !resource.getErrors().isEmpty()
                    && resource.getErrors().get(0) instanceof Throwable first) {
                cause = first;
            }
            int line = 0;
            int column = 0;
            String what = cause.getMessage();
            if (cause instanceof SAXParseException sax) {
                line = sax.getLineNumber();
                column = sax.getColumnNumber();
                what = explainSax(sax.getMessage());
            } else if (cause instanceof Resource.Diagnostic diagnostic) {
                line = diagnostic.getLine();
                column = diagnostic.getColumn();
                if (cause.getCause() instanceof SAXParseException sax) {
                    what = explainSax(sax.getMessage());
                } else if (cause instanceof PackageNotFoundException missing) {
                    what = "namespace '" + missing.uri() + "' is not a Foldbook notebook namespace (this version"
                            + " reads " + NotebookPackage.eNS_URI + " and " + NotebookMigration.PREVIOUS_NS_URI
                            + "); the file is foreign or from a newer Foldbook";
                } else {
                    what = diagnostic.getMessage();
                }
            }
            return new NotebookLoadException(file, line, column, what, failure);
        }

        private static String explainSax(String message) {
            if (message != null && message.contains("DOCTYPE")) {
                return "the file declares a DOCTYPE; notebook files never do, and DTDs and external entities"
                        + " are refused for safety (" + message + ")";
            }
            if (message != null && (message.contains("must start and end within the same entity")
                    || message.contains("Premature end of file"))) {
                return "the file ends early, it is probably truncated; restore it from its .bak copy (" + message + ")";
            }
            return "not well-formed XML: " + message;
        }
    }
}
