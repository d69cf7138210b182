package org.foldbook.dsp.spectrum;

import java.util.Arrays;
import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.window.Symmetry;
import org.foldbook.dsp.window.Window;
import org.foldbook.dsp.window.WindowShape;

/**
 * Welch's averaged modified periodogram (P. D. Welch, IEEE Trans. AU-15(2), 1967), one-sided, with the
 * conventions of {@code scipy.signal.welch(x, fs, window, nperseg, noverlap, detrend, return_onesided=True,
 * scaling, average='mean')} exactly:
 * <ul>
 * <li>segments of n = {@link #segmentLength()} samples start every {@code step = n - overlap} samples at
 * 0, step, 2 step, ...; {@code K = (length - overlap) / step} segments (integer division), the samples
 * after the last whole segment are not used; no padding, FFT length n;</li>
 * <li>each segment is detrended ({@link Detrend}), multiplied by the window w, transformed;
 * {@code P[k] = c / K * sum over segments |X[k]|^2} with {@code c = 1/(fs S2)} (density) or
 * {@code 1/S1^2} (spectrum), {@code S1 = sum(w)}, {@code S2 = sum(w^2)};</li>
 * <li>bins {@code 1 .. (n-1)/2} are doubled (one-sided); DC and, for even n, the Nyquist bin n/2 are not.</li>
 * </ul>
 * Defaults of {@link #builder(int)}: periodic Hann, overlap n/2, constant detrend, density - scipy's.
 *
 * <p>An operator is immutable and thread-safe. {@link #psd(double[], double, Unit)} allocates its result;
 * the hot path {@link #psdInto(double[], int, int, double, Workspace, double[])} allocates nothing and
 * needs one {@link Workspace} per thread.
 */
public final class Welch {
    private final Window window;
    private final int n;
    private final int overlap;
    private final Detrend detrend;
    private final PsdScaling scaling;
    private final RealFft fft;
    private final WindowedSegment segment;

    private Welch(Window window, int overlap, Detrend detrend, PsdScaling scaling) {
        this.window = window;
        this.n = window.length();
        this.overlap = overlap;
        this.detrend = detrend;
        this.scaling = scaling;
        this.fft = RealFft.of(n);
        this.segment = new WindowedSegment(window, detrend);
    }

    /** A builder for segments of {@code segmentLength >= 1} samples. */
    public static Builder builder(int segmentLength) {
        return new Builder(segmentLength);
    }

    /** Segment (and FFT) length n. */
    public int segmentLength() {
        return n;
    }

    /** Samples shared by consecutive segments. */
    public int overlap() {
        return overlap;
    }

    /** {@code n - overlap}. */
    public int step() {
        return n - overlap;
    }

    public Window window() {
        return window;
    }

    public Detrend detrend() {
        return detrend;
    }

    public PsdScaling scaling() {
        return scaling;
    }

    /** Output bins, {@code n/2 + 1}. */
    public int bins() {
        return n / 2 + 1;
    }

    /** Segments averaged for {@code length} samples: {@code (length - overlap) / step}. */
    public int segmentCount(int length) {
        if (length < n) {
            throw new IllegalArgumentException(
                    "length must be >= the segment length " + n + ", was " + length);
        }
        return (length - overlap) / step();
    }

    /** Estimate over all of {@code x} (finite samples in {@code unit}) at {@code sampleRate} Hz. */
    public PowerSpectrum psd(double[] x, double sampleRate, Unit unit) {
        Objects.requireNonNull(unit, "unit");
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        if (x.length == 0) {
            throw new IllegalArgumentException("x must not be empty");
        }
        double[] out = new double[bins()];
        int k = psdInto(x, 0, x.length, sampleRate, new Workspace(n), out);
        return new PowerSpectrum(out, sampleRate, n, scaling, unit, k, window.enbwBins());
    }

