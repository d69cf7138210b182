package org.foldbook.dsp.resample;

import java.math.BigDecimal;
import java.math.BigInteger;

/**
 * An exact re-sampling ratio {@code up/down} (new rate = source rate · up / down), always reduced, with
 * {@code up >= 1} and {@code down >= 1}. Immutable.
 *
 * <p>Requested rates are mostly not integer fractions of the source rate; {@link #nearest(double, long)}
 * snaps a ratio given as a double to the closest fraction whose denominator is bounded. It follows
 * Python's {@code fractions.Fraction(r).limit_denominator(d)} step for step (exact value of the double,
 * continued-fraction convergents, then the better of the last convergent and the best semiconvergent,
 * ties to the convergent), so a rate grid written by the scipy peer and one built here agree exactly.
 */
public final class RateRatio implements Comparable<RateRatio> {

    private final long up;
    private final long down;

    private RateRatio(long up, long down) {
        this.up = up;
        this.down = down;
    }

    /**
     * The ratio {@code up/down}, reduced by the greatest common divisor.
     *
     * @throws IllegalArgumentException if either part is {@code <= 0}
     */
    public static RateRatio of(long up, long down) {
        if (up <= 0) {
            throw new IllegalArgumentException("up must be >= 1, was " + up);
        }
        if (down <= 0) {
            throw new IllegalArgumentException("down must be >= 1, was " + down);
        }
        long g = gcd(up, down);
        return new RateRatio(up / g, down / g);
    }

    /**
     * The fraction closest to {@code ratio} whose denominator is at most {@code maxDenominator}
     * (Python {@code Fraction(ratio).limit_denominator(maxDenominator)}). A ratio whose best fraction
     * would be 0 (ratio below 1/(2·maxDenominator) or so) is rejected: it is no sampling rate.
     *
     * @throws IllegalArgumentException if {@code ratio} is not finite and {@code > 0}, if
     *         {@code maxDenominator < 1}, or if the result would be 0
     */
    public static RateRatio nearest(double ratio, long maxDenominator) {
        if (!(ratio > 0) || Double.isInfinite(ratio)) {
            throw new IllegalArgumentException("ratio must be a finite number > 0, was " + ratio);
        }
        if (maxDenominator < 1) {
            throw new IllegalArgumentException("maxDenominator must be >= 1, was " + maxDenominator);
        }
        // Exact binary value of the double: n/d with d a power of two (BigDecimal(double) is exact).
        BigDecimal exact = new BigDecimal(ratio);
        BigInteger n0;
        BigInteger d0;
        if (exact.scale() <= 0) {
            n0 = exact.toBigIntegerExact();
            d0 = BigInteger.ONE;
        } else {
            n0 = exact.unscaledValue();
            d0 = BigInteger.TEN.pow(exact.scale());
            BigInteger g = n0.gcd(d0);
            n0 = n0.divide(g);
            d0 = d0.divide(g);
        }
        BigInteger max = BigInteger.valueOf(maxDenominator);
        BigInteger p;
        BigInteger q;
        if (d0.compareTo(max) <= 0) {
            p = n0;
            q = d0;
        } else {
            BigInteger p0 = BigInteger.ZERO;
            BigInteger q0 = BigInteger.ONE;
            BigInteger p1 = BigInteger.ONE;
            BigInteger q1 = BigInteger.ZERO;
            BigInteger n = n0;
            BigInteger d = d0;
            while (true) {
                BigInteger a = n.divide(d);
                BigInteger q2 = q0.add(a.multiply(q1));
                if (q2.compareTo(max) > 0) {
                    break;
                }
                BigInteger p2 = p0.add(a.multiply(p1));
                p0 = p1;
                q0 = q1;
                p1 = p2;
                q1 = q2;
                BigInteger r = n.subtract(a.multiply(d));
                n = d;
                d = r;
            }
            BigInteger k = max.subtract(q0).divide(q1);
            BigInteger bp = p0.add(k.multiply(p1));
            BigInteger bq = q0.add(k.multiply(q1));
            // |p1/q1 - x| <= |bp/bq - x|, compared exactly with x = n0/d0
            BigInteger e2 = p1.multiply(d0).subtract(n0.multiply(q1)).abs().multiply(bq);
            BigInteger e1 = bp.multiply(d0).subtract(n0.multiply(bq)).abs().multiply(q1);
            if (e2.compareTo(e1) <= 0) {
                p = p1;
                q = q1;
            } else {
                p = bp;
                q = bq;
            }
        }
        if (p.signum() == 0) {
            throw new IllegalArgumentException("ratio " + ratio + " is below the smallest fraction with denominator <= "
                    + maxDenominator);
        }
        if (p.bitLength() > 62 || q.bitLength() > 62) {
            throw new IllegalArgumentException("ratio " + ratio + " needs a numerator or denominator beyond 2^62 (maxDenominator "
                    + maxDenominator + ")");
        }
        return of(p.longValueExact(), q.longValueExact());
    }

    /** The rate that re-sampling {@code sourceRate} by this ratio gives ({@code sourceRate·up/down}, in that order). */
    public double effectiveRate(double sourceRate) {
        if (!(sourceRate > 0) || Double.isInfinite(sourceRate)) {
            throw new IllegalArgumentException("sourceRate must be a finite number > 0, was " + sourceRate);
        }
        return sourceRate * up / down;
    }

    /** Numerator (interpolation factor). */
    public long up() {
        return up;
    }

    /** Denominator (decimation factor). */
    public long down() {
        return down;
    }

    /** True when the new rate is the source rate divided by an integer (up = 1). */
    public boolean isIntegerDecimation() {
        return up == 1;
    }

    /** The ratio as a double (nearest to up/down). */
    public double toDouble() {
        return (double) up / down;
    }

    /**
     * Number of output samples for {@code inputLength} input samples: instants t_m = m·down/up (in input
     * samples) that lie before the end, i.e. {@code ceil(inputLength·up/down)} (scipy resample_poly's count).
     */
    public long outputLength(long inputLength) {
        if (inputLength < 0) {
            throw new IllegalArgumentException("inputLength must be >= 0, was " + inputLength);
        }
        return Math.ceilDiv(Math.multiplyExact(inputLength, up), down);
    }

    @Override
    public int compareTo(RateRatio o) {
        return Math.multiplyHigh(up, o.down) == Math.multiplyHigh(o.up, down)
                ? Long.compareUnsigned(up * o.down, o.up * down)
                : Long.compare(Math.multiplyHigh(up, o.down), Math.multiplyHigh(o.up, down));
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof RateRatio r && r.up == up && r.down == down;
    }

    @Override
    public int hashCode() {
        return Long.hashCode(up) * 31 + Long.hashCode(down);
    }

    @Override
    public String toString() {
        return up + "/" + down;
    }

    private static long gcd(long a, long b) {
        while (b != 0) {
            long t = a % b;
            a = b;
            b = t;
        }
        return a;
    }
}
