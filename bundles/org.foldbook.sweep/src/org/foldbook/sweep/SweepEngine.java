package org.foldbook.sweep;

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
import org.foldbook.dsp.peaks.NoiseFloor;
import org.foldbook.dsp.peaks.SpectralPeak;
import org.foldbook.dsp.resample.RandomAccessResampler;
import org.foldbook.dsp.resample.ResampleRun;
import org.foldbook.dsp.resample.Resampler;
import org.foldbook.dsp.spectrum.Welch;
import org.foldbook.dsp.spectrum.WelchAccumulator;

/**
 * Runs sweeps: for every rate of a ladder, re-sample the recording, take its Welch PSD, find its peaks and
 * give them verdicts against the source peaks.
 *
 * <p><b>Threads.</b> A fixed pool of daemon threads, its size set once when the engine is made; rates are
 * handed out largest output first, so the long ones do not end up last on one thread. One engine serves
 * any number of sweeps, one after another or at once.
 *
 * <p><b>Memory.</b> The recording is one array shared read-only by all threads. Nothing of the size of the
 * recording is allocated per rate: re-sampled values stream block by block into a Welch accumulator, and
 * each thread reuses its own buffers (a few segments long). The only copy of the recording is the
 * filtered one of the modelled-filter mode, made once per sweep ({@link Resampling#prepare}).
 *
 * <p><b>Progress.</b> Through {@link SweepProgress}: a call per finished rate, a cancel poll every block.
 */
public final class SweepEngine implements AutoCloseable {
    /** Input samples handed to a re-sampler at a time (and between cancel polls). */
    static final int BLOCK = 1 << 15;

    private final int threads;
    private final ExecutorService pool;

    /** An engine with {@code threads >= 1} worker threads. */
    public SweepEngine(int threads) {
        this.threads = Check.atLeast("threads", threads, 1);
        AtomicInteger n = new AtomicInteger();
        this.pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "foldbook-sweep-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        });
    }

    /** An engine with one thread per available processor. */
    public static SweepEngine allCores() {
        return new SweepEngine(Runtime.getRuntime().availableProcessors());
    }

    public int threads() {
        return threads;
    }

    /**
     * Sweeps {@code source} (finite samples at {@code ladder.sourceRate()}) over {@code ladder} in
     * {@code mode}; source peaks from {@link SourceSpectrum#of}.
     *
     * @throws CancellationException if {@code progress} asked to stop
     */
    public SweepResult run(double[] source, RateLadder ladder, Resampling mode, SpectrumSettings settings,
            SweepProgress progress) {
        SourceSpectrum ref = SourceSpectrum.of(source, ladder.sourceRate(), settings);
        return run(source, ref, ladder, mode, progress);
    }

