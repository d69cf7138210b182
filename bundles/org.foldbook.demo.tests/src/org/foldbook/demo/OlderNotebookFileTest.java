package org.foldbook.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.model.Digitizer;
import org.foldbook.model.Notebook;
import org.foldbook.model.SignalChain;
import org.foldbook.model.derived.ChainFigures;
import org.foldbook.model.persistence.NotebookStore;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The demo notebook with attributes removed that older files do not have: it still loads, with the worst case. */
class OlderNotebookFileTest {

    @TempDir
    Path folder;

    @Test
    @DisplayName("a file without dynamic range and out-of-band level (as written before they existed) loads with the worst-case figures")
    void fileWithoutCriterionAttributes() throws IOException {
        Path file = GearboxDemo.write(folder);
        String text = Files.readString(file, StandardCharsets.UTF_8);
        assertTrue(text.contains(" dynamicRangeDb=\"110.0\"") && text.contains(" outOfBandLevelDbfs=\"-30.0\""), text);
        String old = text.replaceAll(" dynamicRangeDb=\"[^\"]*\"", "").replaceAll(" outOfBandLevelDbfs=\"[^\"]*\"", "");
        Files.writeString(file, old, StandardCharsets.UTF_8);

        Notebook loaded = NotebookStore.load(file);
        SignalChain housing = loaded.getRigs().get(0).getChains().get(0);
        assertEquals("CH-HZ", housing.getId());
        assertNull(housing.getOutOfBandLevelDbfs());
        assertNull(((Digitizer) ChainFigures.samplingStage(housing).getDevice()).getDynamicRangeDb());
        ChainFigures.Need need = ChainFigures.need(housing).orElseThrow();
        assertFalse(need.rangeStated() || need.levelStated());
        assertEquals(0, need.outOfBandLevelDbfs(), 0);
        // Kester, Analog Devices MT-001: ideal SNR of a full-scale sine, 6.02·N + 1.76 dB = 146.24 dB at 24 bit
        assertEquals(6.02 * 24 + 1.76, need.requiredDb(), 0.02);
        var figures = ChainFigures.figures(housing).orElseThrow();
        assertEquals(need.requiredDb(), figures.requiredAttenuationDb(), 0);
        // Butterworth 4 at 10 kHz at 12.8 kHz: 10·log10(1 + 1.28^8) = 9.1412 dB (|H|² = 1/(1+(f/fc)^2n))
        assertEquals(9.1412 - need.requiredDb(), figures.marginDb(), 1e-4);
        assertEquals(0, figures.aliasFreeBandHz(), 0);

        // written back with the attributes set, they are in the file and read again
        housing.setOutOfBandLevelDbfs(-30.0);
        NotebookStore.save(loaded, file);
        Notebook again = NotebookStore.load(file);
        assertEquals(-30.0, again.getRigs().get(0).getChains().get(0).getOutOfBandLevelDbfs());
        assertNull(again.getRigs().get(0).getChains().get(1).getOutOfBandLevelDbfs());
    }
}
