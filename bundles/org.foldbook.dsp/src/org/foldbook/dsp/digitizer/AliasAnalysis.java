package org.foldbook.dsp.digitizer;

import java.util.List;
import java.util.function.DoubleFunction;

import org.foldbook.dsp.Check;
import org.foldbook.dsp.filter.AttenuationPoint;
import org.foldbook.dsp.filter.AttenuationSearch;
import org.foldbook.dsp.filter.FrequencyBand;
import org.foldbook.dsp.filter.FrequencyResponse;
import org.foldbook.dsp.fold.Folding;

/**
 * Alias figures of one acquisition chain: its response (sensor → amplifier → anti-alias filter →
 * digitizer filter, as one {@link FrequencyResponse}), the highest frequency the sensor passes, and
 * the attenuation an out-of-band component needs (see {@link IdealQuantiser#requiredAttenuationDb}).
 * Immutable; works for any sample rate.
 *
 * <p>Method, exact rather than by dense guessing: the set of under-attenuated frequencies in
 * [0, sensorMax] ({@link AttenuationSearch#bandsBelow}) does not depend on the rate, so it is found
 * once. At a rate fs, each under-attenuated band above fs/2 folds to apparent frequencies
 * |x − k·fs|; over an interval that is piecewise linear, so its least value is 0 if the interval
 * holds a multiple of fs, else at an end of the interval. The alias-free band is the least of
 * these, capped at fs/2.
 */
public final class AliasAnalysis {

    /** Most images (fold zones) a margin computation visits. */
    public static final long MAX_ZONES = 1_000_000;

    private final FrequencyResponse chain;
    private final double sensorMaxHz;
    private final double requiredDb;
    private final List<FrequencyBand> underAttenuated;

    private AliasAnalysis(FrequencyResponse chain, double sensorMaxHz, double requiredDb) {
        if (chain == null) {
            throw new IllegalArgumentException("chain must not be null");
        }
        this.chain = chain;
        this.sensorMaxHz = Check.positive("sensorMaxHz", sensorMaxHz);
        this.requiredDb = Check.nonNegative("requiredDb", requiredDb);
        this.underAttenuated = List.copyOf(AttenuationSearch.bandsBelow(chain, requiredDb, sensorMaxHz));
    }

    /**
     * @param chain       the whole chain's response
     * @param sensorMaxHz highest frequency the sensor passes (content above it is taken as absent)
     * @param requiredDb  attenuation required for an alias to be harmless, ≥ 0
     */
    public static AliasAnalysis of(FrequencyResponse chain, double sensorMaxHz, double requiredDb) {
        return new AliasAnalysis(chain, sensorMaxHz, requiredDb);
    }

    public FrequencyResponse chain() {
        return chain;
    }

    public double sensorMaxHz() {
        return sensorMaxHz;
    }

    public double requiredDb() {
        return requiredDb;
    }

    /** The parts of [0, sensorMax] attenuated by less than the requirement. */
    public List<FrequencyBand> underAttenuatedBands() {
        return underAttenuated;
    }

    /** The alias-free band at a sample rate. */
    public AliasFreeBand aliasFreeBand(double sampleRateHz) {
        Check.positive("sampleRateHz", sampleRateHz);
        double nyq = 0.5 * sampleRateHz;
        double band = nyq;
        double source = Double.NaN;
        for (FrequencyBand b : underAttenuated) {
            double lo = Math.max(b.lowHz(), nyq);
            double hi = b.highHz();
            if (hi <= nyq) {
                continue;
            }
            double kFirst = Math.ceil(lo / sampleRateHz);
            if (kFirst * sampleRateHz <= hi) {
                band = 0;
                source = kFirst * sampleRateHz;
                break;
            }
            double aLo = Folding.apparentHz(lo, sampleRateHz);
            double aHi = Folding.apparentHz(hi, sampleRateHz);
            if (aLo < band) {
                band = aLo;
                source = lo;
            }
            if (aHi < band) {
                band = aHi;
                source = hi;
            }
        }
        return new AliasFreeBand(sampleRateHz, nyq, band, source);
    }

