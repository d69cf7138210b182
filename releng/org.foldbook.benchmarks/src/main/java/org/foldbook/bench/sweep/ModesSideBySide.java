package org.foldbook.bench.sweep;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;

/**
 * SweepBenchmark's case (the same synthetic recording and 100-rate ladder) for several modes in one JVM,
 * the modes alternating sweep by sweep in a rotating order, so that a change in the machine's load falls on
 * all of them alike (JMH runs one mode after the other, and on this shared machine the load moves between
 * them). Per mode: median and minimum wall time, median own CPU, and the ratio of medians to the first
 * mode; the CPU others used during the rounds is printed beside.
 *
 * <pre>java -cp benchmarks.jar org.foldbook.bench.sweep.ModesSideBySide [--samples N] [--rounds R]
 *     [--warmup W] [--threads T] mode...   (modes: bare-kernel bare modelled polyphase-default ideal)</pre>
 */
public final class ModesSideBySide {
    private ModesSideBySide() {
    }

    public static void main(String[] args) {
        int samples = 1_000_000;
        int rounds = 15;
        int warmup = 4;
        int threads = 1;
        List<String> modes = new ArrayList<>();
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--samples" -> samples = Integer.parseInt(args[++i]);
                case "--rounds" -> rounds = Integer.parseInt(args[++i]);
                case "--warmup" -> warmup = Integer.parseInt(args[++i]);
                case "--threads" -> threads = Integer.parseInt(args[++i]);
                default -> modes.add(args[i]);
            }
        }
        if (modes.isEmpty()) {
            modes = List.of("bare-kernel", "bare", "modelled");
        }
        double[] x = SweepBenchmark.peerTones(samples, 12345);
        RateLadder ladder = RateLadder.geometric(SweepBenchmark.FS0, SweepBenchmark.FS0, 2000, 100, 1000);
        Map<String, Resampling> how = new LinkedHashMap<>();
        for (String m : modes) {
            how.put(m, mode(m));
        }
        int k = modes.size();
        double[][] wall = new double[k][rounds];
        double[][] cpu = new double[k][rounds];
        double others = 0;
        double total = 0;
        try (SweepEngine engine = new SweepEngine(threads)) {
            for (int r = -warmup; r < rounds; r++) {
                for (int j = 0; j < k; j++) {
                    int mi = Math.floorMod(j + r, k);               // rotate which mode goes first
                    Resampling res = how.get(modes.get(mi));
                    double busy0 = MachineLoad.machineBusySeconds();
                    double own0 = MachineLoad.ownCpuSeconds();
                    long t0 = System.nanoTime();
                    engine.run(x, ladder, res, SpectrumSettings.DEFAULT, SweepProgress.NONE);
                    double w = (System.nanoTime() - t0) / 1e9;
                    double own = MachineLoad.ownCpuSeconds() - own0;
                    if (r >= 0) {
                        wall[mi][r] = w;
                        cpu[mi][r] = own;
                        others += MachineLoad.machineBusySeconds() - busy0 - own;
                        total += w;
                    }
                }
            }
        }
        System.out.printf(Locale.ROOT, "%d samples, %d rates, %d thread(s), %d rounds after %d warm-up; others used "
                + "%.2f cores on average while measuring%n", samples, ladder.size(), threads, rounds, warmup, others / total);
        double base = median(wall[0]);
        double baseCpu = median(cpu[0]);
        for (int j = 0; j < k; j++) {
            System.out.printf(Locale.ROOT, "%-18s wall median %7.1f ms  min %7.1f ms  cpu median %7.1f ms  "
                    + "ratio to %s: wall %.3f (min %.3f) cpu %.3f%n", modes.get(j), 1e3 * median(wall[j]),
                    1e3 * min(wall[j]), 1e3 * median(cpu[j]), modes.get(0), median(wall[j]) / base,
                    min(wall[j]) / min(wall[0]), median(cpu[j]) / baseCpu);
        }
    }

    static Resampling mode(String m) {
        return switch (m) {
            case "bare-kernel" -> Resampling.bareKernel();
            case "bare" -> Resampling.bare();
            case "polyphase-default" -> Resampling.polyphaseDefault();
            case "ideal" -> Resampling.idealDecimator();
            case "modelled" -> Resampling.modelledFilter(org.foldbook.dsp.filter.AnalogLowPass.butterworth(4, 20_000));
            default -> throw new IllegalArgumentException("mode bare-kernel|bare|modelled|polyphase-default|ideal, was " + m);
        };
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }

    private static double min(double[] v) {
        return Arrays.stream(v).min().orElse(Double.NaN);
    }
}
