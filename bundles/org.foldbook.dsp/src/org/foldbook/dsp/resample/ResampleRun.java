package org.foldbook.dsp.resample;

/**
 * One pass of a re-sampler over one recording, fed block by block so that a recording of 10^7–10^8
 * samples is never held twice: memory is a few blocks plus the filter's history, whatever the length.
 * Outputs go to the {@link SampleSink} given when the run was started, as soon as they are complete.
 * Not thread-safe (one run belongs to one thread); the re-sampler that started it is.
 */
public interface ResampleRun {

    /**
     * Feeds the next {@code length} input samples.
     *
     * @throws IllegalArgumentException if a sample is not finite (the message gives its input index), or
     *         the slice lies outside the array
     * @throws IllegalStateException after {@link #finish()}
     */
    void push(double[] samples, int offset, int length);

    /** Ends the input (zeros beyond it) and delivers the remaining outputs, up to ceil(N·up/down) in all. */
    void finish();

    /** Input samples received so far. */
    long inputCount();

    /** Output samples delivered so far. */
    long outputCount();
}
