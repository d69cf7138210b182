package org.foldbook.dsp.resample;

import org.foldbook.dsp.SpecialFunctions;

import org.foldbook.dsp.Check;

/**
 * A linear-phase low-pass FIR designed by the Kaiser window method (J. F. Kaiser, ISCAS 1974;
 * Oppenheim &amp; Schafer, Discrete-Time Signal Processing 3rd ed. §7.6):
 * <pre>
 *   A = stop-band attenuation in dB, Δω = 2π·(f_stop − f_pass)/rate,
 *   β = 0.1102·(A − 8.7)                        A > 50
 *       0.5842·(A − 21)^0.4 + 0.07886·(A − 21)  21 ≤ A ≤ 50
 *       0                                       A < 21
 *   order M = ceil((A − 8) / (2.285·Δω)), raised to even so the length M+1 is odd (integer delay M/2),
 *   h[n] = (2·f_c/rate)·sinc(2·f_c/rate·(n − M/2))·w_Kaiser[n],  f_c = (f_pass + f_stop)/2,
 * </pre>
 * scaled to unit gain at DC. Kaiser's formula for M is an estimate that runs short for short filters, so
 * filters up to {@value #VERIFY_MAX_TAPS} taps are measured at design time and lengthened until the stop
 * band meets A; longer ones follow the formula (the tests measure both kinds). Its pass-band ripple is about the same δ = 10^(−A/20) as
 * the stop band (≈ 0.0001 dB for 100 dB). Immutable.
 */
public final class KaiserLowPass {

    private final double rate;
    private final double passEdge;
    private final double stopEdge;
    private final double attenuationDb;
    private final double beta;
    private final double[] taps;

    private KaiserLowPass(double rate, double passEdge, double stopEdge, double attenuationDb) {
        this.rate = rate;
        this.passEdge = passEdge;
        this.stopEdge = stopEdge;
        this.attenuationDb = attenuationDb;
        this.beta = beta(attenuationDb);
        double dw = 2 * Math.PI * (stopEdge - passEdge) / rate;
        long order = order(attenuationDb, dw);
        if (order + 1 > PolyphaseKernel.MAX_TABLE) {
            throw new IllegalArgumentException("a Kaiser low-pass with transition " + (stopEdge - passEdge) + " Hz at "
                    + rate + " S/s and " + attenuationDb + " dB needs " + (order + 1) + " taps, more than "
                    + PolyphaseKernel.MAX_TABLE);
        }
        double[] h = windowedSinc((int) order, (passEdge + stopEdge) / rate, beta);
        // Kaiser's length formula is a fit that runs short for short filters (wide transitions): measure
        // those and lengthen until the stop band holds. Long filters follow the formula closely.
        while (h.length <= VERIFY_MAX_TAPS && worstStopBand(h, stopEdge / rate) > Math.pow(10, -attenuationDb / 20)) {
            order += 2;
            h = windowedSinc((int) order, (passEdge + stopEdge) / rate, beta);
        }
        this.taps = h;
    }

    /** Filters up to this length have their stop band measured at design time. */
    static final int VERIFY_MAX_TAPS = 401;

    /** h[n] = fc·sinc(fc·(n − M/2))·w_Kaiser[n] for n = 0..M, scaled to unit DC gain; fc re Nyquist. */
    private static double[] windowedSinc(int order, double fc, double beta) {
        int n = order + 1;
        double half = order / 2.0;
        double i0b = SpecialFunctions.besselI0(beta);
        double[] h = new double[n];
        double sum = 0;
        for (int i = 0; i <= order / 2; i++) {           // symmetric: first half and centre, then mirror
            double m = i - half;
            double u = half == 0 ? 0 : m / half;
            h[i] = fc * KaiserSinc.sinc(fc * m) * SpecialFunctions.besselI0(beta * Math.sqrt(Math.max(0, 1 - u * u))) / i0b;
            h[n - 1 - i] = h[i];
        }
        for (int i = 0; i < n; i++) {
            sum += h[i];
        }
        for (int i = 0; i < n; i++) {
            h[i] /= sum;
        }
        return h;
    }

