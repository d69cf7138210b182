package org.foldbook.dsp.resample;

import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * Mode 1, a digitizer with no anti-alias filter: the band-limited source is evaluated at the new
 * instants t_m = m·down/up (input samples), m = 0 .. ceil(N·up/down)−1, by windowed-sinc interpolation
 * <pre>
 *   y[m] = Σ_{k=-W+1..W} x[floor(t_m)+k] · h(k − frac(t_m)),   x = 0 outside the recording,
 *   h(τ) = sinc(τ) · I0(β√(1−(τ/W)²)) / I0(β)                   (see {@link KaiserSinc})
 * </pre>
 * with W = 16 (32 taps) and β = 10 by default, the scipy peer's interpolator. Nothing is filtered, so
 * everything above the new Nyquist frequency folds, which is what this mode is for. An integer ratio
 * (up = 1) picks x[m·down] exactly.
 *
 * <p>Accuracy (default kernel; RMS error against exact sin() values of pure tones, re the tone, away
 * from the ends; measured for ratios 556/571, 521/542 and 13/50 alike): −113 dB at 0.01–0.1·fs0,
 * −109 dB at 0.25, −108 at 0.33, −104 at 0.37, −101 at 0.40, then −49 dB at 0.42 and −23 dB at
 * 0.45·fs0. So it is below −100 dB up to 0.4·fs0 (the tests assert that up to 0.39); content in
 * 0.4–0.5·fs0 comes out attenuated, not folded faithfully.
 * Within 16 samples of either end the zero padding makes the output a fade, not the signal.
 *
 * <p>Immutable and thread-safe: the phase table (up rows × 2W) is built once; runs allocate nothing
 * per sample. {@link #forDoubledSeries} is the shorter kernel (16 taps) for a series at twice the source rate
 * that holds nothing above 0.255 of its rate, as the exact bare and modelled modes sample.
 */
public final class BareSampler implements RandomAccessResampler {

    /** Default half width W of the interpolation kernel (input samples). */
    public static final int DEFAULT_HALF_WIDTH = 16;
    /** Default Kaiser β of the interpolation kernel. */
    public static final double DEFAULT_BETA = 10.0;
    /**
     * Half width of the kernel that samples a 2·fs0 series whose content lies below 0.255 of its rate (what
     * {@link ExactChainFilter} writes): 16 taps are enough there, see {@link #forDoubledSeries}.
     */
    public static final int DOUBLED_HALF_WIDTH = 8;
    /** Kaiser β of {@link #forDoubledSeries}' kernel. */
    public static final double DOUBLED_BETA = 12.2;

    private final RateRatio ratio;
    private final KaiserSinc kernelShape;
    private final PolyphaseKernel kernel;   // null for integer decimation (up = 1)

    private BareSampler(RateRatio ratio, int halfWidth, double beta) {
        this.ratio = Objects.requireNonNull(ratio, "ratio");
        this.kernelShape = new KaiserSinc(halfWidth, beta);
        if (ratio.up() == 1) {
            this.kernel = null;
        } else {
            int up = phaseCount(ratio);
            int taps = 2 * halfWidth;
            if ((long) up * taps > PolyphaseKernel.MAX_TABLE) {
                throw new IllegalArgumentException("ratio " + ratio + " needs " + up + " phases x " + taps
                        + " taps, more than " + PolyphaseKernel.MAX_TABLE + "; choose a smaller denominator bound");
            }
            double[] table = new double[up * taps];
            // h is even, so row up−p is row p reversed: compute rows 0 .. up/2, mirror the rest
            for (int p = 0; p <= up / 2; p++) {
                double frac = (double) p / up;
                for (int i = 0; i < taps; i++) {
                    table[p * taps + i] = kernelShape.value((-halfWidth + 1 + i) - frac);
                }
                if (p > 0 && up - p != p) {
                    for (int i = 0; i < taps; i++) {
                        table[(up - p) * taps + i] = table[p * taps + taps - 1 - i];
                    }
                }
            }
            this.kernel = new PolyphaseKernel(up, intDown(ratio), taps, -halfWidth + 1, table);
        }
    }

    /** The default interpolator (W = 16, β = 10) for {@code ratio}. */
    public static BareSampler of(RateRatio ratio) {
        return new BareSampler(ratio, DEFAULT_HALF_WIDTH, DEFAULT_BETA);
    }

    /**
     * The interpolator for a series at 2·fs0 whose content is confined to 0..0.255 of its rate (the output of
     * {@link ExactChainFilter}, zero from 0.51·fs0 to 1.49·fs0), {@code ratio} counted against that series.
     * Such a series only needs a kernel flat to 0.245 of its rate (0.49·fs0) that rejects the images from
     * 0.745 of it on, a transition of 0.49 of the rate: Kaiser's formula N ≈ (A − 8)/(2.285·Δω) (Oppenheim
     * &amp; Schafer 7.6) gives 15.6 taps for A = 117 dB, so W = 8 (16 taps), half the default's work. β = 12.2
     * was chosen by measuring the kernel's continuous response (releng/reference/doubled_kernel_vectors.py):
     * worst error over 0..0.245 of the rate, pass band deviation and images together, −116.6 dB; every image
     * of content up to 0.255 of the rate at least 118 dB down.
     */
    public static BareSampler forDoubledSeries(RateRatio ratio) {
        return new BareSampler(ratio, DOUBLED_HALF_WIDTH, DOUBLED_BETA);
    }

    /**
     * An interpolator of half width {@code halfWidth} (2·halfWidth taps) and Kaiser {@code beta}.
     *
     * @throws IllegalArgumentException if halfWidth < 1 or beta is negative or not finite
     */
    public static BareSampler of(RateRatio ratio, int halfWidth, double beta) {
        return new BareSampler(ratio, halfWidth, beta);
    }

    @Override
    public RateRatio ratio() {
        return ratio;
    }

    public int halfWidth() {
        return kernelShape.halfWidth();
    }

    public double beta() {
        return kernelShape.beta();
    }

    /** The kernel h(τ) itself (for documentation plots and tests). */
    public double kernelValue(double tau) {
        return kernelShape.value(tau);
    }

    @Override
    public double[] apply(double[] samples) {
        Check.finiteSamples("samples", samples);
        long m = ratio.outputLength(samples.length);
        if (m > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("samples: " + samples.length + " inputs give " + m
                    + " outputs, too many for one array; use start(sink)");
        }
        double[] out = new double[(int) m];
        evaluate(samples, 0, out, 0, out.length);
        return out;
    }

    /**
     * Outputs {@code first .. first+count-1} of the re-sampled {@code samples}, written to
     * {@code out[outOffset..]}: random access into the output without computing or storing the rest, so
     * a caller can stream a long recording's output through a spectrum block by block. Reads
     * {@code samples} only. Does not scan the input for non-finite values (do that once per recording,
     * e.g. with {@link Check#finiteSamples}); such values make the affected outputs non-finite.
     *
     * @throws IllegalArgumentException if the output range is outside [0, outputLength) or the target
     *         slice outside {@code out}
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
            long step = ratio.down();
            for (int i = 0; i < count; i++) {
                out[outOffset + i] = samples[(int) ((first + i) * step)];
            }
        } else {
            kernel.evaluate(samples, samples.length, first, out, outOffset, count);
        }
    }

    @Override
    public ResampleRun start(SampleSink sink) {
        if (kernel == null) {
            return new PickRun((int) ratio.down(), sink);
        }
        return new PolyphaseRun(kernel, sink);
    }

    PolyphaseKernel kernel() {
        return kernel;
    }

    static int phaseCount(RateRatio ratio) {
        if (ratio.up() > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("ratio " + ratio + ": up " + ratio.up() + " is too large");
        }
        return (int) ratio.up();
    }

    static int intDown(RateRatio ratio) {
        if (ratio.down() > Integer.MAX_VALUE) {
            throw new IllegalArgumentException("ratio " + ratio + ": down " + ratio.down() + " is too large");
        }
        return (int) ratio.down();
    }
}
