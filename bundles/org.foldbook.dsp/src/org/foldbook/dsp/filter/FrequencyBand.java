package org.foldbook.dsp.filter;

/** A closed frequency interval [lowHz, highHz], 0 ≤ lowHz ≤ highHz. */
public record FrequencyBand(double lowHz, double highHz) {
    public FrequencyBand {
        if (!(lowHz >= 0 && lowHz <= highHz) || Double.isInfinite(highHz)) {
            throw new IllegalArgumentException("band must satisfy 0 <= lowHz <= highHz < infinity, was [" + lowHz + ", "
                    + highHz + "]");
        }
    }

    public boolean contains(double f) {
        return f >= lowHz && f <= highHz;
    }
}
