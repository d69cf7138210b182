package org.foldbook.demo;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes integer PCM WAV files (RIFF "WAVE", format tag 1, little-endian, interleaved frames) for the
 * demo notebook only: the io bundle reads recordings and never writes them. Samples are given as
 * fractions of full scale in [-1, 1] and rounded to the nearest code; values outside are clipped to
 * the largest code of each sign, as a real digitizer saturates.
 */
public final class PcmWavWriter {

    private PcmWavWriter() {
    }

    /**
     * Writes {@code channels[c][n]} (all channels the same length) at {@code sampleRateHz} with 16- or
     * 24-bit samples; returns the number of bytes written.
     */
    public static long write(Path file, int sampleRateHz, int bits, double[][] channels) throws IOException {
        if (bits != 16 && bits != 24) {
            throw new IllegalArgumentException("bits must be 16 or 24, was " + bits);
        }
        if (sampleRateHz <= 0) {
            throw new IllegalArgumentException("sampleRateHz must be positive, was " + sampleRateHz);
        }
        if (channels == null || channels.length == 0 || channels.length > 8) {
            throw new IllegalArgumentException("channels: give 1 to 8 channels, was "
                    + (channels == null ? "null" : channels.length));
        }
        int frames = channels[0].length;
        for (int c = 1; c < channels.length; c++) {
            if (channels[c].length != frames) {
                throw new IllegalArgumentException("channels[" + c + "] has " + channels[c].length
                        + " samples, channels[0] has " + frames);
            }
        }
        int bytesPerSample = bits / 8;
        int blockAlign = bytesPerSample * channels.length;
        long dataBytes = (long) frames * blockAlign;
        if (dataBytes + 36 > 0xFFFF_FFFFL) {
            throw new IllegalArgumentException("channels: " + dataBytes + " bytes of samples exceed a RIFF file's 4 GiB");
        }
        long maxCode = (1L << (bits - 1)) - 1;
        try (OutputStream out = new BufferedOutputStream(Files.newOutputStream(file), 1 << 16)) {
            ascii(out, "RIFF");
            le(out, 36 + dataBytes, 4);
            ascii(out, "WAVE");
            ascii(out, "fmt ");
            le(out, 16, 4);
            le(out, 1, 2); // WAVE_FORMAT_PCM
            le(out, channels.length, 2);
            le(out, sampleRateHz, 4);
            le(out, (long) sampleRateHz * blockAlign, 4);
            le(out, blockAlign, 2);
            le(out, bits, 2);
            ascii(out, "data");
            le(out, dataBytes, 4);
            for (int n = 0; n < frames; n++) {
                for (double[] channel : channels) {
                    le(out, code(channel[n], maxCode), bytesPerSample);
                }
            }
        }
        return 44 + dataBytes;
    }

    /** Nearest integer code for a full-scale fraction, clipped to [-maxCode-1, maxCode]. */
    static long code(double fraction, long maxCode) {
        if (Double.isNaN(fraction)) {
            throw new IllegalArgumentException("sample is NaN");
        }
        long code = Math.round(fraction * maxCode);
        return Math.max(-maxCode - 1, Math.min(maxCode, code));
    }

    private static void ascii(OutputStream out, String tag) throws IOException {
        for (int i = 0; i < tag.length(); i++) {
            out.write(tag.charAt(i));
        }
    }

    private static void le(OutputStream out, long value, int bytes) throws IOException {
        for (int i = 0; i < bytes; i++) {
            out.write((int) (value >>> (8 * i)) & 0xFF);
        }
    }
}
