/**
 * Fold arithmetic: where sampled tones appear and where an observed one may have come from.
 * {@link org.foldbook.dsp.fold.Folding} (apparent frequency, signed and unsigned; Nyquist zones; the
 * inverse), {@link org.foldbook.dsp.fold.FoldMap} (apparent frequency against rate with the exact
 * vertices, for charts) and {@link org.foldbook.dsp.fold.RotationSeenByCamera} (a rotating pattern
 * filmed at a frame rate). All frequencies in Hz, rates in samples (frames) per second.
 */
package org.foldbook.dsp.fold;
