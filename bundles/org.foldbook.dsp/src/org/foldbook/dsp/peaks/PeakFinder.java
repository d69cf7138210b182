package org.foldbook.dsp.peaks;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Objects;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.spectrum.AmplitudeSpectrum;
import org.foldbook.dsp.spectrum.Decibels;
import org.foldbook.dsp.spectrum.PowerSpectrum;
import org.foldbook.dsp.window.Window;

/**
 * Finds peaks in a spectrum given as levels in dB, bin k at {@code k * binHz}. The rules, applied in this
 * order as {@code scipy.signal.find_peaks} applies its own:
 * <ol>
 * <li>local maxima ({@code find_peaks}' definition: strictly higher than both neighbours, a flat top counts
 * once at its middle; bin 0 and the last bin are never peaks);</li>
 * <li>optional: level at least {@code aboveFloorDb} over a running-median noise floor
 * ({@link NoiseFloor#runningMedian}) and over a fixed level (e.g. a quantiser's noise density), the
 * analogue of {@code find_peaks}' {@code height};</li>
 * <li>minimum separation in bins ({@code find_peaks}' {@code distance}: higher peaks win);</li>
 * <li>prominence {@code >= prominenceDb} ({@code find_peaks}' {@code prominence}, computed over the whole
 * spectrum).</li>
 * </ol>
 * With the floor off and separation 1 the bins found are exactly those of
 * {@code find_peaks(levels, prominence=prominenceDb)}. Then each peak gets a {@link SubBin} estimate.
 * An operator is immutable and thread-safe.
 */
public final class PeakFinder {
    private final double prominenceDb;
    private final int minSeparationBins;
    private final int floorWindowBins; // 0: no floor
    private final double aboveFloorDb;
    private final double minimumLevelDb; // -inf: none
    private final SubBin subBin;
    private final KernelRatio kernel; // for WINDOW_KERNEL

    private PeakFinder(Builder b) {
        this.prominenceDb = b.prominenceDb;
        this.minSeparationBins = b.minSeparationBins;
        this.floorWindowBins = b.floorWindowBins;
        this.aboveFloorDb = b.aboveFloorDb;
        this.minimumLevelDb = b.minimumLevelDb;
        this.subBin = b.subBin;
        this.kernel = b.subBin == SubBin.WINDOW_KERNEL ? new KernelRatio(b.window) : null;
    }

    /** Prominence threshold 10 dB, no floor, separation 1 bin, bin centres. */
    public static Builder builder() {
        return new Builder();
    }

    /** Peaks of a power estimate, levels in dB re 1 of its {@link PowerSpectrum#valueUnit()}. */
    public List<SpectralPeak> find(PowerSpectrum spectrum) {
        return findInPower(spectrum.values(), spectrum.bins(), spectrum.binWidth());
    }

    /** Peaks of an amplitude spectrum, levels in dB re 1 of its {@link AmplitudeSpectrum#valueUnit()}. */
    public List<SpectralPeak> find(AmplitudeSpectrum spectrum) {
        return findInLevels(spectrum.levelsDb(1.0), spectrum.bins(), spectrum.binWidth());
    }

    /**
     * Peaks of {@code power[0..count)} (unit² or unit²/Hz), converted to {@code 10 log10(max(p, 1e-300))}
     * dB first, as the sweep's reference pipeline does.
     */
    public List<SpectralPeak> findInPower(double[] power, int count, double binHz) {
        requireCount(power, count);
        double[] levels = new double[count];
        for (int k = 0; k < count; k++) {
            double p = power[k];
            if (!(p >= 0) || Double.isInfinite(p)) {
                throw new IllegalArgumentException("power[" + k + "] must be finite and >= 0, was " + p);
            }
        }
        Decibels.powerToDb(power, levels, count);
        return findInLevels(levels, count, binHz);
    }

