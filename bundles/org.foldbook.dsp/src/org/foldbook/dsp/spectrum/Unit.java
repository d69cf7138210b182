package org.foldbook.dsp.spectrum;

import java.util.Objects;

/**
 * The unit of a signal's samples, e.g. {@code V} or {@code m/s²}; spectra derive theirs from it
 * ({@code V²/Hz}, {@code V rms}). Only a symbol: Foldbook converts between quantities through a
 * {@link Sensitivity}, never by unit algebra.
 *
 * @param symbol non-blank printable symbol
 */
public record Unit(String symbol) {
    /** Volt, the unit of digitised voltage. */
    public static final Unit VOLT = new Unit("V");
    /** Metre per second squared (acceleration). */
    public static final Unit METRE_PER_SECOND_SQUARED = new Unit("m/s²");
    /** Pascal (sound pressure). */
    public static final Unit PASCAL = new Unit("Pa");
    /** Digitizer full scale, for normalised samples in [-1, 1]. */
    public static final Unit FULL_SCALE = new Unit("FS");

    public Unit {
        Objects.requireNonNull(symbol, "symbol");
        if (symbol.isBlank()) {
            throw new IllegalArgumentException("unit symbol must not be blank, was '" + symbol + "'");
        }
    }

    /** A unit by symbol. */
    public static Unit of(String symbol) {
        return new Unit(symbol);
    }

    /** The squared unit, e.g. {@code V²} or {@code (m/s²)²}. */
    public String squared() {
        return (symbol.matches("[A-Za-z]+") ? symbol : "(" + symbol + ")") + "²";
    }

    @Override
    public String toString() {
        return symbol;
    }
}
