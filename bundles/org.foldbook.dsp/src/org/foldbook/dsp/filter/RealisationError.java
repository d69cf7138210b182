package org.foldbook.dsp.filter;

/**
 * How far a digital realisation departs from its analog model over [0, upToHz].
 *
 * @param maxErrorDb largest |attenuation difference| in dB
 * @param atHz       where it occurs
 * @param upToHz     the band that was compared
 */
public record RealisationError(double maxErrorDb, double atHz, double upToHz) {
}
