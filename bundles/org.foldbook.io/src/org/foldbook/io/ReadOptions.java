package org.foldbook.io;

/**
 * Tuning of a reader.
 *
 * @param sha256      compute SHA-256 of the whole file while streaming (on by default; it costs CPU time)
 * @param bufferBytes size of the read buffer; memory use of a reader is about this, independent of file size
 */
public record ReadOptions(boolean sha256, int bufferBytes) {
    public static final ReadOptions DEFAULT = new ReadOptions(true, 1 << 20);

    public ReadOptions {
        if (bufferBytes < 4096 || bufferBytes > (1 << 28)) {
            throw new IllegalArgumentException("bufferBytes: " + bufferBytes + " is outside 4096..2^28");
        }
    }

    public ReadOptions withSha256(boolean on) {
        return new ReadOptions(on, bufferBytes);
    }
}
