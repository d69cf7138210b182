package org.foldbook.dsp;

/**
 * Argument checks shared by the DSP operators. Every failure is an {@link IllegalArgumentException}
 * whose message names the parameter and the offending value, so a caller (CLI, UI, audit) can show it
 * as it is; no operator lets a bad argument turn into silent NaN output.
 */
public final class Check {
    private Check() {
    }

    /** Requires {@code value > 0} and finite. */
    public static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number > 0, was " + value);
        }
        return value;
    }

    /** Requires {@code value >= 0} and finite. */
    public static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be a finite number >= 0, was " + value);
        }
        return value;
    }

    /** Requires a finite value. */
    public static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, was " + value);
        }
        return value;
    }

    /** Requires {@code value >= min}. */
    public static int atLeast(String name, int value, int min) {
        if (value < min) {
            throw new IllegalArgumentException(name + " must be >= " + min + ", was " + value);
        }
        return value;
    }

    /** Requires {@code lo <= value <= hi}. */
    public static double inRange(String name, double value, double lo, double hi) {
        if (!(value >= lo && value <= hi)) {
            throw new IllegalArgumentException(name + " must lie in [" + lo + ", " + hi + "], was " + value);
        }
        return value;
    }

    /** Requires a non-null, non-empty array whose every element is finite. */
    public static double[] finiteSamples(String name, double[] samples) {
        if (samples == null) {
            throw new IllegalArgumentException(name + " must not be null");
        }
        if (samples.length == 0) {
            throw new IllegalArgumentException(name + " must not be empty");
        }
        for (int i = 0; i < samples.length; i++) {
            if (!Double.isFinite(samples[i])) {
                throw new IllegalArgumentException(name + "[" + i + "] must be finite, was " + samples[i]);
            }
        }
        return samples;
    }

    /** Requires a slice {@code [offset, offset+length)} inside an array of {@code arrayLength}. */
    public static void slice(String name, int arrayLength, int offset, int length) {
        if (offset < 0 || length < 0 || offset > arrayLength - length) {
            throw new IllegalArgumentException(name + ": slice offset " + offset + " length " + length
                    + " lies outside an array of " + arrayLength);
        }
    }
}