    /** Peaks of {@code levelsDb[0..count)}, finite dB levels (power or amplitude, any reference). */
    public List<SpectralPeak> findInLevels(double[] levelsDb, int count, double binHz) {
        requireCount(levelsDb, count);
        Check.positive("binHz", binHz);
        for (int k = 0; k < count; k++) {
            if (!Double.isFinite(levelsDb[k])) {
                throw new IllegalArgumentException("levelsDb[" + k + "] must be finite, was " + levelsDb[k]);
            }
        }
        int[] peaks = PeakShapes.localMaxima(levelsDb, count);
        double[] floor = null;
        if (floorWindowBins > 0) {
            floor = NoiseFloor.runningMedian(levelsDb, count, floorWindowBins);
            peaks = keep(peaks, floorMask(levelsDb, floor, peaks));
        }
        if (minimumLevelDb > Double.NEGATIVE_INFINITY) {
            boolean[] high = new boolean[peaks.length];
            for (int p = 0; p < peaks.length; p++) {
                high[p] = levelsDb[peaks[p]] >= minimumLevelDb;
            }
            peaks = keep(peaks, high);
        }
        peaks = keep(peaks, PeakShapes.selectByDistance(levelsDb, peaks, minSeparationBins));
        double[] prom = PeakShapes.prominences(levelsDb, count, peaks, null, null);
        List<SpectralPeak> out = new ArrayList<>();
        for (int p = 0; p < peaks.length; p++) {
            if (!(prom[p] >= prominenceDb)) {
                continue;
            }
            int k = peaks[p];
            double offset = 0;
            double level = levelsDb[k];
            if (subBin == SubBin.GAUSSIAN) {
                double a = levelsDb[k - 1];
                double b = levelsDb[k];
                double c = levelsDb[k + 1];
                double den = a - 2 * b + c;
                if (den < 0) {
                    offset = 0.5 * (a - c) / den;
                    level = b - 0.25 * (a - c) * offset;
                }
            } else if (subBin == SubBin.WINDOW_KERNEL) {
                double left = levelsDb[k - 1];
                double right = levelsDb[k + 1];
                int side = right >= left ? 1 : -1;
                double ratio = Math.pow(10, (Math.max(left, right) - levelsDb[k]) / 20);
                double d = kernel.offsetForRatio(ratio);
                offset = side * d;
                level = levelsDb[k] + kernel.lossDb(d);
            }
            out.add(new SpectralPeak(k, (k + offset) * binHz, level, levelsDb[k], prom[p],
                    floor == null ? Double.NaN : floor[k]));
        }
        return Collections.unmodifiableList(out);
    }

    private boolean[] floorMask(double[] levels, double[] floor, int[] peaks) {
        boolean[] keep = new boolean[peaks.length];
        for (int p = 0; p < peaks.length; p++) {
            keep[p] = levels[peaks[p]] - floor[peaks[p]] >= aboveFloorDb;
        }
        return keep;
    }

    private static int[] keep(int[] peaks, boolean[] mask) {
        int m = 0;
        int[] out = new int[peaks.length];
        for (int p = 0; p < peaks.length; p++) {
            if (mask[p]) {
                out[m++] = peaks[p];
            }
        }
        return Arrays.copyOf(out, m);
    }

    private static void requireCount(double[] a, int count) {
        if (a == null) {
            throw new IllegalArgumentException("spectrum array must not be null");
        }
        if (count < 1 || count > a.length) {
            throw new IllegalArgumentException("count must lie in [1, " + a.length + "], was " + count);
        }
    }

    /**
     * {@code g(d) = |W(1-d)| / |W(d)|} of a window on {@code d in [0, 1/2]}, tabulated at 257 points from the
     * window's own transform and inverted by linear interpolation (table step 1/512 bin: inversion error
     * below 1e-5 bin for the windows of this package), with the scalloping loss {@code |W(d)|/W(0)}.
     */
    static final class KernelRatio {
        private static final int STEPS = 256;
        private final double[] ratio = new double[STEPS + 1];
        private final double[] lossDb = new double[STEPS + 1];

