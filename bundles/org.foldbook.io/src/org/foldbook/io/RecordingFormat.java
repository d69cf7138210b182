package org.foldbook.io;

/** The container a recording was read from. */
public enum RecordingFormat {
    /** RIFF WAVE (up to 4 GiB). */
    WAV,
    /** RF64 / BW64 (EBU Tech 3306): WAVE with 64-bit sizes in a ds64 chunk. */
    RF64,
    /** Delimited text: comma, semicolon or tab separated. */
    DELIMITED_TEXT,
    /** Headerless or fixed-header binary samples described by a {@link org.foldbook.io.raw.RawLayout}. */
    RAW,
    /** A numeric dataset in an HDF5 file. */
    HDF5
}
