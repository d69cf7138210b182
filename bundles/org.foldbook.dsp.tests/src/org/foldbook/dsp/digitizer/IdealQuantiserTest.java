package org.foldbook.dsp.digitizer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class IdealQuantiserTest {

    @Test
    @DisplayName("SNR = 6.02·N + 1.76 dB (Kester, MT-001): 12 bit 74.0 dB, 16 bit 98.1 dB, 24 bit 146.2 dB")
    void kesterFormula() {
        assertEquals(74.00, new IdealQuantiser(12, 20).snrDb(), 0.01);
        assertEquals(98.08, new IdealQuantiser(16, 20).snrDb(), 0.015);
        assertEquals(146.24, new IdealQuantiser(24, 20).snrDb(), 0.02);
        for (int n = 1; n <= 32; n++) {
            assertEquals(6.02 * n + 1.76, new IdealQuantiser(n, 1).snrDb(), 0.0007 * n + 0.001, "N = " + n);
            assertEquals(-new IdealQuantiser(n, 1).snrDb(), new IdealQuantiser(n, 1).noiseFloorDbfs(), 0);
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {10, 12, 14, 16})
    @DisplayName("simulated ideal quantiser on a full-scale sine (synthetic) gives the same SNR within 0.1 dB")
    void simulation(int bits) {
        // The formula assumes an error uniform and independent of the signal; at 6–8 bits the error of
        // a sine is visibly correlated with it (measured here: ~0.2–0.3 dB off), so those are not checked.
        double span = 2.0;
        IdealQuantiser q = new IdealQuantiser(bits, span);
        double lsb = q.lsbVolts();
        double amp = span / 2 * (1 - 1e-12);
        double f = (Math.sqrt(5) - 1) / 14; // cycles per sample: badly approximable, so the phases spread evenly
        int n = 1 << 18;
        double sig = 0;
        double err = 0;
        for (int i = 0; i < n; i++) {
            double x = amp * Math.sin(2 * Math.PI * f * i + 0.3);
            long code = (long) Math.floor(x / lsb); // codes −2^(N−1) … 2^(N−1)−1
            double y = (code + 0.5) * lsb; // mid-riser reconstruction
            sig += x * x;
            err += (y - x) * (y - x);
        }
        double snr = 10 * Math.log10(sig / err);
        assertEquals(q.snrDb(), snr, 0.1);
        assertEquals(q.noiseRmsVolts(), Math.sqrt(err / n), 0.01 * q.noiseRmsVolts());
    }

    @Test
    @DisplayName("±10 V, 16 bit: q = 305.2 µV, noise 88.1 µV RMS, 394 nV/√Hz at 100 kS/s (hand arithmetic from q/√12)")
    void noiseFigures() {
        IdealQuantiser q = new IdealQuantiser(16, 20);
        assertEquals(305.18e-6, q.lsbVolts(), 0.01e-6);
        assertEquals(88.10e-6, q.noiseRmsVolts(), 0.01e-6);
        assertEquals(394.0e-9, q.noiseDensityVoltsPerRootHz(100_000), 0.1e-9);
        assertEquals(q.noiseFloorDbfs() - 10 * Math.log10(50_000), q.noiseDensityDbfsPerHz(100_000), 1e-12);
        // the density in dBFS/Hz is the density in volts re the full-scale sine RMS
        assertEquals(20 * Math.log10(q.noiseDensityVoltsPerRootHz(100_000) / q.fullScaleSineRmsVolts()),
                q.noiseDensityDbfsPerHz(100_000), 1e-9);
        assertEquals(0, q.dbfsOfRmsVolts(10 / Math.sqrt(2)), 1e-12);
    }

    @Test
    @DisplayName("required attenuation of a 0 dBFS tone, 16 bit: 98.1 dB (noise floor), 90.3 dB (1 LSB), 96.3 dB (½ LSB)")
    void requiredAttenuation() {
        IdealQuantiser q = new IdealQuantiser(16, 20);
        assertEquals(98.09, q.requiredAttenuationDb(0, AliasCriterion.BELOW_NOISE_FLOOR), 0.005);
        assertEquals(20 * Math.log10(Math.pow(2, 15)), q.requiredAttenuationDb(0, AliasCriterion.BELOW_ONE_LSB), 1e-9);
        assertEquals(90.31, q.requiredAttenuationDb(0, AliasCriterion.BELOW_ONE_LSB), 0.005);
        assertEquals(96.33, q.requiredAttenuationDb(0, AliasCriterion.BELOW_HALF_LSB), 0.005);
        assertEquals(78.09, q.requiredAttenuationDb(-20, AliasCriterion.BELOW_NOISE_FLOOR), 0.005);
        assertEquals(0, q.requiredAttenuationDb(-120, AliasCriterion.BELOW_NOISE_FLOOR), 0);
    }

    @Test
    @DisplayName("bad input names the parameter and the value")
    void badInput() {
        assertMessage(() -> new IdealQuantiser(0, 1), "bits", "0");
        assertMessage(() -> new IdealQuantiser(33, 1), "bits", "33");
        assertMessage(() -> new IdealQuantiser(16, -5), "fullScaleVolts", "-5.0");
        assertMessage(() -> new IdealQuantiser(16, 1).noiseDensityVoltsPerRootHz(0), "sampleRateHz", "0.0");
        assertMessage(() -> new IdealQuantiser(16, 1).requiredAttenuationDb(Double.NaN, AliasCriterion.BELOW_ONE_LSB),
                "toneLevelDbfs", "NaN");
        assertMessage(() -> new IdealQuantiser(16, 1).requiredAttenuationDb(0, null), "criterion", "null");
    }

    static void assertMessage(Executable e, String... parts) {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, e);
        for (String p : parts) {
            assertTrue(x.getMessage().contains(p), () -> "message '" + x.getMessage() + "' should contain '" + p + "'");
        }
    }
}