        KernelRatio(Window window) {
            double w0 = window.transformMagnitude(0);
            for (int i = 0; i <= STEPS; i++) {
                double d = 0.5 * i / STEPS;
                double main = window.transformMagnitude(d);
                ratio[i] = window.transformMagnitude(1 - d) / main;
                lossDb[i] = -20 * Math.log10(main / w0);
                if (i > 0 && !(ratio[i] > ratio[i - 1])) {
                    throw new IllegalArgumentException("window " + window
                            + " has no monotonic main lobe over the first bin: no kernel estimate");
                }
            }
        }

        /** Offset d in [0, 1/2] whose ratio is {@code r} (clamped to the table's range). */
        double offsetForRatio(double r) {
            if (r <= ratio[0]) {
                return 0;
            }
            if (r >= ratio[STEPS]) {
                return 0.5;
            }
            int lo = 0;
            int hi = STEPS;
            while (hi - lo > 1) {
                int mid = (lo + hi) >>> 1;
                if (ratio[mid] <= r) {
                    lo = mid;
                } else {
                    hi = mid;
                }
            }
            double t = (r - ratio[lo]) / (ratio[hi] - ratio[lo]);
            return 0.5 * (lo + t) / STEPS;
        }

        /** Scalloping loss (positive dB) at offset d, linearly interpolated. */
        double lossDb(double d) {
            double pos = d * 2 * STEPS;
            int i = Math.min(STEPS - 1, (int) pos);
            double t = pos - i;
            return lossDb[i] + t * (lossDb[i + 1] - lossDb[i]);
        }
    }

    /** Configures a {@link PeakFinder}. */
    public static final class Builder {
        private double prominenceDb = 10;
        private int minSeparationBins = 1;
        private int floorWindowBins;
        private double aboveFloorDb;
        private double minimumLevelDb = Double.NEGATIVE_INFINITY;
        private SubBin subBin = SubBin.NONE;
        private Window window;

        private Builder() {
        }

        /** Minimum prominence in dB, {@code >= 0}. */
        public Builder prominenceDb(double value) {
            this.prominenceDb = Check.nonNegative("prominenceDb", value);
            return this;
        }

        /** Peaks closer than this many bins: only the highest stays; {@code >= 1} (1: no constraint). */
        public Builder minSeparationBins(int value) {
            this.minSeparationBins = Check.atLeast("minSeparationBins", value, 1);
            return this;
        }

        /**
         * Keep only peaks at least {@code aboveDb} over a running median of {@code windowBins} (odd, >= 3)
         * bins.
         */
        public Builder noiseFloor(int windowBins, double aboveDb) {
            Check.atLeast("windowBins", windowBins, 3);
            if ((windowBins & 1) == 0) {
                throw new IllegalArgumentException("windowBins must be odd, was " + windowBins);
            }
            this.floorWindowBins = windowBins;
            this.aboveFloorDb = Check.finite("aboveDb", aboveDb);
            return this;
        }

        /** Keep only peaks whose bin level is at least {@code levelDb} (finite, or −∞ for no such rule). */
        public Builder minimumLevelDb(double levelDb) {
            if (Double.isNaN(levelDb) || levelDb == Double.POSITIVE_INFINITY) {
                throw new IllegalArgumentException("levelDb must be finite or -infinity, was " + levelDb);
            }
            this.minimumLevelDb = levelDb;
            return this;
        }

        /** {@link SubBin#NONE} or {@link SubBin#GAUSSIAN}. */
        public Builder subBin(SubBin value) {
            Objects.requireNonNull(value, "subBin");
            if (value == SubBin.WINDOW_KERNEL) {
                throw new IllegalArgumentException("subBin WINDOW_KERNEL needs the window: use windowKernel(window)");
            }
            this.subBin = value;
            this.window = null;
            return this;
        }

        /** {@link SubBin#WINDOW_KERNEL} for spectra computed with {@code window}. */
        public Builder windowKernel(Window value) {
            this.window = Objects.requireNonNull(value, "window");
            this.subBin = SubBin.WINDOW_KERNEL;
            return this;
        }

        public PeakFinder build() {
            return new PeakFinder(this);
        }
    }
}
