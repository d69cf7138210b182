package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * Analog elements of a chain that are not anti-alias low-passes, as {@link AnalogFilter}s so that every
 * analog part of a chain is one kind of object (zeros/poles/gain in rad/s, exact response everywhere):
 * <ul>
 * <li>{@link #sensorResonance}: a sensor's mechanical resonance, the second-order system
 *     H(s) = ωn² / (s² + (ωn/Q)·s + ωn²), 1 at DC, Q at fn (for Q ≫ 1), falling 40 dB/decade above;
 *     an accelerometer's mounted resonance is the usual case (common practice).</li>
 * <li>{@link #highPass}: first-order AC coupling, H(s) = s / (s + ωh), −3.01 dB at the corner.</li>
 * <li>{@link #bandPass}: a conditioner's band, AC coupling then a first-order band limit,
 *     H(s) = s·ωl / ((s + ωh)(s + ωl)).</li>
 * </ul>
 * Chains with several elements list them in series in a {@code ModelledChannel}; the responses multiply.
 */
public final class SensorAndConditioner {

    private SensorAndConditioner() {
    }

    /** Resonance at {@code resonanceHz} with quality factor {@code q} (&gt; 0; 1/√2 is Butterworth-flat). */
    public static AnalogFilter sensorResonance(double resonanceHz, double q) {
        Check.positive("resonanceHz", resonanceHz);
        Check.positive("q", q);
        double wn = 2 * Math.PI * resonanceHz;
        double zeta = 1 / (2 * q);
        Complex[] p;
        if (zeta < 1) {
            double wd = wn * Math.sqrt(1 - zeta * zeta);
            p = new Complex[] {new Complex(-zeta * wn, wd), new Complex(-zeta * wn, -wd)};
        } else {
            double r = wn * Math.sqrt(zeta * zeta - 1);
            p = new Complex[] {Complex.real(-zeta * wn + r), Complex.real(-zeta * wn - r)};
        }
        double peak = q > 1 / Math.sqrt(2) ? wn * Math.sqrt(1 - 2 * zeta * zeta) / (2 * Math.PI) : resonanceHz;
        return new AnalogFilter("sensor resonance at " + resonanceHz + " Hz, Q " + q, new Complex[0], p, wn * wn,
                resonanceHz, false, new double[] {peak});
    }

    /** First-order high-pass (AC coupling), −3.01 dB at {@code cornerHz}. */
    public static AnalogFilter highPass(double cornerHz) {
        Check.positive("cornerHz", cornerHz);
        double wh = 2 * Math.PI * cornerHz;
        return new AnalogFilter("high-pass first order, -3 dB at " + cornerHz + " Hz", new Complex[] {Complex.ZERO},
                new Complex[] {Complex.real(-wh)}, 1, cornerHz, false, null);
    }

    /** AC coupling at {@code highPassHz} then a first-order band limit at {@code lowPassHz} (&gt; highPassHz). */
    public static AnalogFilter bandPass(double highPassHz, double lowPassHz) {
        Check.positive("highPassHz", highPassHz);
        Check.positive("lowPassHz", lowPassHz);
        if (!(lowPassHz > highPassHz)) {
            throw new IllegalArgumentException("lowPassHz must exceed highPassHz " + highPassHz + ", was " + lowPassHz);
        }
        double wh = 2 * Math.PI * highPassHz;
        double wl = 2 * Math.PI * lowPassHz;
        return new AnalogFilter("band-pass " + highPassHz + " - " + lowPassHz + " Hz (first order each)",
                new Complex[] {Complex.ZERO}, new Complex[] {Complex.real(-wh), Complex.real(-wl)}, wl, lowPassHz, false,
                new double[] {Math.sqrt(highPassHz * lowPassHz)});
    }
}
