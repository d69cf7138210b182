package org.foldbook.model.validation;

/**
 * Compares unit strings as people type them: spaces do not count, "²"/"³" equal "^2"/"^3", "**"
 * equals "^", and the micro signs µ (U+00B5), μ (U+03BC) and u are one. Case counts (mV is not MV).
 * A textual comparison, not a unit algebra: "m/s^2" and "m s^-2" stay different.
 */
public final class UnitText {

    private UnitText() {
    }

    public static boolean sameUnit(String a, String b) {
        return normalise(a).equals(normalise(b));
    }

    static String normalise(String unit) {
        return unit.replaceAll("\\s+", "")
                .replace('\u00B5', 'u').replace('\u03BC', 'u')
                .replace("\u00B2", "^2").replace("\u00B3", "^3")
                .replace("**", "^");
    }
}
