/**
 * Stepped-rate simulation: re-sample a stored high-rate recording at a ladder of lower rates and tell,
 * per spectral peak, what happens to it, with the reason in words.
 *
 * <h2>Pieces</h2>
 * <ul>
 * <li>{@link org.foldbook.sweep.RateLadder}: requested rates (list, linear, geometric) snapped to exact
 * ratios up/down, or a grid file of {@code index up down fs} lines read verbatim;</li>
 * <li>{@link org.foldbook.sweep.SimulationMode}: the one vocabulary of modes (the JSON's {@code mode}, the
 * command line's {@code --mode}, the notebook's stored literal, the workbench's names);
 * {@link org.foldbook.sweep.Resampling}: each mode's operator — bare sampler, the channel's modelled chain,
 * ideal decimator, scipy-resample_poly-compatible — with its |H(f)|²;</li>
 * <li>{@link org.foldbook.sweep.SweepEngine}: fixed thread pool over rates; per rate re-sample →
 * Welch PSD (streamed, {@link org.foldbook.dsp.spectrum.WelchAccumulator}) → peaks → verdicts;</li>
 * <li>{@link org.foldbook.sweep.FoldPreview}: the same verdicts from the source PSD alone, without
 * touching samples;</li>
 * <li>{@link org.foldbook.sweep.VerdictClassifier}: the verdict rules;
 * {@link org.foldbook.sweep.SweepResult}: the immutable result with summaries, JSON and CSV.</li>
 * </ul>
 *
 * <h2>JSON layout ({@code format = "foldbook-sweep"}, {@code version = 1})</h2>
 * <pre>
 * { "format", "version", "mode" (a {@link org.foldbook.sweep.SimulationMode#word() mode word}; preview-WORD from the preview),
 *   "source": { "rate", "samples", "binWidth", "peaks": [ { "id", "frequency", "levelDb" } ],
 *               "summarised": { "count", "belowDb", "highestDb" }, "peakRule" },
 *   "accuracy": { "upToHz" or "upToRateFraction", "levelDb", "statement" },
 *   "warnings": [ { "fromHz", "toHz", "uncertaintyDb" (null: content may be missing), "text" } ],
 *   "rates": [ { "index", "up", "down", "rate", "samples", "binWidth",
 *                "peaks":   [ { "frequency", "levelDb", "verdict", "sourcePeak" (id or null), "gainDb", "reason" } ],
 *                "sources": [ { "sourcePeak", "verdict", "apparentFrequency", "observedFrequency", "gainDb",
 *                               "predictedGainDb", "floorDb", "otherPeak", "otherFrequency", "neededSegment"
 *                               (the last three only when they apply), "reason" } ] } ],
 *   "summary": { "peaks": [ { "sourcePeak", "frequency", "lowestTrueRate", "firstFoldRate" } ],
 *                "band": { "low", "high", "lowestAliasFreeRate" } (only when asked) } }
 * </pre>
 * Frequencies in Hz, rates in S/s, levels in dB re 1 unit²/Hz (PSD density), gains in dB of power per bin
 * relative to the source peak; verdicts are {@code survives, folds, removed, buried, hidden, coincides, splits, at-dc,
 * at-nyquist, missing, unexplained} (see {@link org.foldbook.sweep.Verdict}); a
 * number JSON cannot hold (NaN: not seen, never) is {@code null}.
 */
package org.foldbook.sweep;
