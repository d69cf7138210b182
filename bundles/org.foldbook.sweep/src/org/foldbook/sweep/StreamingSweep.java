package org.foldbook.sweep;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.resample.ResampleRun;
import org.foldbook.dsp.resample.Resampler;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.spectrum.WelchAccumulator;

/**
 * The sweep of a recording of any length: the source is read once, front to back, in blocks of
 * {@value #BLOCK} samples; every block goes to the source's own Welch accumulator and to every rate's
 * re-sampler run, whose outputs stream into that rate's Welch accumulator. Nothing is of the recording's
 * size: memory is one block (plus the modelled mode's overlap-save buffers) and, per rate, the re-sampler's history and a Welch
 * chunk (about 0.5 MB a rate with the default settings), whatever the length.
 *
 * <p>The answers are those of {@link SweepEngine#run} on the same samples, bit for bit: the re-samplers
 * compute every output in one fixed order whatever the block edges, the Welch accumulator is the same
 * ({@link WelchAccumulator}, also behind {@link SourceSpectrum#of}), and the once-per-sweep filter of the
 * modelled mode (its exact chain filter, overlap-save) runs over the blocks ({@link Resampling#blockPrepare}).
 *
 * <p><b>Threads.</b> A fixed pool of daemon threads. For each block the rates are handed out from a
 * shared counter, heaviest first, so the threads stay balanced within every block; a block is finished
 * by all rates before the next is read (each rate's state passes between threads only across that
 * barrier). The reading thread works on the rates too.
 */
public final class StreamingSweep implements AutoCloseable {
    /** Samples read and handed on at a time (also the in-memory engine's push size). */
    static final int BLOCK = SweepEngine.BLOCK;

    /** A recording read once in order, block by block. */
    public interface Source {
        /** Samples in the recording (known before reading: the rates' spectrum lengths depend on it). */
        long length();

        /**
         * Reads up to {@code max >= 1} samples into {@code buf[offset..]}; returns how many (at least 1), or
         * -1 after the last one.
         */
        int read(double[] buf, int offset, int max) throws IOException;

        /** A source over samples already in memory (for checks against the in-memory engine). */
        static Source of(double[] samples) {
            Objects.requireNonNull(samples, "samples");
            return new Source() {
                private int pos;

                @Override
                public long length() {
                    return samples.length;
                }

                @Override
                public int read(double[] buf, int offset, int max) {
                    if (pos == samples.length) {
                        return -1;
                    }
                    int c = Math.min(max, samples.length - pos);
                    System.arraycopy(samples, pos, buf, offset, c);
                    pos += c;
                    return c;
                }
            };
        }
    }

    private final int threads;
    private final ExecutorService pool;

