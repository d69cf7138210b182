package org.foldbook.ui.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;
import org.foldbook.ui.chart.PlotView;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * Exports of a real chart and table, read back by outside parsers: the JDK's ImageIO (PNG), the JDK's
 * XML parser (SVG is well-formed, an svg root with polylines as paths), Commons CSV, Jackson. Input is
 * SYNTHETIC: a three-point line.
 */
class ExportTest {
    @TempDir
    Path dir;
    private Shell shell;
    private PlotView plot;

    @BeforeEach
    void open() {
        shell = new Shell(Display.getDefault());
        shell.setSize(700, 500);
        shell.setLayout(new FillLayout());
        plot = new PlotView(shell, "Test chart", "Frequency (Hz)", "Level (dB)");
        plot.addLine("line, one", new double[] {10, 100, 1000}, new double[] {-3, 5, 1});
        plot.addMarker("limit", new double[] {10, 1000}, new double[] {0, 0});
        plot.setLogX(true);
        plot.setRanges(null, null);
        shell.open();
        shell.layout(true, true);
        while (Display.getDefault().readAndDispatch()) {
            // paint
        }
    }

    @AfterEach
    void close() {
        shell.dispose();
    }

    @Test
    void chartExportsReadBack() throws Exception {
        Path png = dir.resolve("c.png");
        ExportMenu.writeChart(plot, ExportMenu.Kind.PNG, png);
        var image = ImageIO.read(png.toFile());
        assertEquals(plot.control().getSize().x, image.getWidth());

        Path svg = dir.resolve("c.svg");
        ExportMenu.writeChart(plot, ExportMenu.Kind.SVG, svg);
        DocumentBuilderFactory factory = DocumentBuilderFactory.newInstance();
        // the SVG DOCTYPE names a DTD on the web: never fetch it (tests talk to loopback only)
        factory.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document doc = factory.newDocumentBuilder().parse(svg.toFile());
        assertEquals("svg", doc.getDocumentElement().getNodeName());
        assertTrue(doc.getElementsByTagName("path").getLength() >= 2, "one path per line");
        assertTrue(Files.readString(svg).contains("Test chart"));

        Path csv = dir.resolve("c.csv");
        ExportMenu.writeChart(plot, ExportMenu.Kind.CSV, csv);
        try (Reader r = Files.newBufferedReader(csv, StandardCharsets.UTF_8);
                CSVParser p = CSVParser.parse(r, CSVFormat.RFC4180)) {
            List<CSVRecord> rows = p.getRecords();
            assertEquals(List.of("series", "Frequency (Hz)", "Level (dB)"), rows.get(0).toList());
            assertEquals("line, one", rows.get(2).get(0));
            assertEquals(100.0, Double.parseDouble(rows.get(2).get(1)));
            assertEquals(1 + 3 + 2, rows.size());
        }

        Path json = dir.resolve("c.json");
        ExportMenu.writeChart(plot, ExportMenu.Kind.JSON, json);
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        assertTrue(root.get("xAxis").get("log").asBoolean());
        assertEquals(5.0, root.get("series").get(0).get("y").get(1).asDouble());
        assertEquals("marker", root.get("series").get(1).get("style").asText());
    }

    @Test
    void tableExportsReadBack() throws IOException {
        TableData t = new TableData("Peaks", List.of("Peak (Hz)", "Level"), List.of(List.of("906.50", "-10.5")));
        Path csv = dir.resolve("t.csv");
        ExportMenu.writeTable(t, ExportMenu.Kind.CSV, csv);
        try (CSVParser p = CSVParser.parse(csv, StandardCharsets.UTF_8, CSVFormat.RFC4180)) {
            List<CSVRecord> rows = p.getRecords();
            assertEquals("906.50", rows.get(1).get(0));
        }
        Path json = dir.resolve("t.json");
        ExportMenu.writeTable(t, ExportMenu.Kind.JSON, json);
        assertEquals("-10.5", new ObjectMapper().readTree(json.toFile()).get("rows").get(0).get("Level").asText());
    }
}
