package org.foldbook.sweep;

/** What became of a spectral peak at one rate of a sweep. Every verdict comes with its reason in words. */
public enum Verdict {
    /** Seen at its true frequency (within tolerance): the rate keeps it as it is. */
    SURVIVES("survives"),
    /** Seen at the predicted apparent frequency |f − k·fs|, k ≠ 0: the rate aliases it. */
    FOLDS("folds"),
    /** Not seen, and the chain's predicted level at this rate lies below the detection floor: the chain removed it. */
    REMOVED("removed"),
    /** Not seen: nothing attenuated it much, but its own level lies below this rate's (folded) noise floor. */
    BURIED("buried"),
    /** Passes the chain above the floor but is not resolved beside a stronger peak (named, with the separation). */
    HIDDEN("hidden"),
    /** Lands on the same bin as another source peak's alias (or the other peak itself): two components in one. */
    COINCIDES("coincides"),
    /**
     * The source spectrum held components closer than its bin as one peak; at this rate's finer bins they
     * come apart into several peaks near the predicted frequency (all of them claimed by this source peak).
     */
    SPLITS("splits"),
    /** Lands within two bins of 0 Hz, where the spectrum shows no peak. */
    AT_DC("at-dc"),
    /** Lands within two bins of the new Nyquist frequency fs/2, where the spectrum shows no peak. */
    AT_NYQUIST("at-nyquist"),
    /** Predicted above the floor, clear of other peaks, and still not seen: a real disagreement. */
    MISSING("missing"),
    /** A peak at this rate that no source peak explains. */
    UNEXPLAINED("unexplained");

    private final String key;

    Verdict(String key) {
        this.key = key;
    }

    /** Name used in JSON and CSV. */
    public String key() {
        return key;
    }

    /** True for the verdicts of a component that is present in the re-sampled signal (seen or not). */
    public boolean present() {
        return this != REMOVED && this != BURIED;
    }
}
