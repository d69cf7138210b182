package org.foldbook.ui.testing;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.file.Path;
import java.util.Random;

import javax.sound.sampled.AudioFileFormat;
import javax.sound.sampled.AudioFormat;
import javax.sound.sampled.AudioInputStream;
import javax.sound.sampled.AudioSystem;

/**
 * SYNTHETIC input for the peak-threshold tests: four tones in white Gaussian noise, 10 s at 48 kS/s, 16-bit
 * PCM written by the JDK's javax.sound.sampled. The tones sit on bin centres of every power-of-two segment from
 * 4096 samples up (k·48000/4096 Hz), so a periodic Hann window leaks nothing beyond its main lobe.
 *
 * <p>How far a tone stands above the Welch floor follows from outside facts, not from our code: a tone of
 * amplitude a reads its mean square a²/2 in its bin; white noise of variance σ² reads σ²·2·ENBW/N per bin of
 * an N-sample segment (one-sided), with ENBW = 1.5 bins for the Hann window (F. J. Harris, "On the use of
 * windows for harmonic analysis with the DFT", Proc. IEEE 66(1), 1978, Table 1). So the ratio is a²·N/(6σ²).
 * The 16-bit rounding adds q²/12 with q = 2⁻¹⁵ of full scale (W. R. Bennett, BSTJ 27, 1948). Averaging some
 * hundred segments puts the floor's running median within a few hundredths of a dB of its mean (P. D. Welch,
 * IEEE Trans. Audio Electroacoust. 15(2), 1967: variance falls as 1/segments), far inside the 4 dB kept
 * between every tone and every margin the tests use.
 */
public final class SyntheticTones {
    public static final double RATE = 48000;
    public static final int FRAMES = 480_000;
    /** Noise standard deviation, fraction of full scale. */
    public static final double SIGMA = 1e-3;
    public static final double[] HZ = {200 * RATE / 4096, 500 * RATE / 4096, 900 * RATE / 4096, 1300 * RATE / 4096};
    /** Each tone's ratio over the floor of 16384-sample Hann segments, dB (its amplitude follows from it). */
    public static final double[] DB_OVER_FLOOR_16384 = {22, 32, 42, 52};

    private SyntheticTones() {
    }

    /** Noise variance in full-scale units², with the 16-bit rounding. */
    public static double variance() {
        double q = 1.0 / 32768;
        return SIGMA * SIGMA + q * q / 12;
    }

    public static double amplitude(int tone) {
        return Math.sqrt(Math.pow(10, DB_OVER_FLOOR_16384[tone] / 10) * 6 * SIGMA * SIGMA / 16384);
    }

    /** Tone {@code i}'s ratio over the floor with {@code n}-sample Hann segments: 10·log10(a²·n/(6σ²)). */
    public static double dbOverFloor(int tone, int n) {
        double a = amplitude(tone);
        return 10 * Math.log10(a * a * n / (6 * variance()));
    }

    /**
     * How many tones a noise-aware rule with {@code marginDb} keeps at segment {@code n}; fails the test set-up
     * when a tone lies within 4 dB of the margin (the count would hinge on the noise's luck).
     */
    public static int expectedPeaks(int n, double marginDb) {
        int count = 0;
        for (int i = 0; i < HZ.length; i++) {
            double r = dbOverFloor(i, n);
            if (Math.abs(r - marginDb) < 4) {
                throw new IllegalStateException("tone " + HZ[i] + " Hz stands " + r + " dB over the floor, too near "
                        + marginDb + " dB");
            }
            count += r > marginDb ? 1 : 0;
        }
        return count;
    }

    /** Writes the recording (seeded, so every run is the same file). */
    public static void write(Path wav) throws IOException {
        Random random = new Random(20261203);
        ByteBuffer pcm = ByteBuffer.allocate(FRAMES * 2).order(ByteOrder.LITTLE_ENDIAN);
        for (int n = 0; n < FRAMES; n++) {
            double x = SIGMA * random.nextGaussian();
            for (int i = 0; i < HZ.length; i++) {
                x += amplitude(i) * Math.cos(2 * Math.PI * HZ[i] * n / RATE + i);
            }
            pcm.putShort((short) Math.max(-32768, Math.min(32767, Math.round(x * 32768))));
        }
        AudioFormat fmt = new AudioFormat((float) RATE, 16, 1, true, false);
        try (AudioInputStream in = new AudioInputStream(new ByteArrayInputStream(pcm.array()), fmt, FRAMES)) {
            AudioSystem.write(in, AudioFileFormat.Type.WAVE, wav.toFile());
        }
    }
}
