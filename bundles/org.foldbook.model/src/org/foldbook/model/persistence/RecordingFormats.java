package org.foldbook.model.persistence;

import java.util.Locale;

import org.foldbook.io.RecordingDescriptor;
import org.foldbook.io.csv.DelimitedTextSettings;
import org.foldbook.io.hdf5.Hdf5Selection;
import org.foldbook.model.RecordingFormat;

/**
 * The one mapping between the notebook's format of a recording ({@link RecordingFormat}: what was logged)
 * and the reader vocabulary of {@code org.foldbook.io} ({@link org.foldbook.io.RecordingFormat}: what a
 * reader found in the file). The notebook keeps CSV and TSV apart because a person logs them so; the
 * readers have one delimited-text reader, and report RF64 apart from WAV because the container differs.
 */
public final class RecordingFormats {

    private RecordingFormats() {
    }

    /** The reader family that reads a recording logged as {@code logged}. */
    public static org.foldbook.io.RecordingFormat readerFormat(RecordingFormat logged) {
        return switch (require(logged)) {
        case WAV -> org.foldbook.io.RecordingFormat.WAV;
        case CSV, TSV -> org.foldbook.io.RecordingFormat.DELIMITED_TEXT;
        case RAW_BINARY -> org.foldbook.io.RecordingFormat.RAW;
        case HDF5 -> org.foldbook.io.RecordingFormat.HDF5;
        };
    }

    /**
     * What to tell {@link org.foldbook.io.Recordings#open} for a recording logged as {@code logged}:
     * delimited-text detection (CSV: ',' or ';' as the file shows, TSV: tab), HDF5 dataset detection, or
     * null where the file says it all (WAV/RF64 by its header, raw binary by its layout sidecar). The
     * notebook's declared rate is not put in: a text file's time column, when it has one, is the truth.
     */
    public static RecordingDescriptor readerSelection(RecordingFormat logged) {
        return switch (require(logged)) {
        case CSV -> DelimitedTextSettings.DETECT;
        case TSV -> DelimitedTextSettings.DETECT.withSeparators('\t', null);
        case HDF5 -> Hdf5Selection.DETECT;
        case WAV, RAW_BINARY -> null;
        };
    }

    /** Whether a file a reader found to be {@code found} may be the recording logged as {@code logged}. */
    public static boolean agree(RecordingFormat logged, org.foldbook.io.RecordingFormat found) {
        if (found == null) {
            throw new IllegalArgumentException("found: null");
        }
        org.foldbook.io.RecordingFormat expected = readerFormat(logged);
        return found == expected
                || (expected == org.foldbook.io.RecordingFormat.WAV && found == org.foldbook.io.RecordingFormat.RF64);
    }

    /** The notebook literal for a file a reader opened, as a person would log it. */
    public static RecordingFormat loggedFormat(org.foldbook.io.RecordingFormat found, String fileName) {
        if (found == null) {
            throw new IllegalArgumentException("found: null");
        }
        return switch (found) {
        case WAV, RF64 -> RecordingFormat.WAV;
        case DELIMITED_TEXT -> fileName != null && fileName.toLowerCase(Locale.ROOT).endsWith(".tsv")
                ? RecordingFormat.TSV : RecordingFormat.CSV;
        case RAW -> RecordingFormat.RAW_BINARY;
        case HDF5 -> RecordingFormat.HDF5;
        };
    }

    private static RecordingFormat require(RecordingFormat logged) {
        if (logged == null) {
            throw new IllegalArgumentException("logged: null (the recording names no format)");
        }
        return logged;
    }
}
