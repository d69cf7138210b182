package org.foldbook.dsp.resample;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the text files that releng/reference/resample_vectors.py (Debian python3-numpy/scipy) writes
 * into resources/reference/resample/: '#' lines are comments ("# input_length N" is read), other lines
 * hold whitespace-separated columns.
 */
final class ReferenceVectors {

    private static final String DIR = "/reference/resample/";

    private ReferenceVectors() {
    }

    static List<String[]> rows(String name) {
        List<String[]> rows = new ArrayList<>();
        for (String line : lines(name)) {
            if (!line.startsWith("#") && !line.isBlank()) {
                rows.add(line.trim().split("\\s+"));
            }
        }
        return rows;
    }

    static double[] column(String name) {
        List<String[]> rows = rows(name);
        double[] v = new double[rows.size()];
        for (int i = 0; i < v.length; i++) {
            v[i] = Double.parseDouble(rows.get(i)[0]);
        }
        return v;
    }

    /** The synthetic input the vectors were computed from, cut to the file's "# input_length". */
    static double[] inputFor(String name) {
        double[] all = column("input.txt");
        for (String line : lines(name)) {
            if (line.startsWith("# input_length ")) {
                return java.util.Arrays.copyOf(all, Integer.parseInt(line.substring(15).trim()));
            }
        }
        return all;
    }

    private static List<String> lines(String name) {
        try (InputStream in = ReferenceVectors.class.getResourceAsStream(DIR + name)) {
            if (in == null) {
                throw new IllegalStateException("reference file " + DIR + name + " not on the test class path");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            return r.lines().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
