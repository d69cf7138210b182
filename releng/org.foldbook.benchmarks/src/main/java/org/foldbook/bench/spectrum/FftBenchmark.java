package org.foldbook.bench.spectrum;

import java.util.concurrent.TimeUnit;

import org.apache.commons.math3.complex.Complex;
import org.apache.commons.math3.transform.DftNormalization;
import org.apache.commons.math3.transform.FastFourierTransformer;
import org.apache.commons.math3.transform.TransformType;
import org.foldbook.bench.sweep.FftKernelChoice;
import org.foldbook.dsp.fft.RealFft;
import org.jtransforms.fft.DoubleFFT_1D;
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
 * One real FFT of 2^10 .. 2^22 samples: {@link RealFft} to a power spectrum and to re/im arrays (its
 * Vector API kernel for 2^7 .. 2^13 when {@code fftKernel=vector-api}, JTransforms otherwise), JTransforms
 * called directly to the same power spectrum (the same-run baseline of the kernel), Apache Commons Math's
 * {@code FastFourierTransformer} on the same input, and a plain copy of the same array as the
 * memory-bandwidth baseline. Each in-place call includes copying the input into its work array.
 */
@State(Scope.Thread)
@Fork(value = 1, jvmArgs = "--add-modules=jdk.incubator.vector")
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
public class FftBenchmark {
    @Param({"10", "12", "13", "14", "16", "18", "20", "22"})
    public int log2Size;

    @Param({"vector-api"})
    public String fftKernel;

    /** Threads JTransforms may use inside one transform (it splits only n >= 8192). */
    @Param({"1"})
    public int fftThreads;

    private double[] x;
    private double[] work;
    private double[] re;
    private double[] im;
    private RealFft fft;
    private FastFourierTransformer commons;
    private DoubleFFT_1D library;

    @Setup
    public void setUp() {
        FftKernelChoice.select(fftKernel);
        RealFft.configureThreads(fftThreads); // daemon pool: no library thread outlives the fork
        int n = 1 << log2Size;
        x = BenchData.signal(n);
        work = new double[n];
        fft = RealFft.of(n);
        re = new double[fft.bins()];
        im = new double[fft.bins()];
        commons = new FastFourierTransformer(DftNormalization.STANDARD);
        library = new DoubleFFT_1D(n);
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

    /** JTransforms directly, to the same |X[k]|^2 as {@link #realFftPower} (RealFft's scalar path). */
    @Benchmark
    public double[] jtransformsPower() {
        System.arraycopy(x, 0, work, 0, x.length);
        library.realForward(work);
        int half = x.length / 2;
        re[0] = work[0] * work[0];
        for (int k = 1; k < half; k++) {
            re[k] = work[2 * k] * work[2 * k] + work[2 * k + 1] * work[2 * k + 1];
        }
        re[half] = work[1] * work[1];
        return re;
    }

    @Benchmark
    public Complex[] commonsMathFft() {
        return commons.transform(x, TransformType.FORWARD);
    }
}
