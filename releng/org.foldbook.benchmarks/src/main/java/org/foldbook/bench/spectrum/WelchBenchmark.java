package org.foldbook.bench.spectrum;

import java.util.concurrent.TimeUnit;

import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.spectrum.Welch;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * Welch PSD (periodic Hann, 4096-point segments, 50 % overlap, constant detrend, density: the sweep's
 * settings) of 2^12 .. 2^22 samples through the zero-allocation entry, against a plain copy of the same
 * array. Segments per call: {@code (2^k - 2048) / 2048}, 1 for 2^12, 2047 for 2^22.
 */
@Fork(value = 1, jvmArgs = "--add-modules=jdk.incubator.vector")
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class WelchBenchmark {
    @Param({"12", "14", "16", "18", "20", "22"})
    public int log2Size;

    @Param({"4096"})
    public int segmentLength;

    private double[] x;
    private double[] copy;
    private double[] out;
    private Welch welch;
    private Welch.Workspace workspace;

    @Setup
    public void setUp() {
        RealFft.configureThreads(1); // segments are short: the library would not split them anyway
        int n = 1 << log2Size;
        x = BenchData.signal(n);
        copy = new double[n];
        welch = Welch.builder(Math.min(segmentLength, n)).build();
        workspace = new Welch.Workspace(welch.segmentLength());
        out = new double[welch.bins()];
    }

    @Benchmark
    public double[] copyBaseline() {
        System.arraycopy(x, 0, copy, 0, x.length);
        return copy;
    }

    @Benchmark
    public double[] welchPsd() {
        welch.psdInto(x, 0, x.length, 100_000.0, workspace, out);
        return out;
    }
}
