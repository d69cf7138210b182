package org.foldbook.dsp.resample;

/**
 * Receives a stream of samples block by block. The block is only valid during the call (the producer
 * reuses its array), so a sink that keeps samples copies them.
 */
@FunctionalInterface
public interface SampleSink {
    void accept(double[] samples, int offset, int length);
}
