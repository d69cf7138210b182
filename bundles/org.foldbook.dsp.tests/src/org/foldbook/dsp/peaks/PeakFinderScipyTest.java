package org.foldbook.dsp.peaks;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;

import org.foldbook.dsp.spectrum.PowerSpectrum;
import org.foldbook.dsp.spectrum.ReferenceVectors;
import org.foldbook.dsp.spectrum.Unit;
import org.foldbook.dsp.spectrum.Welch;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/** Peak bins and prominences against scipy.signal.find_peaks (releng/reference/spectra_vectors.py). */
class PeakFinderScipyTest {

    private static void assertSame(double[] levels, String refFile, PeakFinder finder, boolean bases) {
        List<double[]> ref = ReferenceVectors.rows(refFile);
        List<SpectralPeak> found = finder.findInLevels(levels, levels.length, 1.0);
        assertEquals(ref.size(), found.size(), refFile + ": number of peaks");
        for (int i = 0; i < ref.size(); i++) {
            SpectralPeak p = found.get(i);
            assertEquals((int) ref.get(i)[0], p.bin(), refFile + " peak " + i);
            assertEquals(ref.get(i)[1], p.prominenceDb(), 1e-9, refFile + " prominence " + i);
            assertEquals(levels[p.bin()], p.levelDb(), 0.0);
            assertEquals(p.bin(), p.frequencyHz(), 0.0);
        }
        if (bases) {
            int[] peaks = found.stream().mapToInt(SpectralPeak::bin).toArray();
            int[] left = new int[peaks.length];
            int[] right = new int[peaks.length];
            PeakShapes.prominences(levels, levels.length, peaks, left, right);
            for (int i = 0; i < peaks.length; i++) {
                assertEquals((int) ref.get(i)[2], left[i], refFile + " left base " + i);
                assertEquals((int) ref.get(i)[3], right[i], refFile + " right base " + i);
            }
        }
    }

    @Test
    @DisplayName("Welch PSD in dB, prominence 10 dB and 3 dB: same bins, prominences, bases as scipy")
    void psdProminence() {
        double[] db = ReferenceVectors.column("peaks-psd-db.txt", 0);
        assertSame(db, "peaks-psd-db-prom10.txt", PeakFinder.builder().prominenceDb(10).build(), true);
        assertSame(db, "peaks-psd-db-prom3.txt", PeakFinder.builder().prominenceDb(3).build(), true);
    }

    @Test
    @DisplayName("end to end: our Welch PSD of the same input, then our peaks = scipy's bins, levels within 1e-8 dB")
    void endToEnd() {
        double[] x = ReferenceVectors.column("welch-peer-like-input.txt", 0);
        PowerSpectrum psd = Welch.builder(4096).build().psd(x, 100000.0, Unit.VOLT);
        List<SpectralPeak> found = PeakFinder.builder().prominenceDb(10).build().find(psd);
        double[] db = ReferenceVectors.column("peaks-psd-db.txt", 0);
        List<double[]> ref = ReferenceVectors.rows("peaks-psd-db-prom10.txt");
        assertEquals(ref.size(), found.size());
        for (int i = 0; i < ref.size(); i++) {
            int bin = (int) ref.get(i)[0];
            assertEquals(bin, found.get(i).bin());
            assertEquals(db[bin], found.get(i).levelDb(), 1e-8);
            assertEquals(bin * 100000.0 / 4096, found.get(i).frequencyHz(), 1e-9);
            assertEquals(ref.get(i)[1], found.get(i).prominenceDb(), 1e-8);
        }
    }

    @Test
    @DisplayName("minimum separation 25 bins = scipy find_peaks(distance=25, prominence=3)")
    void psdDistance() {
        double[] db = ReferenceVectors.column("peaks-psd-db.txt", 0);
        assertSame(db, "peaks-psd-db-prom3-dist25.txt",
                PeakFinder.builder().prominenceDb(3).minSeparationBins(25).build(), false);
    }

    @Test
    @DisplayName("plateaus, ties and high endpoints: same as scipy (flat top at its middle, ends never peaks)")
    void plateaus() {
        double[] y = ReferenceVectors.column("peaks-plateaus-input.txt", 0);
        assertSame(y, "peaks-plateaus-prom0.5.txt", PeakFinder.builder().prominenceDb(0.5).build(), true);
    }
}
