/**
 * Peak detection over spectra: prominence ({@code scipy.signal.find_peaks} rules), running-median noise
 * floor, minimum separation, sub-bin estimates of frequency and level. Input is a spectrum in dB (or a power
 * array converted to dB); results are immutable {@link org.foldbook.dsp.peaks.SpectralPeak} values.
 */
package org.foldbook.dsp.peaks;
