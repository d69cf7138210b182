package org.foldbook.io.internal;

import java.io.Closeable;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.security.MessageDigest;

import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.Sha256;

/**
 * Reads a file front to back through one fixed buffer, feeding every byte into SHA-256 exactly once
 * (when hashing is on). Bytes before the sample data and after it are hashed too, so the digest covers
 * the whole file. The channel must be open for READ only.
 */
public final class SequentialInput implements Closeable {
    private final Path file;
    private final FileChannel channel;
    private final ByteBuffer buffer; // direct: the channel reads into it without an extra copy
    private final int capacity;
    private final MessageDigest digest;
    private long bufferFilePosition;
    private int pos;
    private int limit;
    private boolean atEof;
    private String finishedDigest;

    public SequentialInput(Path file, FileChannel channel, int bufferBytes, boolean sha256) throws IOException {
        this.file = file;
        this.channel = channel;
        this.buffer = ByteBuffer.allocateDirect(bufferBytes);
        this.capacity = bufferBytes;
        this.digest = sha256 ? Sha256.newDigest() : null;
        channel.position(0);
    }

    public Path file() {
        return file;
    }

    public FileChannel channel() {
        return channel;
    }

    /** The buffer; bytes {@code index() .. index() + available()} are unread. Do not move its position. */
    public ByteBuffer buffer() {
        return buffer;
    }

    /** Index in {@link #buffer()} of the next unread byte. */
    public int index() {
        return pos;
    }

    public int available() {
        return limit - pos;
    }

    /** File offset of the next unread byte. */
    public long position() {
        return bufferFilePosition + pos;
    }

    public void advance(int bytes) {
        if (bytes < 0 || bytes > limit - pos) {
            throw new IllegalStateException("advance " + bytes + " with " + (limit - pos) + " available");
        }
        pos += bytes;
    }

    /**
     * Makes at least {@code n} bytes available (n no larger than the buffer), reading more as needed.
     *
     * @return false if the file ends first (whatever could be read stays available)
     */
    public boolean fill(int n) throws IOException {
        if (n > capacity) {
            throw new IllegalArgumentException("n: " + n + " exceeds the buffer of " + capacity + " bytes");
        }
        if (limit - pos >= n) {
            return true;
        }
        int remaining = limit - pos;
        buffer.limit(limit).position(pos);
        buffer.compact();
        bufferFilePosition += pos;
        pos = 0;
        limit = remaining;
        while (limit < n && !atEof) {
            buffer.limit(capacity).position(limit);
            int read = channel.read(buffer);
            if (read < 0) {
                atEof = true;
            } else {
                if (digest != null) {
                    digest.update(buffer.duplicate().limit(limit + read).position(limit));
                }
                limit += read;
            }
        }
        return limit - pos >= n;
    }

    /** Reads (and hashes) forward up to file offset {@code target}. */
    public void skipTo(long target) throws IOException {
        while (position() < target) {
            if (available() == 0 && !fill(1)) {
                throw RecordingFormatException.atByte(file, position(), "file ends before offset " + target);
            }
            long step = Math.min(available(), target - position());
            advance((int) step);
        }
    }

    /**
     * Reads the rest of the file, completing the digest.
     *
     * @return the SHA-256 hex digest, or null if hashing is off
     */
    public String finishDigest() throws IOException {
        if (digest == null) {
            return null;
        }
        if (finishedDigest == null) {
            while (!atEof) {
                pos = limit;
                fill(1);
            }
            pos = limit;
            finishedDigest = Sha256.hex(digest.digest());
        }
        return finishedDigest;
    }

    public boolean hashing() {
        return digest != null;
    }

    @Override
    public void close() throws IOException {
        channel.close();
    }
}
