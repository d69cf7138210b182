package org.foldbook.sweep;

/**
 * One rung of a rate ladder: the target rate as the exact ratio {@code up/down} of the source rate.
 * Keeping the ratio exact (not the rate as a double) is what lets a resampler place every output
 * instant exactly and lets two tools compare the same grid.
 *
 * @param index      position in the ladder, 0 = first (usually the highest rate)
 * @param up         interpolation factor, &gt;= 1
 * @param down       decimation factor, &gt;= 1, coprime with {@code up}
 * @param sourceRate rate of the recording in samples per second
 */
public record RateStep(int index, int up, int down, double sourceRate) {

    public RateStep {
        if (index < 0) {
            throw new IllegalArgumentException("index must be >= 0, was " + index);
        }
        if (up < 1 || down < 1) {
            throw new IllegalArgumentException("up/down must both be >= 1, was " + up + "/" + down);
        }
        if (gcd(up, down) != 1) {
            throw new IllegalArgumentException("up/down must be in lowest terms, was " + up + "/" + down);
        }
        if (!(sourceRate > 0) || Double.isInfinite(sourceRate)) {
            throw new IllegalArgumentException("sourceRate must be a finite number > 0, was " + sourceRate);
        }
    }

    /** The rate actually simulated: {@code sourceRate * up / down}, samples per second. */
    public double effectiveRate() {
        return sourceRate * up / down;
    }

    /** Nyquist frequency of the effective rate, Hz. */
    public double nyquist() {
        return effectiveRate() / 2;
    }

    /** Output length for {@code n} input samples: {@code ceil(n*up/down)}, as scipy's resample_poly gives. */
    public long outputLength(long n) {
        return Math.ceilDiv(n * up, (long) down);
    }

    /** True when the rate keeps every {@code down}-th input sample (no interpolation needed). */
    public boolean isIntegerDecimation() {
        return up == 1;
    }

    /** The same ratio as the re-samplers take it. */
    public org.foldbook.dsp.resample.RateRatio ratio() {
        return org.foldbook.dsp.resample.RateRatio.of(up, down);
    }

    static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return Math.abs(a);
    }
}
