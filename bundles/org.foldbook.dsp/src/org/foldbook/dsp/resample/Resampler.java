package org.foldbook.dsp.resample;

/**
 * A configured re-sampler for one rate ratio: immutable and thread-safe, so one instance may serve
 * several threads (each with its own {@link ResampleRun}). Output sample m sits at t_m = m·down/up
 * input samples (zero delay: the kernels are centred), m = 0 .. ceil(N·up/down)−1.
 */
public interface Resampler {

    /** The exact ratio new rate / source rate. */
    RateRatio ratio();

    /** Number of outputs for {@code inputLength} inputs: ceil(inputLength·up/down). */
    default long outputLength(long inputLength) {
        return ratio().outputLength(inputLength);
    }

    /**
     * Re-samples a whole recording held in memory.
     *
     * @throws IllegalArgumentException if {@code samples} is null, empty or holds a non-finite value
     */
    double[] apply(double[] samples);

    /** Starts a block-by-block pass whose outputs go to {@code sink}. */
    ResampleRun start(SampleSink sink);
}