    /**
     * Zero-allocation estimate over the slice {@code x[offset .. offset+length)}: writes
     * {@code out[0 .. n/2]} (the rest of {@code out} is untouched) and returns the number of segments
     * averaged. {@code ws} must have {@code capacity() >= n}; it is scratch, not shared between threads.
     *
     * @throws IllegalArgumentException for a slice outside {@code x}, {@code length < n}, a rate that is
     *                                  not finite and > 0, a too short {@code out}, or a non-finite sample
     *                                  (the message names its index in {@code x})
     */
    public int psdInto(double[] x, int offset, int length, double sampleRate, Workspace ws, double[] out) {
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        Check.slice("x", x.length, offset, length);
        Check.positive("sampleRate", sampleRate);
        int segments = segmentCount(length);
        Objects.requireNonNull(ws, "ws");
        if (ws.buffer.length < n) {
            throw new IllegalArgumentException("workspace capacity must be >= " + n + ", was " + ws.buffer.length);
        }
        if (out == null || out.length < bins()) {
            throw new IllegalArgumentException("out.length must be >= " + bins() + ", was "
                    + (out == null ? "null" : String.valueOf(out.length)));
        }
        double[] buf = ws.buffer;
        Arrays.fill(out, 0, bins(), 0.0);
        int step = step();
        for (int s = 0; s < segments; s++) {
            int start = offset + s * step;
            segment.prepare(x, start, buf);
            fft.accumulatePowerInPlace(buf, out);
        }
        double c = scaling == PsdScaling.DENSITY ? 1.0 / (sampleRate * window.sumOfSquares())
                : 1.0 / (window.sum() * window.sum());
        c /= segments;
        int last = (n & 1) == 0 ? n / 2 - 1 : n / 2; // last doubled bin
        out[0] *= c;
        double c2 = 2 * c;
        for (int k = 1; k <= last; k++) {
            out[k] *= c2;
        }
        if ((n & 1) == 0 && n > 1) {
            out[n / 2] *= c;
        }
        return segments;
    }

    /** Scratch for {@link #psdInto}: one per thread, reusable across operators of segment length <= capacity. */
    public static final class Workspace {
        final double[] buffer;

        /** Scratch for segment lengths up to {@code capacity}. */
        public Workspace(int capacity) {
            Check.atLeast("capacity", capacity, 1);
            this.buffer = new double[capacity];
        }

        public int capacity() {
            return buffer.length;
        }
    }

    /** Configures a {@link Welch}; every setter checks its argument at once. */
    public static final class Builder {
        private final int n;
        private int overlap;
        private WindowShape shape = WindowShape.HANN;
        private Window window;
        private Detrend detrend = Detrend.CONSTANT;
        private PsdScaling scaling = PsdScaling.DENSITY;

        private Builder(int segmentLength) {
            this.n = Check.atLeast("segmentLength", segmentLength, 1);
            this.overlap = segmentLength / 2;
        }

        /** Overlap in samples, {@code 0 <= overlap < segmentLength}; default {@code segmentLength / 2}. */
        public Builder overlap(int samples) {
            if (samples < 0 || samples >= n) {
                throw new IllegalArgumentException(
                        "overlap must lie in [0, " + (n - 1) + "] for segmentLength " + n + ", was " + samples);
            }
            this.overlap = samples;
            return this;
        }

        /** The shape, sampled periodic at the segment length (default Hann). */
        public Builder window(WindowShape value) {
            this.shape = Objects.requireNonNull(value, "window");
            this.window = null;
            return this;
        }

        /** An explicit window; its length must equal the segment length. */
        public Builder window(Window value) {
            Objects.requireNonNull(value, "window");
            if (value.length() != n) {
                throw new IllegalArgumentException(
                        "window length must equal segmentLength " + n + ", was " + value.length());
            }
            this.window = value;
            return this;
        }

        public Builder detrend(Detrend value) {
            this.detrend = Objects.requireNonNull(value, "detrend");
            return this;
        }

        public Builder scaling(PsdScaling value) {
            this.scaling = Objects.requireNonNull(value, "scaling");
            return this;
        }

        public Welch build() {
            Window win = window != null ? window : shape.create(n, Symmetry.PERIODIC);
            if (!(win.sum() > 0) || !(win.sumOfSquares() > 0)) {
                throw new IllegalArgumentException("window " + win + " must have a positive sum, was " + win.sum());
            }
            return new Welch(win, overlap, detrend, scaling);
        }
    }
}
