package org.foldbook.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.util.List;
import java.util.concurrent.CancellationException;

import org.foldbook.dsp.filter.AnalogLowPass;
import org.foldbook.dsp.resample.ModelledChannel;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The streaming sweep against the in-memory engine (itself checked against the scipy peer in
 * {@link PeerAgreementTest}): identical JSON, i.e. every double equal to the last bit, on the peer's
 * committed recording (one block) and on a clearly synthetic recording of seven blocks read in ragged
 * pieces, in every time-domain mode, on one and two threads.
 */
class StreamingSweepTest {
    static final double FS0 = 100_000;
    static SweepEngine engine;

    @BeforeAll
    static void start() {
        engine = new SweepEngine(2);
    }

    @AfterAll
    static void stop() {
        engine.close();
    }

    static Resampling mode(String name) {
        return switch (name) {
            case "bare" -> Resampling.bare();
            case "polyphase-default" -> Resampling.polyphaseDefault();
            case "ideal" -> Resampling.idealDecimator();
            case "modelled" -> Resampling.modelledFilter(AnalogLowPass.butterworth(4, 10_000));
            case "modelled-digitizer" -> Resampling.modelledChannel(ModelledChannel.none()
                    .withAnalog(AnalogLowPass.butterworth(4, 20_000))
                    .withDigitizerFilter(new ModelledChannel.DigitizerFilter(0.45, 0.55, 90)));
            default -> throw new IllegalArgumentException(name);
        };
    }

    /** Hands out samples in pieces of varying size (1 .. 40000), as a reader at buffer edges would. */
    static StreamingSweep.Source ragged(double[] x) {
        return new StreamingSweep.Source() {
            private int pos;
            private int turn;

            @Override
            public long length() {
                return x.length;
            }

            @Override
            public int read(double[] buf, int offset, int max) {
                if (pos == x.length) {
                    return -1;
                }
                int[] sizes = {40_000, 1, 7919, 3, 32_768, 12_345};
                int c = Math.min(Math.min(max, sizes[turn++ % sizes.length]), x.length - pos);
                System.arraycopy(x, pos, buf, offset, c);
                pos += c;
                return c;
            }
        };
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"bare", "polyphase-default", "ideal", "modelled", "modelled-digitizer"})
    @DisplayName("seven blocks read in ragged pieces: JSON identical to the in-memory sweep, 1 and 2 threads")
    void sameJsonAsInMemory(String name) throws IOException {
        double[] x = Tones.of(7 * StreamingSweep.BLOCK - 1234, FS0, new double[] {1000, 4700, 13_300, 27_100},
                new double[] {1, 0.5, 0.3, 0.2}, 0.01, 42);
        RateLadder ladder = RateLadder.geometric(FS0, FS0, 9000, 9, 1000);
        Resampling mode = mode(name);
        String expected = engine.run(x, ladder, mode, SpectrumSettings.DEFAULT, SweepProgress.NONE).toJson();
        for (int threads : new int[] {1, 2}) {
            try (StreamingSweep s = new StreamingSweep(threads)) {
                String got = s.run(ragged(x), ladder, mode(name), SpectrumSettings.DEFAULT, SweepProgress.NONE)
                        .toJson();
                assertEquals(expected, got, name + " on " + threads + " thread(s)");
            }
        }
        assertTrue(expected.contains("\"rates\""), expected.substring(0, Math.min(200, expected.length())));
    }

    @Test
    @DisplayName("the peer's committed recording and 16-rate grid: JSON identical to the in-memory sweep")
    void peerRecording() throws IOException {
        double[] x = TestData.float64("peer_signal.f64");
        RateLadder grid = RateLadder.readGrid(TestData.reader("peer_grid.txt"), "peer_grid.txt", FS0);
        for (String name : List.of("bare", "polyphase-default")) {
            String expected = engine.run(x, grid, mode(name), SpectrumSettings.DEFAULT, SweepProgress.NONE).toJson();
            try (StreamingSweep s = new StreamingSweep(2)) {
                assertEquals(expected, s.run(StreamingSweep.Source.of(x), grid, mode(name), SpectrumSettings.DEFAULT,
                        SweepProgress.NONE).toJson(), name);
            }
        }
    }

    @Test
    @DisplayName("a non-finite sample, a short source and a cancel are refused with clear messages")
    void badInput() {
        double[] x = Tones.of(100_000, FS0, new double[] {1000}, new double[] {1}, 0.0, 1);
        x[77_777] = Double.NaN;
        RateLadder ladder = RateLadder.geometric(FS0, FS0, 20_000, 3, 1000);
        try (StreamingSweep s = new StreamingSweep(2)) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> s.run(ragged(x), ladder,
                    Resampling.bare(), SpectrumSettings.DEFAULT, SweepProgress.NONE));
            assertTrue(e.getMessage().contains("77777") && e.getMessage().contains("NaN"), e.getMessage());
            x[77_777] = 0;
            StreamingSweep.Source shortOne = new StreamingSweep.Source() {
                final StreamingSweep.Source inner = StreamingSweep.Source.of(x);

                @Override
                public long length() {
                    return x.length + 5;
                }

                @Override
                public int read(double[] buf, int offset, int max) throws IOException {
                    return inner.read(buf, offset, max);
                }
            };
            e = assertThrows(IllegalArgumentException.class, () -> s.run(shortOne, ladder, Resampling.bare(),
                    SpectrumSettings.DEFAULT, SweepProgress.NONE));
            assertTrue(e.getMessage().contains("100000 of its 100005"), e.getMessage());
            SweepProgress stop = new SweepProgress() {
                @Override
                public boolean isCancelled() {
                    return true;
                }
            };
            assertThrows(CancellationException.class,
                    () -> s.run(StreamingSweep.Source.of(x), ladder, Resampling.bare(), SpectrumSettings.DEFAULT, stop));
        }
    }
}
