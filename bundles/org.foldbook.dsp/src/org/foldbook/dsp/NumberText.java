package org.foldbook.dsp;

import java.util.ArrayList;
import java.util.List;

/**
 * Numbers typed by a person (a workbench field, a command-line option): one parser and one wording of
 * its errors for every front end. Accepts the typographic minus (U+2212) and surrounding blanks; every
 * failure is an {@link IllegalArgumentException} whose message names what was asked for and quotes the
 * text, ready to show as it is.
 */
public final class NumberText {

    private NumberText() {
    }

    /** A finite number; {@code what} names it in the message ("sampling rate", "--to"). */
    public static double finite(String what, String text) {
        String t = text == null ? "" : text.trim().replace('\u2212', '-');
        double v;
        try {
            v = Double.parseDouble(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(capital(what) + " is not a number: '" + t + "'.");
        }
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException(capital(what) + " must be a finite number, was '" + t + "'.");
        }
        return v;
    }

    /** A finite number &gt; 0. */
    public static double positive(String what, String text) {
        double v = finite(what, text);
        if (!(v > 0)) {
            throw new IllegalArgumentException(capital(what) + " must be a positive number, was '"
                    + text.trim() + "'.");
        }
        return v;
    }

    /** A whole number &gt;= {@code min}. */
    public static int atLeast(String what, String text, int min) {
        String t = text == null ? "" : text.trim().replace('\u2212', '-');
        int v;
        try {
            v = Integer.parseInt(t);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(capital(what) + " is not a whole number: '" + t + "'.");
        }
        if (v < min) {
            throw new IllegalArgumentException(capital(what) + " must be at least " + min + ", was '" + t + "'.");
        }
        return v;
    }

    /** One or more positive numbers separated by commas, semicolons or blanks. */
    public static double[] positiveList(String what, String text) {
        List<Double> values = new ArrayList<>();
        for (String s : (text == null ? "" : text).split("[,;\\s]+")) {
            if (!s.isBlank()) {
                values.add(positive(what + " '" + s + "'", s));
            }
        }
        if (values.isEmpty()) {
            throw new IllegalArgumentException(capital(what) + ": enter at least one number.");
        }
        return values.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static String capital(String what) {
        return what.isEmpty() ? what : Character.toUpperCase(what.charAt(0)) + what.substring(1);
    }
}
