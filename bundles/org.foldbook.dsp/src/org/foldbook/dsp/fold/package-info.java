/** Fold arithmetic: apparent frequency, Nyquist zones, fold maps, rotating patterns seen by a camera. */
package org.foldbook.dsp.fold;
