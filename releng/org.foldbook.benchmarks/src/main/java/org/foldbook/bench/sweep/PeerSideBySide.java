package org.foldbook.bench.sweep;

import java.io.IOException;
import java.io.Reader;
import java.nio.ByteBuffer;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.foldbook.sweep.ObservedPeak;
import org.foldbook.sweep.RateLadder;
import org.foldbook.sweep.RateResult;
import org.foldbook.sweep.Resampling;
import org.foldbook.sweep.SpectrumSettings;
import org.foldbook.sweep.SweepEngine;
import org.foldbook.sweep.SweepProgress;
import org.foldbook.sweep.SweepResult;

/**
 * Side-by-side run of Foldbook's sweep and the scipy peer (shared/peer/peer_sweep.py), by the peer's
 * README protocol: the same recording file and rate grid (written by the peer with --write-signal and
 * --write-grid), the same answers first (per-rate peak lists against the peer's --details), then sweeps
 * timed alternately, peer and Java, one after the other; per sweep the CPU-seconds other processes used
 * (from /proc/stat) and only "clean" sweeps (others &lt; 5 % of one core) in the medians. Java sweeps run in
 * this JVM after untimed warm-ups (the first, cold one is reported too); the whole sweep is timed with
 * the recording in memory and every design inside, source spectrum and verdicts included.
 *
 * <pre>
 * java -Xms4g -Xmx4g -cp benchmarks.jar org.foldbook.bench.sweep.PeerSideBySide \
 *   --peer ../shared/peer/peer_sweep.py --signal rec1e6.f64 --grid grid.txt --details details.json \
 *   --mode a --threads 1 --sweeps 5 --warmup 2 [--max-attempts 15]
 * </pre>
 * ({@code --add-modules jdk.incubator.vector} too, for the FFT's vector kernel: the JSON's "fft" says which
 * ran; {@code --sweeps 0 --warmup 0} compares the answers only.)
 * Prints one JSON line. Mode a = Java bare-kernel (the kernel alone, as the peer), b = Java polyphase-default; --threads N pairs with the peer's --jobs N.
 */
public final class PeerSideBySide {
    private PeerSideBySide() {
    }

