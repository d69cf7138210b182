package org.foldbook.dsp.peaks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Random;

import org.foldbook.dsp.spectrum.AmplitudeEstimator;
import org.foldbook.dsp.spectrum.AmplitudeScale;
import org.foldbook.dsp.spectrum.AmplitudeSpectrum;
import org.foldbook.dsp.spectrum.Detrend;
import org.foldbook.dsp.spectrum.PowerSpectrum;
import org.foldbook.dsp.spectrum.Unit;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.window.Window;
import org.foldbook.dsp.window.WindowShape;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * Sub-bin estimates against the known frequency and amplitude of synthetic tones (the truth is the generated
 * input), and the running-median floor against a direct median.
 */
class SubBinAndFloorTest {
    private static final int N = 4096;
    private static final double FS = 8192.0; // 2 Hz bins

    private static double[] tone(double bin, double amplitude, double phase) {
        double[] x = new double[N];
        for (int j = 0; j < N; j++) {
            x[j] = amplitude * Math.cos(2 * Math.PI * bin * j / N + phase);
        }
        return x;
    }

    /** Worst error over offsets 0..0.5 bin and a few phases: {frequency error in bins, level error in dB}. */
    private static double[] worstError(WindowShape shape, PeakFinder finder) {
        Window w = shape.periodic(N);
        AmplitudeEstimator est = AmplitudeEstimator.of(w, AmplitudeScale.PEAK, Detrend.NONE);
        double worstF = 0;
        double worstL = 0;
        for (int i = 0; i <= 10; i++) {
            for (double phase : new double[] {0.0, 1.0, 2.5}) {
                double bin = 500 + 0.05 * i;
                AmplitudeSpectrum s = est.amplitude(tone(bin, 2.0, phase), FS, Unit.VOLT);
                List<SpectralPeak> peaks = finder.find(s);
                // the highest peak is the tone (a noise-free tone's sidelobes are peaks too)
                SpectralPeak p = peaks.stream().max(java.util.Comparator.comparingDouble(SpectralPeak::binLevelDb))
                        .orElseThrow();
                worstF = Math.max(worstF, Math.abs(p.frequencyHz() / s.binWidth() - bin));
                worstL = Math.max(worstL, Math.abs(p.levelDb() - 20 * Math.log10(2.0)));
            }
        }
        return new double[] {worstF, worstL};
    }

    @Test
    @DisplayName("window-kernel estimate: < 1e-3 bin and < 0.01 dB for Hann, Hamming, BH4, flat top, Kaiser")
    void windowKernel() {
        for (WindowShape shape : new WindowShape[] {WindowShape.HANN, WindowShape.HAMMING,
                WindowShape.BLACKMAN_HARRIS_4, WindowShape.FLAT_TOP, WindowShape.kaiser(8)}) {
            PeakFinder f = PeakFinder.builder().prominenceDb(20).windowKernel(shape.periodic(N)).build();
            double[] e = worstError(shape, f);
            assertTrue(e[0] < 1e-3, shape + " frequency error " + e[0] + " bins");
            assertTrue(e[1] < 0.01, shape + " level error " + e[1] + " dB");
        }
    }

    @Test
    @DisplayName("Gaussian (log-parabolic) estimate with Hann: < 0.02 bin and < 0.35 dB; bin centres are worse")
    void gaussian() {
        double[] g = worstError(WindowShape.HANN, PeakFinder.builder().prominenceDb(20).subBin(SubBin.GAUSSIAN).build());
        assertTrue(g[0] < 0.02, "frequency error " + g[0]);
        assertTrue(g[1] < 0.35, "level error " + g[1]);
        double[] none = worstError(WindowShape.HANN, PeakFinder.builder().prominenceDb(20).build());
        assertEquals(0.5, none[0], 1e-9, "bin centre: up to half a bin off");
        // scallop loss of Hann at half a bin, 1.4236 dB (Heinzel 2002)
        assertEquals(1.4236, none[1], 1e-3);
        assertTrue(g[0] < none[0] && g[1] < none[1]);
    }

