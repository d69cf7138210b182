package org.foldbook.dsp.resample;

import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.filter.DigitalRealisation;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.filter.SecondOrderSections;
import org.foldbook.dsp.filter.SosFilter;

/**
 * Mode 2, "through the channel's own modelled filter": at the source rate fs0 the recording goes through
 * <ol>
 * <li>the analog filters, realised by the filter package ({@link DigitalRealisation}: bilinear, pre-warped
 *     at each cutoff, second-order sections run block by block);</li>
 * <li>the digitizer's digital filter: a Kaiser low-pass FIR at fs0 ({@link KaiserLowPass}) with the
 *     data sheet's pass/stop edges times the new rate fs and its attenuation;</li>
 * <li>the camera exposure: the average over T·fs0 source samples centred on the frame instant, the
 *     two end samples weighted by the fraction of their sample interval inside the exposure;</li>
 * </ol>
 * then is sampled bare ({@link BareSampler}'s kernel) at t_m = m·down/up. Steps 2 and 3 are linear
 * and time-invariant like the interpolation, so they are folded into the sampler's phase table
 * (taps = FIR length + 31): only the kept instants are computed, never the filtered recording.
 *
 * <p><b>Validity.</b> The model is only as good as the source rate's headroom above the filters:
 * <ul>
 * <li>the analog realisation follows the model closely only well below fs0/2 (see
 *     {@link DigitalRealisation}); {@link #analogFaithfulUpToHz(double)} gives the band where it stays
 *     within a tolerance. Content the real filter would pass near or above fs0/2 was never recorded;</li>
 * <li>a digitizer filter whose stop edge lies above fs0/2 is realised with its stop edge at fs0/2 (the
 *     source has nothing above it, but the transition is then steeper than the real one);</li>
 * <li>the exposure sum approximates the integral of the band-limited signal: its response is
 *     sin(πfT)/(πfT) within a relative (πf/fs0)²/3 (0.003 dB at 0.01·fs0, 0.07 dB at 0.05·fs0);</li>
 * <li>the sampler's own error (below −100 dB up to 0.39·fs0) and the edges (zero padding) as in mode 1.</li>
 * </ul>
 * Immutable and thread-safe; the analog filter state lives in each {@link ResampleRun}.
 */
public final class ModelledChannelResampler implements Resampler {

    /** Whether step 1 runs here or the caller has already filtered the recording (once for all rates). */
    public enum AnalogStage {
        RUN_HERE, ALREADY_APPLIED
    }

    private final RateRatio ratio;
    private final double sourceRate;
    private final ModelledChannel channel;
    private final SecondOrderSections analog;     // null: none or already applied
    private final double[] fir;                   // combined digitizer FIR ∗ exposure, symmetric, odd length
    private final KaiserLowPass digitizerFir;     // null: none
    private final boolean digitizerClamped;
    private final PolyphaseKernel kernel;

    private ModelledChannelResampler(RateRatio ratio, double sourceRate, ModelledChannel channel, AnalogStage stage) {
        this.ratio = Objects.requireNonNull(ratio, "ratio");
        this.sourceRate = Check.positive("sourceRate", sourceRate);
        this.channel = Objects.requireNonNull(channel, "channel");
        Objects.requireNonNull(stage, "stage");
        this.analog = stage == AnalogStage.RUN_HERE && !channel.analogFilters().isEmpty()
                ? DigitalRealisation.of(channel.analogFilters(), sourceRate) : null;
        double newRate = ratio.effectiveRate(sourceRate);
        double[] c = {1.0};
        KaiserLowPass dig = null;
        boolean clamped = false;
        ModelledChannel.DigitizerFilter df = channel.digitizerFilter();
        if (df != null && df.passFraction() * newRate < sourceRate / 2) {
            double stop = df.stopFraction() * newRate;
            clamped = stop > sourceRate / 2;
            dig = KaiserLowPass.design(sourceRate, df.passFraction() * newRate, Math.min(stop, sourceRate / 2),
                    df.attenuationDb());
            c = dig.coefficientsShared();
        }
        this.digitizerFir = dig;
        this.digitizerClamped = clamped;
        if (channel.exposureSeconds() > 0) {
            c = convolve(c, exposureWeights(channel.exposureSeconds() * sourceRate));
        }
        this.fir = c;
        this.kernel = combinedKernel(ratio, c);
    }

    /** Mode 2 for {@code ratio}, with every part of {@code channel} applied here. */
    public static ModelledChannelResampler of(RateRatio ratio, double sourceRate, ModelledChannel channel) {
        return new ModelledChannelResampler(ratio, sourceRate, channel, AnalogStage.RUN_HERE);
    }

    /**
     * Mode 2 for {@code ratio}; with {@link AnalogStage#ALREADY_APPLIED} the analog filters are left out
     * (the caller ran them once over the recording, e.g. for a whole sweep) but still count in
     * {@link #magnitude}.
     */
    public static ModelledChannelResampler of(RateRatio ratio, double sourceRate, ModelledChannel channel,
            AnalogStage stage) {
        return new ModelledChannelResampler(ratio, sourceRate, channel, stage);
    }

    /**
     * Box-car weights for an exposure of {@code len} source samples centred on sample 0: sample n stands
     * for [n − ½, n + ½) and gets the overlap of that interval with [−len/2, len/2], divided by len.
     */
    static double[] exposureWeights(double len) {
        Check.positive("exposure length in samples", len);
        if (len > PolyphaseKernel.MAX_TABLE / 64) {
            throw new IllegalArgumentException("exposure of " + len + " source samples is too long to simulate");
        }
        int half = (int) Math.ceil(len / 2 - 0.5);
        double[] w = new double[2 * half + 1];
        for (int n = -half; n <= half; n++) {
            double lo = Math.max(n - 0.5, -len / 2);
            double hi = Math.min(n + 0.5, len / 2);
            w[n + half] = Math.max(0, hi - lo) / len;
        }
        return w;
    }

