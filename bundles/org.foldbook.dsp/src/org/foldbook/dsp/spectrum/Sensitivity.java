package org.foldbook.dsp.spectrum;

import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * A sensor's (or a whole chain's) sensitivity: output volts per unit of the measured quantity, e.g. an
 * accelerometer of 100 mV/(m/s²) is {@code Sensitivity.millivoltsPer(100, Unit.METRE_PER_SECOND_SQUARED)}.
 * A value in volts divided by {@link #voltsPerUnit()} is a value of the quantity; a power or PSD is
 * divided by its square.
 *
 * @param voltsPerUnit finite, > 0
 * @param quantity     unit of the measured quantity
 */
public record Sensitivity(double voltsPerUnit, Unit quantity) {
    public Sensitivity {
        Check.positive("voltsPerUnit", voltsPerUnit);
        Objects.requireNonNull(quantity, "quantity");
    }

    /** From a data-sheet figure in mV per unit. */
    public static Sensitivity millivoltsPer(double millivolts, Unit quantity) {
        Check.positive("millivolts", millivolts);
        return new Sensitivity(millivolts / 1000.0, quantity);
    }

    /** {@code volts / voltsPerUnit}. */
    public double toQuantity(double volts) {
        return volts / voltsPerUnit;
    }
}