    @Test
    @DisplayName("window-kernel estimate on a Welch density: level corrected to the bin-centred reading")
    void kernelOnWelch() {
        double bin = 300.3;
        int n = 1024;
        double[] x = new double[16 * n];
        for (int j = 0; j < x.length; j++) {
            x[j] = Math.sin(2 * Math.PI * bin * j / n);
        }
        Welch welch = Welch.builder(n).build();
        PowerSpectrum s = welch.psd(x, FS, Unit.VOLT);
        PeakFinder f = PeakFinder.builder().prominenceDb(20).windowKernel(welch.window()).build();
        List<SpectralPeak> peaks = f.find(s);
        SpectralPeak p = peaks.stream().max(java.util.Comparator.comparingDouble(SpectralPeak::binLevelDb))
                .orElseThrow();
        assertEquals(bin * FS / n, p.frequencyHz(), 1e-3 * FS / n);
        // a bin-centred unit sine: A^2/2 / (ENBW fs/n) = 0.5 / (1.5 * 8) V²/Hz
        assertEquals(10 * Math.log10(0.5 / (1.5 * FS / n)), p.levelDb(), 0.01);
        assertTrue(p.levelDb() > p.binLevelDb());
    }

    @Test
    @DisplayName("running median equals a direct median of the truncated window")
    void runningMedian() {
        Random r = new Random(3);
        double[] x = new double[301];
        for (int i = 0; i < x.length; i++) {
            x[i] = Math.round(r.nextGaussian() * 3); // with ties
        }
        for (int w : new int[] {1, 3, 31, 301, 999}) {
            double[] floor = NoiseFloor.runningMedian(x, x.length, w);
            for (int k = 0; k < x.length; k++) {
                double[] win = Arrays.copyOfRange(x, Math.max(0, k - w / 2), Math.min(x.length, k + w / 2 + 1));
                Arrays.sort(win);
                int m = win.length;
                double med = (m & 1) == 1 ? win[m / 2] : 0.5 * (win[m / 2 - 1] + win[m / 2]);
                assertEquals(med, floor[k], 0.0, "w=" + w + " k=" + k);
            }
        }
        assertThrows(IllegalArgumentException.class, () -> NoiseFloor.runningMedian(x, x.length, 4));
    }

    @Test
    @DisplayName("floor threshold keeps the tones and drops noise peaks that pass the prominence rule")
    void floorThreshold() {
        Random r = new Random(11);
        int n = 1 << 16;
        double[] x = new double[n];
        double[] bins = {300, 1000, 1700}; // bin-centred: Hann leaks them into +-1 bin only
        for (int j = 0; j < n; j++) {
            x[j] = 0.01 * r.nextGaussian();
            for (double b : bins) {
                x[j] += Math.sin(2 * Math.PI * b * j / 4096);
            }
        }
        PowerSpectrum s = Welch.builder(4096).build().psd(x, FS, Unit.VOLT);
        List<SpectralPeak> loose = PeakFinder.builder().prominenceDb(3).build().find(s);
        List<SpectralPeak> floored = PeakFinder.builder().prominenceDb(3).noiseFloor(31, 20).build().find(s);
        assertTrue(loose.size() > 20, "noise peaks with 3 dB prominence: " + loose.size());
        assertEquals(3, floored.size(), floored.toString());
        for (int i = 0; i < 3; i++) {
            assertEquals(bins[i] * 2.0, floored.get(i).frequencyHz(), 1e-9);
            assertTrue(floored.get(i).levelDb() - floored.get(i).floorDb() > 60);
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PeakFinder.builder().noiseFloor(30, 10));
        assertTrue(e.getMessage().contains("windowBins") && e.getMessage().contains("30"));
        double[] p = s.values();
        p[7] = Double.NaN;
        e = assertThrows(IllegalArgumentException.class,
                () -> PeakFinder.builder().build().findInPower(p, p.length, 2.0));
        assertTrue(e.getMessage().contains("power[7]"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> PeakFinder.builder().prominenceDb(-1));
        assertTrue(e.getMessage().contains("prominenceDb"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> PeakFinder.builder().build().findInPower(p, 0, 2.0));
        assertTrue(e.getMessage().contains("count"), e.getMessage());
    }
}
