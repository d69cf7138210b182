package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * An immutable digital IIR filter as a cascade of second-order sections at a fixed sample rate.
 * Layout as scipy.signal's {@code sos}: row i holds {@code b0 b1 b2 a0 a1 a2} with a0 = 1, section
 * i computing {@code (b0 + b1 z⁻¹ + b2 z⁻²)/(1 + a1 z⁻¹ + a2 z⁻²)}. A first-order section has
 * b2 = a2 = 0. Run it over samples with {@link #newFilter()}.
 *
 * <p>As a {@link FrequencyResponse} it gives the digital filter's magnitude at a frequency in Hz
 * (periodic in the sample rate, mirrored about Nyquist).
 */
public final class SecondOrderSections implements FrequencyResponse {

    private final double[] coeffs; // 6 per section
    private final double sampleRateHz;

    /**
     * @param sections     rows of {@code b0 b1 b2 a0 a1 a2}; each row is divided by its a0
     * @param sampleRateHz the rate the coefficients are for
     */
    public SecondOrderSections(double[][] sections, double sampleRateHz) {
        this.sampleRateHz = Check.positive("sampleRateHz", sampleRateHz);
        if (sections == null || sections.length == 0) {
            throw new IllegalArgumentException("sections must hold at least one section, was "
                    + (sections == null ? "null" : "empty"));
        }
        coeffs = new double[6 * sections.length];
        for (int i = 0; i < sections.length; i++) {
            double[] r = sections[i];
            if (r == null || r.length != 6) {
                throw new IllegalArgumentException("sections[" + i + "] must hold 6 coefficients b0 b1 b2 a0 a1 a2, was "
                        + (r == null ? "null" : r.length + " values"));
            }
            for (int j = 0; j < 6; j++) {
                Check.finite("sections[" + i + "][" + j + "]", r[j]);
            }
            if (r[3] == 0) {
                throw new IllegalArgumentException("sections[" + i + "][3] (a0) must be non-zero, was 0");
            }
            for (int j = 0; j < 6; j++) {
                coeffs[6 * i + j] = r[j] / r[3];
            }
        }
    }

    public int sectionCount() {
        return coeffs.length / 6;
    }

    public double sampleRateHz() {
        return sampleRateHz;
    }

    /** A copy of the coefficients, one row of {@code b0 b1 b2 1 a1 a2} per section. */
    public double[][] toArray() {
        double[][] out = new double[sectionCount()][6];
        for (int i = 0; i < out.length; i++) {
            System.arraycopy(coeffs, 6 * i, out[i], 0, 6);
        }
        return out;
    }

    /** This filter followed by {@code next} (same sample rate): the sections are concatenated. */
    public SecondOrderSections followedBy(SecondOrderSections next) {
        if (next.sampleRateHz != sampleRateHz) {
            throw new IllegalArgumentException("next.sampleRateHz must equal " + sampleRateHz + ", was " + next.sampleRateHz);
        }
        double[][] a = toArray();
        double[][] b = next.toArray();
        double[][] all = new double[a.length + b.length][];
        System.arraycopy(a, 0, all, 0, a.length);
        System.arraycopy(b, 0, all, a.length, b.length);
        return new SecondOrderSections(all, sampleRateHz);
    }

    /** True when every pole lies strictly inside the unit circle. */
    public boolean isStable() {
        for (int i = 0; i < sectionCount(); i++) {
            double a1 = coeffs[6 * i + 4];
            double a2 = coeffs[6 * i + 5];
            // Jury conditions for 1 + a1 z⁻¹ + a2 z⁻²
            if (!(Math.abs(a2) < 1 && Math.abs(a1) < 1 + a2)) {
                return false;
            }
        }
        return true;
    }

    /** The complex response at frequency f (Hz), z = exp(j2πf/fs). */
    public Complex response(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double w = 2 * Math.PI * frequencyHz / sampleRateHz;
        Complex z1 = new Complex(Math.cos(w), -Math.sin(w)); // z⁻¹
        Complex z2 = z1.times(z1);
        Complex h = Complex.ONE;
        for (int i = 0; i < sectionCount(); i++) {
            int o = 6 * i;
            Complex num = Complex.real(coeffs[o]).plus(z1.times(coeffs[o + 1])).plus(z2.times(coeffs[o + 2]));
            Complex den = Complex.ONE.plus(z1.times(coeffs[o + 4])).plus(z2.times(coeffs[o + 5]));
            h = h.times(num.dividedBy(den));
        }
        return h;
    }

    @Override
    public double magnitude(double frequencyHz) {
        return response(frequencyHz).abs();
    }

    @Override
    public double[] landmarksHz(double upToHz) {
        return upToHz >= sampleRateHz / 2 ? new double[] {sampleRateHz / 2} : new double[0];
    }

    /** A fresh streaming filter with zero state. */
    public SosFilter newFilter() {
        return new SosFilter(coeffs);
    }

    double[] coefficientsView() {
        return coeffs;
    }
}
