package org.foldbook.bench.sweep;

import java.util.concurrent.TimeUnit;

import org.foldbook.sweep.FoldPreview;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.RateStep;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * The spectral-fold preview of one rate after the source PSD is computed (goal: well under 10 ms), against
 * the same rate swept in the time domain (bare, one thread) in the same run. The rate cycles through the
 * 100-rate ladder, so every call is a different rate.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx2g", "--add-modules=jdk.incubator.vector"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 5, time = 1)
public class PreviewBenchmark {
    @Param({"1000000"})
    public int samples;

    @Param({"bare", "modelled"})
    public String chain;

    private double[] x;
    private SourceSpectrum source;
    private FoldPreview preview;
    private RateLadder ladder;
    private RateLadder oneRate;
    private Resampling resampling;
    private SweepEngine engine;
    private int next;

    @Setup
    public void setUp() {
        x = SweepBenchmark.peerTones(samples, 12345);
        source = SourceSpectrum.of(x, SweepBenchmark.FS0, SpectrumSettings.DEFAULT);
        preview = new FoldPreview(source);
        ladder = RateLadder.geometric(SweepBenchmark.FS0, SweepBenchmark.FS0, 2000, 100, 1000);
        oneRate = RateLadder.ofRates(SweepBenchmark.FS0, new double[] {ladder.get(50).effectiveRate()}, 1000);
        resampling = chain.equals("bare") ? Resampling.bare()
                : Resampling.modelledFilter(org.foldbook.dsp.filter.AnalogLowPass.butterworth(4, 20_000));
        engine = new SweepEngine(1);
    }

    @TearDown
    public void tearDown() {
        engine.close();
    }

    @Benchmark
    public RateResult previewOneRate() {
        RateStep s = ladder.get(next);
        next = (next + 1) % ladder.size();
        return preview.preview(s, resampling);
    }

    /** Baseline: the middle rate of the ladder in the time domain (same chain), source spectrum reused. */
    @Benchmark
    public Object timeDomainOneRate() {
        return engine.run(x, source, oneRate, resampling, SweepProgress.NONE);
    }
}
