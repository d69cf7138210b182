package org.foldbook.model.persistence;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.foldbook.model.Channel;
import org.foldbook.model.Experiment;
import org.foldbook.model.Notebook;
import org.foldbook.model.NotebookFactory;
import org.foldbook.model.SimulationRun;
import org.foldbook.model.SweepMode;
import org.foldbook.model.SyntheticNotebooks;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Sweep modes are stored as the sweep's words (bare, modelled, ideal); files written before hold the
 * literals BARE_SAMPLING, FILTERED, IDEAL_DECIMATOR and still load as the same modes.
 */
class OldModeLiteralsTest {

    @TempDir
    Path folder;

    @Test
    @DisplayName("the demo notebook as the previous code wrote it loads with its plan's three modes, and saves with the words")
    void committedFileOfThePreviousCode() throws IOException {
        // written by the demo of the code before the change (`foldbook --self-check`), committed unchanged
        Path file = folder.resolve("demo.foldbook");
        try (InputStream in = getClass().getResourceAsStream("/notebooks/demo-before-mode-words.foldbook")) {
            Files.copy(in, file);
        }
        String before = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(before.contains("<modes>BARE_SAMPLING</modes>") && before.contains("<modes>IDEAL_DECIMATOR</modes>"));
        Notebook notebook = NotebookStore.load(file);
        Channel survey = notebook.getExperiments().get(2).getChannels().get(0);
        assertEquals(List.of(SweepMode.BARE, SweepMode.MODELLED, SweepMode.IDEAL), survey.getSweepPlan().getModes());

        NotebookStore.save(notebook);
        String after = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(after.contains("<modes>bare</modes>") && after.contains("<modes>modelled</modes>")
                && after.contains("<modes>ideal</modes>"), after);
        assertFalse(after.contains("BARE_SAMPLING") || after.contains("FILTERED") || after.contains("IDEAL_DECIMATOR"));
        assertTrue(EcoreUtil.equals(notebook, NotebookStore.load(file)));
    }

    @Test
    @DisplayName("a kept run's mode in the old literal loads as the same mode")
    void keptRunOfAnOlderFile() throws IOException {
        Notebook notebook = SyntheticNotebooks.bench();
        Experiment experiment = notebook.getExperiments().get(0);
        SimulationRun run = NotebookFactory.eINSTANCE.createSimulationRun();
        run.setChannel(experiment.getChannels().get(0));
        run.setMode(SweepMode.MODELLED);
        run.setPath("simulations/run1-channel1-modelled.json");
        experiment.getSimulations().add(run);
        Path file = folder.resolve("bench.foldbook");
        NotebookStore.save(notebook, file);
        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.contains("mode=\"modelled\""), text);
        assertTrue(text.contains("<modes>bare</modes>"), text);

        // the same file as the code before the change wrote it (its literals were the constants' names)
        Files.writeString(file, text.replace("mode=\"modelled\"", "mode=\"FILTERED\"")
                .replace("<modes>bare</modes>", "<modes>BARE_SAMPLING</modes>")
                .replace("<modes>modelled</modes>", "<modes>FILTERED</modes>"), StandardCharsets.UTF_8);
        Notebook old = NotebookStore.load(file);
        Experiment e = old.getExperiments().get(0);
        assertEquals(SweepMode.MODELLED, e.getSimulations().get(0).getMode());
        assertEquals(List.of(SweepMode.BARE, SweepMode.MODELLED), e.getChannels().get(0).getSweepPlan().getModes());
        assertTrue(EcoreUtil.equals(notebook, old));
    }
}
