package org.foldbook.sweep;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Filtered re-sampling computed from its definition, with taps made outside the project: zero insertion by
 * up, convolution with the taps, every down-th sample kept, the filter's half length removed (so output m
 * sits at m·down/up input samples, as the sweep's modes place it), zeros outside the recording:
 * <pre>  y[m] = Σ_n x[n] · h[m·down + L − n·up],  0 ≤ m·down + L − n·up ≤ 2L,  h of length 2L + 1</pre>
 * The taps are scipy.signal.firwin(2·10·R+1, 1/R, window=('kaiser', 5.0))·up, R = max(up, down), written by
 * releng/reference/polyphase_taps.py into polyphase_default_taps.txt (see docs/REFERENCES.md).
 */
final class PolyphaseDefinition {
    static final String FILE = "polyphase_default_taps.txt";
    private static Map<Long, double[]> taps;

    private PolyphaseDefinition() {
    }

    /** The ratios the committed file holds, as {up, down}. */
    static synchronized List<int[]> ratios() {
        return all().keySet().stream().map(k -> new int[] {(int) (k >>> 32), (int) (long) k}).toList();
    }

    /** The taps for {@code up/down} (lowest terms). */
    static synchronized double[] taps(int up, int down) {
        double[] h = all().get((long) up << 32 | down);
        if (h == null) {
            throw new IllegalArgumentException("no taps for " + up + "/" + down + " in " + FILE);
        }
        return h;
    }

    /** y[m], m = 0 .. outputs−1, from the definition above. */
    static double[] apply(double[] x, int up, int down, long outputs) {
        double[] h = taps(up, down);
        int half = (h.length - 1) / 2;
        double[] y = new double[(int) outputs];
        for (int m = 0; m < outputs; m++) {
            long centre = (long) m * down + half;                     // index into the zero-stuffed series
            long nLo = Math.max(0, Math.ceilDiv(centre - 2L * half, up));
            long nHi = Math.min(x.length - 1L, Math.floorDiv(centre, up));
            double s = 0;
            for (long n = nLo; n <= nHi; n++) {
                s += x[(int) n] * h[(int) (centre - n * up)];
            }
            y[m] = s;
        }
        return y;
    }

    private static Map<Long, double[]> all() {
        if (taps != null) {
            return taps;
        }
        Map<Long, double[]> out = new LinkedHashMap<>();
        try (BufferedReader in = new BufferedReader(TestData.reader(FILE))) {
            String line;
            int lineNo = 0;
            while ((line = in.readLine()) != null) {
                lineNo++;
                if (line.startsWith("#")) {
                    continue;
                }
                String[] f = line.trim().split("\\s+");
                if (f.length != 4 || !f[0].equals("ratio")) {
                    throw new IllegalStateException(FILE + " line " + lineNo + ": expected 'ratio UP DOWN COUNT', was "
                            + line);
                }
                int up = Integer.parseInt(f[1]);
                int down = Integer.parseInt(f[2]);
                double[] h = new double[Integer.parseInt(f[3])];
                for (int i = 0; i < h.length; i++) {
                    String v = in.readLine();
                    lineNo++;
                    if (v == null) {
                        throw new IllegalStateException(FILE + ": ends inside the taps of " + up + "/" + down);
                    }
                    h[i] = Double.parseDouble(v.trim());
                }
                out.put((long) up << 32 | down, h);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        taps = out;
        return out;
    }
}
