/** Peak detection over spectra: prominence, noise floor, sub-bin estimates. */
package org.foldbook.dsp.peaks;
