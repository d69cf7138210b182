package org.foldbook.bench.sweep;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.foldbook.dsp.fft.RealFft;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * Two threads against one, in one JVM and one run: the same recording and grid swept alternately by an
 * engine of 1 and of 2 threads (after untimed warm-ups of both), per sweep the wall time and the CPU-seconds
 * other processes used (/proc/stat, as {@link PeerSideBySide}); medians over the "clean" sweeps (others
 * &lt; 5 % of a core) when there are any, else over all. The two engines' results are checked equal first.
 *
 * <pre>
 * java -Xms3g -Xmx3g --add-modules jdk.incubator.vector -cp benchmarks.jar org.foldbook.bench.sweep.ThreadScaling \
 *   --signal rec1e6.f64 --grid grid.txt --mode a --sweeps 7 --warmup 2
 * </pre>
 * Mode a = bare-kernel, b = polyphase-default (the peer's modes). Prints one JSON line.
 */
public final class ThreadScaling {
    private ThreadScaling() {
    }

    public static void main(String[] args) throws Exception {
        Path signal = null;
        Path grid = null;
        String mode = "a";
        int sweeps = 7;
        int warmup = 2;
        double fs0 = 100_000;
        for (int i = 0; i < args.length; i += 2) {
            String v = args[i + 1];
            switch (args[i]) {
                case "--signal" -> signal = Path.of(v);
                case "--grid" -> grid = Path.of(v);
                case "--mode" -> mode = v;
                case "--sweeps" -> sweeps = Integer.parseInt(v);
                case "--warmup" -> warmup = Integer.parseInt(v);
                case "--fs0" -> fs0 = Double.parseDouble(v);
                default -> throw new IllegalArgumentException("unknown option " + args[i]);
            }
        }
        if (signal == null || grid == null) {
            throw new IllegalArgumentException("--signal and --grid are required");
        }
        double[] x = PeerSideBySide.readF64(signal);
        RateLadder ladder;
        try (Reader r = Files.newBufferedReader(grid)) {
            ladder = RateLadder.readGrid(r, grid.toString(), fs0);
        }
        Resampling java = mode.equals("a") ? Resampling.bareKernel() : Resampling.polyphaseDefault();
        try (SweepEngine one = new SweepEngine(1); SweepEngine two = new SweepEngine(2)) {
            SweepResult a = one.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
            SweepResult b = two.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
            if (!a.equals(b)) {
                throw new IllegalStateException("1 and 2 threads gave different results");
            }
            for (int i = 1; i < warmup; i++) {
                one.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
                two.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
            }
            List<double[]> runs1 = new ArrayList<>();
            List<double[]> runs2 = new ArrayList<>();
            for (int i = 0; i < sweeps; i++) {
                runs1.add(timed(one, x, ladder, java));
                runs2.add(timed(two, x, ladder, java));
            }
            double m1 = PeerSideBySide.medianClean(runs1);
            double m2 = PeerSideBySide.medianClean(runs2);
            System.out.println(String.format(Locale.ROOT,
                    "{\"samples\":%d,\"rates\":%d,\"java\":\"%s\",\"fft\":\"%s\",\"one_thread\":%s,\"two_threads\":%s,"
                            + "\"speedup_two_over_one\":%.3f}",
                    x.length, ladder.size(), java.mode().word(), RealFft.of(4096).kernel(), PeerSideBySide.runs(runs1),
                    PeerSideBySide.runs(runs2), m1 / m2));
        }
    }

    private static double[] timed(SweepEngine engine, double[] x, RateLadder ladder, Resampling mode) {
        double b0 = MachineLoad.machineBusySeconds();
        double o0 = MachineLoad.ownCpuSeconds();
        long s = System.nanoTime();
        engine.run(x, ladder, mode, SpectrumSettings.DEFAULT, SweepProgress.NONE);
        double wall = (System.nanoTime() - s) * 1e-9;
        double own = MachineLoad.ownCpuSeconds() - o0;
        double others = Math.max(0, (MachineLoad.machineBusySeconds() - b0) - own);
        return new double[] {wall, others, own};
    }
}
