/** Spectral windows and their figures of merit, computed from the samples. */
package org.foldbook.dsp.window;
