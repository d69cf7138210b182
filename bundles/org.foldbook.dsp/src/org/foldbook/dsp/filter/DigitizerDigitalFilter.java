package org.foldbook.dsp.filter;

import org.foldbook.dsp.Check;

/**
 * Magnitude model of the digital decimation filter built into a delta-sigma digitizer, from the few
 * figures a data sheet gives relative to the output rate fs: passband edge (e.g. 0.45·fs), stopband
 * edge (e.g. 0.55·fs) and stopband attenuation (e.g. 100 dB). The filter tracks the output rate, so
 * {@link #atOutputRate} gives the same filter at another rate.
 *
 * <p>The model is a mask, not a design: 0 dB up to the passband edge (ripple ignored), exactly the
 * stated attenuation from the stopband edge on, and between the edges a straight line in dB through
 * the attenuation at fs/2. Data sheets guarantee nothing inside the transition band; half-band
 * decimators are typically about 6 dB down at fs/2 (common practice, from memory), which is the
 * default here. It covers frequencies up to the modulator's own images, which the analog front end
 * must remove.
 */
public final class DigitizerDigitalFilter implements FrequencyResponse {

    /** Default attenuation at fs/2 of {@link #of(double, double, double, double)}. */
    public static final double DEFAULT_NYQUIST_DB = 6.0;

    private final double outputRateHz;
    private final double passbandFraction;
    private final double stopbandFraction;
    private final double stopbandDb;
    private final double nyquistDb;

    private DigitizerDigitalFilter(double outputRateHz, double passbandFraction, double stopbandFraction,
            double stopbandDb, double nyquistDb) {
        this.outputRateHz = Check.positive("outputRateHz", outputRateHz);
        this.passbandFraction = Check.inRange("passbandFraction", Check.positive("passbandFraction", passbandFraction), 0, 0.5);
        this.stopbandFraction = Check.inRange("stopbandFraction", Check.positive("stopbandFraction", stopbandFraction), 0.5, 1e6);
        if (!(stopbandFraction > passbandFraction)) {
            throw new IllegalArgumentException("stopbandFraction must exceed passbandFraction, was " + stopbandFraction);
        }
        this.stopbandDb = Check.positive("stopbandDb", stopbandDb);
        this.nyquistDb = Check.inRange("nyquistDb", nyquistDb, 0, stopbandDb);
        if (passbandFraction == 0.5 && nyquistDb != 0 || stopbandFraction == 0.5 && nyquistDb != stopbandDb) {
            throw new IllegalArgumentException("nyquistDb " + nyquistDb + " is inconsistent with edges at fs/2");
        }
    }

    /**
     * @param outputRateHz     the digitizer's output sample rate fs
     * @param passbandFraction passband edge / fs, in (0, 0.5]
     * @param stopbandFraction stopband edge / fs, ≥ 0.5 and above the passband edge
     * @param stopbandDb       attenuation from the stopband edge on, &gt; 0
     */
    public static DigitizerDigitalFilter of(double outputRateHz, double passbandFraction, double stopbandFraction,
            double stopbandDb) {
        Check.positive("stopbandDb", stopbandDb);
        return new DigitizerDigitalFilter(outputRateHz, passbandFraction, stopbandFraction, stopbandDb,
                Math.min(DEFAULT_NYQUIST_DB, stopbandDb));
    }

    /** As {@link #of(double, double, double, double)} with a stated attenuation at fs/2. */
    public static DigitizerDigitalFilter of(double outputRateHz, double passbandFraction, double stopbandFraction,
            double stopbandDb, double nyquistDb) {
        return new DigitizerDigitalFilter(outputRateHz, passbandFraction, stopbandFraction, stopbandDb, nyquistDb);
    }

    /** The same filter (same fractions of the rate) at another output rate. */
    public DigitizerDigitalFilter atOutputRate(double newOutputRateHz) {
        return new DigitizerDigitalFilter(newOutputRateHz, passbandFraction, stopbandFraction, stopbandDb, nyquistDb);
    }

    public double outputRateHz() {
        return outputRateHz;
    }

    public double passbandEdgeHz() {
        return passbandFraction * outputRateHz;
    }

    public double stopbandEdgeHz() {
        return stopbandFraction * outputRateHz;
    }

    public double stopbandDb() {
        return stopbandDb;
    }

    @Override
    public double attenuationDb(double frequencyHz) {
        Check.finite("frequencyHz", frequencyHz);
        double f = Math.abs(frequencyHz);
        double fp = passbandEdgeHz();
        double fn = 0.5 * outputRateHz;
        double fsb = stopbandEdgeHz();
        if (f <= fp) {
            return 0;
        }
        if (f >= fsb) {
            return stopbandDb;
        }
        if (f <= fn) {
            return nyquistDb * (f - fp) / (fn - fp);
        }
        return nyquistDb + (stopbandDb - nyquistDb) * (f - fn) / (fsb - fn);
    }

    @Override
    public double magnitude(double frequencyHz) {
        return Math.pow(10, -attenuationDb(frequencyHz) / 20);
    }

    @Override
    public double[] landmarksHz(double upToHz) {
        return java.util.stream.DoubleStream.of(passbandEdgeHz(), 0.5 * outputRateHz, stopbandEdgeHz())
                .filter(f -> f <= upToHz).toArray();
    }

    @Override
    public boolean attenuationNonDecreasing() {
        return true;
    }

    @Override
    public String toString() {
        return "digitizer digital filter at " + outputRateHz + " S/s: pass to " + passbandEdgeHz() + " Hz, "
                + stopbandDb + " dB from " + stopbandEdgeHz() + " Hz";
    }
}
