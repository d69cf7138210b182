package org.foldbook.dsp.spectrum;

import java.util.Objects;

/**
 * An immutable one-sided power estimate: {@code value(k)} at {@code frequency(k) = k fs / n} for
 * {@code k = 0 .. n/2}, where n is the segment (transform) length. Density values are in {@code unit²/Hz},
 * spectrum values in {@code unit²}; bins other than DC and (even n) Nyquist carry the power of both
 * positive and negative frequencies.
 */
public final class PowerSpectrum {
    private final double[] values;
    private final double sampleRate;
    private final int transformLength;
    private final PsdScaling scaling;
    private final Unit unit;
    private final int segments;
    private final double enbwBins;

    PowerSpectrum(double[] values, double sampleRate, int transformLength, PsdScaling scaling, Unit unit,
            int segments, double enbwBins) {
        this.values = values;
        this.sampleRate = sampleRate;
        this.transformLength = transformLength;
        this.scaling = scaling;
        this.unit = Objects.requireNonNull(unit, "unit");
        this.segments = segments;
        this.enbwBins = enbwBins;
    }

    /** Number of bins, {@code n/2 + 1}. */
    public int bins() {
        return values.length;
    }

    /** The estimate at bin k. */
    public double value(int k) {
        return values[k];
    }

    /** A copy of all values, indexed by bin. */
    public double[] values() {
        return values.clone();
    }

    /** {@code k fs / n} in Hz. */
    public double frequency(int k) {
        return k * sampleRate / transformLength;
    }

    /** Bin spacing {@code fs / n} in Hz. */
    public double binWidth() {
        return sampleRate / transformLength;
    }

    public double sampleRate() {
        return sampleRate;
    }

    /** Segment length n. */
    public int transformLength() {
        return transformLength;
    }

    public PsdScaling scaling() {
        return scaling;
    }

    /** Unit of the samples the estimate came from. */
    public Unit unit() {
        return unit;
    }

    /** Label of the values' unit, e.g. {@code V²/Hz}. */
    public String valueUnit() {
        return scaling == PsdScaling.DENSITY ? unit.squared() + "/Hz" : unit.squared();
    }

    /** Number of segments averaged. */
    public int segments() {
        return segments;
    }

    /** Equivalent noise bandwidth of the window used, in bins. */
    public double enbwBins() {
        return enbwBins;
    }

    /** {@code 10 log10(max(value(k), 1e-300) / reference)}: dB re {@code reference} in {@link #valueUnit()}. */
    public double levelDb(int k, double reference) {
        return Decibels.power(values[k], reference);
    }

    /** All levels in dB re {@code reference} (e.g. 1 V²/Hz). */
    public double[] levelsDb(double reference) {
        double[] db = new double[values.length];
        for (int k = 0; k < db.length; k++) {
            db[k] = Decibels.power(values[k], reference);
        }
        return db;
    }

    /**
     * Total power: for a density, {@code sum(value) * fs / n} (the rectangle rule; Parseval: the mean square
     * of the detrended signal); for a power spectrum, {@code sum(value) / ENBW} (the same quantity).
     */
    public double totalPower() {
        double s = 0;
        for (double v : values) {
            s += v;
        }
        return scaling == PsdScaling.DENSITY ? s * binWidth() : s / enbwBins;
    }

    /** The same estimate as a density (unit²/Hz): power spectrum divided by {@code ENBW fs / n}. */
    public PowerSpectrum toDensity() {
        if (scaling == PsdScaling.DENSITY) {
            return this;
        }
        return rescaled(1.0 / (enbwBins * binWidth()), PsdScaling.DENSITY, unit);
    }

    /** The same estimate as a power spectrum (unit²): density times {@code ENBW fs / n}. */
    public PowerSpectrum toSpectrum() {
        if (scaling == PsdScaling.SPECTRUM) {
            return this;
        }
        return rescaled(enbwBins * binWidth(), PsdScaling.SPECTRUM, unit);
    }

    /**
     * A spectrum of volts expressed in the sensor's quantity: values divided by {@code voltsPerUnit^2}.
     *
     * @throws IllegalArgumentException if this spectrum is not in volts
     */
    public PowerSpectrum inQuantity(Sensitivity sensitivity) {
        if (!unit.equals(Unit.VOLT)) {
            throw new IllegalArgumentException("sensitivity applies to a spectrum in V, this one is in " + unit);
        }
        double s = sensitivity.voltsPerUnit();
        return rescaled(1.0 / (s * s), scaling, sensitivity.quantity());
    }

    private PowerSpectrum rescaled(double factor, PsdScaling newScaling, Unit newUnit) {
        double[] v = new double[values.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = values[k] * factor;
        }
        return new PowerSpectrum(v, sampleRate, transformLength, newScaling, newUnit, segments, enbwBins);
    }

    @Override
    public String toString() {
        return "PowerSpectrum[" + scaling + ", n=" + transformLength + ", fs=" + sampleRate + " Hz, "
                + segments + " segments, " + valueUnit() + "]";
    }
}
