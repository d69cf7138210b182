/**
 * Spectral windows and their figures of merit, computed from the samples.
 *
 * <p>{@link org.foldbook.dsp.window.WindowShape} describes a window independent of its length;
 * {@link org.foldbook.dsp.window.Window} is one sampled form ({@link org.foldbook.dsp.window.Symmetry}
 * periodic for spectra, symmetric for filters) with coherent gain, ENBW, scalloping loss and highest sidelobe.
 */
package org.foldbook.dsp.window;
