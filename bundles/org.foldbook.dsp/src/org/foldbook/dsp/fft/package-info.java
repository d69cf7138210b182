/**
 * Real FFTs behind Foldbook's own types; the transform library's packed layout stays inside.
 *
 * <p>Layout everywhere: one-sided, indexed by bin {@code k = 0 .. n/2} (integer division), bin k at
 * {@code k fs / n} Hz; {@code X[k] = sum_j x[j] exp(-2 pi i j k / n)}, unnormalised. Start-up code calls
 * {@link org.foldbook.dsp.fft.RealFft#configureThreads(int)} once.
 */
package org.foldbook.dsp.fft;