    /** The protection margin of the chain for the band [0, bandHz] at a sample rate. */
    public ProtectionMargin protectionMargin(double sampleRateHz, double bandHz) {
        Check.positive("sampleRateHz", sampleRateHz);
        Check.inRange("bandHz", Check.nonNegative("bandHz", bandHz), 0, 0.5 * sampleRateHz);
        long zones = (long) Math.floor((sensorMaxHz + bandHz) / sampleRateHz);
        if (zones > MAX_ZONES) {
            throw new IllegalArgumentException("sampleRateHz " + sampleRateHz + " is too low for sensorMaxHz "
                    + sensorMaxHz + ": " + zones + " fold zones, at most " + MAX_ZONES);
        }
        AttenuationPoint worst = null;
        for (long k = 1; k <= zones; k++) {
            double lo = k * sampleRateHz - bandHz;
            double hi = Math.min(sensorMaxHz, k * sampleRateHz + bandHz);
            if (lo > sensorMaxHz) {
                break;
            }
            AttenuationPoint p = AttenuationSearch.minimum(chain, lo, hi);
            if (worst == null || p.attenuationDb() < worst.attenuationDb()) {
                worst = p;
            }
        }
        double nyqDb = chain.attenuationDb(0.5 * sampleRateHz);
        if (worst == null) {
            return new ProtectionMargin(sampleRateHz, bandHz, requiredDb, Double.NaN, Double.POSITIVE_INFINITY,
                    Double.POSITIVE_INFINITY, nyqDb);
        }
        return new ProtectionMargin(sampleRateHz, bandHz, requiredDb, worst.frequencyHz(), worst.attenuationDb(),
                worst.attenuationDb() - requiredDb, nyqDb);
    }

    /**
     * The lowest rate in [minRateHz, maxRateHz] that keeps [0, bandHz] alias-free for this (fixed) chain.
     * See {@link #lowestRate(DoubleFunction, double, double, double, double, double, double)}.
     */
    public RateSearchResult lowestRate(double bandHz, double minRateHz, double maxRateHz, double relativeTolerance) {
        return lowestRate(fs -> chain, sensorMaxHz, requiredDb, bandHz, minRateHz, maxRateHz, relativeTolerance);
    }

    /**
     * The lowest sample rate in [minRateHz, maxRateHz] at which [0, bandHz] is alias-free, for a chain
     * that may depend on the rate (a digitizer's built-in filter tracks its output rate).
     *
     * <p>Bisection on the rate, which assumes that once a rate is alias-free every higher rate is
     * too. That holds when the chain's attenuation does not decrease with frequency above the band
     * (RC, Butterworth, Bessel, Chebyshev I beyond its passband, the digitizer mask). With a rippling
     * stopband (elliptic, exposure box-car) isolated lower rates can also work ("band-pass sampling"
     * windows); the result is then a verified alias-free rate at a fail/pass boundary, not
     * necessarily the lowest one. The search starts at max(minRateHz, 2·bandHz) and stops when the bracket is
     * narrower than relativeTolerance × rate; the returned rate is the verified (upper) end.
     *
     * @param chainAtRate        the chain's response at a given output rate
     * @param relativeTolerance  in [1e-12, 0.1]
     */
    public static RateSearchResult lowestRate(DoubleFunction<? extends FrequencyResponse> chainAtRate,
            double sensorMaxHz, double requiredDb, double bandHz, double minRateHz, double maxRateHz,
            double relativeTolerance) {
        if (chainAtRate == null) {
            throw new IllegalArgumentException("chainAtRate must not be null");
        }
        Check.positive("sensorMaxHz", sensorMaxHz);
        Check.nonNegative("requiredDb", requiredDb);
        Check.positive("bandHz", bandHz);
        Check.positive("minRateHz", minRateHz);
        Check.positive("maxRateHz", maxRateHz);
        Check.inRange("relativeTolerance", relativeTolerance, 1e-12, 0.1);
        double lo = Math.max(minRateHz, 2 * bandHz);
        double hi = maxRateHz;
        if (!(hi >= lo)) {
            throw new IllegalArgumentException("maxRateHz must be >= max(minRateHz, 2·bandHz) = " + lo + ", was " + maxRateHz);
        }
        int evals = 0;
        evals++;
        if (isAliasFree(chainAtRate, sensorMaxHz, requiredDb, bandHz, lo)) {
            return new RateSearchResult(true, lo, 0, bandHz, evals);
        }
        evals++;
        if (!isAliasFree(chainAtRate, sensorMaxHz, requiredDb, bandHz, hi)) {
            return new RateSearchResult(false, Double.NaN, Double.NaN, bandHz, evals);
        }
        while (hi - lo > relativeTolerance * hi) {
            double mid = 0.5 * (lo + hi);
            evals++;
            if (isAliasFree(chainAtRate, sensorMaxHz, requiredDb, bandHz, mid)) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return new RateSearchResult(true, hi, hi - lo, bandHz, evals);
    }

    private static boolean isAliasFree(DoubleFunction<? extends FrequencyResponse> chainAtRate, double sensorMaxHz,
            double requiredDb, double bandHz, double fs) {
        FrequencyResponse r = chainAtRate.apply(fs);
        if (r == null) {
            throw new IllegalArgumentException("chainAtRate returned null for rate " + fs);
        }
        return of(r, sensorMaxHz, requiredDb).aliasFreeBand(fs).bandHz() >= bandHz;
    }
}
