package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.Recording;
import org.foldbook.model.SyntheticNotebooks;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The save service of both workbench save paths: a real save, and real failures of the store. */
class NotebookSavingTest {
    @TempDir
    Path folder;

    @Test
    @DisplayName("a save that works: the notebook loads back from the file")
    void saves() throws Exception {
        Path file = folder.resolve("bench.foldbook");
        NotebookSaving.Outcome outcome = NotebookSaving.save(SyntheticNotebooks.bench(), file);
        assertTrue(outcome.saved(), outcome.message());
        assertEquals(SyntheticNotebooks.bench().getExperiments().size(),
                NotebookStore.load(file).getExperiments().size());
    }

    @Test
    @DisplayName("a reference out of the notebook fails the write; the file on disk keeps its bytes")
    void failedWriteLeavesTheFile() throws Exception {
        Path file = folder.resolve("bench.foldbook");
        Notebook notebook = SyntheticNotebooks.bench();
        assertTrue(NotebookSaving.save(notebook, file).saved());
        byte[] before = Files.readAllBytes(file);
        // a channel pointing at a recording that belongs to no notebook: XMI cannot write the reference
        Experiment experiment = notebook.getExperiments().get(0);
        Channel channel = NotebookFactory.eINSTANCE.createChannel();
        channel.setName("stray");
        Recording stray = NotebookFactory.eINSTANCE.createRecording();
        channel.setRecording(stray);
        experiment.getChannels().add(channel);
        NotebookSaving.Outcome outcome = NotebookSaving.save(notebook, file);
        assertFalse(outcome.saved());
        assertTrue(outcome.message().startsWith(file + ": "), outcome.message());
        assertTrue(outcome.message().contains("The file on disk is unchanged"), outcome.message());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    @DisplayName("a folder that is a file: the outcome names the file and the problem, nothing is thrown")
    void unwritablePlace() throws IOException {
        Path notAFolder = Files.writeString(folder.resolve("plain.txt"), "x");
        Path file = notAFolder.resolve("bench.foldbook");
        NotebookSaving.Outcome outcome = NotebookSaving.save(SyntheticNotebooks.bench(), file);
        assertFalse(outcome.saved());
        assertTrue(outcome.message().startsWith(file.toString()), outcome.message());
        NotebookSaving.Outcome failing = NotebookSaving.save(file, () -> {
            throw new IOException("No space left on device");
        });
        assertEquals("No space left on device", failing.problem());
    }
}
