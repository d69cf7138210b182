package org.foldbook.dsp.resample;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * Mode 2, "through the channel's own modelled filter":
 * <ol>
 * <li>the analog filters and the camera exposure with their true response, magnitude and phase
 *     ({@link ExactChainFilter}: frequency domain, output at 2·fs0, within 0.1 dB of the model wherever it
 *     is above −120 dB over 0..0.49·fs0);</li>
 * <li>the digitizer's digital filter: a Kaiser low-pass FIR ({@link KaiserLowPass}) at 2·fs0 with the
 *     data sheet's pass/stop edges times the new rate fs and its attenuation — a design that meets the
 *     mask, which is all a data sheet states;</li>
 * </ol>
 * then sampled bare at t_m = m·down/up source samples from the 2·fs0 series by the 16-tap kernel made for
 * it ({@link BareSampler#forDoubledSeries}: flat to 0.245 of the series' rate, i.e. 0.49·fs0, images of
 * anything below 0.255 of it rejected by ≥ 118 dB). Step 2 is linear and time-invariant like the
 * interpolation, so it is folded into the sampler's phase table (taps = FIR length + 15): only the kept
 * instants are computed.
 *
 * <p>With {@link AnalogStage#ALREADY_APPLIED} the input is already {@link ExactChainFilter#apply}'s 2·fs0
 * series (a sweep filters the recording once for all rates), so {@link #outputLength} counts 2·fs0 inputs.
 * What cannot be honoured is stated in {@link #warnings()}. Immutable and thread-safe.
 */
public final class ModelledChannelResampler implements RandomAccessResampler {

    /** Whether step 1 runs here or the caller has already run {@link ExactChainFilter} (once for all rates). */
    public enum AnalogStage {
        RUN_HERE, ALREADY_APPLIED
    }

    private final RateRatio ratio;
    private final RateRatio fromDoubled;          // the ratio against the 2·fs0 series
    private final double sourceRate;
    private final ModelledChannel channel;
    private final ExactChainFilter exact;         // null: already applied
    private final double[] fir;                   // digitizer FIR at 2·fs0, symmetric, odd length ({1}: none)
    private final KaiserLowPass digitizerFir;     // null: none
    private final boolean digitizerClamped;
    private final PolyphaseKernel kernel;         // null: integer picking from the 2·fs0 series
    private final List<SimulationWarning> warnings;

    private ModelledChannelResampler(RateRatio ratio, double sourceRate, ModelledChannel channel, AnalogStage stage) {
        this.ratio = Objects.requireNonNull(ratio, "ratio");
        this.sourceRate = Check.positive("sourceRate", sourceRate);
        this.channel = Objects.requireNonNull(channel, "channel");
        Objects.requireNonNull(stage, "stage");
        this.fromDoubled = RateRatio.of(ratio.up(), ExactChainFilter.FACTOR * ratio.down());
        this.exact = stage == AnalogStage.RUN_HERE ? ExactChainFilter.of(channel, sourceRate) : null;
        double newRate = ratio.effectiveRate(sourceRate);
        double rate2 = ExactChainFilter.FACTOR * sourceRate;
        double[] c = {1.0};
        KaiserLowPass dig = null;
        boolean clamped = false;
        List<SimulationWarning> w = new ArrayList<>(exact == null ? List.of() : exact.warnings());
        ModelledChannel.DigitizerFilter df = channel.digitizerFilter();
        if (df != null && df.passFraction() * newRate < SourceBandTaper.END * sourceRate) {
            double stop = df.stopFraction() * newRate;
            clamped = stop > rate2 / 2;
            dig = KaiserLowPass.design(rate2, df.passFraction() * newRate, Math.min(stop, rate2 / 2), df.attenuationDb());
            c = dig.coefficientsShared();
            if (clamped) {
                w.add(new SimulationWarning(rate2 / 2, stop, Double.POSITIVE_INFINITY, String.format(Locale.ROOT,
                        "the digitizer filter's stop edge %.6g Hz lies above the simulation's %.6g Hz: its transition "
                                + "is realised steeper than stated", stop, rate2 / 2)));
            }
        }
        this.digitizerFir = dig;
        this.digitizerClamped = clamped;
        this.fir = c;
        this.kernel = combinedKernel(fromDoubled, c);
        this.warnings = List.copyOf(w);
    }

    /** Mode 2 for {@code ratio}, with every part of {@code channel} applied here. */
    public static ModelledChannelResampler of(RateRatio ratio, double sourceRate, ModelledChannel channel) {
        return new ModelledChannelResampler(ratio, sourceRate, channel, AnalogStage.RUN_HERE);
    }

    /**
     * Mode 2 for {@code ratio}; with {@link AnalogStage#ALREADY_APPLIED} the input must be
     * {@link ExactChainFilter#apply} of the recording (2·fs0), the analog filters and exposure still count in
     * {@link #magnitude}.
     */
    public static ModelledChannelResampler of(RateRatio ratio, double sourceRate, ModelledChannel channel,
            AnalogStage stage) {
        return new ModelledChannelResampler(ratio, sourceRate, channel, stage);
    }

    /**
     * Phase table of "FIR c at 2·fs0, then the bare kernel": for output m with b = floor(t_m), f = frac(t_m),
     * y = Σ_i v[b + i0 + i]·G_f[i], G_f[i] = Σ_j c[j]·h(i0 + i + j − C − f); null for integer picking.
     */
    private static PolyphaseKernel combinedKernel(RateRatio ratio, double[] c) {
        int w = BareSampler.DOUBLED_HALF_WIDTH;
        KaiserSinc h = new KaiserSinc(w, BareSampler.DOUBLED_BETA);
        PolyphaseKernel bare = BareSampler.forDoubledSeries(ratio).kernel();   // null for up = 1
        if (c.length == 1) {
            return bare;                                                 // nothing to fold in
        }
        int up = BareSampler.phaseCount(ratio);
        int down = BareSampler.intDown(ratio);
        int centre = c.length / 2;
        int taps = 2 * w + c.length - 1;
        int offset = -w + 1 - centre;
        if ((long) up * taps > PolyphaseKernel.MAX_TABLE) {
            throw new IllegalArgumentException("ratio " + ratio + " with a " + c.length + "-tap digitizer filter needs "
                    + up + " x " + taps + " coefficients, more than " + PolyphaseKernel.MAX_TABLE);
        }
        double[] table = new double[up * taps];
        double[] hk = new double[2 * w];
        for (int p = 0; p < up; p++) {
            double f = (double) p / up;
            for (int k = 0; k < 2 * w; k++) {
                // bare kernel tap for v[b + k - w + 1] (the sampler's own table, so an empty model is mode 1)
                hk[k] = bare != null ? bare.coefficient(p, k) : h.value((-w + 1 + k) - f);
            }
            int row = p * taps;
            // v[b + kk] = Σ_j c[j]·x[b + kk − (j − C)]; kk = k − w + 1, x index offset i' = kk − j + C
            for (int k = 0; k < 2 * w; k++) {
                double hv = hk[k];
                if (hv == 0) {
                    continue;
                }
                for (int j = 0; j < c.length; j++) {
                    int ix = (k - w + 1) - j + centre - offset;     // table column
                    table[row + ix] += hv * c[j];
                }
            }
        }
        return new PolyphaseKernel(up, down, taps, offset, table);
    }

    @Override
    public RateRatio ratio() {
        return ratio;
    }

    /** Outputs for {@code inputLength} inputs: source samples when run here, 2·fs0 samples when already applied. */
    @Override
    public long outputLength(long inputLength) {
        return exact != null ? ratio.outputLength(inputLength) : fromDoubled.outputLength(inputLength);
    }

    public double sourceRate() {
        return sourceRate;
    }

    public ModelledChannel channel() {
        return channel;
    }

    /** Taps per output at 2·fs0: 16 for the bare kernel plus the digitizer FIR's length minus one. */
    public int tapsPerOutput() {
        return kernel == null ? 1 : kernel.taps();
    }

    /** True when the digitizer filter's stop edge was above fs0 (the 2·fs0 Nyquist) and had to be moved down. */
    public boolean digitizerFilterClamped() {
        return digitizerClamped;
    }

    /** True for {@link AnalogStage#ALREADY_APPLIED}: the input is {@link ExactChainFilter#apply}'s 2·fs0 series. */
    public boolean takesPrepared() {
        return exact == null;
    }

    /** Random access works on the prepared 2·fs0 series only. */
    @Override
    public boolean offersRandomAccess() {
        return takesPrepared();
    }

    /** Up to this frequency (0.49·fs0) the simulated chain is the modelled one (see {@link ExactChainFilter}). */
    public double exactUpToHz() {
        return ExactChainFilter.EXACT_UP_TO_FRACTION * sourceRate;
    }

    /** What this simulation cannot honour (the exact filter's limits when run here, the digitizer filter's). */
    public List<SimulationWarning> warnings() {
        return warnings;
    }

    /**
     * |H(f)| that source content at {@code frequencyHz} gets before it is sampled: the analog models and the
     * exposure's sinc, the source-band edge, and the realised digitizer FIR.
     */
    public double magnitude(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double m = ExactChainFilter.chainResponse(channel, frequencyHz).abs()
                * ExactChainFilter.sourceBandEdge(frequencyHz, sourceRate);
        return m * Math.abs(KaiserLowPass.amplitude(fir, frequencyHz / (ExactChainFilter.FACTOR * sourceRate)));
    }

    /** |H(f)| of the realised digitizer FIR alone (1 when there is none). */
    public double digitizerMagnitude(double frequencyHz) {
        return digitizerFir == null ? 1.0 : digitizerFir.magnitude(frequencyHz);
    }

    @Override
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        long total = outputLength(samples.length);
        if (total > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " inputs give " + total
                    + " outputs, too many for one array; use start(sink)");
        }
        double[] out = new double[(int) total];
        if (exact == null) {
            evaluate(samples, 0, out, 0, out.length);
            return out;
        }
        int[] pos = {0};
        ResampleRun run = start((b, o, l) -> {
            System.arraycopy(b, o, out, pos[0], l);
            pos[0] += l;
        });
        run.push(samples, 0, samples.length);
        run.finish();
        return out;
    }

    /**
     * Random access into the outputs from an {@link AnalogStage#ALREADY_APPLIED} 2·fs0 series (as
     * {@link BareSampler#evaluate}); outputs {@code first .. first+count-1} go to {@code out[outOffset..]}.
     */
    @Override
    public void evaluate(double[] doubled, long first, double[] out, int outOffset, int count) {
        if (exact != null) {
            throw new IllegalStateException("evaluate needs the 2·fs0 series of AnalogStage.ALREADY_APPLIED");
        }
        if (doubled == null) {
            throw new IllegalArgumentException("doubled must not be null");
        }
        long total = fromDoubled.outputLength(doubled.length);
        if (first < 0 || count < 0 || first > total - count) {
            throw new IllegalArgumentException("output range " + first + " + " + count + " outside [0, " + total + ")");
        }
        Check.slice("out", out.length, outOffset, count);
        if (kernel == null) {
            long step = fromDoubled.down();
            for (int i = 0; i < count; i++) {
                out[outOffset + i] = doubled[(int) ((first + i) * step)];
            }
        } else {
            kernel.evaluate(doubled, doubled.length, first, out, outOffset, count);
        }
    }

    @Override
    public ResampleRun start(SampleSink sink) {
        ResampleRun sampler = kernel == null ? new PickRun((int) fromDoubled.down(), sink) : new PolyphaseRun(kernel, sink);
        return exact == null ? sampler : new ExactThenSample(exact, sampler);
    }

    /** The exact filter's 2·fs0 outputs streamed straight into the sampler. */
    private static final class ExactThenSample implements ResampleRun {
        private final ResampleRun filter;
        private final ResampleRun sampler;

        ExactThenSample(ExactChainFilter exact, ResampleRun sampler) {
            this.sampler = sampler;
            this.filter = exact.start(sampler::push);
        }

        @Override
        public void push(double[] samples, int offset, int length) {
            filter.push(samples, offset, length);
        }

        @Override
        public void finish() {
            filter.finish();
            sampler.finish();
        }

        @Override
        public long inputCount() {
            return filter.inputCount();
        }

        @Override
        public long outputCount() {
            return sampler.outputCount();
        }
    }
}
