package org.foldbook.cli;

import org.foldbook.dsp.NumberText;
import org.foldbook.sweep.SimulationMode;

import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Option values typed by a person, parsed by the one parser the workbench uses too ({@link NumberText});
 * picocli puts the option's name in front of the message ("Invalid value for option '--rate': ...").
 */
final class CliValues {
    private CliValues() {
    }

    /** A list of frequencies or rates in Hz (one option value, commas between). */
    record HzList(double[] hz) {
    }

    /** A band of frequencies, 0 &lt;= low &lt; high, in Hz. */
    record BandHz(double low, double high) {
    }

    /** A simulation mode by its word ({@link SimulationMode#word()}). */
    static final class Mode implements ITypeConverter<SimulationMode> {
        @Override
        public SimulationMode convert(String value) {
            try {
                return SimulationMode.ofWord(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A finite number &gt; 0 (rates, frequencies, seconds). */
    static final class Positive implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            try {
                return NumberText.positive("the value", value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A finite number &gt;= 0 (margins in dB). */
    static final class NonNegative implements ITypeConverter<Double> {
        @Override
        public Double convert(String value) {
            try {
                double v = NumberText.finite("the value", value);
                if (v < 0) {
                    throw new IllegalArgumentException("The value must be at least 0, was '" + value.trim() + "'.");
                }
                return v;
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A whole number &gt;= 1 (steps, threads, denominators, channels). */
    static final class AtLeastOne implements ITypeConverter<Integer> {
        @Override
        public Integer convert(String value) {
            try {
                return NumberText.atLeast("the value", value, 1);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** One or more positive numbers separated by commas (or blanks). */
    static final class PositiveList implements ITypeConverter<HzList> {
        @Override
        public HzList convert(String value) {
            try {
                return new HzList(NumberText.positiveList("the value", value));
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A band LO:HI in Hz with 0 &lt;= LO &lt; HI. */
    static final class Band implements ITypeConverter<BandHz> {
        @Override
        public BandHz convert(String value) {
            String[] p = value.split(":");
            if (p.length != 2) {
                throw new TypeConversionException("a band is LO:HI in Hz, was '" + value + "'");
            }
            try {
                double lo = NumberText.finite("the band's low edge", p[0]);
                double hi = NumberText.finite("the band's high edge", p[1]);
                if (!(lo >= 0 && hi > lo)) {
                    throw new TypeConversionException("a band needs 0 <= LO < HI, was '" + value + "'");
                }
                return new BandHz(lo, hi);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }
}
