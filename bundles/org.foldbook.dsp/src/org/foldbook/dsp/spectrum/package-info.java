/** Calibrated amplitude spectra and Welch power spectral densities. */
package org.foldbook.dsp.spectrum;
