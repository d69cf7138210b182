package org.foldbook.io.csv;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CodingErrorAction;
import java.nio.file.Path;

import org.foldbook.io.RecordingFormatException;

/**
 * Splits bytes into lines (\n, \r\n or \r) with 1-based line numbers and decodes each line on its own,
 * so an invalid byte sequence is reported at its true line. Needs a charset in which CR and LF are the
 * single ASCII bytes (UTF-8, ISO-8859-x, windows-125x). Refuses lines over {@value #MAX_LINE} bytes and
 * NUL bytes, so a binary file mistaken for text fails fast and cannot exhaust memory.
 */
final class LineSource {
    static final int MAX_LINE = 1 << 16;

    private final Path file;
    private final InputStream in;
    private final CharsetDecoder decoder;
    private final byte[] buf = new byte[1 << 16];
    private final byte[] line = new byte[MAX_LINE];
    private int pos;
    private int lim;
    private long lineNumber;

    LineSource(Path file, InputStream in, Charset charset) {
        this.file = file;
        this.in = in;
        this.decoder = charset.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
    }

    static boolean asciiCompatible(Charset cs) {
        byte[] b = "\r\n,;\t.0".getBytes(cs);
        return java.util.Arrays.equals(b, new byte[] {13, 10, ',', ';', 9, '.', '0'});
    }

    /** Line number of the line last returned. */
    long lineNumber() {
        return lineNumber;
    }

    private int nextByte() throws IOException {
        if (pos == lim) {
            lim = in.read(buf, 0, buf.length);
            pos = 0;
            if (lim <= 0) {
                lim = 0;
                return -1;
            }
        }
        return buf[pos++] & 0xFF;
    }

    /** The next line without its terminator, or null at the end. */
    String next() throws IOException {
        int len = 0;
        int b = nextByte();
        if (b < 0) {
            return null;
        }
        while (b >= 0 && b != '\n' && b != '\r') {
            if (b == 0) {
                throw RecordingFormatException.atLine(file, lineNumber + 1, len + 1,
                        "NUL byte: this is a binary file, not delimited text");
            }
            if (len == MAX_LINE) {
                throw RecordingFormatException.atLine(file, lineNumber + 1, len + 1,
                        "line longer than " + MAX_LINE + " bytes");
            }
            line[len++] = (byte) b;
            b = nextByte();
        }
        if (b == '\r') {
            int after = nextByte();
            if (after >= 0 && after != '\n') {
                pos--; // lone CR ends the line; keep the byte after it (pos > 0 since it was just read)
            }
        }
        lineNumber++;
        try {
            return decoder.reset().decode(ByteBuffer.wrap(line, 0, len)).toString();
        } catch (CharacterCodingException e) {
            throw RecordingFormatException.atLine(file, lineNumber, 1,
                    "bytes that are not valid " + decoder.charset().name() + " text");
        }
    }
}
