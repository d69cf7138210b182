package org.foldbook.dsp.resample;

import org.foldbook.dsp.SpecialFunctions;

import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * Filtered rational re-sampling by one polyphase FIR stage designed with a Kaiser window: zero-stuff by
 * up, low-pass at min(fs0, fs0·up/down)/2, keep every down-th sample, all in one pass that only
 * computes the kept samples. Output m sits at t_m = m·down/up input samples (the filter is centred),
 * m = 0 .. ceil(N·up/down)−1; zeros outside the recording.
 *
 * <p>{@link #resamplePolyDefaults(RateRatio)} is the design of scipy.signal.resample_poly with its default
 * arguments (window ('kaiser', 5.0), padtype 'constant'): 2·10·R+1 taps, R = max(up, down), cutoff 1/R
 * of the up-sampled Nyquist, unit DC gain times up; outputs equal scipy's to rounding, so Foldbook's
 * filtered sweep can be compared with the peer's bin for bin. That filter is a compromise (scipy.signal.freqz
 * of it, R = 20: within ±0.02 dB to 0.4·fs_new, −0.66 dB at 0.45·fs_new, −6.0 dB at fs_new/2, −22.6 dB at
 * 0.55·fs_new, below −55 dB from 0.6·fs_new, about −65 to −70 dB further out); for a stated pass band
 * and ≥ 100 dB stop band use {@link IdealDecimator}. Cost: about 20·N multiply-adds per pass whatever
 * the ratio. Immutable and thread-safe.
 */
public final class KaiserPolyphaseResampler implements RandomAccessResampler {

    private final RateRatio ratio;
    private final PolyphaseKernel kernel;   // null for 1/1 (a copy)
    private final double[] prototype;       // unit DC gain, at up·fs0; null for 1/1

    private KaiserPolyphaseResampler(RateRatio ratio, PolyphaseKernel kernel, double[] prototype) {
        this.ratio = ratio;
        this.kernel = kernel;
        this.prototype = prototype;
    }

    /** scipy.signal.resample_poly(x, up, down)'s default filter for {@code ratio}; 1/1 is a plain copy, as there. */
    public static KaiserPolyphaseResampler resamplePolyDefaults(RateRatio ratio) {
        Objects.requireNonNull(ratio, "ratio");
        if (ratio.up() == 1 && ratio.down() == 1) {
            return new KaiserPolyphaseResampler(ratio, null, null);
        }
        int up = BareSampler.phaseCount(ratio);
        int down = BareSampler.intDown(ratio);
        long r = Math.max(up, down);
        long half = 10 * r;
        if (2 * half + 1 > PolyphaseKernel.MAX_TABLE) {
            throw new IllegalArgumentException("ratio " + ratio + " needs a prototype of " + (2 * half + 1)
                    + " taps; choose a smaller denominator bound");
        }
        double[] proto = firwinKaiser((int) (2 * half + 1), 1.0 / r, 5.0);
        double[] g = new double[proto.length];
        for (int i = 0; i < g.length; i++) {
            g[i] = proto[i] * up;
        }
        return new KaiserPolyphaseResampler(ratio, PolyphaseKernel.fromPrototype(up, down, g, (int) half), proto);
    }

    /**
     * Windowed-sinc low-pass of odd length {@code n}, cutoff {@code cutoff} relative to the Nyquist
     * frequency of its rate, symmetric Kaiser window {@code beta}, scaled to unit gain at DC (the
     * construction of scipy.signal.firwin(n, cutoff, window=('kaiser', beta))).
     */
    static double[] firwinKaiser(int n, double cutoff, double beta) {
        Check.atLeast("taps", n, 1);
        if (n % 2 == 0) {
            throw new IllegalArgumentException("taps must be odd for a zero-delay low-pass, was " + n);
        }
        Check.inRange("cutoff", cutoff, Double.MIN_NORMAL, 1.0);
        double alpha = (n - 1) / 2.0;
        double i0b = SpecialFunctions.besselI0(beta);
        double[] h = new double[n];
        double sum = 0;
        // symmetric: compute the first half and the centre, mirror the rest
        for (int i = 0; i <= n / 2; i++) {
            double m = i - alpha;
            double u = alpha == 0 ? 0 : m / alpha;
            double w = SpecialFunctions.besselI0(beta * Math.sqrt(Math.max(0.0, 1.0 - u * u))) / i0b;
            h[i] = cutoff * KaiserSinc.sinc(cutoff * m) * w;
            h[n - 1 - i] = h[i];
        }
        for (int i = 0; i < n; i++) {
            sum += h[i];
        }
        for (int i = 0; i < n; i++) {
            h[i] /= sum;
        }
        return h;
    }

    @Override
    public RateRatio ratio() {
        return ratio;
    }

    /**
     * |H(f)| of the filter for source content at {@code frequency} given as a fraction of the source
     * rate (the prototype's DTFT; 1 for the 1/1 copy). Aliases aside, the gain content gets before the
     * rate change.
     */
    public double magnitude(double frequency) {
        Check.finite("frequency", frequency);
        return prototype == null ? 1.0 : Math.abs(KaiserLowPass.amplitude(prototype, frequency / ratio.up()));
    }

    /** Multiply-adds per output sample. */
    public int tapsPerOutput() {
        return kernel == null ? 1 : kernel.taps();
    }

    @Override
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        long m = ratio.outputLength(samples.length);
        if (m > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " inputs give " + m
                    + " outputs, too many for one array; use start(sink)");
        }
        if (kernel == null) {
            return samples.clone();
        }
        double[] out = new double[(int) m];
        kernel.evaluate(samples, samples.length, 0, out, 0, out.length);
        return out;
    }

    /**
     * Outputs {@code first .. first+count-1} into {@code out[outOffset..]}, reading {@code samples} only
     * (random access, as {@link BareSampler#evaluate}); the input is not scanned for non-finite values.
     */
    @Override
    public void evaluate(double[] samples, long first, double[] out, int outOffset, int count) {
        if (samples == null) {
            throw new IllegalArgumentException("samples must not be null");
        }
        long total = ratio.outputLength(samples.length);
        if (first < 0 || count < 0 || first > total - count) {
            throw new IllegalArgumentException("output range " + first + " + " + count + " outside [0, " + total + ")");
        }
        Check.slice("out", out.length, outOffset, count);
        if (kernel == null) {
            System.arraycopy(samples, (int) first, out, outOffset, count);
        } else {
            kernel.evaluate(samples, samples.length, first, out, outOffset, count);
        }
    }

    @Override
    public ResampleRun start(SampleSink sink) {
        return kernel == null ? new PickRun(1, sink) : new PolyphaseRun(kernel, sink);
    }
}