    /** A streaming sweep with {@code threads >= 1} threads (the calling one included). */
    public StreamingSweep(int threads) {
        this.threads = Check.atLeast("threads", threads, 1);
        AtomicInteger n = new AtomicInteger();
        this.pool = threads == 1 ? null : Executors.newFixedThreadPool(threads - 1, r -> {
            Thread t = new Thread(r, "foldbook-stream-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    public int threads() {
        return threads;
    }

    /**
     * Sweeps {@code source} (finite samples at {@code ladder.sourceRate()}) over {@code ladder} in
     * {@code mode}: the same result as {@code new SweepEngine(t).run(samples, ladder, mode, settings, progress)}.
     *
     * @throws IOException           from the source
     * @throws CancellationException if {@code progress} asked to stop (polled every block)
     * @throws IllegalArgumentException for a non-finite sample (naming its index) or a source that
     *                                  delivers fewer or more samples than its length
     */
    public SweepResult run(Source source, RateLadder ladder, Resampling mode, SpectrumSettings settings,
            SweepProgress progress) throws IOException {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(settings, "settings");
        Objects.requireNonNull(progress, "progress");
        long n = source.length();
        if (n < 1) {
            throw new IllegalArgumentException("source must hold at least one sample, has " + n);
        }
        double fs0 = ladder.sourceRate();
        Map<Integer, Welch> welchBySegment = new ConcurrentHashMap<>();
        int sourceSegment = settings.segmentFor(n);
        WelchAccumulator sourceWelch = new WelchAccumulator(
                welchBySegment.computeIfAbsent(sourceSegment, s -> Welch.builder(s).build()), fs0);
        Resampling.Preparation pre = mode.blockPrepare(fs0);
        long seriesLength = pre == null ? n : pre.outputLength(n); // what the rates' re-samplers take in
        List<RateState> rates = new ArrayList<>(ladder.size());
        for (RateStep step : ladder.steps()) {
            rates.add(new RateState(step, seriesLength, mode, settings, welchBySegment));
        }
        // heaviest first: outputs per input (the Welch and, for the bare sampler, the kernel) plus a fixed
        // share per input (copying, the finite check, the decimators' input-rate stages)
        rates.sort(Comparator.comparingDouble((RateState r) -> -(0.25 + r.step.effectiveRate() / fs0))
                .thenComparingInt(r -> r.step.index()));
        // without a preparation the source blocks go to the rates as they are; with one, its output does
        ResampleRun prepared = pre == null ? null
                : pre.start((b, off, len) -> forEachRate(rates, r -> r.run.push(b, off, len)));
        double[] block = new double[BLOCK];
        long read = 0;
        while (true) {
            if (progress.isCancelled()) {
                throw new CancellationException("sweep cancelled");
            }
            int got = fill(source, block);
            if (got <= 0) {
                break;
            }
            if (read + got > n) {
                throw new IllegalArgumentException("source delivered more than its " + n + " samples");
            }
            requireFinite(block, got, read);
            sourceWelch.add(block, 0, got);
            if (prepared != null) {
                prepared.push(block, 0, got);
            } else {
                int count = got;
                forEachRate(rates, r -> r.run.push(block, 0, count));
            }
            read += got;
        }
        if (read != n) {
            throw new IllegalArgumentException("source ended after " + read + " of its " + n + " samples");
        }
        if (prepared != null) {
            prepared.finish();
        }
        double[] srcPsd = new double[sourceSegment / 2 + 1];
        sourceWelch.finish(srcPsd);
        SourceSpectrum ref = SourceSpectrum.fromPsd(srcPsd, fs0, n, sourceSegment, settings);
        VerdictClassifier classifier = ref.classifier();
        RateResult[] results = new RateResult[ladder.size()];
        AtomicInteger done = new AtomicInteger();
        forEachRate(rates, r -> {
            RateResult result = r.finish(settings, classifier, mode);
            results[r.step.index()] = result;
            progress.rateDone(result, done.incrementAndGet(), results.length);
        });
        return new SweepResult(mode.mode().word(), fs0, n, ref.binWidth(), ref.peaks(), Arrays.asList(results),
                Optional.empty(), mode.accuracy(fs0), mode.warnings(fs0), ref.summarised(),
                settings.threshold().describe());
    }

    /** Reads until the block is full or the source ends. */
    private static int fill(Source source, double[] block) throws IOException {
        int got = 0;
        while (got < block.length) {
            int c = source.read(block, got, block.length - got);
            if (c < 0) {
                break;
            }
            if (c == 0) {
                throw new IllegalStateException("source read returned 0 samples");
            }
            got += c;
        }
        return got;
    }

    private static void requireFinite(double[] block, int count, long firstIndex) {
        double probe = 0;
        for (int i = 0; i < count; i++) {
            probe += block[i] * 0.0; // 0 exactly for finite values, NaN otherwise
        }
        if (probe != 0 || Double.isNaN(probe)) {
            for (int i = 0; i < count; i++) {
                if (!Double.isFinite(block[i])) {
                    throw new IllegalArgumentException("source sample " + (firstIndex + i) + " must be finite, was "
                            + block[i]);
                }
            }
        }
    }

    /** Runs {@code work} once for every rate, spread over the threads; returns when all are done. */
    private void forEachRate(List<RateState> rates, RateWork work) {
        AtomicInteger next = new AtomicInteger();
        Runnable drain = () -> {
            for (int i; (i = next.getAndIncrement()) < rates.size(); ) {
                try {
                    work.accept(rates.get(i));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        };
        List<Future<?>> helpers = new ArrayList<>(threads - 1);
        for (int t = 1; t < threads && t < rates.size(); t++) {
            helpers.add(pool.submit(drain));
        }
        RuntimeException first = null;
        try {
            drain.run();
        } catch (RuntimeException e) {
            first = e;
            next.set(rates.size()); // the helpers stop at their next rate
        }
        for (Future<?> f : helpers) {
            try {
                f.get();
            } catch (InterruptedException e) {
                helpers.forEach(h -> h.cancel(true));
                Thread.currentThread().interrupt();
                throw new CancellationException("sweep interrupted");
            } catch (ExecutionException e) {
                if (first == null) {
                    first = e.getCause() instanceof RuntimeException re ? re : new IllegalStateException(e.getCause());
                }
            }
        }
        if (first != null) {
            throw first;
        }
    }

    @FunctionalInterface
    private interface RateWork {
        void accept(RateState r) throws IOException;
    }

    /** One rate's re-sampler run and Welch accumulator, carried from block to block. */
    private static final class RateState {
        final RateStep step;
        final long outputs;
        final Welch welch;
        final WelchAccumulator acc;
        final ResampleRun run;

        RateState(RateStep step, long seriesLength, Resampling mode, SpectrumSettings settings,
                Map<Integer, Welch> welchBySegment) {
            this.step = step;
            Resampler resampler = mode.forRate(step);
            this.outputs = resampler.outputLength(seriesLength);
            int seg = settings.segmentFor(outputs);
            this.welch = welchBySegment.computeIfAbsent(seg, s -> Welch.builder(s).build());
            this.acc = new WelchAccumulator(welch, step.effectiveRate());
            this.run = resampler.start(acc::add);
        }

        RateResult finish(SpectrumSettings settings, VerdictClassifier classifier, Resampling mode) {
            run.finish();
            double[] psd = new double[welch.bins()];
            acc.finish(psd);
            double binWidth = step.effectiveRate() / welch.segmentLength();
            double fs = step.effectiveRate();
            List<SpectralPeak> peaks = settings.finderAt(fs).findInPower(psd, welch.bins(), binWidth);
            return classifier.classify(step, outputs, binWidth, peaks, mode, SweepEngine.floorOf(psd, welch.bins(), settings),
                    settings.threshold().quantisationFloorDb(fs));
        }
    }

    /** Stops the helper threads. */
    @Override
    public void close() {
        if (pool != null) {
            pool.shutdownNow();
        }
    }
}
