package org.foldbook.sweep;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.resample.RateRatio;

/**
 * An ordered list of target rates for a sweep, each snapped to an exact ratio of the source rate.
 *
 * <p>Requested rates come from a list, or from a from–to range with linear or geometric steps
 * (geometric steps are spaced as numpy's {@code geomspace}: equal steps of log10, both ends exact).
 * Each is snapped to the closest fraction {@code up/down} with {@code down <= maxDenominator}, by the
 * continued-fraction rule of Python's {@code Fraction.limit_denominator} ({@link RateRatio#nearest}); rates snapping to a ratio already present are dropped. A grid
 * written by the peer tool ({@code index up down fs} lines) is taken verbatim.
 */
public final class RateLadder {
    private final double sourceRate;
    private final List<RateStep> steps;

    private RateLadder(double sourceRate, List<RateStep> steps) {
        this.sourceRate = sourceRate;
        this.steps = Collections.unmodifiableList(steps);
    }

    /** Requested rates in the given order, snapped with {@code maxDenominator}. */
    public static RateLadder ofRates(double sourceRate, double[] rates, int maxDenominator) {
        Check.positive("sourceRate", sourceRate);
        if (rates == null || rates.length == 0) {
            throw new IllegalArgumentException("rates must hold at least one rate");
        }
        if (maxDenominator < 1) {
            throw new IllegalArgumentException("maxDenominator must be >= 1, was " + maxDenominator);
        }
        List<RateStep> out = new ArrayList<>();
        Set<Long> seen = new HashSet<>();
        for (int i = 0; i < rates.length; i++) {
            double r = rates[i];
            if (!(r > 0) || Double.isInfinite(r) || r > sourceRate) {
                throw new IllegalArgumentException("rates[" + i + "] must lie in (0, sourceRate=" + sourceRate
                        + "], was " + r);
            }
            RateRatio f;
            try {
                f = RateRatio.nearest(r / sourceRate, maxDenominator);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("rates[" + i + "] = " + r + ": " + e.getMessage(), e);
            }
            if (f.up() > Integer.MAX_VALUE || f.down() > Integer.MAX_VALUE) {
                throw new IllegalArgumentException("rates[" + i + "] = " + r + " needs ratio " + f
                        + ", beyond int range");
            }
            if (seen.add(f.up() << 32 | f.down())) {
                out.add(new RateStep(out.size(), (int) f.up(), (int) f.down(), sourceRate));
            }
        }
        return new RateLadder(sourceRate, out);
    }

    /** {@code steps} rates equally spaced from {@code from} to {@code to} (both included). */
    public static RateLadder linear(double sourceRate, double from, double to, int steps, int maxDenominator) {
        return ofRates(sourceRate, linspace(from, to, steps), maxDenominator);
    }

    /** {@code steps} rates geometrically spaced from {@code from} to {@code to}, as numpy.geomspace. */
    public static RateLadder geometric(double sourceRate, double from, double to, int steps, int maxDenominator) {
        Check.positive("from", from);
        Check.positive("to", to);
        double[] exps = linspace(Math.log10(from), Math.log10(to), steps);
        double[] rates = new double[steps];
        for (int i = 0; i < steps; i++) {
            rates[i] = Math.pow(10, exps[i]);
        }
        rates[0] = from;
        rates[steps - 1] = to;
        return ofRates(sourceRate, rates, maxDenominator);
    }

    /**
     * Reads a grid of {@code index up down fs} lines (blank lines and {@code #} comments skipped), as the
     * peer tool's {@code --write-grid} writes it. Ratios are used as written; {@code fs} must agree with
     * {@code sourceRate*up/down} to 1e-6 relative, which catches a grid written for another source rate.
     */
    public static RateLadder readGrid(Reader in, String name, double sourceRate) throws IOException {
        Check.positive("sourceRate", sourceRate);
        List<RateStep> out = new ArrayList<>();
        BufferedReader r = new BufferedReader(in);
        String line;
        int lineNo = 0;
        while ((line = r.readLine()) != null) {
            lineNo++;
            String t = line.strip();
            if (t.isEmpty() || t.startsWith("#")) {
                continue;
            }
            String[] f = t.split("\\s+");
            if (f.length != 4) {
                throw new IllegalArgumentException(name + " line " + lineNo + ": expected 'index up down fs', was '"
                        + t + "'");
            }
            int index;
            long up;
            long down;
            double fs;
            try {
                index = Integer.parseInt(f[0]);
                up = Long.parseLong(f[1]);
                down = Long.parseLong(f[2]);
                fs = Double.parseDouble(f[3]);
            } catch (NumberFormatException e) {
                throw new IllegalArgumentException(name + " line " + lineNo + ": not numbers: '" + t + "'");
            }
            if (index != out.size()) {
                throw new IllegalArgumentException(name + " line " + lineNo + ": index " + index + " out of order, expected "
                        + out.size());
            }
            if (up < 1 || down < 1 || up > Integer.MAX_VALUE || down > Integer.MAX_VALUE) {
                throw new IllegalArgumentException(name + " line " + lineNo + ": up/down must be positive ints, was "
                        + up + "/" + down);
            }
            long g = RateStep.gcd(up, down);
            RateStep step = new RateStep(index, (int) (up / g), (int) (down / g), sourceRate);
            if (Math.abs(step.effectiveRate() - fs) > 1e-6 * fs) {
                throw new IllegalArgumentException(name + " line " + lineNo + ": fs " + fs + " does not match "
                        + sourceRate + "*" + up + "/" + down + " = " + step.effectiveRate()
                        + " (grid written for another source rate?)");
            }
            out.add(step);
        }
        if (out.isEmpty()) {
            throw new IllegalArgumentException(name + ": no rate lines found");
        }
        return new RateLadder(sourceRate, out);
    }

    public double sourceRate() {
        return sourceRate;
    }

    /** The steps in ladder order (unmodifiable). */
    public List<RateStep> steps() {
        return steps;
    }

    public int size() {
        return steps.size();
    }

    public RateStep get(int index) {
        return steps.get(index);
    }

    /** {@code n} values from a to b inclusive, as numpy.linspace computes them (i*step + a, last = b). */
    static double[] linspace(double a, double b, int n) {
        if (n < 1) {
            throw new IllegalArgumentException("steps must be >= 1, was " + n);
        }
        double[] y = new double[n];
        if (n == 1) {
            y[0] = a;
            return y;
        }
        double step = (b - a) / (n - 1);
        for (int i = 0; i < n; i++) {
            y[i] = i * step + a;
        }
        y[n - 1] = b;
        return y;
    }

}
