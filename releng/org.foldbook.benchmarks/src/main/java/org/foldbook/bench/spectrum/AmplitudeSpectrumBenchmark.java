package org.foldbook.bench.spectrum;

import java.util.concurrent.TimeUnit;

import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.spectrum.AmplitudeEstimator;
import org.foldbook.dsp.spectrum.AmplitudeScale;
import org.foldbook.dsp.spectrum.Detrend;
import org.foldbook.dsp.window.WindowShape;
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
 * Amplitude spectrum (Hann, constant detrend, peak scale) of one block of 2^12 .. 2^22 samples through the
 * zero-allocation entry, against a plain copy of the same array.
 */
@Fork(value = 1, jvmArgs = "--add-modules=jdk.incubator.vector")
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class AmplitudeSpectrumBenchmark {
    @Param({"12", "14", "16", "18", "20", "22"})
    public int log2Size;

    @Param({"1"})
    public int fftThreads;

    private double[] x;
    private double[] work;
    private double[] out;
    private AmplitudeEstimator estimator;

    @Setup
    public void setUp() {
        RealFft.configureThreads(fftThreads);
        int n = 1 << log2Size;
        x = BenchData.signal(n);
        work = new double[n];
        estimator = AmplitudeEstimator.of(WindowShape.HANN.periodic(n), AmplitudeScale.PEAK, Detrend.CONSTANT);
        out = new double[estimator.bins()];
    }

    @Benchmark
    public double[] copyBaseline() {
        System.arraycopy(x, 0, work, 0, x.length);
        return work;
    }

    @Benchmark
    public double[] amplitudeSpectrum() {
        estimator.amplitudeInto(x, 0, work, out);
        return out;
    }
}
