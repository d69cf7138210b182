package org.foldbook.dsp.filter;

import static org.foldbook.dsp.filter.AnalogLowPassTest.assertMessage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Exposure box-car, the digitizer's digital-filter mask, and the searches over frequency. */
class ChainElementsTest {

    @Test
    @DisplayName("box-car exposure |sin(πfT)/(πfT)|: 3.92 dB at f = 1/(2T) (= rectangular-window scalloping, Harris 1978 Table 1), null at 1/T, first sidelobe 13.26 dB")
    void exposureBoxcar() {
        double t = 1.0 / 500; // 2 ms
        ExposureBoxcar b = new ExposureBoxcar(t);
        assertEquals(3.92, b.attenuationDb(0.5 / t), 0.005);
        assertEquals(20 * Math.log10(Math.PI / 2), b.attenuationDb(0.5 / t), 1e-12);
        assertEquals(0, b.magnitude(1 / t), 0);
        assertEquals(Double.POSITIVE_INFINITY, b.attenuationDb(3 / t));
        assertEquals(0, b.attenuationDb(0), 0);
        // first sidelobe: Harris 1978 gives −13 dB for the rectangular window (13.26 dB exactly)
        AttenuationPoint lobe = AttenuationSearch.minimum(b, 1 / t, 2 / t);
        assertEquals(13.26, lobe.attenuationDb(), 0.005);
        assertEquals(1.4303 / t, lobe.frequencyHz(), 0.0005 / t); // tan(x) = x root 4.4934/π (A&S table 4.19)
        // 180° shutter at 60 frames/s = 1/120 s
        assertEquals(1.0 / 120, ExposureBoxcar.ofShutterAngle(180, 60).exposureSeconds(), 1e-15);
        assertMessage(() -> new ExposureBoxcar(0), "exposureSeconds", "0.0");
        assertMessage(() -> ExposureBoxcar.ofShutterAngle(400, 60), "shutterAngleDeg", "400.0");
    }

    @Test
    @DisplayName("digitizer digital filter mask (common practice: 0.45·fs pass, 0.55·fs stop, ≥ 90 dB)")
    void digitizerMask() {
        DigitizerDigitalFilter d = DigitizerDigitalFilter.of(48_000, 0.45, 0.55, 100);
        assertEquals(21_600, d.passbandEdgeHz(), 1e-9);
        assertEquals(26_400, d.stopbandEdgeHz(), 1e-9);
        assertEquals(0, d.attenuationDb(21_000), 0);
        assertEquals(6, d.attenuationDb(24_000), 1e-12);
        assertEquals(100, d.attenuationDb(26_400), 1e-12);
        assertEquals(100, d.attenuationDb(1e6), 0);
        assertEquals(53, d.attenuationDb(25_200), 1e-9); // halfway between fs/2 and the stopband edge
        DigitizerDigitalFilter slow = d.atOutputRate(1000);
        assertEquals(450, slow.passbandEdgeHz(), 1e-12);
        assertEquals(100, slow.attenuationDb(550), 1e-12);
        assertTrue(d.attenuationNonDecreasing());
        assertMessage(() -> DigitizerDigitalFilter.of(48_000, 0.6, 0.55, 100), "passbandFraction", "0.6");
        assertMessage(() -> DigitizerDigitalFilter.of(-1, 0.45, 0.55, 100), "outputRateHz", "-1.0");
        assertMessage(() -> DigitizerDigitalFilter.of(48_000, 0.45, 0.55, 0), "stopbandDb", "0.0");
    }

    @Test
    @DisplayName("bands below a threshold: Butterworth closed form (f/fc)^2n = 10^(A/10) − 1")
    void bandsBelowMonotone() {
        AnalogFilter b = AnalogLowPass.butterworth(4, 1000);
        List<FrequencyBand> bands = AttenuationSearch.bandsBelow(b, 80, 50_000);
        assertEquals(1, bands.size());
        double edge = 1000 * Math.pow(1e8 - 1, 1.0 / 8);
        assertEquals(edge, bands.get(0).highHz(), 1e-8 * edge);
        // the same through the generic path (a cascade with a non-monotone stage of unit gain here)
        FrequencyResponse nonMono = new FrequencyResponse() {
            @Override
            public double magnitude(double f) {
                return b.magnitude(f);
            }
        };
        List<FrequencyBand> g = AttenuationSearch.bandsBelow(nonMono, 80, 50_000);
        assertEquals(1, g.size());
        assertEquals(edge, g.get(0).highHz(), 1e-8 * edge);
    }

    @Test
    @DisplayName("bands below a threshold around elliptic transmission zeros and box-car lobes")
    void bandsBelowRippling() {
        // elliptic: under-attenuated only below its stopband edge, where attenuation first reaches As
        AnalogFilter e = AnalogLowPass.elliptic(5, 0.5, 60, 1000);
        double edge = AnalogLowPass.ellipticStopbandEdgeHz(5, 0.5, 60, 1000);
        List<FrequencyBand> eb = AttenuationSearch.bandsBelow(e, 59.9, 100_000);
        assertEquals(1, eb.size(), eb.toString());
        assertTrue(eb.get(0).highHz() < edge && eb.get(0).highHz() > 0.99 * edge, eb.toString());
        // asking for more than As: every stopband ripple peak is a separate under-attenuated band
        List<FrequencyBand> deep = AttenuationSearch.bandsBelow(e, 61, 100_000);
        assertTrue(deep.size() >= 3, deep.toString());
        for (FrequencyBand band : deep.subList(1, deep.size())) {
            double mid = 0.5 * (band.lowHz() + band.highHz());
            assertTrue(e.attenuationDb(mid) < 61, "inside " + band);
            assertEquals(61, e.attenuationDb(band.lowHz()), 1e-6);
        }
        // box-car with T = 1 ms: |sinc| > 0.1 (below 20 dB) around DC and in the first two sidelobes
        ExposureBoxcar box = new ExposureBoxcar(1e-3);
        List<FrequencyBand> lobes = AttenuationSearch.bandsBelow(box, 20, 10_000);
        assertEquals(3, lobes.size(), lobes.toString()); // main lobe, sidelobes 1 and 2 (peaks −13.3, −17.8 dB)
        assertEquals(0, lobes.get(0).lowHz(), 0);
        assertTrue(lobes.get(1).contains(1430.3) && lobes.get(2).contains(2459.0), lobes.toString());
    }

    @Test
    @DisplayName("minimum over an interval: Chebyshev I passband ripple peaks reach 0 dB")
    void minimumFindsRipplePeaks() {
        AnalogFilter c = AnalogLowPass.chebyshev1(4, 1.0, 1000);
        AttenuationPoint p = AttenuationSearch.minimum(c, 100, 900);
        assertEquals(0, p.attenuationDb(), 1e-9);
        // a ripple peak sits where T4(f/fc) = 0: f = fc·cos((2m−1)π/8)
        double nearest = Double.POSITIVE_INFINITY;
        for (int m = 1; m <= 4; m++) {
            nearest = Math.min(nearest, Math.abs(p.frequencyHz() - 1000 * Math.cos((2 * m - 1) * Math.PI / 8)));
        }
        assertTrue(nearest < 1e-3, "at " + p.frequencyHz());
        assertMessage(() -> AttenuationSearch.minimum(c, 10, 5), "hiHz", "5.0");
        assertMessage(() -> AttenuationSearch.bandsBelow(c, Double.NaN, 10), "thresholdDb", "NaN");
    }
}
