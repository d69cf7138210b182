package org.foldbook.io;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 helpers. Every Java SE platform must provide SHA-256, so its absence is a broken JDK. */
public final class Sha256 {
    private Sha256() {
    }

    public static MessageDigest newDigest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    public static String hex(byte[] digest) {
        return HexFormat.of().formatHex(digest);
    }

    /** Streams the file (read-only, 1 MiB buffer) and returns its SHA-256 as lower-case hex. */
    public static String ofFile(Path file) throws IOException {
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            return ofChannel(ch);
        }
    }

    /** Hashes a channel from byte 0 to its end using positional reads (the channel position is untouched). */
    public static String ofChannel(FileChannel ch) throws IOException {
        MessageDigest md = newDigest();
        ByteBuffer buf = ByteBuffer.allocate(1 << 20);
        long pos = 0;
        while (true) {
            buf.clear();
            int n = ch.read(buf, pos);
            if (n < 0) {
                break;
            }
            md.update(buf.array(), 0, n);
            pos += n;
        }
        return hex(md.digest());
    }

    static void requireHex(String hex) {
        if (hex == null || hex.length() != 64 || !hex.chars().allMatch(c -> Character.digit(c, 16) >= 0)) {
            throw new IllegalArgumentException("expectedHex: '" + hex + "' is not a SHA-256 digest (64 hex digits)");
        }
    }
}
