package org.foldbook.io;

import java.io.IOException;

/**
 * Block-wise reading of one recording into caller buffers. Memory use is bounded by the reader's
 * buffer, not by the file size. The file is opened for reading only and never modified.
 *
 * <p>Frames are read strictly in order. Both read methods return the number of frames delivered
 * (at least 1 unless {@code maxFrames} is 0), or -1 once all {@link RecordingInfo#frameCount()} frames
 * have been delivered. A file that turns out to be shorter or malformed while reading raises
 * {@link RecordingFormatException}; there is no silent short read.
 *
 * <p>Not thread-safe: one reader, one thread.
 */
public interface RecordingReader extends AutoCloseable {

    RecordingInfo info();

    /**
     * Reads up to {@code maxFrames} frames, de-interleaved: sample {@code i} of channel {@code c} goes to
     * {@code channels[c][offset + i]}.
     *
     * @param channels one array per channel ({@code channels.length == info().channelCount()}), each with
     *                 room for {@code offset + maxFrames} values
     * @throws IllegalArgumentException if the buffers do not fit
     */
    int read(double[][] channels, int offset, int maxFrames) throws IOException;

    /**
     * Reads up to {@code maxFrames} frames interleaved: sample of channel {@code c} in frame {@code i}
     * goes to {@code interleaved[offset + i * channelCount + c]}.
     *
     * @throws IllegalArgumentException if the buffer does not fit
     */
    int readInterleaved(double[] interleaved, int offset, int maxFrames) throws IOException;

    /** Frames delivered so far. */
    long framePosition();

    /**
     * SHA-256 of the complete file content as lower-case hex. Uses the digest computed while streaming
     * when it covers the whole file; otherwise reads the file once more (read-only) without disturbing
     * the frame position.
     */
    String sha256Hex() throws IOException;

    /**
     * Compares the file's SHA-256 with a stored hex digest (case-insensitive).
     *
     * @throws RecordingFormatException naming both digests when they differ
     * @throws IllegalArgumentException if {@code expectedHex} is not 64 hex digits
     */
    default void verifySha256(String expectedHex) throws IOException {
        Sha256.requireHex(expectedHex);
        String actual = sha256Hex();
        if (!actual.equalsIgnoreCase(expectedHex)) {
            throw new RecordingFormatException(info().file(), "whole file",
                    "SHA-256 mismatch: stored " + expectedHex.toLowerCase(java.util.Locale.ROOT) + ", file has "
                            + actual + " (the file changed since it was registered, or it is a different file)");
        }
    }

    @Override
    void close() throws IOException;
}
