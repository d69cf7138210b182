package org.foldbook.ui.export;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;

/**
 * Charts and tables as CSV (Apache Commons CSV, RFC 4180) and JSON (Jackson): the numbers behind what is
 * shown, for other tools. A chart's CSV has one block per series ({@code series,x,y} rows) so that series
 * of different lengths stay apart; its JSON keeps titles, axes and ranges. Free of SWT.
 */
public final class DataFiles {
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private DataFiles() {
    }

    public static void chartCsv(ChartData chart, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
                CSVPrinter csv = new CSVPrinter(w, CSVFormat.RFC4180)) {
            csv.printRecord("series", chart.xTitle(), chart.yTitle());
            for (ChartData.Series s : chart.series()) {
                for (int i = 0; i < s.x().length; i++) {
                    csv.printRecord(s.name(), s.x()[i], s.y()[i]);
                }
            }
        }
    }

    public static void chartJson(ChartData chart, Path file) throws IOException {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("title", chart.title());
        root.put("xAxis", Map.of("title", chart.xTitle(), "log", chart.logX(), "range", chart.xRange()));
        root.put("yAxis", Map.of("title", chart.yTitle(), "range", chart.yRange()));
        List<Map<String, Object>> series = new ArrayList<>();
        for (ChartData.Series s : chart.series()) {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", s.name());
            m.put("style", s.style().name().toLowerCase(Locale.ROOT));
            m.put("x", s.x());
            m.put("y", s.y());
            series.add(m);
        }
        root.put("series", series);
        JSON.writeValue(file.toFile(), root);
    }

    public static void tableCsv(TableData table, Path file) throws IOException {
        try (Writer w = Files.newBufferedWriter(file, StandardCharsets.UTF_8);
                CSVPrinter csv = new CSVPrinter(w, CSVFormat.RFC4180)) {
            csv.printRecord(table.columns());
            for (List<String> row : table.rows()) {
                csv.printRecord(row);
            }
        }
    }

    /** {@code {"title": ..., "columns": [...], "rows": [{column: cell, ...}, ...]}}. */
    public static void tableJson(TableData table, Path file) throws IOException {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("title", table.title());
        root.put("columns", table.columns());
        List<Map<String, String>> rows = new ArrayList<>();
        for (List<String> row : table.rows()) {
            Map<String, String> m = new LinkedHashMap<>();
            for (int i = 0; i < row.size(); i++) {
                m.put(table.columns().get(i), row.get(i));
            }
            rows.add(m);
        }
        root.put("rows", rows);
        JSON.writeValue(file.toFile(), root);
    }
}
