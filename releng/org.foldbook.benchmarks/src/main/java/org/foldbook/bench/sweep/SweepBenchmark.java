package org.foldbook.bench.sweep;

import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
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
 * The whole stepped-rate sweep (re-sample, Welch PSD, peaks, verdicts) over the peer's default ladder:
 * N samples at 100 kS/s (synthetic: the peer's five tones plus seeded noise), 100 geometric rates down to
 * 2 kS/s, limit_denominator(1000). One operation = one sweep. {@code copyLadder} is the same-run baseline
 * (one copy of the recording per rate); report the modes as ratios to it, threads=2 against threads=1 and
 * the two FFT kernels against each other.
 * The machine is shared: figures are noisy.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgs = {"-Xms3g", "-Xmx3g", "--add-modules=jdk.incubator.vector"})
@Warmup(iterations = 2, time = 2)
@Measurement(iterations = 5, time = 2)
public class SweepBenchmark {
    static final double FS0 = 100_000;

    @Param({"1000000"})
    public int samples;

    @Param({"bare-kernel", "bare", "polyphase-default", "ideal", "modelled"})
    public String mode;

    @Param({"1", "2"})
    public int threads;

    /** FFT of the Welch segments: the Vector API kernel or JTransforms (see {@link FftKernelChoice}). */
    @Param({"vector-api", "jtransforms"})
    public String fftKernel;

    private double[] x;
    private double[] copy;
    private RateLadder ladder;
    private Resampling resampling;
    private SweepEngine engine;

    @Setup(Level.Trial)
    public void setUp() {
        FftKernelChoice.select(fftKernel);
        x = peerTones(samples, 12345);
        copy = new double[samples];
        ladder = RateLadder.geometric(FS0, FS0, 2000, 100, 1000);
        resampling = switch (mode) {
            case "bare-kernel" -> Resampling.bareKernel();
            case "bare" -> Resampling.bare();
            case "polyphase-default" -> Resampling.polyphaseDefault();
            case "ideal" -> Resampling.idealDecimator();
            case "modelled" -> Resampling.modelledFilter(org.foldbook.dsp.filter.AnalogLowPass.butterworth(4, 20_000));
            default -> throw new IllegalArgumentException(mode);
        };
        engine = new SweepEngine(threads);
    }

    @TearDown(Level.Trial)
    public void tearDown() {
        engine.close();
    }

    /** Synthetic recording: the peer's tones (Hz, amplitude, phase) plus Gaussian noise of std 0.01. */
    static double[] peerTones(int n, long seed) {
        double[][] tones = {{1000, 1.0, 0.1}, {4700, 0.5, 0.7}, {13300, 0.3, 1.3}, {27100, 0.2, 2.1}, {38900, 0.1, 2.9}};
        Random r = new Random(seed);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double v = 0.01 * r.nextGaussian();
            for (double[] t : tones) {
                v += t[1] * Math.sin(2 * Math.PI * t[0] * i / FS0 + t[2]);
            }
            x[i] = v;
        }
        return x;
    }

    @Benchmark
    public SweepResult sweep() {
        return engine.run(x, ladder, resampling, SpectrumSettings.DEFAULT, SweepProgress.NONE);
    }

    /** Baseline: copy the recording once per ladder rate. */
    @Benchmark
    public double[] copyLadder() {
        for (int i = 0; i < ladder.size(); i++) {
            System.arraycopy(x, 0, copy, 0, x.length);
        }
        return copy;
    }
}