    public static void main(String[] args) throws Exception {
        String peer = null;
        Path signal = null;
        Path grid = null;
        Path details = null;
        String mode = "a";
        int threads = 1;
        int sweeps = 5;
        int warmup = 2;
        double fs0 = 100_000;
        int maxAttempts = -1;
        for (int i = 0; i < args.length; i += 2) {
            String v = args[i + 1];
            switch (args[i]) {
                case "--peer" -> peer = v;
                case "--signal" -> signal = Path.of(v);
                case "--grid" -> grid = Path.of(v);
                case "--details" -> details = Path.of(v);
                case "--mode" -> mode = v;
                case "--threads" -> threads = Integer.parseInt(v);
                case "--sweeps" -> sweeps = Integer.parseInt(v);
                case "--warmup" -> warmup = Integer.parseInt(v);
                case "--fs0" -> fs0 = Double.parseDouble(v);
                case "--max-attempts" -> maxAttempts = Integer.parseInt(v);
                default -> throw new IllegalArgumentException("unknown option " + args[i]);
            }
        }
        if (peer == null || signal == null || grid == null) {
            throw new IllegalArgumentException("--peer, --signal and --grid are required");
        }
        if (maxAttempts < 0) {
            maxAttempts = 3 * sweeps;   // redo sweeps that others disturbed, up to this many rounds
        }
        double[] x = readF64(signal);
        RateLadder ladder;
        try (Reader r = Files.newBufferedReader(grid)) {
            ladder = RateLadder.readGrid(r, grid.toString(), fs0);
        }
        Resampling java = mode.equals("a") ? Resampling.bareKernel() : Resampling.polyphaseDefault();
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT,
                "{\"samples\":%d,\"rates\":%d,\"mode\":\"%s\",\"java\":\"%s\",\"threads\":%d,\"fft\":\"%s\"",
                x.length, ladder.size(), mode, java.mode().word(), threads, org.foldbook.dsp.fft.RealFft.of(4096).kernel()));
        try (SweepEngine engine = new SweepEngine(threads)) {
            long t0 = System.nanoTime();
            SweepResult first = engine.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
            double cold = (System.nanoTime() - t0) * 1e-9;
            out.append(String.format(Locale.ROOT, ",\"java_cold_s\":%.4f", cold));
            if (details != null) {
                out.append(",\"answers\":").append(compare(first, Files.readString(details), mode));
            }
            for (int i = 0; i < warmup; i++) {
                engine.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
            }
            List<double[]> javaRuns = new ArrayList<>();
            List<double[]> peerRuns = new ArrayList<>();
            int attempts = 0;
            while ((clean(javaRuns) < sweeps || clean(peerRuns) < sweeps) && attempts < maxAttempts) {
                attempts++;
                if (clean(peerRuns) < sweeps) {
                    peerRuns.add(peerSweep(peer, signal, fs0, mode, threads));
                }
                if (clean(javaRuns) < sweeps) {
                    double b0 = MachineLoad.machineBusySeconds();
                    double o0 = MachineLoad.ownCpuSeconds();
                    long s = System.nanoTime();
                    engine.run(x, ladder, java, SpectrumSettings.DEFAULT, SweepProgress.NONE);
                    double wall = (System.nanoTime() - s) * 1e-9;
                    double own = MachineLoad.ownCpuSeconds() - o0;
                    double others = Math.max(0, (MachineLoad.machineBusySeconds() - b0) - own);
                    javaRuns.add(new double[] {wall, others, own});
                }
            }
            out.append(",\"java\":").append(runs(javaRuns)).append(",\"peer\":").append(runs(peerRuns));
            double jm = medianClean(javaRuns);
            double pm = medianClean(peerRuns);
            out.append(String.format(Locale.ROOT, ",\"ratio_java_over_peer\":%.4f", jm / pm));
            if (threads == 1) {
                // one thread each: CPU-seconds are a second, less load-sensitive measure
                out.append(String.format(Locale.ROOT, ",\"cpu_ratio_java_over_peer\":%.4f",
                        median(javaRuns, 2) / median(peerRuns, 2)));
            }
            out.append('}');
        }
        System.out.println(out);
    }

    /** One peer sweep in its own process: its reported wall time and others-CPU of that sweep. */
    static double[] peerSweep(String peer, Path signal, double fs0, String mode, int jobs)
            throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder("/usr/bin/python3", peer, "--input", signal.toString(), "--fs0",
                String.valueOf(fs0), "--mode", mode, "--repeat", "1", "--jobs", String.valueOf(jobs));
        pb.redirectError(ProcessBuilder.Redirect.INHERIT);
        Process p = pb.start();
        String json = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (p.waitFor() != 0) {
            throw new IOException("peer failed: " + json);
        }
        return new double[] {first(json, "wall_s_all"), first(json, "others_cpu_s_all"), first(json, "cpu_s_all")};
    }

    static double first(String json, String key) {
        Matcher m = Pattern.compile("\"" + key + "\":\\[([0-9.eE+-]+)").matcher(json);
        if (!m.find()) {
            throw new IllegalStateException(key + " not in peer output " + json);
        }
        return Double.parseDouble(m.group(1));
    }

    static int clean(List<double[]> runs) {
        return (int) runs.stream().filter(r -> r[1] <= 0.05 * r[0]).count();
    }

    static double medianClean(List<double[]> runs) {
        double[] w = runs.stream().filter(r -> r[1] <= 0.05 * r[0]).mapToDouble(r -> r[0]).sorted().toArray();
        if (w.length == 0) {
            w = runs.stream().mapToDouble(r -> r[0]).sorted().toArray();
        }
        if (w.length == 0) {
            return Double.NaN; // --sweeps 0: answers only
        }
        return w.length % 2 == 1 ? w[w.length / 2] : 0.5 * (w[w.length / 2 - 1] + w[w.length / 2]);
    }

    static double median(List<double[]> runs, int column) {
        double[] v = runs.stream().mapToDouble(r -> r[column]).sorted().toArray();
        if (v.length == 0) {
            return Double.NaN;
        }
        return v.length % 2 == 1 ? v[v.length / 2] : 0.5 * (v[v.length / 2 - 1] + v[v.length / 2]);
    }

    static String runs(List<double[]> runs) {
        StringBuilder b = new StringBuilder("{\"wall_s_all\":[");
        for (int i = 0; i < runs.size(); i++) {
            b.append(i > 0 ? "," : "").append(String.format(Locale.ROOT, "%.4f", runs.get(i)[0]));
        }
        b.append("],\"cpu_s_all\":[");
        for (int i = 0; i < runs.size(); i++) {
            b.append(i > 0 ? "," : "").append(String.format(Locale.ROOT, "%.2f", runs.get(i)[2]));
        }
        b.append("],\"others_cpu_s_all\":[");
        for (int i = 0; i < runs.size(); i++) {
            b.append(i > 0 ? "," : "").append(String.format(Locale.ROOT, "%.2f", runs.get(i)[1]));
        }
        b.append(String.format(Locale.ROOT, "],\"clean\":%d,\"median_clean_s\":%.4f}", clean(runs),
                medianClean(runs)));
        return b.toString();
    }

    /**
     * Per-rate peak lists against the peer's --details JSON for {@code mode}: the number of peaks in both
     * (same bin, level within 0.01 dB), and those only in one or with levels apart.
     */
    static String compare(SweepResult r, String detailsJson, String mode) {
        int start = detailsJson.indexOf("\"" + mode + "\":");
        if (start < 0) {
            return "{\"error\":\"mode " + mode + " not in details\"}";
        }
        Pattern rate = Pattern.compile("\\{\"index\": ?(\\d+).*?\"freqs\": ?\\[([^\\]]*)\\], ?\"levels_db\": ?\\[([^\\]]*)\\]\\}");
        Matcher m = rate.matcher(detailsJson);
        m.region(start, detailsJson.length());
        int same = 0;
        int differ = 0;
        int rates = 0;
        double worst = 0;
        while (m.find() && rates < r.rates().size()) {
            int idx = Integer.parseInt(m.group(1));
            if (idx != rates) {
                break;
            }
            rates++;
            double[] f = parse(m.group(2));
            double[] l = parse(m.group(3));
            RateResult mine = r.rates().get(idx);
            List<ObservedPeak> obs = mine.observed();
            boolean[] used = new boolean[obs.size()];
            for (int k = 0; k < f.length; k++) {
                int hit = -1;
                for (int j = 0; j < obs.size(); j++) {
                    if (!used[j] && Math.abs(obs.get(j).frequency() - f[k]) < 1e-6 * mine.binWidth()) {
                        hit = j;
                        break;
                    }
                }
                if (hit >= 0) {
                    used[hit] = true;
                }
                if (hit >= 0 && Math.abs(obs.get(hit).levelDb() - l[k]) <= 0.01) {
                    same++;
                    worst = Math.max(worst, Math.abs(obs.get(hit).levelDb() - l[k]));
                } else {
                    differ++;
                }
            }
            for (boolean u : used) {
                if (!u) {
                    differ++; // a peak only Java found
                }
            }
        }
        return String.format(Locale.ROOT, "{\"rates\":%d,\"peaks_same\":%d,\"peaks_differ\":%d,\"worst_level_db\":%.2e}",
                rates, same, differ, worst);
    }

    static double[] parse(String list) {
        if (list.isBlank()) {
            return new double[0];
        }
        return Arrays.stream(list.split(",")).mapToDouble(s -> Double.parseDouble(s.strip())).toArray();
    }

    static double[] readF64(Path file) throws IOException {
        ByteBuffer b = ByteBuffer.wrap(Files.readAllBytes(file)).order(ByteOrder.LITTLE_ENDIAN);
        double[] x = new double[b.remaining() / 8];
        b.asDoubleBuffer().get(x);
        return x;
    }
}
