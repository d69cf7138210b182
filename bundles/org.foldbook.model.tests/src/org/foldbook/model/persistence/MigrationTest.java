package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.Recording;
import org.foldbook.model.Sensor;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Files of the previous format version (0.9) are read, migrated, and written back as version 1. */
class MigrationTest {

    @TempDir
    Path folder;

    private static void assertMigrated(Notebook notebook) {
        assertEquals("Synthetic 0.9 notebook", notebook.getTitle());
        Sensor sensor = (Sensor) notebook.getDevices().get(0);
        assertEquals(0.5, sensor.getUsableMinHz());
        assertEquals(8000.0, sensor.getUsableMaxHz());
        assertEquals(9000.0, sensor.getResonanceHz());
        Recording recording = notebook.getExperiments().get(0).getRecordings().get(0);
        assertEquals(20000.0, recording.getDeclaredRateHz());
        assertEquals(2, recording.getChannelCount());
        assertEquals(Version09Writer.EMPTY_SHA256, recording.getSha256());
        Channel channel = notebook.getExperiments().get(0).getChannels().get(0);
        assertEquals(recording, channel.getRecording());
        assertEquals(notebook.getRigs().get(0).getChains().get(0), channel.getChain());
        assertEquals(10000.0, channel.getChain().nyquistHz());
        assertTrue(((NotebookResource) notebook.eResource()).wasPreviousVersion());
        assertTrue(((NotebookResource) notebook.eResource()).getEObjectToExtensionMap().isEmpty(),
                "every 0.9 attribute was migrated");
    }

    @Test
    @DisplayName("a notebook written with the frozen 0.9 model loads migrated, and saves as version 1")
    void dynamic09File() throws IOException {
        Path file = new Version09Writer().write(folder.resolve("old.foldbook"), "sha256:" + Version09Writer.EMPTY_SHA256);
        String oldText = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(oldText.contains(NotebookMigration.PREVIOUS_NS_URI) && oldText.contains("checksum="), oldText);

        Notebook migrated = NotebookStore.load(file);
        assertMigrated(migrated);
        NotebookStore.save(migrated);

        String newText = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(newText.contains("xmlns:foldbook=\"" + NotebookPackage.eNS_URI + "\""), newText);
        assertFalse(newText.contains(NotebookMigration.PREVIOUS_NS_URI), newText);
        assertFalse(newText.contains("checksum=") || newText.contains("band=") || newText.contains(" rate="), newText);
        assertTrue(newText.contains("usableMaxHz=\"8000.0\""), newText);
        Notebook reread = NotebookStore.load(file);
        assertFalse(((NotebookResource) reread.eResource()).wasPreviousVersion());
        assertTrue(EcoreUtil.equals(migrated, reread));
        // the original 0.9 file is kept as the backup
        assertEquals(oldText, Files.readString(NotebookStore.backupOf(file), StandardCharsets.UTF_8));
    }

    @Test
    @DisplayName("the committed 0.9 fixture loads migrated (upper-case hex digest normalised)")
    void committedFixture() throws IOException {
        Path file = folder.resolve("bench-0.9.foldbook");
        try (InputStream in = getClass().getResourceAsStream("/notebooks/bench-0.9.foldbook")) {
            Files.copy(in, file);
        }
        assertMigrated(NotebookStore.load(file));
    }

    @Test
    @DisplayName("a 0.9 value that cannot be migrated is refused with the object and the value")
    void badOldValue() throws IOException {
        Path file = new Version09Writer().write(folder.resolve("bad.foldbook"), "md5:d41d8cd98f00b204e9800998ecf8427e");
        NotebookLoadException e = assertThrows(NotebookLoadException.class, () -> NotebookStore.load(file));
        assertTrue(e.getMessage().contains("recording 'data/old.wav'") && e.getMessage().contains("md5:d41d8"),
                e.getMessage());
    }
}
