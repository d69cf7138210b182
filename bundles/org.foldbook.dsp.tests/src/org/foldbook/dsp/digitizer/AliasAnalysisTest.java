package org.foldbook.dsp.digitizer;

import static org.foldbook.dsp.digitizer.IdealQuantiserTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.DigitizerDigitalFilter;
import org.foldbook.dsp.filter.ExposureBoxcar;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class AliasAnalysisTest {

    /** No filter at all: a unit response. */
    private static final FrequencyResponse NONE = f -> 1.0;

    /** Where a 4th-order Butterworth at fc first reaches A dB: (f/fc)^8 = 10^(A/10) − 1 (Williams & Taylor). */
    private static double butterworth4Reaches(double fc, double a) {
        return fc * Math.pow(Math.pow(10, a / 10) - 1, 1.0 / 8);
    }

    @Test
    @DisplayName("common practice: 20 kS/s, sensor flat to 40 kHz, no low-pass: everything 10–40 kHz folds in, no alias-free band")
    void noFilter() {
        AliasFreeBand b = AliasAnalysis.of(NONE, 40_000, 80).aliasFreeBand(20_000);
        assertEquals(10_000, b.nyquistHz(), 0);
        assertEquals(0, b.bandHz(), 0);
        assertEquals(20_000, b.limitingSourceHz(), 0); // 20 kHz lands on DC
        // sensor only to 15 kHz: 10–15 kHz folds onto 5–10 kHz, so 0–5 kHz stays clean (worked example)
        AliasFreeBand c = AliasAnalysis.of(NONE, 15_000, 80).aliasFreeBand(20_000);
        assertEquals(5_000, c.bandHz(), 1e-9);
        assertEquals(15_000, c.limitingSourceHz(), 0);
        // sensor below Nyquist: nothing folds
        AliasFreeBand d = AliasAnalysis.of(NONE, 9_000, 80).aliasFreeBand(20_000);
        assertEquals(10_000, d.bandHz(), 0);
        assertTrue(Double.isNaN(d.limitingSourceHz()));
    }

    @Test
    @DisplayName("Butterworth 4 at 1 kHz, 80 dB required, 15 kS/s: band = fs − f(80 dB) (closed form)")
    void butterworthBand() {
        AnalogFilter bw = AnalogLowPass.butterworth(4, 1000);
        double fA = butterworth4Reaches(1000, 80); // ≈ 10 kHz
        AliasFreeBand b = AliasAnalysis.of(bw, 50_000, 80).aliasFreeBand(15_000);
        assertEquals(15_000 - fA, b.bandHz(), 1e-6);
        assertEquals(fA, b.limitingSourceHz(), 1e-6);
        // at a high rate the whole Nyquist band is clean
        assertEquals(12_000, AliasAnalysis.of(bw, 50_000, 80).aliasFreeBand(24_000).bandHz(), 0);
    }

    @Test
    @DisplayName("alias-free band agrees with a brute-force scan of the definition (non-monotone chain: Butterworth + box-car)")
    void bruteForce() {
        FrequencyResponse chain = AnalogLowPass.butterworth(2, 300).then(new ExposureBoxcar(1.0 / 240));
        double fmax = 5000;
        double req = 40;
        AliasAnalysis a = AliasAnalysis.of(chain, fmax, req);
        Random rnd = new Random(5);
        for (int t = 0; t < 12; t++) {
            double fs = 300 + 3000 * rnd.nextDouble();
            double band = a.aliasFreeBand(fs).bandHz();
            // definition: the least apparent frequency of any under-attenuated x in (fs/2, fmax]
            double brute = fs / 2;
            int n = 400_000;
            for (int i = 0; i <= n; i++) {
                double x = fs / 2 + (fmax - fs / 2) * i / n;
                if (chain.attenuationDb(x) < req) {
                    brute = Math.min(brute, Folding.apparentHz(x, fs));
                }
            }
            // the scan can only miss the exact minimum by its step (≤ 0.013 Hz here)
            assertTrue(band <= brute + 1e-9, "fs " + fs + ": " + band + " vs scan " + brute);
            assertEquals(brute, band, 0.02, "fs " + fs);
        }
    }

    @Test
    @DisplayName("lowest rate: Butterworth closed form fs = f(80 dB) + band; delta-sigma filter tracking the rate: band/0.45")
    void lowestRate() {
        AnalogFilter bw = AnalogLowPass.butterworth(4, 1000);
        RateSearchResult r = AliasAnalysis.of(bw, 50_000, 80).lowestRate(2_000, 100, 100_000, 1e-10);
        assertTrue(r.found());
        double expect = butterworth4Reaches(1000, 80) + 2_000;
        assertEquals(expect, r.rateHz(), 1e-5 * expect);
        assertTrue(r.rateHz() >= expect - 1e-9 && r.toleranceHz() <= 1e-10 * r.rateHz() * 1.0001);
        // a delta-sigma decimator (common practice: 0.45/0.55·fs, 100 dB) alone, sensor to 1 MHz,
        // 100 dB required: alias-free exactly to its passband edge 0.45·fs
        DigitizerDigitalFilter ds = DigitizerDigitalFilter.of(48_000, 0.45, 0.55, 100);
        assertEquals(0.45 * 48_000, AliasAnalysis.of(ds, 1e6, 100).aliasFreeBand(48_000).bandHz(), 1e-6);
        RateSearchResult t = AliasAnalysis.lowestRate(ds::atOutputRate, 1e6, 100, 20_000, 1000, 200_000, 1e-9);
        assertEquals(20_000 / 0.45, t.rateHz(), 1e-6 * t.rateHz());
        // no filter, sensor to 50 kHz: only fs ≥ 50 kHz + band keeps the band clean (worked example)
        RateSearchResult bare = AliasAnalysis.of(NONE, 50_000, 80).lowestRate(2_000, 100, 90_000, 1e-9);
        assertEquals(52_000, bare.rateHz(), 1e-4);
        RateSearchResult none = AliasAnalysis.of(NONE, 50_000, 80).lowestRate(2_000, 100, 51_000, 1e-6);
        assertFalse(none.found());
        assertTrue(Double.isNaN(none.rateHz()));
    }

    @Test
    @DisplayName("protection margin: Butterworth 4 at 1 kHz, 15 kS/s, band 4 kHz: worst image 11 kHz, 10·log10(1+11^8) − 80 dB")
    void protectionMargin() {
        AnalogFilter bw = AnalogLowPass.butterworth(4, 1000);
        ProtectionMargin m = AliasAnalysis.of(bw, 50_000, 80).protectionMargin(15_000, 4_000);
        assertEquals(11_000, m.worstImageHz(), 1e-9);
        assertEquals(10 * Math.log10(1 + Math.pow(11, 8)) - 80, m.marginDb(), 1e-9);
        assertEquals(10 * Math.log10(1 + Math.pow(7.5, 8)), m.attenuationAtNyquistDb(), 1e-9);
        assertTrue(m.isProtected());
        // band 6 kHz: the image at 9 kHz is short of 80 dB
        ProtectionMargin short6 = AliasAnalysis.of(bw, 50_000, 80).protectionMargin(15_000, 6_000);
        assertEquals(10 * Math.log10(1 + Math.pow(9, 8)) - 80, short6.marginDb(), 1e-9);
        assertFalse(short6.isProtected());
        // nothing within the sensor's range folds onto the band
        ProtectionMargin clean = AliasAnalysis.of(bw, 10_000, 80).protectionMargin(15_000, 4_000);
        assertEquals(Double.POSITIVE_INFINITY, clean.marginDb());
        // elliptic: images of the whole Nyquist band at fs = 2·(stopband edge) start at the edge, where
        // the attenuation is exactly As, and cover the stopband ripple peaks (also exactly As)
        AnalogFilter el = AnalogLowPass.elliptic(5, 0.5, 60, 1000);
        double edge = AnalogLowPass.ellipticStopbandEdgeHz(5, 0.5, 60, 1000);
        ProtectionMargin em = AliasAnalysis.of(el, 100_000, 60).protectionMargin(2 * edge, edge);
        assertEquals(0, em.marginDb(), 1e-6);
        ProtectionMargin em2 = AliasAnalysis.of(el, 100_000, 60).protectionMargin(2 * edge, 0.9 * edge);
        assertEquals(0, em2.marginDb(), 1e-6); // a ripple peak lies inside [1.1·edge, 2.9·edge]
        assertTrue(em2.worstImageHz() > 1.1 * edge, "worst at " + em2.worstImageHz());
    }

    @Test
    @DisplayName("ProtectionFigures: 16 bit, Butterworth 8 at 10 kHz, 51.2 kS/s (ratio 2.56, common practice), sensor to 100 kHz")
    void chainFigures() {
        AnalogFilter bw = AnalogLowPass.butterworth(8, 10_000);
        ProtectionFigures c = ProtectionFigures.of(100_000, bw, 16, 51_200);
        double req = 6.02 * 16 + 1.76; // Kester MT-001
        assertEquals(req, c.requiredAttenuationDb(), 0.015);
        assertEquals(25_600, c.nyquistHz(), 0);
        double fA = 10_000 * Math.pow(Math.pow(10, c.requiredAttenuationDb() / 10) - 1, 1.0 / 16);
        assertEquals(51_200 - fA, c.aliasFreeBandHz(), 1e-6);
        assertEquals(10 * Math.log10(1 + Math.pow(2.56, 16)), c.attenuationAtNyquistDb(), 1e-9);
        assertEquals(c.attenuationAtNyquistDb() - c.requiredAttenuationDb(), c.marginDb(), 1e-9);
        assertTrue(c.marginDb() < -30); // a 8-pole filter at fs/5.12 is far from 16-bit protection
    }

    @Test
    @DisplayName("ProtectionFigures with a stated dynamic range: 110 dB and −30 dBFS content need 80 dB; Butterworth 4 at 10 kHz, 25.6 kS/s")
    void chainFiguresOfDynamicRange() {
        AnalogFilter bw = AnalogLowPass.butterworth(4, 10_000);
        ProtectionFigures c = ProtectionFigures.ofDynamicRange(32_000, bw, 24, 25_600, 110, -30);
        assertEquals(80, c.requiredAttenuationDb(), 0); // alias of −30 dBFS content must lie 110 dB under full scale
        // Butterworth |H|² = 1/(1 + (f/fc)^2n) (any filter handbook): at fs/2 = 12.8 kHz, 10·log10(1 + 1.28^8)
        // = 10·log10(8.20576) = 9.141 dB, worked by hand
        assertEquals(9.141, c.attenuationAtNyquistDb(), 1e-3);
        assertEquals(9.141 - 80, c.marginDb(), 1e-3);
        // 25.6 kHz lies inside the sensor's range and folds onto 0 Hz under-attenuated: no alias-free band
        assertEquals(0, c.aliasFreeBandHz(), 0);
        assertEquals(25_600, c.limitingSourceHz(), 0);
        // the dynamic-range entry with the ideal quantiser's SNR is the ideal-quantiser entry (Kester MT-001)
        double snr16 = new IdealQuantiser(16, 1.0).snrDb();
        ProtectionFigures viaRange = ProtectionFigures.ofDynamicRange(100_000, bw, 16, 51_200, snr16, -20);
        ProtectionFigures viaQuantiser = ProtectionFigures.of(100_000, bw, new IdealQuantiser(16, 1.0), 51_200, -20,
                AliasCriterion.BELOW_NOISE_FLOOR);
        assertEquals(viaQuantiser, viaRange);
        assertEquals(6.02 * 16 + 1.76 - 20, viaRange.requiredAttenuationDb(), 0.015);
        // content already below the floor needs nothing
        assertEquals(0, ProtectionFigures.requiredAttenuationDb(100, -120), 0);
        assertMessage(() -> ProtectionFigures.requiredAttenuationDb(0, -30), "dynamicRangeDb", "0.0");
        assertMessage(() -> ProtectionFigures.requiredAttenuationDb(110, Double.NaN), "toneLevelDbfs", "NaN");
        assertMessage(() -> ProtectionFigures.ofDynamicRange(32_000, bw, 33, 25_600, 110, -30), "bits", "33");
    }

    @Test
    @DisplayName("bad input names the parameter and the value")
    void badInput() {
        AnalogFilter bw = AnalogLowPass.butterworth(4, 1000);
        assertMessage(() -> AliasAnalysis.of(bw, 0, 80), "sensorMaxHz", "0.0");
        assertMessage(() -> AliasAnalysis.of(bw, 1000, Double.NaN), "requiredDb", "NaN");
        assertMessage(() -> AliasAnalysis.of(null, 1000, 80), "chain");
        assertMessage(() -> AliasAnalysis.of(bw, 1000, 80).aliasFreeBand(-1), "sampleRateHz", "-1.0");
        assertMessage(() -> AliasAnalysis.of(bw, 1000, 80).protectionMargin(1000, 600), "bandHz", "600.0");
        assertMessage(() -> AliasAnalysis.of(bw, 1000, 80).lowestRate(100, 10, 1000, 0), "relativeTolerance", "0.0");
        assertMessage(() -> AliasAnalysis.of(bw, 1000, 80).lowestRate(100, 10, 150, 1e-6), "maxRateHz", "150.0");
        assertMessage(() -> ProtectionFigures.of(1000, bw, 0, 2000), "bits", "0");
    }
}
