package org.foldbook.audit;

/** How much a finding matters for a reanalysis, in rising order. */
public enum Severity {
    /** A figure worth knowing; nothing wrong. */
    INFO,
    /** The data can be used with care; the report says what to keep in mind. */
    WARNING,
    /** Part of the data cannot be trusted as it stands. */
    ERROR;

    /** The lower-case word used in reports, JSON and the command line. */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }
}
