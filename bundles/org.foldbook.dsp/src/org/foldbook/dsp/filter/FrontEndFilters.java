package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * Analog shapes of a measurement front end that are not anti-alias low-passes: a sensor's mounted
 * resonance and the first-order band edges of a conditioning amplifier. Zero-pole-gain forms of the
 * textbook transfer functions (e.g. Ogata, <i>Modern Control Engineering</i>, the standard second-order
 * system), so they cascade and realise like the low-pass families.
 */
public final class FrontEndFilters {

    private FrontEndFilters() {
    }

    /**
     * A resonance at {@code resonanceHz} with quality factor {@code q}: H(s) = ω0²/(s² + (ω0/Q)s + ω0²),
     * flat (0 dB) well below ω0, a peak of about 20·log10(Q) dB at ω0 (exactly Q at f0), −40 dB/decade above.
     * Q must be &gt; 0.5 (an under-damped pair of poles).
     */
    public static AnalogFilter resonance(double resonanceHz, double q) {
        Check.positive("resonanceHz", resonanceHz);
        if (!(q > 0.5) || Double.isInfinite(q)) {
            throw new IllegalArgumentException("q must be finite and > 0.5 (an under-damped resonance), was " + q);
        }
        double w0 = 2 * Math.PI * resonanceHz;
        double re = -w0 / (2 * q);
        double im = w0 * Math.sqrt(1 - 1 / (4 * q * q));
        return new AnalogFilter("resonance at " + resonanceHz + " Hz, Q " + q, new Complex[0],
                new Complex[] {new Complex(re, im), new Complex(re, -im)}, w0 * w0, resonanceHz, false,
                new double[] {resonanceHz * Math.sqrt(Math.max(0, 1 - 1 / (2 * q * q)))});
    }

    /** First-order high-pass, H(s) = s/(s + ωc): −3 dB at {@code cutoffHz}, +20 dB/decade below it. */
    public static AnalogFilter highPass(double cutoffHz) {
        Check.positive("cutoffHz", cutoffHz);
        double wc = 2 * Math.PI * cutoffHz;
        return new AnalogFilter("first-order high-pass, -3 dB at " + cutoffHz + " Hz",
                new Complex[] {Complex.ZERO}, new Complex[] {Complex.real(-wc)}, 1.0, cutoffHz, false, null);
    }
}
