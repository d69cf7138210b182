package org.foldbook.dsp.resample;

/**
 * A band (Hz) where a simulation cannot honour the chain it models, and by how much, in words for the
 * user: e.g. content the source rate could not hold, or the faded edge of the source band.
 *
 * @param fromHz        lower edge of the uncertain band
 * @param toHz          upper edge ({@link Double#POSITIVE_INFINITY} when it has none)
 * @param uncertaintyDb how far, at most, the simulated level there may lie from the real chain's
 *                      ({@link Double#POSITIVE_INFINITY} when content may be missing altogether)
 * @param text          the warning as a sentence
 */
public record SimulationWarning(double fromHz, double toHz, double uncertaintyDb, String text) {
    public SimulationWarning {
        if (!(fromHz >= 0) || !(toHz >= fromHz)) {
            throw new IllegalArgumentException("band must satisfy 0 <= fromHz <= toHz, was " + fromHz + " .. " + toHz);
        }
        if (!(uncertaintyDb >= 0)) {
            throw new IllegalArgumentException("uncertaintyDb must be >= 0, was " + uncertaintyDb);
        }
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("text must say what is uncertain, was " + text);
        }
    }
}
