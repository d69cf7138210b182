/**
 * Re-sampling a stored recording at an exact rational ratio of its rate, the three ways the
 * stepped-rate simulation needs.
 *
 * <ul>
 * <li>{@link org.foldbook.dsp.resample.RateRatio}: up/down, reduced; {@code nearest(r, maxDen)} is
 *     Python's {@code Fraction(r).limit_denominator(maxDen)} step for step, so grids agree with the scipy
 *     peer exactly.</li>
 * <li>Mode 1, {@link org.foldbook.dsp.resample.BareSampler}: no filter, Kaiser-windowed sinc
 *     (W = 16, β = 10) evaluated at t_m = m·down/up; integer ratios pick samples. Error ≤ −100 dB re a
 *     tone up to 0.39·fs0 (tests: ≤ −100 asserted against exact sin(); the peer measured ≤ −108 dB).</li>
 * <li>Mode 2, {@link org.foldbook.dsp.resample.ModelledChannelResampler} over a
 *     {@link org.foldbook.dsp.resample.ModelledChannel}: the analog filters and a camera exposure with
 *     their true response ({@link org.foldbook.dsp.resample.ExactChainFilter}: frequency domain, overlap-save,
 *     output at 2·fs0, within 0.1 dB above −120 dB over 0..0.49·fs0), a digitizer's digital filter, then a
 *     16-tap Kaiser sinc on the 2·fs0 series ({@link org.foldbook.dsp.resample.BareSampler#forDoubledSeries}:
 *     W = 8, β = 12.2, enough there because the series holds nothing above 0.255 of its rate). With an empty
 *     chain this is the exact bare mode: every component up to 0.49·fs0 within −100 dB. What the source rate cannot honour comes as
 *     {@link org.foldbook.dsp.resample.SimulationWarning}s.</li>
 * <li>Mode 3, {@link org.foldbook.dsp.resample.IdealDecimator}: multi-stage Kaiser polyphase, pass band
 *     to 0.45·fs within 0.001 dB, ≥ 100 dB from fs/2, zero delay.</li>
 * <li>{@link org.foldbook.dsp.resample.KaiserPolyphaseResampler#resamplePolyDefaults}: the filter of
 *     scipy.signal.resample_poly with its defaults, equal to it to rounding, for bin-for-bin comparison
 *     with the peer's filtered mode.</li>
 * </ul>
 *
 * <p>Conventions: output m sits at t_m = m·down/up input samples (every kernel is centred, no delay),
 * m = 0 .. ceil(N·up/down)−1, input taken as zero outside the recording (the first and last ~16 outputs
 * of mode 1, more for the long filters, see that padding). Re-samplers are immutable and thread-safe:
 * each rate's phase table (up phases × taps) is built once, then any number of threads may use it.
 * {@code evaluate(x, first, out, off, count)} computes any output range straight from an array without
 * copying it (a sweep streams outputs into its spectrum block by block);
 * {@link org.foldbook.dsp.resample.Resampler#start} takes the input block by block instead, so memory
 * stays a few blocks whatever the recording's length. Bad arguments raise IllegalArgumentException
 * naming the parameter and value.
 *
 * <p>Cost, multiply-adds: mode 1 32 per output (16 on the 2·fs0 series); resample_poly ≈ 20 per input
 * sample at any ratio; mode 3 about 27 per input sample for strong decimation, ≈ 133 per input sample for ratios in [1/2, 1)
 * (one sharp stage: a 5 % transition at ≥ 100 dB is that long); mode 2 the FIR's length + 15 per
 * output at 2·fs0, plus the exact filter's overlap-save (two FFTs of about four kernel lengths per block,
 * once per recording). The inner loops are plain Java (no incubator vector API): fixed 32- and 16-tap loops
 * ({@code SixteenTapLoops}), several independent sums, and four outputs of one phase per pass so each
 * coefficient is loaded once for four outputs.
 */
package org.foldbook.dsp.resample;
