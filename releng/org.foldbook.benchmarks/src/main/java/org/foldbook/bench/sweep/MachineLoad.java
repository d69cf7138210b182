package org.foldbook.bench.sweep;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * CPU-seconds from /proc, the same way the peer tool counts them: the whole machine's busy time (user,
 * nice, system, irq, softirq, steal) and this process's own (utime + stime of all its threads), so that
 * "others" = machine busy − own over a sweep. Resolution one clock tick (10 ms).
 */
final class MachineLoad {
    private static final double TICK = 0.01; // USER_HZ is 100 on Linux

    private MachineLoad() {
    }

    static double machineBusySeconds() {
        try {
            String[] f = Files.readAllLines(Path.of("/proc/stat")).get(0).trim().split("\\s+");
            long busy = Long.parseLong(f[1]) + Long.parseLong(f[2]) + Long.parseLong(f[3]) + Long.parseLong(f[6])
                    + Long.parseLong(f[7]) + Long.parseLong(f[8]);
            return busy * TICK;
        } catch (IOException | RuntimeException e) {
            return Double.NaN;
        }
    }

    static double processCpuSeconds(long pid) {
        try {
            String st = Files.readString(Path.of("/proc/" + pid + "/stat"));
            String[] f = st.substring(st.lastIndexOf(')') + 2).trim().split("\\s+");
            return (Long.parseLong(f[11]) + Long.parseLong(f[12])) * TICK;
        } catch (IOException | RuntimeException e) {
            return Double.NaN;
        }
    }

    static double ownCpuSeconds() {
        return processCpuSeconds(ProcessHandle.current().pid());
    }
}
