package org.foldbook.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.foldbook.demo.GearboxDemo;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/** {@code foldbook audit} on the demo: exit codes, the JSON read with Jackson, the HTML parsed with jsoup. */
class AuditCommandTest {
    @TempDir
    static Path dir;
    static Path notebook;

    @BeforeAll
    static void demo() throws IOException {
        notebook = GearboxDemo.write(dir.resolve("lab"));
    }

    private static int run(ByteArrayOutputStream out, ByteArrayOutputStream err, String... args) {
        return Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @Test
    void theDemoHasFindingsAndTheReportsAgree() throws IOException {
        Path html = dir.resolve("audit.html");
        Path json = dir.resolve("audit.json");
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        // a folder is searched for notebooks; the demo's bypassed filter is a finding (warning or worse)
        int code = run(out, err, "audit", dir.resolve("lab").toString(), "--report", html.toString(), "--json",
                json.toString(), "--quiet");
        assertEquals(1, code, err.toString(StandardCharsets.UTF_8));
        JsonNode j = new ObjectMapper().readTree(json.toFile());
        assertEquals("foldbook-audit/1", j.get("layout").asText());
        int findings = 0;
        for (JsonNode e : j.get("experiments")) {
            for (JsonNode c : e.get("channels")) {
                findings += c.get("findings").size();
            }
        }
        assertTrue(findings > 0);
        Document doc = Jsoup.parse(html.toFile(), "UTF-8");
        assertTrue(doc.select("svg").size() >= 3, "inline SVG plots");
        String text = doc.text();
        for (JsonNode e : j.get("experiments")) {
            for (JsonNode c : e.get("channels")) {
                assertTrue(text.contains(c.get("channel").asText()), c.get("channel").asText());
            }
        }
        assertTrue(text.toLowerCase(java.util.Locale.ROOT).contains("qualified staff"), "the usual cautions");
        // only errors count: the exit code follows --fail-on
        int onErrors = run(new ByteArrayOutputStream(), new ByteArrayOutputStream(), "audit", notebook.toString(),
                "--fail-on", "error", "--quiet");
        assertEquals(j.get("summary").get("errors").asInt() > 0 ? 1 : 0, onErrors);
    }

    @Test
    void usageAndInputErrorsAreTwo() {
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertEquals(2, run(new ByteArrayOutputStream(), err, "audit"));
        assertEquals(2, run(new ByteArrayOutputStream(), err, "audit", dir.resolve("nowhere").toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("nowhere"));
        assertEquals(2, run(new ByteArrayOutputStream(), err, "audit", notebook.toString(), "--fail-on", "loud"));
        Path empty = dir.resolve("empty");
        assertTrue(empty.toFile().mkdirs() || Files.isDirectory(empty));
        assertEquals(2, run(new ByteArrayOutputStream(), err, "audit", empty.toString()));
    }
}
