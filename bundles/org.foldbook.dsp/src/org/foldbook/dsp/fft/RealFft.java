package org.foldbook.dsp.fft;

import java.util.Arrays;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;

import org.foldbook.dsp.Check;
import org.jtransforms.fft.DoubleFFT_1D;
import org.visnow.jlargearrays.ConcurrencyUtils;

/**
 * Forward DFT of a real sequence of any length {@code n >= 1} (JTransforms' {@code DoubleFFT_1D} inside:
 * split radix for powers of two, mixed radix, Bluestein for large prime factors). Powers of two from
 * {@code 2 L^2} to {@value FftKernels#MAX_VECTOR_LENGTH} (L doubles a vector; 128 with AVX-512) run the
 * forward transforms in {@link VectorRealFft} instead when the JVM was started with
 * {@code --add-modules jdk.incubator.vector} (see {@link FftKernels}); {@link #kernel()} says which. Both
 * agree to rounding (about 1e-15 of the largest bin).
 *
 * <h2>Convention and layout</h2>
 * {@code X[k] = sum_{j=0}^{n-1} x[j] exp(-2 pi i j k / n)}, unnormalised (no 1/n). Only the one-sided half
 * is returned: bins {@code k = 0 .. n/2} (integer division), i.e. {@link #bins()} {@code = n/2 + 1} values;
 * bin k lies at {@code k * fs / n} Hz. {@code Im X[0] = 0}, and for even n also {@code Im X[n/2] = 0}. The
 * other half follows from {@code X[n-k] = conj(X[k])}. Outputs are either a {@link ComplexSpectrum}, or
 * caller-provided arrays {@code re[k]}, {@code im[k]} or {@code power[k] = |X[k]|^2}, each indexed by bin
 * ({@code length >= bins()}; entries past {@code bins()} are left alone).
 *
 * <h2>Threads</h2>
 * An operator is immutable and may be shared by any number of threads: the transform library keeps only
 * read-only twiddle tables in it after construction. Scratch memory is always the caller's ({@code work}
 * arrays) or allocated per call, so one operator shared by all sweep threads and one operator per thread
 * both work; each thread needs its own {@code work} array. The in-place methods allocate nothing unless the
 * library picks Bluestein's algorithm (when what is left of n after the factors 2, 3, 4, 5 is 211 or more),
 * which allocates its scratch on every call. The library itself splits a single transform over 2 threads
 * when {@code n >= 8192} (4 from 65536) if its global thread count allows (its default is the number of
 * processors, on a non-daemon pool). Call {@link #configureThreads(int)} once at start-up: use 1 when the
 * caller already runs transforms in parallel (the rate sweep), the core count for single big transforms.
 */
public final class RealFft {
    private final int n;
    private final DoubleFFT_1D fft;
    private final VectorRealFft vector; // null: the library does the forward transforms too

    private RealFft(int n, boolean mayUseVector) {
        this.n = n;
        this.fft = n > 1 ? new DoubleFFT_1D(n) : null;
        this.vector = mayUseVector ? FftKernels.vectorKernelFor(n) : null;
    }

    /** An operator for sequences of length {@code n >= 1}. */
    public static RealFft of(int n) {
        Check.atLeast("n", n, 1);
        return new RealFft(n, true);
    }

    /** An operator that never uses the vector kernel (the scalar path, for comparisons in tests). */
    static RealFft libraryOnly(int n) {
        Check.atLeast("n", n, 1);
        return new RealFft(n, false);
    }

    /** Which code computes the forward transforms: {@code "vector-api"} or {@code "jtransforms"}. */
    public String kernel() {
        return vector != null ? "vector-api" : "jtransforms";
    }

    /** Transform length n. */
    public int size() {
        return n;
    }

    /** Number of one-sided bins, {@code n/2 + 1}. */
    public int bins() {
        return n / 2 + 1;
    }

    /** One-sided spectrum of {@code x[0..n)}; {@code x} must have exactly n finite samples and is not changed. */
    public ComplexSpectrum forward(double[] x) {
        Check.finiteSamples("x", x);
        if (x.length != n) {
            throw new IllegalArgumentException("x.length must equal the transform size " + n + ", was " + x.length);
        }
        return forward(x, 0);
    }

    /** One-sided spectrum of {@code x[offset .. offset+n)}; {@code x} is not changed. */
    public ComplexSpectrum forward(double[] x, int offset) {
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        Check.slice("x", x.length, offset, n);
        double[] work = new double[n];
        System.arraycopy(x, offset, work, 0, n);
        requireFinite("x", work, offset);
        double[] re = new double[bins()];
        double[] im = new double[bins()];
        forwardInPlace(work, re, im);
        return new ComplexSpectrum(n, re, im);
    }

    /**
     * Zero-allocation transform: {@code work[0..n)} holds the samples on entry and is overwritten (its
     * contents afterwards are unspecified scratch); {@code re[k]}, {@code im[k]} receive bin k for
     * {@code k = 0 .. n/2}. {@code re} and {@code im} must be distinct from {@code work}. Non-finite samples
     * are detected from the result (no extra pass) and rejected without their index; callers that want the
     * index check their input first, as {@link #forward(double[], int)} and the spectrum operators do.
     */
    public void forwardInPlace(double[] work, double[] re, double[] im) {
        requireLength("work", work, n);
        requireLength("re", re, bins());
        requireLength("im", im, bins());
        if (vector != null) {
            vector.forward(work, re, im);
            requireFiniteDc(re[0]);
            return;
        }
        transform(work);
        if (n == 1) {
            re[0] = work[0];
            im[0] = 0;
            return;
        }
        int half = n / 2;
        re[0] = work[0];
        im[0] = 0;
        if ((n & 1) == 0) {
            for (int k = 1; k < half; k++) {
                re[k] = work[2 * k];
                im[k] = work[2 * k + 1];
            }
            re[half] = work[1];
            im[half] = 0;
        } else {
            for (int k = 1; k < half; k++) {
                re[k] = work[2 * k];
                im[k] = work[2 * k + 1];
            }
            re[half] = work[n - 1];
            im[half] = work[1];
        }
    }

