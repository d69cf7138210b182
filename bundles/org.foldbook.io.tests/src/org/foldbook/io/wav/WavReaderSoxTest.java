package org.foldbook.io.wav;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;

import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;
import javax.sound.sampled.UnsupportedAudioFileException;

import org.foldbook.io.RecordingFormat;
import org.foldbook.io.RecordingInfo;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.TestFiles;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * WAV files written by Debian's sox 14.4.2 (releng/reference/io_files.sh) in every layout we read. Two
 * outside references: sox's own float64 dump of each file (sox scales integer codes by 1/2^(bits-1),
 * 8-bit as (code-128)/128, like our reader), and the JDK's javax.sound.sampled WAV parser, whose header
 * interpretation (channels, rate, frame count, encoding) and raw sample bytes we compare with ours.
 */
class WavReaderSoxTest {
    @TempDir
    Path dir;

    @ParameterizedTest(name = "{0}: sox float64 dump")
    @CsvSource({
            "u8-mono,      1,  8000, UINT8,   0",
            "s16-mono,     1, 32000, INT16,   0",
            "s16-stereo,   2, 48000, INT16,   0",
            "s16-3ch,      3, 44100, INT16,   0",
            "s24-mono,     1, 96000, INT24,   0",
            "s24-stereo,   2, 48000, INT24,   0",
            "s24-6ch,      6, 48000, INT24,   0",
            "s32-stereo,   2, 48000, INT32,   0",
            // sox passes float input through its 32-bit integer pipeline: the dump is within 2^-31 of the file
            "f32-stereo,   2, 48000, FLOAT32, 4.7e-10",
            "f32-4ch,      4, 22050, FLOAT32, 4.7e-10",
            "f64-mono,     1, 48000, FLOAT64, 4.7e-10",
            "f64-stereo,   2, 16000, FLOAT64, 4.7e-10"})
    void matchesSoxDump(String name, int channels, long rate, SampleType type, double tolerance) throws IOException {
        Path wav = TestFiles.copy("wav/sox/" + name + ".wav", dir);
        double[][] expected = TestFiles.f64("wav/sox/" + name + ".f64", channels);
        try (RecordingReader r = WavReader.open(wav)) {
            RecordingInfo info = r.info();
            assertEquals(RecordingFormat.WAV, info.format());
            assertEquals(channels, info.channelCount());
            assertEquals(rate, info.sampleRate());
            assertEquals(type, info.sampleType());
            assertEquals(240, info.frameCount(), "sox wrote synth 240s");
            double[][] got = TestFiles.readAll(r, 37);
            for (int c = 0; c < channels; c++) {
                assertArrayEquals(expected[c], got[c], tolerance, "channel " + (c + 1));
            }
        }
        try (RecordingReader r = WavReader.open(wav)) {
            double[] inter = TestFiles.readAllInterleaved(r, 100);
            for (int f = 0; f < 240; f++) {
                for (int c = 0; c < channels; c++) {
                    assertEquals(expected[c][f], inter[f * channels + c], tolerance, "frame " + f + " ch " + (c + 1));
                }
            }
        }
    }

    /** Every layout: the JDK 25 WAV readers accept them all (PCM 8-32 bit, extensible, IEEE float 32/64). */
    @ParameterizedTest(name = "{0}: javax.sound.sampled")
    @CsvSource({"u8-mono", "s16-mono", "s16-stereo", "s16-3ch", "s24-mono", "s24-stereo", "s24-6ch", "s32-stereo", "f32-stereo", "f32-4ch", "f64-mono", "f64-stereo"})
    void matchesJdkDecoder(String name) throws IOException, UnsupportedAudioFileException {
        Path wav = TestFiles.copy("wav/sox/" + name + ".wav", dir);
        try (AudioInputStream jdk = AudioSystem.getAudioInputStream(wav.toFile());
                RecordingReader r = WavReader.open(wav)) {
            AudioFormat f = jdk.getFormat();
            RecordingInfo info = r.info();
            assertEquals(f.getChannels(), info.channelCount(), "channels");
            assertEquals(f.getSampleRate(), info.sampleRate(), 0.0, "rate");
            assertEquals(jdk.getFrameLength(), info.frameCount(), "frames");
            assertEquals(f.getSampleSizeInBits(), 8 * info.sampleType().bytes(), "bits");
            ByteBuffer b = ByteBuffer.wrap(jdk.readAllBytes())
                    .order(f.isBigEndian() ? ByteOrder.BIG_ENDIAN : ByteOrder.LITTLE_ENDIAN);
            double[] ours = TestFiles.readAllInterleaved(r, 64);
            int bits = f.getSampleSizeInBits();
            for (int i = 0; i < ours.length; i++) {
                double expected;
                if (f.getEncoding() == AudioFormat.Encoding.PCM_FLOAT) {
                    expected = bits == 64 ? b.getDouble() : b.getFloat();
                } else if (f.getEncoding() == AudioFormat.Encoding.PCM_UNSIGNED) {
                    expected = ((b.get() & 0xFF) - 128) / 128.0;
                } else {
                    long code = switch (bits) {
                    case 16 -> b.getShort();
                    case 24 -> {
                        int lo = b.get() & 0xFF;
                        int mid = b.get() & 0xFF;
                        int hi = b.get();
                        yield (hi << 16) | (mid << 8) | lo;
                    }
                    case 32 -> b.getInt();
                    default -> throw new IllegalStateException(bits + " bits");
                    };
                    expected = code / Math.pow(2, bits - 1);
                }
                assertEquals(expected, ours[i], 0.0, "sample " + i);
            }
            assertEquals(0, b.remaining(), "JDK delivered more bytes than we read frames");
        }
    }
}
