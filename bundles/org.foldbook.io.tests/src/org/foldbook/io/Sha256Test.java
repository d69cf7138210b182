package org.foldbook.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;

import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The one SHA-256 of the project (readers, notebook validation, the demo). Check values: the examples of
 * FIPS 180-2 appendix B (NIST's SHA-256 example vectors).
 */
class Sha256Test {

    @TempDir
    Path folder;

    @Test
    @DisplayName("SHA-256 of \"abc\" (FIPS 180-2 B.1) and of the empty message")
    void shortMessages() throws IOException {
        Path abc = Files.write(folder.resolve("abc"), "abc".getBytes(StandardCharsets.US_ASCII));
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", Sha256.ofFile(abc));
        Path empty = Files.write(folder.resolve("empty"), new byte[0]);
        assertEquals("e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855", Sha256.ofFile(empty));
    }

    @Test
    @DisplayName("SHA-256 of one million 'a' (FIPS 180-2 B.3): spans many read buffers")
    void millionA() throws IOException {
        Path file = folder.resolve("million-a");
        try (OutputStream out = Files.newOutputStream(file)) {
            byte[] block = new byte[1000];
            java.util.Arrays.fill(block, (byte) 'a');
            for (int i = 0; i < 1000; i++) {
                out.write(block);
            }
        }
        assertEquals("cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0", Sha256.ofFile(file));
        try (FileChannel ch = FileChannel.open(file, StandardOpenOption.READ)) {
            ch.position(123);
            assertEquals("cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0", Sha256.ofChannel(ch));
            assertEquals(123, ch.position(), "positional reads leave the channel where it was");
        }
    }

    @Test
    @DisplayName("a missing file is an IOException naming it")
    void missingFile() {
        Path gone = folder.resolve("gone.wav");
        IOException e = assertThrows(IOException.class, () -> Sha256.ofFile(gone));
        assertTrue(e.getMessage().contains("gone.wav"), e.getMessage());
    }
}
