/**
 * Calibrated amplitude spectra and Welch power spectral densities.
 *
 * <p>All spectra are one-sided, bins {@code k = 0 .. n/2} at {@code k fs / n} Hz, n the block or segment
 * length; doubled bins are {@code 1 .. (n-1)/2}, DC and (even n) Nyquist are not. Values are in the unit of
 * the samples ({@link org.foldbook.dsp.spectrum.Unit}), converted to a physical quantity through a
 * {@link org.foldbook.dsp.spectrum.Sensitivity}; levels are dB re a stated reference. Operators are
 * immutable; their {@code ...Into} methods allocate nothing and take per-thread scratch.
 */
package org.foldbook.dsp.spectrum;
