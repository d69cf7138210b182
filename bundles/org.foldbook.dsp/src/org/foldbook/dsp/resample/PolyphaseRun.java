package org.foldbook.dsp.resample;

import java.util.Arrays;
import java.util.Objects;

import org.foldbook.dsp.Check;

/**
 * Block-by-block driver of a {@link PolyphaseKernel}: keeps only the input history that pending outputs
 * still need (about taps + one block), computes every output whose taps are all in, and hands outputs
 * on in blocks. Zeros before index 0 and, at {@link #finish()}, after the last input.
 */
final class PolyphaseRun implements ResampleRun {

    private static final int IN_BLOCK = 1 << 14;
    private static final int OUT_BLOCK = 1 << 12;

    private final PolyphaseKernel kernel;
    private final SampleSink sink;
    private final double[] out = new double[OUT_BLOCK];
    private double[] buf;
    private long origin;      // input index of buf[0]
    private int filled;       // valid entries in buf
    private long inputs;
    private long nextOut;
    private boolean finished;
    private long limit = Long.MAX_VALUE;   // ceil(N·up/down), known at finish

    PolyphaseRun(PolyphaseKernel kernel, SampleSink sink) {
        this.kernel = kernel;
        this.sink = Objects.requireNonNull(sink, "sink");
        this.buf = new double[2 * kernel.taps() + 2 * kernel.down() + IN_BLOCK];
        this.origin = kernel.offset();          // offset <= 0: these first entries are the zero padding
        this.filled = -kernel.offset();
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
        int done = 0;
        while (done < length) {
            int c = Math.min(length - done, buf.length - filled);
            System.arraycopy(samples, offset + done, buf, filled, c);
            filled += c;
            done += c;
            inputs += c;
            produce(Long.MAX_VALUE);
            compact();
        }
    }

    /** Appends zeros (not counted as input): the same path as samples, used by finish. */
    private void pushZeros(long count) {
        while (count > 0) {
            int c = (int) Math.min(count, buf.length - filled);
            Arrays.fill(buf, filled, filled + c, 0.0);
            filled += c;
            count -= c;
            produce(limit);
            compact();
        }
    }

    @Override
    public void finish() {
        if (finished) {
            return;
        }
        finished = true;
        limit = Math.ceilDiv(Math.multiplyExact(inputs, (long) kernel.up()), kernel.down());
        if (nextOut < limit) {
            long need = kernel.base(limit - 1) + kernel.offset() + kernel.taps();   // one past the last tap
            long have = origin + filled;
            produce(limit);
            if (need > have) {
                pushZeros(need - have);
            }
        }
    }

    private void produce(long cap) {
        long end = Math.min(cap, kernel.outputsWithBaseAtMost(origin + filled - kernel.offset() - kernel.taps()));
        while (nextOut < end) {
            int c = (int) Math.min(OUT_BLOCK, end - nextOut);
            kernel.run(buf, origin, nextOut, out, 0, c);
            nextOut += c;
            sink.accept(out, 0, c);
        }
    }

    private void compact() {
        long keepFrom = kernel.base(nextOut) + kernel.offset();
        int drop = (int) Math.min(Math.max(keepFrom - origin, 0), filled);
        if (drop > 0) {
            System.arraycopy(buf, drop, buf, 0, filled - drop);
            filled -= drop;
            origin += drop;
        }
        if (filled == buf.length) {                // outputs need more history than fits: grow
            buf = Arrays.copyOf(buf, buf.length * 2);
        }
    }

    @Override
    public long inputCount() {
        return inputs;
    }

    @Override
    public long outputCount() {
        return nextOut;
    }
}
