package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** The spectral-fold preview against the time-domain modes and the fold formula. */
class FoldPreviewTest {
    static final double FS0 = 100_000;
    // the peer's tone set (Hz, amplitude), clearly synthetic, with light seeded noise
    static final double[] F = {1000, 4700, 13300, 27100, 38900};
    static final double[] A = {1.0, 0.5, 0.3, 0.2, 0.1};
    static SweepEngine engine;
    static double[] x;
    static SourceSpectrum ref;
    static RateLadder ladder;

    @BeforeAll
    static void setUp() {
        engine = new SweepEngine(2);
        x = Tones.of(1 << 17, FS0, F, A, 1e-3, 7);
        ref = SourceSpectrum.of(x, FS0, SpectrumSettings.DEFAULT);
        ladder = RateLadder.geometric(FS0, FS0, 2000, 30, 1000);
    }

    @AfterAll
    static void tearDown() {
        engine.close();
    }

    @Test
    @DisplayName("preview at 1.9 S/s of a 1.5 Hz tone: folded peak at 0.4 Hz (common practice)")
    void previewFoldsLikeTheFormula() {
        double[] y = Tones.of(1 << 16, 19, new double[] {1.5}, new double[] {1}, 1e-4, 8);
        SourceSpectrum s = SourceSpectrum.of(y, 19, SpectrumSettings.DEFAULT);
        RateStep step = RateLadder.ofRates(19, new double[] {1.9}, 10).get(0);
        RateResult r = new FoldPreview(s).preview(step, Resampling.bare());
        assertEquals(Verdict.FOLDS, r.fate(0).verdict());
        assertEquals(0.4, r.fate(0).observedFrequency(), 2 * s.binWidth());
        // folding moves power, it does not change it: the same bin power within Hann scalloping
        assertEquals(0.0, r.fate(0).gainDb(), 1.5);
    }

    @Test
    @DisplayName("bare: preview verdicts = time-domain verdicts for every source peak at every rate")
    void previewAgreesWithBareMode() {
        assertAgree(Resampling.bare());
    }

    @Test
    @DisplayName("modelled 4th-order Butterworth at 8 kHz: preview verdicts = time-domain verdicts")
    void previewAgreesWithModelledMode() {
        assertAgree(Resampling.modelledFilter(AnalogLowPass.butterworth(4, 8000)));
    }

    @Test
    @DisplayName("ideal decimator (0.45/0.5 fs, 100 dB): preview verdicts = time-domain verdicts")
    void previewAgreesWithIdealDecimator() {
        assertAgree(Resampling.idealDecimator());
    }

    static void assertAgree(Resampling mode) {
        SweepResult time = engine.run(x, ref, ladder, mode, SweepProgress.NONE);
        SweepResult fast = new FoldPreview(ref).preview(ladder, mode);
        assertEquals(F.length, ref.peaks().size(), "source peaks");
        List<String> differ = new ArrayList<>();
        int folds = 0;
        for (int i = 0; i < ladder.size(); i++) {
            double fs = ladder.get(i).effectiveRate();
            // within two bins of DC or Nyquist end bins are never peaks (find_peaks rule); and the preview's
            // continuum lives on the source grid, so nearer DC than two source bins it cannot tell a line apart
            double edge = Math.max(2 * fs / ref.settings().segmentFor(ladder.get(i).outputLength(x.length)),
                    2 * ref.binWidth());
            for (int p = 0; p < F.length; p++) {
                double fa = VerdictClassifier.apparentFrequency(ref.peaks().get(p).frequency(), fs);
                if (fa < edge || fa > fs / 2 - edge) {
                    continue;
                }
                double ft = ref.peaks().get(p).frequency();
                if (mode.mode() == SimulationMode.IDEAL && (ft > 0.45 * fs && ft < 0.5 * fs || fa > 0.45 * fs)) {
                    continue; // transition band 0.45..0.5 fs: the preview uses the stated response, not the design
                }
                SourceFate t = time.rates().get(i).fate(p);
                SourceFate f = fast.rates().get(i).fate(p);
                if (t.verdict() != f.verdict()) {
                    differ.add("rate " + ladder.get(i).effectiveRate() + " peak " + F[p] + ": time " + t.verdict()
                            + " preview " + f.verdict());
                }
                if (t.verdict() == Verdict.FOLDS) {
                    folds++;
                    if (f.verdict() == Verdict.FOLDS) {
                        // the two agree on where it lands, to a source bin
                        assertEquals(t.observedFrequency(), f.observedFrequency(), 1.5 * ref.binWidth());
                    }
                }
            }
        }
        if (mode.mode() != SimulationMode.IDEAL) {
            assertTrue(folds > 10, "the ladder must make tones fold, folds = " + folds);
        }
        assertTrue(differ.isEmpty(), mode.mode().word() + ": " + differ);
    }
}
