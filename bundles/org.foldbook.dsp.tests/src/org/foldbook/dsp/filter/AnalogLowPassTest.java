package org.foldbook.dsp.filter;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class AnalogLowPassTest {

    private static final double FC = 1000.0;

    @Test
    @DisplayName("complex responses equal scipy.signal butter/bessel/cheby1/ellip(analog=True) + freqs_zpk")
    void matchesScipyFreqs() {
        ReferenceCsv cases = ReferenceCsv.load("analog_cases.csv");
        Map<Integer, List<String[]>> resp = ReferenceCsv.load("analog_response.csv").byCase();
        ReferenceCsv rcsv = ReferenceCsv.load("analog_response.csv");
        int checked = 0;
        for (String[] c : cases.rows) {
            int id = Integer.parseInt(cases.get(c, "case"));
            AnalogFilter f = cases.design(c);
            for (String[] r : resp.get(id)) {
                double hz = rcsv.num(r, "f_hz");
                Complex ref = new Complex(rcsv.num(r, "re"), rcsv.num(r, "im"));
                Complex h = f.response(hz);
                double err = h.minus(ref).abs() / ref.abs();
                assertTrue(err < 1e-8, () -> f + " at " + hz + " Hz: " + h + " vs scipy " + ref + " (rel err " + err + ")");
                // magnitude by the log-sum path agrees too
                assertEquals(-20 * Math.log10(ref.abs()), f.attenuationDb(hz), 1e-7, f + " attenuation at " + hz);
                // the continuous phase equals scipy's angle up to whole turns
                double turns = (f.phaseRad(hz) - ref.arg()) / (2 * Math.PI);
                assertEquals(Math.rint(turns), turns, 1e-8, f + " phase at " + hz);
                checked++;
            }
        }
        assertEquals(cases.rows.size() * 27, checked);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 6, 8, 10, 16, 32})
    @DisplayName("Butterworth: 3.01 dB at fc for every order, |H|² = 1/(1+(f/fc)^2n) (Williams & Taylor)")
    void butterworthMagnitude(int n) {
        AnalogFilter f = AnalogLowPass.butterworth(n, FC);
        assertEquals(10 * Math.log10(2), f.attenuationDb(FC), 1e-9);
        assertEquals(3.0103, f.attenuationDb(FC), 1e-4); // handbook value
        for (double x : new double[] {0.01, 0.3, 0.9, 1.5, 4, 40}) {
            assertEquals(10 * Math.log10(1 + Math.pow(x, 2 * n)), f.attenuationDb(x * FC), 1e-9, "f/fc = " + x);
        }
        assertTrue(f.attenuationNonDecreasing());
    }

    @Test
    @DisplayName("Butterworth normalised polynomials n=2, n=4 (Williams & Taylor, Electronic Filter Design Handbook)")
    void butterworthPolynomials() {
        double[] p2 = AnalogLowPass.butterworth(2, FC).denominatorCoefficients(FC);
        assertArrayEquals(new double[] {1, 1.4142, 1}, p2, 1e-4);
        double[] q = quadraticFactors(AnalogLowPass.butterworth(4, FC), FC);
        assertArrayEquals(new double[] {0.7654, 1.8478}, q, 1e-4);
    }

    @Test
    @DisplayName("Bessel delay-normalised polynomials n=2..4 (Thomson 1949; handbook tables)")
    void besselDelayPolynomials() {
        assertArrayEquals(new double[] {1, 3, 3},
                AnalogLowPass.bessel(2, FC, BesselNormalization.DELAY).denominatorCoefficients(FC), 1e-9);
        assertArrayEquals(new double[] {1, 6, 15, 15},
                AnalogLowPass.bessel(3, FC, BesselNormalization.DELAY).denominatorCoefficients(FC), 1e-9);
        assertArrayEquals(new double[] {1, 10, 45, 105, 105},
                AnalogLowPass.bessel(4, FC, BesselNormalization.DELAY).denominatorCoefficients(FC), 1e-8);
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 6, 8, 10, 12, 16})
    @DisplayName("Bessel normalisations: delay 1/ωc at DC, −3.01 dB at fc, Butterworth asymptote (scipy.signal.bessel docs)")
    void besselNormalisations(int n) {
        double wc = 2 * Math.PI * FC;
        assertEquals(1 / wc, AnalogLowPass.bessel(n, FC, BesselNormalization.DELAY).groupDelaySeconds(0), 1e-9 / wc);
        assertEquals(10 * Math.log10(2), AnalogLowPass.bessel(n, FC, BesselNormalization.MAGNITUDE).attenuationDb(FC), 1e-9);
        // 'phase': same high-frequency asymptote as a Butterworth of the same order and cutoff
        double far = 1e4 * FC;
        assertEquals(AnalogLowPass.butterworth(n, FC).attenuationDb(far),
                AnalogLowPass.bessel(n, FC, BesselNormalization.PHASE).attenuationDb(far), 1e-3);
        // for n = 1, 2 the phase at fc is exactly −n·45° (scipy docs: the phase midpoint)
        if (n <= 2) {
            assertEquals(-n * Math.PI / 4, AnalogLowPass.bessel(n, FC, BesselNormalization.PHASE).phaseRad(FC), 1e-9);
        }
        // the flat delay is what a Bessel is for: within 1 % of the DC value up to 0.5·fc for n ≥ 3
        // (common practice; Thomson's criterion is maximal flatness at DC)
        AnalogFilter d = AnalogLowPass.bessel(n, FC, BesselNormalization.DELAY);
        if (n >= 3) {
            assertEquals(d.groupDelaySeconds(0), d.groupDelaySeconds(0.5 * FC), 0.01 * d.groupDelaySeconds(0));
        }
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3, 4, 5, 7, 10})
    @DisplayName("Chebyshev I: |H|² = 1/(1+ε²Tₙ²(f/fc)), ε = √(10^(r/10)−1) (Williams & Taylor)")
    void chebyshevFormula(int n) {
        double rp = 0.5;
        AnalogFilter f = AnalogLowPass.chebyshev1(n, rp, FC);
        double eps2 = Math.pow(10, rp / 10) - 1;
        for (double x : new double[] {0, 0.1, 0.37, 0.8, 1, 1.01, 1.5, 3, 10}) {
            double t = x <= 1 ? Math.cos(n * Math.acos(x)) : Math.cosh(n * acosh(x));
            assertEquals(10 * Math.log10(1 + eps2 * t * t), f.attenuationDb(x * FC), 1e-9, "f/fc = " + x);
        }
        assertEquals(rp, f.attenuationDb(FC), 1e-9, "ripple at the passband edge");
    }

    @Test
    @DisplayName("Elliptic: ripple at fc, stopband attenuation from the stated edge on, equiripple minima = As")
    void ellipticEdges() {
        int n = 5;
        double rp = 0.5;
        double rs = 60;
        AnalogFilter f = AnalogLowPass.elliptic(n, rp, rs, FC);
        double fs = AnalogLowPass.ellipticStopbandEdgeHz(n, rp, rs, FC);
        assertEquals(rp, f.attenuationDb(FC), 1e-7);
        assertEquals(rs, f.attenuationDb(fs), 1e-6);
        // the stopband minima of attenuation all equal rs (definition of the elliptic response)
        long minima = Arrays.stream(f.landmarksHz(100 * FC)).filter(x -> x > fs * 1.0001)
                .map(x -> f.attenuationDb(x)).filter(a -> !Double.isInfinite(a) && Math.abs(a - rs) < 1e-6).count();
        assertTrue(minima >= 2, "equiripple stopband minima found: " + minima);
        // and nothing in the stopband is below rs (dense check, 20000 points)
        for (int i = 0; i < 20000; i++) {
            double x = fs * Math.pow(100, i / 20000.0);
            assertTrue(f.attenuationDb(x) >= rs - 1e-6, "at " + x);
        }
        assertEquals(2 * (n / 2), f.zeros().length);
    }

    @Test
    @DisplayName("group delay in closed form equals −dφ/dω by central differences of the phase")
    void groupDelayIsPhaseSlope() {
        for (AnalogFilter f : new AnalogFilter[] {AnalogLowPass.butterworth(5, FC), AnalogLowPass.chebyshev1(4, 1, FC),
                AnalogLowPass.bessel(6, FC, BesselNormalization.DELAY), AnalogLowPass.elliptic(4, 0.5, 50, FC)}) {
            for (double hz : new double[] {50, 400, 900, 1100, 3000}) {
                double h = 1e-3;
                double slope = -(f.phaseRad(hz + h) - f.phaseRad(hz - h)) / (2 * Math.PI * 2 * h);
                assertEquals(slope, f.groupDelaySeconds(hz), 1e-7 * Math.abs(slope) + 1e-12, f + " at " + hz);
            }
        }
    }

    @Test
    @DisplayName("RC: |H| = 1/√(1+(f/fc)²), phase −atan(f/fc) (first-order circuit theory)")
    void rc() {
        AnalogFilter f = AnalogLowPass.rc(FC);
        for (double x : new double[] {0, 0.5, 1, 2, 20}) {
            assertEquals(1 / Math.sqrt(1 + x * x), f.magnitude(x * FC), 1e-12);
            assertEquals(-Math.atan(x), f.phaseRad(x * FC), 1e-12);
        }
        assertEquals(1, f.order());
    }

    @Test
    @DisplayName("cascade: attenuations add in dB")
    void cascadeAdds() {
        AnalogFilter a = AnalogLowPass.butterworth(4, FC);
        AnalogFilter b = AnalogLowPass.rc(3 * FC);
        FrequencyResponse c = a.then(b);
        for (double x : new double[] {10, 500, 1000, 5000, 1e5}) {
            assertEquals(a.attenuationDb(x) + b.attenuationDb(x), c.attenuationDb(x), 1e-12);
            assertEquals(a.magnitude(x) * b.magnitude(x), c.magnitude(x), 1e-15);
        }
        assertTrue(c.attenuationNonDecreasing());
        assertEquals(2, ((Cascade) c.then(a).then(b)).stages().size() - 2);
    }

    @Test
    @DisplayName("bad input names the parameter and the value")
    void badInput() {
        assertMessage(() -> AnalogLowPass.butterworth(0, FC), "order", "0");
        assertMessage(() -> AnalogLowPass.butterworth(4, -1), "cutoffHz", "-1.0");
        assertMessage(() -> AnalogLowPass.rc(Double.NaN), "cutoffHz", "NaN");
        assertMessage(() -> AnalogLowPass.bessel(3, FC, null), "normalization", "null");
        assertMessage(() -> AnalogLowPass.bessel(17, FC, BesselNormalization.DELAY), "order", "17");
        assertMessage(() -> AnalogLowPass.chebyshev1(3, 0, FC), "rippleDb", "0.0");
        assertMessage(() -> AnalogLowPass.elliptic(3, 1, 0.5, FC), "stopbandDb", "0.5");
        assertMessage(() -> AnalogLowPass.butterworth(3, FC).magnitude(Double.POSITIVE_INFINITY), "frequencyHz", "Infinity");
        assertMessage(() -> new AnalogFilter("x", new Complex[0], new Complex[] {Complex.real(1)}, 1, 1, true, null),
                "poles[0]", "1.0");
        assertMessage(() -> new AnalogFilter("x", new Complex[0], new Complex[] {new Complex(-1, 1)}, 1, 1, true, null),
                "poles", "conjugate");
        assertMessage(() -> Cascade.of(AnalogLowPass.rc(FC), null), "stages[1]", "null");
        assertMessage(() -> Cascade.of(java.util.List.of()), "stages", "[]");
        assertMessage(() -> new FrequencyBand(5, 2), "band", "[5.0, 2.0]");
    }

    static void assertMessage(org.junit.jupiter.api.function.Executable e, String... parts) {
        IllegalArgumentException x = assertThrows(IllegalArgumentException.class, e);
        for (String p : parts) {
            assertTrue(x.getMessage().contains(p), () -> "message '" + x.getMessage() + "' should contain '" + p + "'");
        }
    }

    static void assertArrayEquals(double[] expected, double[] actual, double tol) {
        assertEquals(expected.length, actual.length, () -> Arrays.toString(actual));
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], actual[i], tol, "coefficient " + i + " of " + Arrays.toString(actual));
        }
    }

    /** The middle coefficients of the quadratic factors s² + b·s + 1 (s in units of ωc), sorted. */
    private static double[] quadraticFactors(AnalogFilter f, double scaleHz) {
        double w = 2 * Math.PI * scaleHz;
        return Arrays.stream(f.poles()).filter(p -> p.im() > 0).mapToDouble(p -> -2 * p.re() / w).sorted().toArray();
    }

    private static double acosh(double x) {
        return Math.log(x + Math.sqrt(x * x - 1));
    }
}
