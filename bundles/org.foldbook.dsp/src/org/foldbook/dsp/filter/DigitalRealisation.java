package org.foldbook.dsp.filter;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.foldbook.dsp.Check;

/**
 * Digital versions of analog models, so stored samples can be run "through the channel's own
 * filter": the bilinear transform {@code s = K·(z − 1)/(z + 1)} with {@code K = 2π·fw / tan(π·fw/fs)},
 * pre-warped so the digital response equals the analog one exactly at fw (by default the model's
 * cutoff), realised as second-order sections.
 *
 * <p><b>Validity.</b> The bilinear map compresses the whole analog axis into [0, fs/2): the digital
 * response at f equals the analog response at {@code f_a = fw·tan(πf/fs)/tan(πfw/fs)}, not at f. Near
 * fw and below it the two agree closely only while fs/2 is well above the cutoff. Measured for a
 * 4th-order Butterworth (largest error up to fc / up to 2·fc): fs = 5·fc 0.29 / 26 dB, fs = 10·fc
 * 0.07 / 3.9 dB, fs = 20·fc 0.017 / 0.9 dB, fs = 100·fc 0.0007 / 0.03 dB. Towards fs/2 the digital
 * version attenuates more than the analog one (infinitely at fs/2, where the zeros at infinity
 * land), so a simulation of aliasing by content near the source's Nyquist frequency understates it.
 * A model whose cutoff is close to or above fs/2 cannot be reproduced at all; it is rejected.
 * {@link #magnitudeError} measures the discrepancy for a given rate and band: check it before trusting
 * a simulation that relies on the filter's shape near the source's Nyquist frequency.
 */
public final class DigitalRealisation {

    /** Number of evenly spaced frequencies {@link #magnitudeError} compares (plus the model's landmarks). */
    public static final int ERROR_GRID_POINTS = 4096;

    private DigitalRealisation() {
    }

    /** Bilinear realisation at {@code sampleRateHz}, pre-warped at the model's cutoff. */
    public static SecondOrderSections of(AnalogFilter analog, double sampleRateHz) {
        if (analog == null) {
            throw new IllegalArgumentException("analog must not be null");
        }
        return of(analog, sampleRateHz, analog.cutoffHz());
    }

    /** Bilinear realisation of stages in series, each pre-warped at its own cutoff. */
    public static SecondOrderSections of(List<AnalogFilter> stages, double sampleRateHz) {
        if (stages == null || stages.isEmpty()) {
            throw new IllegalArgumentException("stages must hold at least one analog filter, was " + stages);
        }
        SecondOrderSections all = null;
        for (AnalogFilter f : stages) {
            SecondOrderSections d = of(f, sampleRateHz);
            all = all == null ? d : all.followedBy(d);
        }
        return all;
    }

    /** Bilinear realisation at {@code sampleRateHz}, pre-warped at {@code prewarpHz} (&lt; fs/2). */
    public static SecondOrderSections of(AnalogFilter analog, double sampleRateHz, double prewarpHz) {
        if (analog == null) {
            throw new IllegalArgumentException("analog must not be null");
        }
        Check.positive("sampleRateHz", sampleRateHz);
        Check.positive("prewarpHz", prewarpHz);
        if (!(prewarpHz < 0.5 * sampleRateHz)) {
            throw new IllegalArgumentException("prewarpHz must lie below half of sampleRateHz (" + sampleRateHz
                    + "), was " + prewarpHz + ": the model's cutoff cannot be reproduced at this rate");
        }
        double k = 2 * Math.PI * prewarpHz / Math.tan(Math.PI * prewarpHz / sampleRateHz);
        Complex kk = Complex.real(k);

        Complex[] zs = analog.zeros();
        Complex[] ps = analog.poles();
        Complex gain = Complex.real(analog.gain());
        // (s − a) = (K − a)(z − (K + a)/(K − a))/(z + 1)
        List<Complex> dz = new ArrayList<>();
        List<Complex> dp = new ArrayList<>();
        for (Complex z : zs) {
            gain = gain.times(kk.minus(z));
            dz.add(kk.plus(z).dividedBy(kk.minus(z)));
        }
        for (Complex p : ps) {
            gain = gain.dividedBy(kk.minus(p));
            dp.add(kk.plus(p).dividedBy(kk.minus(p)));
        }
        for (int i = zs.length; i < ps.length; i++) {
            dz.add(Complex.real(-1)); // zeros at s = ∞ land at Nyquist
        }
        double[][] rows = pairIntoSections(dz, dp);
        // Give each section unit gain at DC (z = 1) and put the overall gain in the first, which keeps
        // the internal signal levels of a low-pass near the input level.
        double total = gain.re();
        for (double[] r : rows) {
            double g = (r[0] + r[1] + r[2]) / (1 + r[4] + r[5]);
            if (Math.abs(g) > 1e-300) {
                for (int j = 0; j < 3; j++) {
                    r[j] /= g;
                }
                total *= g;
            }
        }
        for (int j = 0; j < 3; j++) {
            rows[0][j] *= total;
        }
        return new SecondOrderSections(rows, sampleRateHz);
    }

