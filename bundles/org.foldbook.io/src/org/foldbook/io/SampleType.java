package org.foldbook.io;

/** How one sample is stored in a binary recording (text formats report {@link #FLOAT64}: parsed doubles). */
public enum SampleType {
    UINT8(1, false, true),
    INT8(1, false, false),
    INT16(2, false, false),
    UINT16(2, false, true),
    /** 24-bit two's complement packed into 3 bytes. */
    INT24(3, false, false),
    INT32(4, false, false),
    UINT32(4, false, true),
    INT64(8, false, false),
    FLOAT32(4, true, false),
    FLOAT64(8, true, false);

    private final int bytes;
    private final boolean floating;
    private final boolean unsigned;

    SampleType(int bytes, boolean floating, boolean unsigned) {
        this.bytes = bytes;
        this.floating = floating;
        this.unsigned = unsigned;
    }

    public int bytes() {
        return bytes;
    }

    public boolean isFloatingPoint() {
        return floating;
    }

    public boolean isUnsigned() {
        return unsigned;
    }

    /** Parses the lower-case names used in raw sidecar files ("int16", "float32", ...). */
    public static SampleType fromName(String name) {
        for (SampleType t : values()) {
            if (t.name().equalsIgnoreCase(name)) {
                return t;
            }
        }
        throw new IllegalArgumentException("sample type: unknown value '" + name + "'; expected one of "
                + java.util.Arrays.toString(values()).toLowerCase(java.util.Locale.ROOT));
    }
}
