package org.foldbook.channel;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.concurrent.CancellationException;

import org.foldbook.model.Channel;
import org.foldbook.model.Notebook;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The block-wise read gives the samples of the whole read (javax.sound.sampled's WAV, TestNotebooks). */
class ChannelScanTest {

    @TempDir
    Path dir;

    @Test
    void streamsTheSamplesOfTheWholeRead() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Channel c = TestNotebooks.channel(nb, 1);
        double[] whole = ChannelReader.read(c, ChannelReader.ReadRequest.STRICT, ReadProgress.NONE).samples();
        double[] streamed = new double[whole.length];
        int[] pos = {0};
        ChannelScan.Scan scan = ChannelScan.scan(c, ChannelReader.ReadRequest.STRICT, (x, n) -> {
            System.arraycopy(x, 0, streamed, pos[0], n);
            pos[0] += n;
        }, ReadProgress.NONE);
        assertArrayEquals(whole, streamed);
        assertEquals(TestNotebooks.FRAMES, scan.frames());
        assertEquals(TestNotebooks.sha256(dir.resolve("data/sines.wav")), scan.sha256(), "JDK MessageDigest");
    }

    @Test
    void changedFileAndCancelStopTheScan() throws IOException {
        Notebook nb = TestNotebooks.write(dir);
        Path wav = dir.resolve("data/sines.wav");
        Channel c = TestNotebooks.channel(nb, 0);
        assertThrows(CancellationException.class, () -> ChannelScan.scan(c, ChannelReader.ReadRequest.STRICT,
                (x, n) -> { }, new ReadProgress() {
                    @Override
                    public boolean cancelled() {
                        return true;
                    }
                }));
        byte[] b = Files.readAllBytes(wav);
        b[b.length - 1] ^= 1;
        Files.write(wav, b, StandardOpenOption.TRUNCATE_EXISTING);
        ChannelDataException e = assertThrows(ChannelDataException.class,
                () -> ChannelScan.scan(c, ChannelReader.ReadRequest.STRICT, (x, n) -> { }, ReadProgress.NONE));
        assertTrue(e.getMessage().startsWith(wav.toString()) && e.getMessage().contains("changed"), e.getMessage());
    }
}
