package org.foldbook.audit;

/** What an audit says about one spectral peak, in three steps. */
public enum PeakVerdict {
    /** No frequency above Nyquist that the front end passes could put a peak here at a plausible level. */
    TRUSTWORTHY("trustworthy"),
    /** Some frequency above Nyquist could put it here at a level the chain does not rule out. */
    COULD_BE_FOLDED("could be folded"),
    /** A higher-rate recording of the same rig shows a folded source dominating this frequency. */
    PROBABLY_FOLDED("probably folded");

    private final String words;

    PeakVerdict(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }
}