    /** As {@link #run(double[], RateLadder, Resampling, SpectrumSettings, SweepProgress)} with the source
     * spectrum already computed (it must be of this {@code source}). */
    public SweepResult run(double[] source, SourceSpectrum ref, RateLadder ladder, Resampling mode,
            SweepProgress progress) {
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(progress, "progress");
        if (source == null || source.length != ref.samples()) {
            throw new IllegalArgumentException("source must be the recording of the source spectrum ("
                    + ref.samples() + " samples), was " + (source == null ? "null" : source.length + " samples"));
        }
        if (ladder.sourceRate() != ref.sourceRate()) {
            throw new IllegalArgumentException("ladder source rate " + ladder.sourceRate()
                    + " differs from the recording's " + ref.sourceRate());
        }
        double[] x = mode.prepare(source, ref.sourceRate());
        SpectrumSettings settings = ref.settings();
        VerdictClassifier classifier = ref.classifier();
        Map<Integer, Welch> welchBySegment = new ConcurrentHashMap<>();
        ThreadLocal<WorkerState> state = ThreadLocal.withInitial(() -> new WorkerState(settings.maxSegment()));
        int total = ladder.size();
        AtomicInteger done = new AtomicInteger();

        List<RateStep> order = new ArrayList<>(ladder.steps());
        order.sort(Comparator.comparingLong((RateStep s) -> -s.outputLength(source.length)).thenComparingInt(RateStep::index));
        RateResult[] results = new RateResult[total];
        List<Future<?>> futures = new ArrayList<>(total);
        for (RateStep step : order) {
            futures.add(pool.submit(() -> {
                WorkerState ws = state.get();
                RateResult r = runRate(x, step, mode, settings, classifier, welchBySegment, ws, progress);
                results[step.index()] = r;
                progress.rateDone(r, done.incrementAndGet(), total);
                return null;
            }));
        }
        try {
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            futures.forEach(f -> f.cancel(true));
            Thread.currentThread().interrupt();
            throw new CancellationException("sweep interrupted");
        } catch (ExecutionException e) {
            futures.forEach(f -> f.cancel(true));
            Throwable c = e.getCause();
            if (c instanceof RuntimeException re) {
                throw re;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(c);
        }
        return new SweepResult(mode.mode().word(), ref.sourceRate(), source.length, ref.binWidth(), ref.peaks(),
                Arrays.asList(results), Optional.empty(), mode.accuracy(ref.sourceRate()), mode.warnings(ref.sourceRate()),
                ref.summarised(), settings.threshold().describe());
    }

    private static RateResult runRate(double[] x, RateStep step, Resampling mode, SpectrumSettings settings,
            VerdictClassifier classifier, Map<Integer, Welch> welchBySegment, WorkerState ws,
            SweepProgress progress) {
        if (progress.isCancelled()) {
            throw new CancellationException("sweep cancelled");
        }
        double fs = step.effectiveRate();
        Resampler resampler = mode.forRate(step);
        long m = resampler.outputLength(x.length);      // x may be a prepared series at another rate
        int seg = settings.segmentFor(m);
        Welch welch = welchBySegment.computeIfAbsent(seg, s -> Welch.builder(s).build());
        ws.welch.reset(welch, fs);
        if (resampler instanceof RandomAccessResampler direct && direct.offersRandomAccess()) {
            // random access straight from the shared array into the Welch buffer: no copy of input or output
            for (long first = 0; first < m; ) {
                if (progress.isCancelled()) {
                    throw new CancellationException("sweep cancelled");
                }
                int count = (int) Math.min(ws.welch.room(), m - first);
                direct.evaluate(x, first, ws.welch.buffer(), ws.welch.position(), count);
                ws.welch.advance(count);
                first += count;
            }
        } else {
            ResampleRun run = resampler.start(ws.welch::add);
            for (int off = 0; off < x.length; off += BLOCK) {
                if (progress.isCancelled()) {
                    throw new CancellationException("sweep cancelled");
                }
                run.push(x, off, Math.min(BLOCK, x.length - off));
            }
            run.finish();
        }
        ws.welch.finish(ws.psd);
        double binWidth = fs / seg;
        List<SpectralPeak> peaks = settings.finderAt(fs).findInPower(ws.psd, welch.bins(), binWidth);
        return classifier.classify(step, m, binWidth, peaks, mode, floorOf(ws.psd, welch.bins(), settings),
                settings.threshold().quantisationFloorDb(fs));
    }

    /** Running-median floor of a PSD in dB (the verdicts' detection floor, whatever the peak rule). */
    static double[] floorOf(double[] psd, int bins, SpectrumSettings settings) {
        double[] db = new double[bins];
        for (int k = 0; k < bins; k++) {
            db[k] = 10 * Math.log10(Math.max(psd[k], 1e-300));
        }
        int w = Math.min(settings.threshold().floorWindowBins(), bins % 2 == 1 ? bins : bins - 1);
        return NoiseFloor.runningMedian(db, bins, Math.max(1, w));
    }

    /** Per-thread buffers, reused from rate to rate. */
    private static final class WorkerState {
        final WelchAccumulator welch;
        final double[] psd;

        WorkerState(int maxSegment) {
            welch = new WelchAccumulator(maxSegment);
            psd = new double[maxSegment / 2 + 1];
        }
    }

    /** Stops the worker threads (running sweeps are interrupted). */
    @Override
    public void close() {
        pool.shutdownNow();
    }
}
