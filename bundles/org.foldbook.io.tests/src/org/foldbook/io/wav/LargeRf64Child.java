package org.foldbook.io.wav;

import java.nio.file.Path;

import org.foldbook.io.RecordingReader;

/**
 * Child-JVM side of {@link LargeRf64Test}: reads a whole RF64 file in blocks with a small heap and prints
 * frame count, SHA-256, the peak heap in use, and the samples at the frames named on the command line.
 */
public final class LargeRf64Child {
    private LargeRf64Child() {
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[0]);
        long[] probes = new long[args.length - 1];
        for (int i = 1; i < args.length; i++) {
            probes[i - 1] = Long.parseLong(args[i]);
        }
        StringBuilder found = new StringBuilder();
        long peak = 0;
        Runtime rt = Runtime.getRuntime();
        try (RecordingReader r = WavReader.open(file)) {
            int ch = r.info().channelCount();
            int block = 1 << 16;
            double[][] buf = new double[ch][block];
            long at = 0;
            int n;
            long blocks = 0;
            while ((n = r.read(buf, 0, block)) > 0) {
                for (long p : probes) {
                    if (p >= at && p < at + n) {
                        found.append(' ').append(p).append('=').append(buf[0][(int) (p - at)]).append('/')
                                .append(buf[ch - 1][(int) (p - at)]);
                    }
                }
                at += n;
                if ((++blocks & 1023) == 0) {
                    peak = Math.max(peak, rt.totalMemory() - rt.freeMemory());
                }
            }
            System.out.println("frames=" + at + " format=" + r.info().format() + " sha256=" + r.sha256Hex()
                    + " peakHeap=" + peak + " maxHeap=" + rt.maxMemory() + " probes" + found);
        }
    }
}
