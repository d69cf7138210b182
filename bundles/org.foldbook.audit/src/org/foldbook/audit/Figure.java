package org.foldbook.audit;

/**
 * One number a finding rests on, kept as a number (for scripts and tests) with its unit.
 *
 * @param name  a stable lower-camel name ("clippedSamples", "offsetDbfs")
 * @param value the value; NaN when it could not be computed
 * @param unit  "Hz", "dB", "dBFS", "samples", "bits", "s", "" for a plain count or ratio
 */
public record Figure(String name, double value, String unit) {
}
