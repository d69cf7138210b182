package org.foldbook.sweep;

/** What became of a spectral peak at one rate of a sweep. */
public enum Verdict {
    /** Seen at its true frequency (within tolerance): the rate keeps it as it is. */
    SURVIVES,
    /** Seen at the predicted apparent frequency |f - k·fs|, k ≠ 0: the rate aliases it. */
    FOLDS,
    /** Not seen: the chain's filter (or the spectrum's floor) removed it. */
    SUPPRESSED,
    /** Lands within resolution of a stronger peak and cannot be told apart from it. */
    MERGES,
    /** A peak at this rate that no source peak explains. */
    UNEXPLAINED;

    /** Lower-case name used in JSON and CSV. */
    public String key() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
