package org.foldbook.dsp.spectrum;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/**
 * Reads the scipy reference vectors written by releng/reference/spectra_vectors.py into
 * resources/reference/spectra/ (comment lines start with '#', then whitespace-separated numbers).
 */
public final class ReferenceVectors {
    private ReferenceVectors() {
    }

    /** Rows of numbers of a reference file. */
    public static List<double[]> rows(String file) {
        List<double[]> rows = new ArrayList<>();
        for (String line : lines(file)) {
            String[] parts = line.trim().split("\\s+");
            double[] row = new double[parts.length];
            for (int i = 0; i < parts.length; i++) {
                row[i] = Double.parseDouble(parts[i]);
            }
            rows.add(row);
        }
        return rows;
    }

    /** Column c of a reference file. */
    public static double[] column(String file, int c) {
        List<double[]> rows = rows(file);
        double[] col = new double[rows.size()];
        for (int i = 0; i < col.length; i++) {
            col[i] = rows.get(i)[c];
        }
        return col;
    }

    /** Non-comment, non-blank lines of a reference file. */
    public static List<String> lines(String file) {
        String path = "/reference/spectra/" + file;
        try (InputStream in = ReferenceVectors.class.getResourceAsStream(path)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + path
                        + " (run releng/reference/spectra_vectors.py)");
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            List<String> out = new ArrayList<>();
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.isBlank() && !line.startsWith("#")) {
                    out.add(line);
                }
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
