package org.foldbook.dsp.filter;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Reads the small CSV files written by releng/reference/filter_vectors.py (scipy.signal) from the
 * test class path: '#' lines are comments, the first other line names the columns.
 */
public final class ReferenceCsv {

    public final List<String> columns;
    public final List<String[]> rows = new ArrayList<>();

    private ReferenceCsv(List<String> columns) {
        this.columns = columns;
    }

    public static ReferenceCsv load(String name) {
        String path = "/reference/filters/" + name;
        try (InputStream in = ReferenceCsv.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + path);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            ReferenceCsv csv = null;
            for (String line; (line = r.readLine()) != null;) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] cells = line.split(",", -1);
                if (csv == null) {
                    csv = new ReferenceCsv(Arrays.asList(cells));
                } else {
                    csv.rows.add(cells);
                }
            }
            return csv;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public String get(String[] row, String column) {
        int i = columns.indexOf(column);
        if (i < 0) {
            throw new IllegalArgumentException("no column " + column + " in " + columns);
        }
        return row[i];
    }

    public double num(String[] row, String column) {
        return Double.parseDouble(get(row, column));
    }

    /** Rows grouped by the integer in column "case". */
    public Map<Integer, List<String[]>> byCase() {
        Map<Integer, List<String[]>> m = new HashMap<>();
        for (String[] row : rows) {
            m.computeIfAbsent(Integer.parseInt(get(row, "case")), k -> new ArrayList<>()).add(row);
        }
        return m;
    }

    /** Builds the analog model a cases row describes (family, order, ripple_db, stopband_db, norm, cutoff_hz). */
    public AnalogFilter design(String[] row) {
        String family = get(row, "family");
        int order = Integer.parseInt(get(row, "order"));
        double rp = num(row, "ripple_db");
        double rs = num(row, "stopband_db");
        double fc = num(row, "cutoff_hz");
        return switch (family) {
            case "butterworth" -> AnalogLowPass.butterworth(order, fc);
            case "bessel" -> AnalogLowPass.bessel(order, fc, switch (get(row, "norm")) {
                case "delay" -> BesselNormalization.DELAY;
                case "phase" -> BesselNormalization.PHASE;
                case "mag" -> BesselNormalization.MAGNITUDE;
                default -> throw new IllegalStateException(get(row, "norm"));
            });
            case "chebyshev1" -> AnalogLowPass.chebyshev1(order, rp, fc);
            case "elliptic" -> AnalogLowPass.elliptic(order, rp, rs, fc);
            default -> throw new IllegalStateException(family);
        };
    }
}