    static double[] convolve(double[] a, double[] b) {
        double[] c = new double[a.length + b.length - 1];
        for (int i = 0; i < a.length; i++) {
            for (int j = 0; j < b.length; j++) {
                c[i + j] += a[i] * b[j];
            }
        }
        return c;
    }

    /**
     * Phase table of "FIR c at the source rate, then the bare kernel": for output m with b = floor(t_m),
     * f = frac(t_m), y = Σ_i x[b + i0 + i]·G_f[i], G_f[i] = Σ_j c[j]·h(i0 + i + j − C − f).
     */
    private static PolyphaseKernel combinedKernel(RateRatio ratio, double[] c) {
        int w = BareSampler.DEFAULT_HALF_WIDTH;
        KaiserSinc h = new KaiserSinc(w, BareSampler.DEFAULT_BETA);
        PolyphaseKernel bare = BareSampler.of(ratio).kernel();          // null for up = 1
        if (c.length == 1 && bare != null) {
            return bare;                                                 // nothing to fold in
        }
        int up = BareSampler.phaseCount(ratio);
        int down = BareSampler.intDown(ratio);
        int centre = c.length / 2;
        int taps = 2 * w + c.length - 1;
        int offset = -w + 1 - centre;
        if ((long) up * taps > PolyphaseKernel.MAX_TABLE) {
            throw new IllegalArgumentException("ratio " + ratio + " with a " + c.length + "-tap source-rate filter needs "
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

    public double sourceRate() {
        return sourceRate;
    }

    public ModelledChannel channel() {
        return channel;
    }

    /** Taps per output: 32 for the bare kernel plus the source-rate FIR's length minus one. */
    public int tapsPerOutput() {
        return kernel.taps();
    }

    /** True when the digitizer filter's stop edge was above fs0/2 and had to be moved down to it. */
    public boolean digitizerFilterClamped() {
        return digitizerClamped;
    }

    /**
     * The band (Hz) up to which the analog filters' realisation at the source rate stays within
     * {@code toleranceDb} of their models ({@link DigitalRealisation#faithfulUpToHz}); fs0/2 if there are none.
     */
    public double analogFaithfulUpToHz(double toleranceDb) {
        if (channel.analogFilters().isEmpty()) {
            return sourceRate / 2;
        }
        SecondOrderSections sos = analog != null ? analog : DigitalRealisation.of(channel.analogFilters(), sourceRate);
        FrequencyResponse model = f -> {
            double m = 1;
            for (var a : channel.analogFilters()) {
                m *= a.magnitude(f);
            }
            return m;
        };
        return DigitalRealisation.faithfulUpToHz(model, sos, toleranceDb);
    }

    /**
     * |H(f)| that source content at {@code frequencyHz} gets before it is sampled: the analog models (not
     * their realisation) times the realised digitizer FIR and exposure sum. The bare kernel's own roll-off
     * above 0.39·fs0 is not included.
     */
    public double magnitude(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double m = 1;
        for (var a : channel.analogFilters()) {
            m *= a.magnitude(frequencyHz);
        }
        return m * Math.abs(KaiserLowPass.amplitude(fir, frequencyHz / sourceRate));
    }

    /** |H(f)| of the realised digitizer FIR alone (1 when there is none). */
    public double digitizerMagnitude(double frequencyHz) {
        return digitizerFir == null ? 1.0 : digitizerFir.magnitude(frequencyHz);
    }

    @Override
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        long total = ratio.outputLength(samples.length);
        if (total > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " inputs give " + total
                    + " outputs, too many for one array; use start(sink)");
        }
        double[] out = new double[(int) total];
        if (analog == null) {
            kernel.evaluate(samples, samples.length, 0, out, 0, out.length);
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

    @Override
    public ResampleRun start(SampleSink sink) {
        PolyphaseRun sampler = new PolyphaseRun(kernel, sink);
        return analog == null ? sampler : new AnalogThenSample(analog.newFilter(), sampler);
    }

    /** Runs the analog filter's sections over each block (state carried across blocks), then the sampler. */
    private static final class AnalogThenSample implements ResampleRun {
        private static final int BLOCK = 1 << 13;
        private final SosFilter filter;
        private final ResampleRun sampler;
        private final double[] buf = new double[BLOCK];
        private long inputs;

        AnalogThenSample(SosFilter filter, ResampleRun sampler) {
            this.filter = filter;
            this.sampler = sampler;
        }

        @Override
        public void push(double[] samples, int offset, int length) {
            if (samples == null) {
                throw new IllegalArgumentException("samples must not be null");
            }
            Check.slice("samples", samples.length, offset, length);
            for (int i = offset, e = offset + length; i < e; i++) {
                if (!Double.isFinite(samples[i])) {
                    throw new IllegalArgumentException("samples: input sample " + (inputs + i - offset)
                            + " must be finite, was " + samples[i]);
                }
            }
            for (int done = 0; done < length; done += BLOCK) {
                int c = Math.min(BLOCK, length - done);
                filter.filter(samples, offset + done, buf, 0, c);
                sampler.push(buf, 0, c);
            }
            inputs += length;
        }

        @Override
        public void finish() {
            sampler.finish();
        }

        @Override
        public long inputCount() {
            return inputs;
        }

        @Override
        public long outputCount() {
            return sampler.outputCount();
        }
    }
}
