package org.foldbook.audit;

/**
 * The kinds of audit finding, with stable codes (kept in saved JSON) and the severity each usually has.
 * A finding may raise or lower that severity when its numbers say so.
 */
public enum AuditKind {
    // from the notebook
    ALIAS_FREE_BAND(101, Severity.INFO, "alias-free band"),
    UNPROTECTED_BAND(102, Severity.ERROR, "band passed into the fold"),
    SETTING_MISSING(103, Severity.WARNING, "setting not recorded"),
    CALIBRATION_EXPIRED(104, Severity.WARNING, "calibration out of date"),
    RIG_NOT_VALID(105, Severity.ERROR, "rig not valid on the date"),
    FILE_DISAGREES(106, Severity.ERROR, "file disagrees with the notebook"),
    // from the samples
    FILE_UNREADABLE(201, Severity.ERROR, "recording not readable"),
    CHECKSUM_CHANGED(202, Severity.ERROR, "file changed since logged"),
    CLIPPING(203, Severity.ERROR, "samples at the rails"),
    DC_OFFSET(204, Severity.WARNING, "DC offset"),
    RANGE_USE(205, Severity.INFO, "range in use"),
    DROPOUT(206, Severity.ERROR, "dropout"),
    FLAT_RUN(207, Severity.WARNING, "flat run"),
    NON_FINITE(208, Severity.ERROR, "values that are not numbers"),
    ENERGY_AT_NYQUIST(209, Severity.WARNING, "energy near Nyquist"),
    // from the spectrum
    SUSPECT_PEAK(301, Severity.WARNING, "peak that may be folded"),
    FOLDED_NOISE(302, Severity.INFO, "folded noise");

    private final int code;
    private final Severity usual;
    private final String title;

    AuditKind(int code, Severity usual, String title) {
        this.code = code;
        this.usual = usual;
        this.title = title;
    }

    public int code() {
        return code;
    }

    /** The severity a finding of this kind has unless its numbers say otherwise. */
    public Severity usualSeverity() {
        return usual;
    }

    /** A short title for people. */
    public String title() {
        return title;
    }
}
