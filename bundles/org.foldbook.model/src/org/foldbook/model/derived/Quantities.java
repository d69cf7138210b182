package org.foldbook.model.derived;

import java.util.Locale;

/**
 * How Foldbook writes a quantity for people — in the workbench, the reports and the command line alike:
 * four significant digits, kHz above 1000 Hz, kS/s above 1000 S/s, dB to a tenth.
 */
public final class Quantities {

    private Quantities() {
    }

    /** "12.8 kHz", "906.5 Hz"; "?" for NaN. */
    public static String hz(double value) {
        if (Double.isNaN(value)) {
            return "?";
        }
        return Math.abs(value) >= 1000 ? number(value / 1000) + " kHz" : number(value) + " Hz";
    }

    /** "25.6 kS/s"; "?" for NaN. */
    public static String rate(double value) {
        if (Double.isNaN(value)) {
            return "?";
        }
        return Math.abs(value) >= 1000 ? number(value / 1000) + " kS/s" : number(value) + " S/s";
    }

    /** "9.1 dB", "∞ dB". */
    public static String db(double value) {
        return Double.isInfinite(value) ? "∞ dB" : String.format(Locale.ROOT, "%.1f dB", value);
    }

    /** "+3.0 dB", "−12.5 dB" (sign always shown). */
    public static String signedDb(double value) {
        return String.format(Locale.ROOT, "%+.1f dB", value);
    }

    /** "0.8 ms". */
    public static String ms(double seconds) {
        return number(seconds * 1000) + " ms";
    }

    /** A value for an input field, in full: 25600, 10000, 0.0008 (no exponent, no trailing zeros). */
    public static String plain(double value) {
        if (!Double.isFinite(value)) {
            return "";
        }
        return new java.math.BigDecimal(Double.toString(value)).stripTrailingZeros().toPlainString();
    }

    /** Up to four significant digits, no trailing zeros: 12.8, 906.5, 0.8, 25.6. */
    public static String number(double value) {
        String s = String.format(Locale.ROOT, "%.4g", value);
        if (s.contains("e")) {
            return s;
        }
        if (s.contains(".")) {
            s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return s;
    }
}