    /** Largest |A(f)| over [stop, 1/2] cycles/sample, on a grid of 8 points per 1/length. */
    private static double worstStopBand(double[] h, double stop) {
        int points = (int) Math.ceil((0.5 - stop) * 8 * h.length) + 1;
        double worst = 0;
        for (int i = 0; i < points; i++) {
            double f = stop + (0.5 - stop) * i / Math.max(1, points - 1);
            worst = Math.max(worst, Math.abs(amplitude(h, f)));
        }
        return worst;
    }

    /**
     * Designs the filter for a stream at {@code rate} samples/s.
     *
     * @throws IllegalArgumentException unless 0 &lt; passEdge &lt; stopEdge &le; rate/2 and attenuation is
     *         finite and &ge; 0 (each message names the parameter)
     */
    public static KaiserLowPass design(double rate, double passEdge, double stopEdge, double attenuationDb) {
        Check.positive("rate", rate);
        Check.positive("passEdge", passEdge);
        Check.positive("stopEdge", stopEdge);
        if (!(stopEdge > passEdge)) {
            throw new IllegalArgumentException("stopEdge must exceed passEdge " + passEdge + ", was " + stopEdge);
        }
        if (stopEdge > rate / 2) {
            throw new IllegalArgumentException("stopEdge must be <= rate/2 = " + rate / 2 + ", was " + stopEdge);
        }
        Check.nonNegative("attenuationDb", attenuationDb);
        return new KaiserLowPass(rate, passEdge, stopEdge, attenuationDb);
    }

    /** Kaiser's β for a stop-band attenuation of {@code a} dB. */
    public static double beta(double a) {
        if (a > 50) {
            return 0.1102 * (a - 8.7);
        }
        if (a >= 21) {
            return 0.5842 * Math.pow(a - 21, 0.4) + 0.07886 * (a - 21);
        }
        return 0.0;
    }

    /** Even filter order M (length M+1) for attenuation {@code a} dB and transition {@code dw} rad/sample. */
    static long order(double a, double dw) {
        double m = Math.ceil(Math.max(a - 8, 1) / (2.285 * dw));
        long o = (long) Math.min(m, 1L << 40);
        return o % 2 == 0 ? o : o + 1;
    }

    public double rate() {
        return rate;
    }

    public double passEdge() {
        return passEdge;
    }

    public double stopEdge() {
        return stopEdge;
    }

    public double attenuationDb() {
        return attenuationDb;
    }

    public double beta() {
        return beta;
    }

    /** Number of taps (odd). */
    public int length() {
        return taps.length;
    }

    /** Delay of the centre tap, samples: (length − 1)/2. */
    public int centre() {
        return taps.length / 2;
    }

    /** A copy of the coefficients. */
    public double[] coefficients() {
        return taps.clone();
    }

    double[] coefficientsShared() {
        return taps;
    }

    /** |H(f)| at {@code frequencyHz} (the zero-phase amplitude response's magnitude). */
    public double magnitude(double frequencyHz) {
        return Math.abs(amplitude(taps, frequencyHz / rate));
    }

    /** Zero-phase amplitude of a symmetric odd-length FIR at {@code f} cycles/sample. */
    static double amplitude(double[] h, double f) {
        int c = h.length / 2;
        double w = 2 * Math.PI * f;
        double cw = Math.cos(w);
        double sw = Math.sin(w);
        double a = 0;
        // cos(kw) by rotation, restarted from Math.cos/sin every 64 terms so rounding cannot build up
        for (int k0 = 1; k0 <= c; k0 += 64) {
            double ck = Math.cos(w * k0);
            double sk = Math.sin(w * k0);
            for (int k = k0, end = Math.min(c, k0 + 63); k <= end; k++) {
                a += h[c + k] * ck;
                double t = ck * cw - sk * sw;
                sk = sk * cw + ck * sw;
                ck = t;
            }
        }
        return h[c] + 2 * a;
    }
}
