package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.CancellationException;

import org.foldbook.dsp.fold.Folding;
import org.foldbook.model.Channel;
import org.foldbook.sweep.SimulationMode;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SweepEngine;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The what-if rate on the synthetic channel 1 (a 1250 Hz tone at 8 kS/s, 16-bit, bare): at 2 kS/s it
 * lands at |1250 − 2000| = 750 Hz (fold formula, Oppenheim &amp; Schafer ch. 4); the preview and the exact
 * re-sample agree on where and on the verdict, and on the tone's level within 1 dB.
 */
class WhatIfRateTest {
    @TempDir
    Path dir;

    @Test
    void previewAndExactAgreeWithTheFoldFormula() throws IOException {
        Channel c = TestNotebooks.channel(TestNotebooks.write(dir), 1);
        ChannelData data = ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE);
        SimulationSetup setup = ChannelSimulation.setup(c, SimulationMode.BARE, data.rateHz());
        SourceSpectrum source = SourceSpectrum.of(data.samples(), data.rateHz(), setup.settings());
        WhatIfRate w = new WhatIfRate(data.samples(), source, setup.resampling());
        WhatIfRate.Spectrum preview = w.preview(2000);
        assertFalse(preview.exact());
        assertEquals(1000, preview.frequencyHz()[preview.frequencyHz().length - 1], 1e-9);
        WhatIfRate.Spectrum exact;
        try (SweepEngine engine = new SweepEngine(1)) {
            exact = w.exact(2000, engine, () -> false);
            assertThrows(CancellationException.class, () -> w.exact(2000, engine, () -> true));
        }
        assertTrue(exact.exact());
        assertEquals(preview.landings().size(), exact.landings().size());
        int tone = -1;
        for (int i = 0; i < preview.landings().size(); i++) {
            if (Math.abs(preview.landings().get(i).sourceHz() - TestNotebooks.F1) < 2) {
                tone = i;
            }
        }
        assertTrue(tone >= 0, "the 1250 Hz tone is a source peak: " + preview.landings());
        WhatIfRate.Landing p = preview.landings().get(tone);
        WhatIfRate.Landing e = exact.landings().get(tone);
        double expected = Folding.apparentHz(p.sourceHz(), 2000);
        assertEquals(750, expected, 2);
        assertEquals(expected, p.landsAtHz(), 1e-6);
        assertEquals(expected, e.landsAtHz(), 1e-6);
        assertEquals("folds", p.verdict());
        assertEquals("folds", e.verdict());
        assertEquals(max(preview.levelDb()), max(exact.levelDb()), 1.0);
        assertThrows(IllegalArgumentException.class, () -> w.preview(9000));
    }

    private static double max(double[] v) {
        double m = Double.NEGATIVE_INFINITY;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }
}
