package org.foldbook.bench.sweep;

import java.util.concurrent.TimeUnit;

import org.foldbook.channel.WhatIfRate;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SourceSpectrum;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
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
 * One change of the simulation part's what-if rate on a 10^6-sample channel (goal: under 100 ms): the
 * answer the part draws at once ({@link WhatIfRate#preview}: the rate's exact ratio, the folded PSD on
 * that rate's bins, peaks and verdicts, the landing of every source peak), against the exact re-sample
 * that replaces it ({@link WhatIfRate#exact}, one thread) measured in the same run. The rate moves
 * through 100 values between the recording's rate and a sixteenth of it, as a slider drag would.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xms2g", "-Xmx2g", "--add-modules=jdk.incubator.vector"})
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 5, time = 1)
public class WhatIfBenchmark {
    @Param({"1000000"})
    public int samples;

    @Param({"bare", "modelled"})
    public String chain;

    private WhatIfRate whatIf;
    private SweepEngine engine;
    private double[] rates;
    private int next;

    @Setup
    public void setUp() {
        double[] x = SweepBenchmark.peerTones(samples, 12345);
        SourceSpectrum source = SourceSpectrum.of(x, SweepBenchmark.FS0, SpectrumSettings.DEFAULT);
        Resampling resampling = chain.equals("bare") ? Resampling.bare()
                : Resampling.modelledFilter(org.foldbook.dsp.filter.AnalogLowPass.butterworth(4, 20_000));
        whatIf = new WhatIfRate(x, source, resampling);
        engine = new SweepEngine(1);
        rates = new double[100];
        for (int i = 0; i < rates.length; i++) {
            rates[i] = SweepBenchmark.FS0 * Math.pow(1.0 / 16, i / 99.0);
        }
    }

    @TearDown
    public void tearDown() {
        engine.close();
    }

    private double nextRate() {
        double r = rates[next];
        next = (next + 1) % rates.length;
        return r;
    }

    @Benchmark
    public WhatIfRate.Spectrum whatIfPreview() {
        return whatIf.preview(nextRate());
    }

    /** Baseline: the exact answer for the same kind of change (re-sample, Welch, verdicts). */
    @Benchmark
    public WhatIfRate.Spectrum whatIfExact() {
        return whatIf.exact(nextRate(), engine, () -> false);
    }
}
