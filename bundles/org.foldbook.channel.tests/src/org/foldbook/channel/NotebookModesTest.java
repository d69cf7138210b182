package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;

import org.foldbook.model.NotebookPackage;
import org.foldbook.model.SweepMode;
import org.foldbook.sweep.SimulationMode;
import org.junit.jupiter.api.Test;

/**
 * The notebook's stored modes and the sweep's are one vocabulary: the EMF literals are the words the
 * sweep's JSON and {@code foldbook sweep --mode} use (the JSON layout documented in the sweep's
 * package-info), and every mode a notebook keeps maps both ways.
 */
class NotebookModesTest {

    @Test
    void storedLiteralsAreTheWordsOfTheJsonAndTheCommandLine() {
        assertEquals(List.of("bare", "modelled", "ideal"),
                Arrays.stream(SweepMode.values()).map(SweepMode::getLiteral).toList());
        assertEquals(List.of("bare", "modelled", "ideal"),
                SimulationMode.notebookModes().stream().map(SimulationMode::word).toList());
        // what EMF writes into the file is the literal
        assertEquals("modelled", NotebookPackage.eINSTANCE.getNotebookFactory()
                .convertToString(NotebookPackage.Literals.SWEEP_MODE, SweepMode.MODELLED));
    }

    @Test
    void everyModeANotebookKeepsMapsBothWays() {
        assertEquals(SweepMode.values().length, SimulationMode.notebookModes().size());
        for (SweepMode stored : SweepMode.values()) {
            SimulationMode m = NotebookModes.of(stored);
            assertTrue(m.inNotebooks(), m.word());
            assertEquals(stored, NotebookModes.stored(m));
        }
        assertEquals(List.of(SimulationMode.BARE, SimulationMode.IDEAL),
                NotebookModes.of(List.of(SweepMode.BARE, SweepMode.IDEAL)));
    }

    @Test
    void sideBySideCheckModesAreNotStored() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> NotebookModes.stored(SimulationMode.POLYPHASE_DEFAULT));
        assertTrue(e.getMessage().contains("polyphase-default") && e.getMessage().contains("bare, modelled, ideal"),
                e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> SimulationMode.ofWord("FILTERED"));
        assertTrue(e.getMessage().contains("'FILTERED'") && e.getMessage().contains("bare-kernel"), e.getMessage());
    }
}
