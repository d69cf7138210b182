package org.foldbook.bench.spectrum;

import java.util.concurrent.TimeUnit;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.foldbook.dsp.fft.RealFft;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/**
 * One real FFT of 2^12 .. 2^22 samples: {@link RealFft} (JTransforms inside) to a power spectrum and to
 * re/im arrays, Apache Commons Math's {@code FastFourierTransformer} on the same input, and a plain copy of
 * the same array as the memory-bandwidth baseline. Each RealFft call includes copying the input into its
 * work array (the transform is in place), which is what the copy baseline measures on its own.
 */
@State(Scope.Thread)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class FftBenchmark {
    @Param({"12", "14", "16", "18", "20", "22"})
    public int log2Size;

    /** Threads JTransforms may use inside one transform (it splits only n >= 8192). */
    @Param({"1"})
    public int fftThreads;

    private double[] x;
    private double[] work;
    private double[] re;
    private double[] im;
    private RealFft fft;
    private FastFourierTransformer commons;

    @Setup
    public void setUp() {
        RealFft.configureThreads(fftThreads); // daemon pool: no library thread outlives the fork
        int n = 1 << log2Size;
        x = BenchData.signal(n);
        work = new double[n];
        fft = RealFft.of(n);
        re = new double[fft.bins()];
        im = new double[fft.bins()];
        commons = new FastFourierTransformer(DftNormalization.STANDARD);
    }

    @Benchmark
    public double[] copyBaseline() {
        System.arraycopy(x, 0, work, 0, x.length);
        return work;
    }

    @Benchmark
    public double[] realFftPower() {
        System.arraycopy(x, 0, work, 0, x.length);
        fft.powerInPlace(work, re);
        return re;
    }

    @Benchmark
    public double[] realFftReIm() {
        System.arraycopy(x, 0, work, 0, x.length);
        fft.forwardInPlace(work, re, im);
        return im;
    }

    @Benchmark
    public Complex[] commonsMathFft() {
        return commons.transform(x, TransformType.FORWARD);
    }
}
