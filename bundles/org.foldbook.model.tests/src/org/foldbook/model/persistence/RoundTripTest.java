package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SyntheticNotebooks;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RoundTripTest {

    @TempDir
    Path folder;

    @Test
    @DisplayName("a full notebook saved and loaded again is equal, attribute by attribute and reference by reference")
    void fullNotebookRoundTrip() throws IOException {
        Notebook original = SyntheticNotebooks.bench();
        Path file = folder.resolve("bench.foldbook");
        NotebookStore.save(original, file);

        Notebook loaded = NotebookStore.load(file);
        assertNotSame(original, loaded);
        assertTrue(EcoreUtil.equals(original, loaded), "loaded notebook differs from the saved one");
        // cross references resolve to the loaded objects, not proxies
        Channel channel = loaded.getExperiments().get(0).getChannels().get(0);
        assertFalse(channel.getChain().eIsProxy());
        assertEquals(loaded.getRigs().get(0).getChains().get(0), channel.getChain());
        assertEquals(loaded.getDevices().get(0), channel.getChain().getStages().get(0).getDevice());

        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.contains("xmlns:foldbook=\"" + NotebookPackage.eNS_URI + "\""), text);
        assertTrue(text.contains("path=\"data/run1.wav\""), "recording path stays relative");
        assertFalse(text.contains(folder.toString()), "no absolute path of the save folder in the file");
        // references by inventory id, stable against reordering
        assertTrue(text.contains("device=\"ACC-1\""), text);
    }

    @Test
    @DisplayName("saving again keeps the previous file as .bak, byte for byte")
    void previousFileKeptAsBackup() throws IOException {
        Notebook notebook = SyntheticNotebooks.bench();
        Path file = folder.resolve("bench.foldbook");
        NotebookStore.save(notebook, file);
        byte[] first = Files.readAllBytes(file);
        notebook.setTitle("second title");
        NotebookStore.save(notebook);
        assertArrayEquals(first, Files.readAllBytes(NotebookStore.backupOf(file)));
        assertEquals("second title", NotebookStore.load(file).getTitle());
        try (var listing = Files.list(folder)) {
            assertEquals(2, listing.count(), "only the notebook and its backup remain, no temporary file");
        }
    }

    @Test
    @DisplayName("attributes and elements of a newer version are kept through load and save (nothing lost)")
    void unknownContentSurvives() throws IOException {
        Path file = folder.resolve("newer.foldbook");
        NotebookStore.save(SyntheticNotebooks.bench(), file);
        String text = Files.readString(file, StandardCharsets.UTF_8)
                .replace("title=\"Synthetic bench notebook\"", "title=\"Synthetic bench notebook\" futureField=\"kept 42\"");
        Files.writeString(file, text, StandardCharsets.UTF_8);

        Notebook loaded = NotebookStore.load(file);
        loaded.setOwningGroup("changed by this version");
        NotebookStore.save(loaded);
        String again = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(again.contains("futureField=\"kept 42\""), again);
        assertTrue(again.contains("owningGroup=\"changed by this version\""), again);
    }

    @Test
    @DisplayName("recording paths resolve against the notebook's folder, and follow it when saved elsewhere")
    void relativePaths() throws IOException {
        Notebook notebook = SyntheticNotebooks.bench();
        Path first = folder.resolve("a/bench.foldbook");
        NotebookStore.save(notebook, first);
        var recording = notebook.getExperiments().get(0).getRecordings().get(0);
        assertEquals(folder.resolve("a/data/run1.wav"), RecordingFiles.resolve(recording));
        NotebookStore.save(notebook, folder.resolve("b/bench.foldbook"));
        assertEquals(folder.resolve("b/data/run1.wav"), RecordingFiles.resolve(recording));
        assertEquals("data/run1.wav", RecordingFiles.relativeTo(first, folder.resolve("a/data/run1.wav")));
    }
}
