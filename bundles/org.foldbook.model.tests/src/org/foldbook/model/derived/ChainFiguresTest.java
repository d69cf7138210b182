package org.foldbook.model.derived;

import static org.foldbook.model.SyntheticNotebooks.vibrationChain;
import static org.foldbook.model.SyntheticNotebooks.videoChain;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.foldbook.model.AntiAliasFilter;
import org.foldbook.model.FilterFamily;
import org.foldbook.model.Notebook;
import org.foldbook.model.SignalChain;
import org.foldbook.model.SyntheticNotebooks;
import org.foldbook.model.derived.ChainFigures.Band;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

class ChainFiguresTest {

    @Test
    @DisplayName("rate and Nyquist come from the sampling stage (setting, else device maximum / first frame rate)")
    void rateAndNyquist() {
        Notebook notebook = SyntheticNotebooks.bench();
        SignalChain chain = vibrationChain(notebook);
        assertEquals(20000.0, chain.samplingRateHz());
        assertEquals(10000.0, chain.nyquistHz()); // fs/2 (Nyquist–Shannon)
        chain.getStages().get(3).setRateHz(null);
        assertEquals(51200.0, chain.samplingRateHz(), "the digitizer's maximum rate");
        SignalChain video = videoChain(notebook);
        video.getStages().get(0).setRateHz(null);
        assertEquals(60.0, video.samplingRateHz(), "the camera's first frame rate");
        chain.getStages().remove(3);
        assertTrue(Double.isNaN(chain.nyquistHz()));
    }

    @Test
    @DisplayName("folded band: 20 kS/s, content to 40 kHz lands in 0–10 kHz; to 15 kHz in 5–10 kHz; to 9 kHz nothing")
    void foldedBand() {
        // docs/REFERENCES.md, facts of the trade (common practice), and |f − k·fs| (Oppenheim & Schafer ch. 4)
        assertEquals(new Band(0.0, 10000.0), ChainFigures.foldedBandHz(40000.0, 20000.0).orElseThrow());
        assertEquals(new Band(5000.0, 10000.0), ChainFigures.foldedBandHz(15000.0, 20000.0).orElseThrow());
        assertTrue(ChainFigures.foldedBandHz(9000.0, 20000.0).isEmpty());
        // "A 1.5 Hz tone sampled at 1.9 Hz appears at 0.4 Hz" (docs/REFERENCES.md, facts of the trade; common practice)
        assertEquals(0.4, ChainFigures.foldedBandHz(1.5, 1.9).orElseThrow().lowHz(), 1e-12);
    }

    @Test
    @DisplayName("4th-order Butterworth at 4 kHz, fs 20 kS/s: 10·log10(1+(10/4)^8) = 31.84 dB at Nyquist (Butterworth |H|²)")
    void butterworthAttenuationAtNyquist() {
        SignalChain chain = vibrationChain(SyntheticNotebooks.bench());
        // |H|² = 1/(1+(f/fc)^2n): S. Butterworth (1930); Williams & Taylor, Electronic Filter Design Handbook
        double expected = 10 * Math.log10(1 + Math.pow(10000.0 / 4000.0, 8));
        assertEquals(expected, ChainFigures.filterAttenuationAtNyquistDb(chain).orElseThrow(), 1e-6);
        AntiAliasFilter device = (AntiAliasFilter) chain.getStages().get(2).getDevice();
        device.setFamily(FilterFamily.RC);
        // first-order RC: |H|² = 1/(1+(f/fc)²)
        assertEquals(10 * Math.log10(1 + 6.25), ChainFigures.filterAttenuationAtNyquistDb(chain).orElseThrow(), 1e-6);
        device.setFamily(FilterFamily.UNKNOWN);
        assertTrue(ChainFigures.filterAttenuationAtNyquistDb(chain).isEmpty(), "no model for an unknown family");
    }

    @Test
    @DisplayName("dsp figures of the bench chain: Nyquist 10 kHz, Butterworth attenuation there, 24-bit requirement 6.02·N + 1.76 dB")
    void dspFigures() {
        SignalChain chain = vibrationChain(SyntheticNotebooks.bench());
        var figures = ChainFigures.figures(chain).orElseThrow();
        assertEquals(10000.0, figures.nyquistHz());
        assertEquals(9000.0, figures.sensorMaxHz(), "resonance above the usable maximum counts");
        // Butterworth |H|^2 = 1/(1+(f/fc)^2n), as above
        assertEquals(10 * Math.log10(1 + Math.pow(10000.0 / 4000.0, 8)), figures.attenuationAtNyquistDb(), 1e-6);
        // Kester, Analog Devices MT-001: ideal SNR of a full-scale sine = 6.02·N + 1.76 dB
        assertEquals(6.02 * 24 + 1.76, figures.requiredAttenuationDb(), 0.02);
        // camera chains have no digitizer figures
        assertTrue(ChainFigures.figures(videoChain(SyntheticNotebooks.bench())).isEmpty());
    }

    @Test
    @DisplayName("a camera chain's response is its exposure box-car: null at 1/T (|sin(πfT)/(πfT)|, common practice)")
    void cameraExposureResponse() {
        SignalChain video = videoChain(SyntheticNotebooks.bench());
        var response = ChainFigures.chainResponse(video);
        // exposure 4 ms: first null at 250 Hz; at 125 Hz |H| = sin(π/2)/(π/2) = 2/π
        assertEquals(2 / Math.PI, response.magnitude(125.0), 1e-9);
        assertEquals(0.0, response.magnitude(250.0), 1e-9);
    }
}
