package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.xmi.XMIResource;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookPackage;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A child JVM saves a large notebook in a loop and is killed (SIGKILL) at a random moment, 20 times.
 * After every kill the notebook file must load and be one complete generation: never torn.
 */
class CrashDuringSaveTest {

    private static final int DEVICES = 2500;
    private static final int KILLS = 20;

    @TempDir
    Path folder;

    /**
     * Class path for the child: the code-source locations of the classes it needs (EMF common,
     * ecore, xmi; the model bundle; this fragment). Works for jars and class folders, on a plain
     * class path and under OSGi, where each bundle's classes come from its own location.
     */
    static String childClassPath() {
        Set<String> entries = new LinkedHashSet<>();
        for (Class<?> type : List.of(URI.class, EObject.class, XMIResource.class, NotebookPackage.class,
                NotebookStore.class, SaveLoopChild.class)) {
            var source = type.getProtectionDomain().getCodeSource();
            if (source == null || source.getLocation() == null) {
                throw new IllegalStateException("no code source for " + type.getName());
            }
            try {
                entries.add(Path.of(source.getLocation().toURI()).toString());
            } catch (URISyntaxException | IllegalArgumentException e) {
                throw new IllegalStateException("code source of " + type.getName() + " is not a file: "
                        + source.getLocation(), e);
            }
        }
        return String.join(File.pathSeparator, entries);
    }

    private static String javaExecutable() {
        return Path.of(System.getProperty("java.home"), "bin", "java").toString();
    }

    @Test
    @DisplayName("20 kills of a child JVM in the middle of large saves: the file is always a whole notebook")
    void killedSavesNeverTear() throws Exception {
        Path target = folder.resolve("large.foldbook");
        NotebookStore.save(SaveLoopChild.large(DEVICES, 0), target);
        long size = Files.size(target);
        assertTrue(size > 700_000, "the notebook should be large enough to take a while to write: " + size);

        Random random = new Random(20261201L);
        String classPath = childClassPath();
        long lastSeen = 0;
        int killedWhileWriting = 0;
        List<String> seen = new ArrayList<>();
        for (int kill = 0; kill < KILLS; kill++) {
            Process child = new ProcessBuilder(javaExecutable(), "-Xmx256m", "-XX:+UseSerialGC", "-XX:TieredStopAtLevel=1", "-cp", classPath,
                    SaveLoopChild.class.getName(), target.toString(), Integer.toString(DEVICES),
                    Long.toString(lastSeen)).redirectErrorStream(true).start();
            try (BufferedReader out = new BufferedReader(
                    new InputStreamReader(child.getInputStream(), StandardCharsets.UTF_8))) {
                // wait until it is saving, let it run 0 to 2 saves further, then kill it
                String line = out.readLine();
                if (line == null || !line.startsWith("saving ")) {
                    fail("child did not start saving: " + line + " (class path " + classPath + ")");
                }
                int moreLines = random.nextInt(4);
                for (int i = 0; i < moreLines && (line = out.readLine()) != null;) {
                    i++;
                }
                Thread.sleep(random.nextInt(150));
                child.destroyForcibly();
                assertTrue(child.waitFor(30, TimeUnit.SECONDS), "child did not die");
            }
            if (hasTemporary(target)) {
                killedWhileWriting++;
            }
            Notebook notebook = NotebookStore.load(target); // throws if torn
            assertEquals(DEVICES, notebook.getDevices().size(), "devices in " + notebook.getTitle());
            String title = notebook.getTitle();
            assertTrue(title.startsWith("generation "), title);
            long generation = Long.parseLong(title.substring("generation ".length()));
            assertTrue(generation >= lastSeen, "went back from generation " + lastSeen + " to " + generation);
            lastSeen = generation;
            seen.add(title);
        }
        assertEquals(DEVICES, NotebookStore.load(NotebookStore.backupOf(target)).getDevices().size(),
                "the backup is a whole notebook too");
        // Every kill must have hit a save in progress now and then, or the test proves nothing.
        assertTrue(killedWhileWriting > 0, "no kill landed while a temporary file was being written: " + seen);
        // the next save cleans up what killed saves left behind
        NotebookStore.save(NotebookStore.load(target));
        assertTrue(!hasTemporary(target), "stale temporary files were not removed");
    }

    private static boolean hasTemporary(Path target) throws IOException {
        try (Stream<Path> files = Files.list(target.getParent())) {
            return files.anyMatch(p -> p.getFileName().toString().endsWith(NotebookStore.TEMP_SUFFIX));
        }
    }
}
