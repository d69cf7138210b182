package org.foldbook.dsp.spectrum;

import java.util.Objects;

/**
 * An immutable one-sided amplitude spectrum of one block: {@code value(k)} at {@code frequency(k) = k fs / n},
 * {@code k = 0 .. n/2}, in the samples' {@link #unit()} (peak or rms, see {@link #scale()}). A tone on a bin
 * centre reads its amplitude whatever the window (the coherent gain is divided out); off-centre it reads up
 * to the window's scalloping loss less.
 */
public final class AmplitudeSpectrum {
    private final double[] values;
    private final double sampleRate;
    private final int n;
    private final AmplitudeScale scale;
    private final Unit unit;

    AmplitudeSpectrum(double[] values, double sampleRate, int n, AmplitudeScale scale, Unit unit) {
        this.values = values;
        this.sampleRate = sampleRate;
        this.n = n;
        this.scale = scale;
        this.unit = Objects.requireNonNull(unit, "unit");
    }

    public int bins() {
        return values.length;
    }

    public double value(int k) {
        return values[k];
    }

    /** Copy of all values, indexed by bin. */
    public double[] values() {
        return values.clone();
    }

    /** {@code k fs / n} in Hz. */
    public double frequency(int k) {
        return k * sampleRate / n;
    }

    public double binWidth() {
        return sampleRate / n;
    }

    public double sampleRate() {
        return sampleRate;
    }

    /** Block (transform) length n. */
    public int transformLength() {
        return n;
    }

    public AmplitudeScale scale() {
        return scale;
    }

    public Unit unit() {
        return unit;
    }

    /** Label such as {@code V peak} or {@code m/s² rms}. */
    public String valueUnit() {
        return unit.symbol() + (scale == AmplitudeScale.PEAK ? " peak" : " rms");
    }

    /** {@code 20 log10(value(k) / reference)}: dB re {@code reference} (e.g. 1 V rms). */
    public double levelDb(int k, double reference) {
        return Decibels.amplitude(values[k], reference);
    }

    /** All levels in dB re {@code reference}. */
    public double[] levelsDb(double reference) {
        double[] db = new double[values.length];
        for (int k = 0; k < db.length; k++) {
            db[k] = Decibels.amplitude(values[k], reference);
        }
        return db;
    }

    /**
     * A spectrum of volts in the sensor's quantity: values divided by {@code voltsPerUnit}.
     *
     * @throws IllegalArgumentException if this spectrum is not in volts
     */
    public AmplitudeSpectrum inQuantity(Sensitivity sensitivity) {
        if (!unit.equals(Unit.VOLT)) {
            throw new IllegalArgumentException("sensitivity applies to a spectrum in V, this one is in " + unit);
        }
        double[] v = new double[values.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = values[k] / sensitivity.voltsPerUnit();
        }
        return new AmplitudeSpectrum(v, sampleRate, n, scale, sensitivity.quantity());
    }

    @Override
    public String toString() {
        return "AmplitudeSpectrum[n=" + n + ", fs=" + sampleRate + " Hz, " + valueUnit() + "]";
    }
}
