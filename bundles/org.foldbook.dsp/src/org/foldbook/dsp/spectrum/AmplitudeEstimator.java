package org.foldbook.dsp.spectrum;

import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.fft.RealFft;
import org.foldbook.dsp.window.Window;

/**
 * Amplitude spectrum of one block of n samples (Heinzel, Rüdiger, Schilling 2002, section 9, "linear
 * spectrum"): the block is detrended, windowed by w, transformed, and
 * {@code A[k] = 2 |X[k]| / S1} for {@code 1 <= k <= (n-1)/2}, {@code A[k] = |X[k]| / S1} for DC and, n even,
 * the Nyquist bin n/2, with {@code S1 = sum(w)} (coherent gain times n); {@link AmplitudeScale#RMS} divides
 * the doubled bins by sqrt 2. Immutable and thread-safe; the zero-allocation entry takes the caller's work
 * array.
 */
public final class AmplitudeEstimator {
    private final Window window;
    private final AmplitudeScale scale;
    private final Detrend detrend;
    private final RealFft fft;
    private final WindowedSegment segment;

    private AmplitudeEstimator(Window window, AmplitudeScale scale, Detrend detrend) {
        this.window = window;
        this.scale = scale;
        this.detrend = detrend;
        this.fft = RealFft.of(window.length());
        this.segment = new WindowedSegment(window, detrend);
    }

    /**
     * An estimator for blocks of {@code window.length()} samples.
     *
     * @param detrend usually {@link Detrend#NONE} (keeps the DC bin) or {@link Detrend#CONSTANT}
     */
    public static AmplitudeEstimator of(Window window, AmplitudeScale scale, Detrend detrend) {
        Objects.requireNonNull(window, "window");
        Objects.requireNonNull(scale, "scale");
        Objects.requireNonNull(detrend, "detrend");
        if (!(window.sum() > 0)) {
            throw new IllegalArgumentException("window " + window + " must have a positive sum, was " + window.sum());
        }
        return new AmplitudeEstimator(window, scale, detrend);
    }

    /** Block length n. */
    public int blockLength() {
        return window.length();
    }

    /** {@code n/2 + 1}. */
    public int bins() {
        return fft.bins();
    }

    public Window window() {
        return window;
    }

    public AmplitudeScale scale() {
        return scale;
    }

    public Detrend detrend() {
        return detrend;
    }

    /** Spectrum of {@code x[offset .. offset+n)} in {@code unit} at {@code sampleRate} Hz. */
    public AmplitudeSpectrum amplitude(double[] x, int offset, double sampleRate, Unit unit) {
        Objects.requireNonNull(unit, "unit");
        Check.positive("sampleRate", sampleRate);
        double[] out = new double[bins()];
        amplitudeInto(x, offset, new double[blockLength()], out);
        return new AmplitudeSpectrum(out, sampleRate, blockLength(), scale, unit);
    }

    /** Spectrum of the whole of {@code x}, whose length must be the block length. */
    public AmplitudeSpectrum amplitude(double[] x, double sampleRate, Unit unit) {
        if (x != null && x.length != blockLength()) {
            throw new IllegalArgumentException("x.length must equal the block length " + blockLength()
                    + ", was " + x.length);
        }
        return amplitude(x, 0, sampleRate, unit);
    }

    /**
     * Zero-allocation: writes {@code out[0 .. n/2]} from {@code x[offset .. offset+n)}; {@code work} (length
     * {@code >= n}) is scratch.
     */
    public void amplitudeInto(double[] x, int offset, double[] work, double[] out) {
        int n = blockLength();
        if (x == null) {
            throw new IllegalArgumentException("x must not be null");
        }
        if (x.length == 0) {
            throw new IllegalArgumentException("x must not be empty");
        }
        Check.slice("x", x.length, offset, n);
        if (work == null || work.length < n) {
            throw new IllegalArgumentException("work.length must be >= " + n + ", was "
                    + (work == null ? "null" : String.valueOf(work.length)));
        }
        if (out == null || out.length < bins()) {
            throw new IllegalArgumentException("out.length must be >= " + bins() + ", was "
                    + (out == null ? "null" : String.valueOf(out.length)));
        }
        segment.prepare(x, offset, work);
        fft.powerInPlace(work, out);
        double single = 1.0 / window.sum();
        double doubled = (scale == AmplitudeScale.PEAK ? 2.0 : Math.sqrt(2.0)) * single;
        int last = (n & 1) == 0 ? n / 2 - 1 : n / 2;
        out[0] = Math.sqrt(out[0]) * single;
        for (int k = 1; k <= last; k++) {
            out[k] = Math.sqrt(out[k]) * doubled;
        }
        if ((n & 1) == 0 && n > 1) {
            out[n / 2] = Math.sqrt(out[n / 2]) * single;
        }
    }
}
