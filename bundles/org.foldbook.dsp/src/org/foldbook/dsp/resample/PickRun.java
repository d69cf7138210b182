package org.foldbook.dsp.resample;

import java.util.Objects;

import org.foldbook.dsp.Check;

/** Block-by-block integer decimation without a filter: keeps input samples 0, d, 2d, ... exactly. */
final class PickRun implements ResampleRun {

    private static final int OUT_BLOCK = 1 << 12;

    private final int down;
    private final SampleSink sink;
    private final double[] out = new double[OUT_BLOCK];
    private int filled;
    private long inputs;
    private long outputs;
    private long skip;            // inputs to skip before the next kept one
    private boolean finished;

    PickRun(int down, SampleSink sink) {
        this.down = down;
        this.sink = Objects.requireNonNull(sink, "sink");
    }

    @Override
    public void push(double[] samples, int offset, int length) {
        if (finished) {
            throw new IllegalStateException("push after finish");
        }
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
        long i = offset + skip;
        long e = (long) offset + length;
        for (; i < e; i += down) {
            out[filled++] = samples[(int) i];
            if (filled == OUT_BLOCK) {
                flush();
            }
        }
        skip = i - e;
        inputs += length;
    }

    private void flush() {
        if (filled > 0) {
            outputs += filled;
            sink.accept(out, 0, filled);
            filled = 0;
        }
    }

    @Override
    public void finish() {
        if (!finished) {
            finished = true;
            flush();
        }
    }

    @Override
    public long inputCount() {
        return inputs;
    }

    @Override
    public long outputCount() {
        return outputs + filled;
    }
}
