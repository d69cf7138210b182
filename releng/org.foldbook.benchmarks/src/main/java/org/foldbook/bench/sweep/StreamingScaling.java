package org.foldbook.bench.sweep;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.MemoryPoolMXBean;
import java.lang.management.MemoryType;
import java.nio.ByteOrder;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.foldbook.io.ReadOptions;
import org.foldbook.io.RecordingReader;
import org.foldbook.io.SampleType;
import org.foldbook.io.raw.RawLayout;
import org.foldbook.io.raw.RawReader;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.StreamingSweep;
import org.foldbook.sweep.SweepProgress;

/**
 * Is the streaming sweep's time linear in the recording's length? Sweeps raw float64 files of different
 * lengths (e.g. sparse files of 10^7, 10^8, 10^9 samples: {@code truncate -s $((N*8)) zeroN.f64}) through
 * the io bundle's reader, round after round in alternation, and prints per sweep the wall time, the time per
 * sample, this process's CPU-seconds and those other processes used meanwhile (/proc/stat), and the peak
 * heap after the run. The JVM start is outside the timed part (whole-process figures: /usr/bin/time -v on
 * {@code foldbook-sweep --stream}).
 *
 * <pre>
 * java -Xms256m -Xmx256m -cp benchmarks.jar org.foldbook.bench.sweep.StreamingScaling \
 *   --rate 100000 --to 2000 --steps 10 --threads 2 --rounds 2 [--mode bare-kernel] zero1e7.f64 zero1e8.f64 zero1e9.f64
 * </pre>
 */
public final class StreamingScaling {
    private StreamingScaling() {
    }

    public static void main(String[] args) throws IOException {
        double rate = 100_000;
        double to = 2000;
        int steps = 10;
        int threads = 2;
        int rounds = 2;
        String mode = "bare-kernel";
        List<Path> files = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--rate" -> rate = Double.parseDouble(args[++i]);
                case "--to" -> to = Double.parseDouble(args[++i]);
                case "--steps" -> steps = Integer.parseInt(args[++i]);
                case "--threads" -> threads = Integer.parseInt(args[++i]);
                case "--rounds" -> rounds = Integer.parseInt(args[++i]);
                case "--mode" -> mode = args[++i];
                default -> files.add(Path.of(args[i]));
            }
        }
        RateLadder ladder = RateLadder.geometric(rate, rate, to, steps, 1000);
        Resampling how = switch (mode) {
            case "bare-kernel" -> Resampling.bareKernel();
            case "bare" -> Resampling.bare();
            case "polyphase-default" -> Resampling.polyphaseDefault();
            case "ideal" -> Resampling.idealDecimator();
            default -> throw new IllegalArgumentException("--mode bare-kernel|bare|polyphase-default|ideal, was " + mode);
        };
        try (StreamingSweep sweep = new StreamingSweep(threads)) {
            for (int round = 0; round < rounds; round++) {
                for (Path f : files) {
                    long n = Files.size(f) / 8;
                    double busy0 = MachineLoad.machineBusySeconds();
                    double own0 = MachineLoad.ownCpuSeconds();
                    long t0 = System.nanoTime();
                    String json;
                    try (RecordingReader r = RawReader.open(f, RawLayout.of(SampleType.FLOAT64, ByteOrder.LITTLE_ENDIAN,
                            1, true, 0, rate), ReadOptions.DEFAULT.withSha256(false))) {
                        json = sweep.run(source(r), ladder, how, SpectrumSettings.DEFAULT,
                                SweepProgress.NONE).toJson();
                    }
                    double wall = (System.nanoTime() - t0) / 1e9;
                    double own = MachineLoad.ownCpuSeconds() - own0;
                    double others = MachineLoad.machineBusySeconds() - busy0 - own;
                    System.out.printf(Locale.ROOT,
                            "{\"round\":%d,\"samples\":%d,\"rates\":%d,\"threads\":%d,\"wall_s\":%.3f,\"ns_per_sample\":%.3f,"
                                    + "\"own_cpu_s\":%.2f,\"others_cpu_s\":%.2f,\"peak_heap_mb\":%.1f,\"json_hash\":%d}%n",
                            round, n, ladder.size(), threads, wall, wall / n * 1e9, own, others, peakHeapMb(),
                            json.hashCode());
                }
            }
        }
    }

    /** The reader's one channel as a block source (its bounded buffer; nothing of the file's size). */
    static StreamingSweep.Source source(RecordingReader r) {
        long frames = r.info().frameCount();
        double[][] channels = new double[1][];
        return new StreamingSweep.Source() {
            @Override
            public long length() {
                return frames;
            }

            @Override
            public int read(double[] buf, int offset, int max) throws IOException {
                channels[0] = buf;
                return r.read(channels, offset, max);
            }
        };
    }

    private static double peakHeapMb() {
        long sum = 0;
        for (MemoryPoolMXBean p : ManagementFactory.getMemoryPoolMXBeans()) {
            if (p.getType() == MemoryType.HEAP && p.getPeakUsage() != null) {
                sum += p.getPeakUsage().getUsed();
            }
        }
        return sum / 1048576.0;
    }
}
