package org.foldbook.bench.filter;

import java.util.Random;
import java.util.concurrent.TimeUnit;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.filter.SecondOrderSections;
import org.foldbook.dsp.filter.SosFilter;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * Throughput of the streaming SOS filter over a block, against a plain copy of the same array
 * (a memory-bandwidth baseline measured in the same run). Synthetic input.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 2, time = 1)
@Measurement(iterations = 3, time = 1)
@Fork(value = 1, jvmArgs = {"-Xms1g", "-Xmx1g", "--add-modules=jdk.incubator.vector"})
public class SosFilterBenchmark {

    @Param({"65536", "1048576"})
    int samples;

    /** Filter design: sections = ceil(order/2). */
    @Param({"butterworth4", "elliptic6", "elliptic10"})
    String design;

    /** "noise": Gaussian; "impulse": one impulse then silence (the case subnormal numbers would slow). */
    @Param({"noise", "impulse"})
    String input;

    double[] source;
    double[] work;
    SosFilter filter;

    @Setup(Level.Trial)
    public void setUp() {
        Random rnd = new Random(1);
        source = new double[samples];
        for (int i = 0; i < samples; i++) {
            source[i] = input.equals("noise") ? rnd.nextGaussian() : (i == 0 ? 1 : 0);
        }
        work = new double[samples];
        SecondOrderSections sos = switch (design) {
            case "butterworth4" -> AnalogLowPass.butterworth(4, 5_000).toDigital(100_000);
            case "butterworth8" -> AnalogLowPass.butterworth(8, 5_000).toDigital(100_000);
            case "elliptic6" -> AnalogLowPass.elliptic(6, 0.1, 90, 5_000).toDigital(100_000);
            case "elliptic10" -> AnalogLowPass.elliptic(10, 0.1, 120, 5_000).toDigital(100_000);
            default -> throw new IllegalStateException(design);
        };
        filter = sos.newFilter();
    }

    @Benchmark
    public double[] copyBaseline() {
        System.arraycopy(source, 0, work, 0, samples);
        return work;
    }

    @Benchmark
    public double[] filterBlock() {
        filter.reset(); // every call sees the same input from rest
        filter.filter(source, 0, work, 0, samples);
        return work;
    }

    @Benchmark
    public double[] filterSampleBySample() {
        filter.reset();
        for (int i = 0; i < samples; i++) {
            work[i] = filter.filterSample(source[i]);
        }
        return work;
    }
}