    /**
     * Inverse of {@link #forwardInPlace}: {@code out[j] = (1/n) Σ_k X[k] exp(+2πi jk/n)} over all n bins, the
     * upper half taken as {@code X[n-k] = conj(X[k])} from {@code re[k]}, {@code im[k]} (k = 0 .. n/2).
     * {@code Im X[0]} and, for even n, {@code Im X[n/2]} are ignored (a real sequence has none). Allocates
     * nothing except on the library's Bluestein path (see the class); {@code out} must be distinct from
     * {@code re} and {@code im}.
     */
    public void inverseInPlace(double[] re, double[] im, double[] out) {
        requireLength("re", re, bins());
        requireLength("im", im, bins());
        requireLength("out", out, n);
        if (n == 1) {
            out[0] = re[0];
            return;
        }
        int half = n / 2;
        out[0] = re[0];
        for (int k = 1; k < half; k++) {
            out[2 * k] = re[k];
            out[2 * k + 1] = im[k];
        }
        if ((n & 1) == 0) {
            out[1] = re[half];
        } else {
            out[n - 1] = re[half];
            out[1] = im[half];
        }
        fft.realInverse(out, true);
    }

    /**
     * Zero-allocation power spectrum: {@code work[0..n)} holds the samples on entry and is overwritten;
     * {@code power[k] = |X[k]|^2} for {@code k = 0 .. n/2}, straight from the library's packed output.
     */
    public void powerInPlace(double[] work, double[] power) {
        requireLength("power", power, bins());
        Arrays.fill(power, 0, bins(), 0.0);
        accumulatePowerInPlace(work, power);
    }

    /**
     * As {@link #powerInPlace} but adds {@code |X[k]|^2} to {@code sum[k]} (for averaging periodograms
     * without a second pass).
     */
    public void accumulatePowerInPlace(double[] work, double[] sum) {
        requireLength("work", work, n);
        requireLength("sum", sum, bins());
        if (vector != null) {
            requireFiniteDc(vector.accumulatePower(work, sum));
            return;
        }
        transform(work);
        if (n == 1) {
            sum[0] += work[0] * work[0];
            return;
        }
        int half = n / 2;
        sum[0] += work[0] * work[0];
        for (int k = 1; k < half; k++) {
            double r = work[2 * k];
            double i = work[2 * k + 1];
            sum[k] += r * r + i * i;
        }
        if ((n & 1) == 0) {
            sum[half] += work[1] * work[1];
        } else {
            double r = work[n - 1];
            double i = work[1];
            sum[half] += r * r + i * i;
        }
    }

    /**
     * Transforms in place and rejects non-finite input at O(1) cost: the DC bin {@code work[0]} is the sum of
     * all samples through butterflies of weight 1, so a NaN or infinity anywhere (or a sum that overflows)
     * makes it non-finite.
     */
    private void transform(double[] work) {
        if (fft != null) {
            fft.realForward(work);
        }
        requireFiniteDc(work[0]);
    }

    private void requireFiniteDc(double dc) {
        if (!Double.isFinite(dc)) {
            throw new IllegalArgumentException("work[0.." + n + ") must hold finite samples of moderate size: "
                    + "the transform's DC bin came out " + dc);
        }
    }

    /** Throws if {@code a[0..n)} holds a NaN or infinity ({@code v * 0} is 0 exactly for finite v). */
    private void requireFinite(String name, double[] a, int reportedOffset) {
        double probe = 0;
        for (int i = 0; i < n; i++) {
            probe += a[i] * 0.0;
        }
        if (probe != 0) {
            for (int i = 0; i < n; i++) {
                if (!Double.isFinite(a[i])) {
                    throw new IllegalArgumentException(
                            name + "[" + (i + reportedOffset) + "] must be finite, was " + a[i]);
                }
            }
        }
    }

    private static void requireLength(String name, double[] a, int min) {
        if (a == null) {
            throw new IllegalArgumentException(name + " must not be null");
        }
        if (a.length < min) {
            throw new IllegalArgumentException(name + ".length must be >= " + min + ", was " + a.length);
        }
    }

    /**
     * Sets, once at start-up, how many threads the transform library may use inside one transform
     * (it splits transforms of {@code n >= 8192} only) and gives it a pool of daemon threads, so that no
     * library thread keeps the JVM alive. {@code threads = 1}: every transform runs on the calling thread,
     * the right choice when the caller parallelises over transforms itself. This is global state of the
     * library; do not change it while transforms run.
     */
    public static synchronized void configureThreads(int threads) {
        Check.atLeast("threads", threads, 1);
        ExecutorService previous = ConcurrencyUtils.getThreadPool();
        ConcurrencyUtils.setThreadPool(Executors.newCachedThreadPool(DAEMON_THREADS));
        ConcurrencyUtils.setNumberOfThreads(threads);
        previous.shutdown();
    }

    private static final ThreadFactory DAEMON_THREADS = new ThreadFactory() {
        private final AtomicInteger count = new AtomicInteger();

        @Override
        public Thread newThread(Runnable r) {
            Thread t = new Thread(r, "foldbook-fft-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        }
    };
}