    /** Pole pairs nearest the unit circle first, each with the zero pair nearest to it. */
    private static double[][] pairIntoSections(List<Complex> zeros, List<Complex> poles) {
        AnalogFilter.ConjugateSplit zsplit = AnalogFilter.ConjugateSplit.of("digital zeros", zeros.toArray(new Complex[0]));
        AnalogFilter.ConjugateSplit psplit = AnalogFilter.ConjugateSplit.of("digital poles", poles.toArray(new Complex[0]));
        List<Complex> zPairs = new ArrayList<>(zsplit.pairs());
        List<Double> zReals = new ArrayList<>(zsplit.reals());
        List<Complex> pPairs = new ArrayList<>(psplit.pairs());
        List<Double> pReals = new ArrayList<>(psplit.reals());
        pPairs.sort(Comparator.comparingDouble(Complex::abs).reversed());
        pReals.sort(Comparator.comparingDouble((Double d) -> Math.abs(d)).reversed());
        zReals.sort(Comparator.comparingDouble(d -> Math.abs(d + 1))); // the Nyquist zeros first
        List<double[]> rows = new ArrayList<>();
        for (Complex p : pPairs) {
            double[] r = new double[6];
            r[3] = 1;
            r[4] = -2 * p.re();
            r[5] = p.re() * p.re() + p.im() * p.im();
            if (!zPairs.isEmpty()) {
                Complex best = zPairs.get(0);
                for (Complex z : zPairs) {
                    if (z.minus(p).abs() < best.minus(p).abs()) {
                        best = z;
                    }
                }
                zPairs.remove(best);
                setPair(r, best);
            } else {
                setReals(r, zReals.remove(0), zReals.remove(0));
            }
            rows.add(r);
        }
        for (int i = 0; i < pReals.size(); i += 2) {
            double[] r = new double[6];
            r[3] = 1;
            if (i + 1 < pReals.size()) {
                double p1 = pReals.get(i);
                double p2 = pReals.get(i + 1);
                r[4] = -(p1 + p2);
                r[5] = p1 * p2;
                if (!zPairs.isEmpty()) {
                    setPair(r, zPairs.remove(0));
                } else {
                    setReals(r, zReals.remove(0), zReals.remove(0));
                }
            } else {
                r[4] = -pReals.get(i);
                r[0] = 1;
                r[1] = -zReals.remove(0);
            }
            rows.add(r);
        }
        return rows.toArray(new double[0][]);
    }

    private static void setPair(double[] r, Complex z) {
        r[0] = 1;
        r[1] = -2 * z.re();
        r[2] = z.re() * z.re() + z.im() * z.im();
    }

    private static void setReals(double[] r, double z1, double z2) {
        r[0] = 1;
        r[1] = -(z1 + z2);
        r[2] = z1 * z2;
    }

    /** Attenuations beyond this count as equal in {@link #magnitudeError(FrequencyResponse, SecondOrderSections, double)}. */
    public static final double DEFAULT_FLOOR_DB = 150;

    /** {@link #magnitudeError(FrequencyResponse, SecondOrderSections, double, double)} with a floor of {@value #DEFAULT_FLOOR_DB} dB. */
    public static RealisationError magnitudeError(FrequencyResponse analog, SecondOrderSections digital, double upToHz) {
        return magnitudeError(analog, digital, upToHz, DEFAULT_FLOOR_DB);
    }

    /**
     * The largest difference in attenuation (dB) between the digital realisation and the analog
     * model over [0, upToHz] (upToHz ≤ fs/2), on {@value #ERROR_GRID_POINTS} evenly spaced frequencies
     * plus the analog model's landmarks (cutoff, pole and zero frequencies). Both attenuations are
     * clipped at {@code floorDb} first: below that level (e.g. far under the digitizer's noise floor)
     * a difference does not matter, and near a transmission zero it would be meaningless.
     */
    public static RealisationError magnitudeError(FrequencyResponse analog, SecondOrderSections digital, double upToHz,
            double floorDb) {
        if (analog == null || digital == null) {
            throw new IllegalArgumentException((analog == null ? "analog" : "digital") + " must not be null");
        }
        Check.positive("upToHz", upToHz);
        Check.positive("floorDb", floorDb);
        double nyq = digital.sampleRateHz() / 2;
        if (upToHz > nyq) {
            throw new IllegalArgumentException("upToHz must not exceed the digital filter's Nyquist frequency " + nyq
                    + ", was " + upToHz);
        }
        double worst = 0;
        double at = 0;
        double[] marks = analog.landmarksHz(upToHz);
        for (int i = 0; i <= ERROR_GRID_POINTS + marks.length; i++) {
            double f = i <= ERROR_GRID_POINTS ? upToHz * i / ERROR_GRID_POINTS : marks[i - ERROR_GRID_POINTS - 1];
            double a = Math.min(floorDb, analog.attenuationDb(f));
            double d = Math.abs(Math.min(floorDb, digital.attenuationDb(f)) - a);
            if (d > worst) {
                worst = d;
                at = f;
            }
        }
        return new RealisationError(worst, at, upToHz);
    }

    /**
     * The highest frequency (Hz, ≤ fs/2) up to which the digital realisation stays within
     * {@code toleranceDb} of the analog model (attenuations clipped at {@value #DEFAULT_FLOOR_DB} dB),
     * found by scanning the same evenly spaced grid upward from 0.
     */
    public static double faithfulUpToHz(FrequencyResponse analog, SecondOrderSections digital, double toleranceDb) {
        if (analog == null || digital == null) {
            throw new IllegalArgumentException((analog == null ? "analog" : "digital") + " must not be null");
        }
        Check.positive("toleranceDb", toleranceDb);
        double nyq = digital.sampleRateHz() / 2;
        double last = 0;
        for (int i = 0; i <= ERROR_GRID_POINTS; i++) {
            double f = nyq * i / ERROR_GRID_POINTS;
            double a = Math.min(DEFAULT_FLOOR_DB, analog.attenuationDb(f));
            if (!(Math.abs(Math.min(DEFAULT_FLOOR_DB, digital.attenuationDb(f)) - a) <= toleranceDb)) {
                return last;
            }
            last = f;
        }
        return nyq;
    }
}
