package org.foldbook.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.foldbook.demo.GearboxDemo;
import org.foldbook.model.Notebook;
import org.foldbook.model.persistence.NotebookStore;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The demo notebook audited, written as HTML and JSON, read back with jsoup and Jackson (outside parsers):
 * the plots are there, every finding is in both, and they agree.
 */
class ReportTest {
    @TempDir
    static Path dir;
    static NotebookAudit audit;
    static Path html;
    static Path json;

    @BeforeAll
    static void auditTheDemo() throws Exception {
        Path nbFile = GearboxDemo.write(dir.resolve("demo"));
        Notebook nb = NotebookStore.load(nbFile);
        audit = new Auditor(AuditPolicy.DEFAULT).audit(nb, nbFile, Auditor.Scope.ALL, AuditProgress.NONE);
        html = dir.resolve("audit.html");
        json = dir.resolve("audit.json");
        HtmlReport.write(audit, html);
        JsonReport.write(audit, json);
        if (System.getenv("FOLDBOOK_AUDIT_KEEP") != null) { // to look at the demo's report after a build
            Path keep = Path.of(System.getenv("FOLDBOOK_AUDIT_KEEP"));
            Files.createDirectories(keep);
            Files.copy(html, keep.resolve("demo-audit.html"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            Files.copy(json, keep.resolve("demo-audit.json"), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
    }

    @Test
    void theHtmlHoldsThePlotsAndEveryFinding() throws Exception {
        Document doc = Jsoup.parse(html.toFile(), "UTF-8");
        int channels = audit.channels().size();
        assertTrue(channels >= 3, "demo channels: " + channels);
        // three plots a channel: chain, spectrum, fold map (the spectrum only where the data was read)
        long withSpectrum = audit.channels().stream().filter(c -> c.spectrum().isPresent()).count();
        assertEquals(2 * channels + withSpectrum, doc.select("figure > svg").size());
        assertTrue(doc.select("figure svg path, figure svg polyline").size() > 3 * channels);
        List<Element> rows = doc.select("tr.finding");
        List<Finding> all = audit.channels().stream().flatMap(c -> c.findings().stream()).toList();
        assertEquals(all.size(), rows.size());
        for (int i = 0; i < all.size(); i++) {
            assertEquals(String.valueOf(all.get(i).kind().code()), rows.get(i).attr("data-code"));
            assertEquals(all.get(i).message(), rows.get(i).select("td").get(2).text().trim());
        }
        assertEquals(audit.channels().stream().mapToInt(c -> c.peaks().size()).sum(), doc.select("tr.peak").size());
        assertTrue(doc.select("script, link, img[src]").isEmpty(), "self-contained");
        assertTrue(doc.text().contains("qualified staff"));
        assertTrue(doc.text().contains("do not prove"));
    }

    @Test
    void theJsonReadsBackAndMatchesTheHtml() throws Exception {
        JsonNode root = new ObjectMapper().readTree(json.toFile());
        assertEquals(JsonReport.LAYOUT, root.get("layout").asText());
        assertEquals(audit.summary().errors(), root.at("/summary/errors").asInt());
        List<String> fromJson = new ArrayList<>();
        for (JsonNode e : root.get("experiments")) {
            for (JsonNode c : e.get("channels")) {
                for (JsonNode f : c.get("findings")) {
                    fromJson.add(f.get("code").asInt() + " " + f.get("message").asText());
                    assertEquals(AuditKind.valueOf(f.get("kind").asText()).code(), f.get("code").asInt());
                }
            }
        }
        Document doc = Jsoup.parse(html.toFile(), "UTF-8");
        List<String> fromHtml = doc.select("tr.finding").stream()
                .map(r -> r.attr("data-code") + " " + r.select("td").get(2).text().trim()).toList();
        assertEquals(fromHtml, fromJson);
        assertFalse(fromJson.isEmpty());
    }

    @Test
    void theDemoSurveyTellsTheMeshToneFromTheToneThatFoldsOntoIt() {
        // the demo's own design (API notes, 9ccdd4d): 27.413 kHz lands on the 1813 Hz mesh tone at 25.6 kS/s,
        // |27413 − 25600| = 1813 Hz (fold formula); the survey at 204.8 kS/s shows it far below the mesh tone
        // once LP-A has taken its share, so the peak stays trustworthy and the candidate is listed
        ChannelAudit hz = audit.channels().stream().filter(c -> c.reference().isPresent() && c.rateHz() == 25_600)
                .findFirst().orElseThrow(() -> new AssertionError("no 25.6 kS/s channel with a survey reference"));
        PeakAssessment p = hz.peaks().stream().filter(x -> Math.abs(x.frequencyHz() - 1_813) < 2).findFirst()
                .orElseThrow(() -> new AssertionError("no peak at 1813 Hz in " + hz.peaks()));
        PeakCandidate k = p.candidates().stream().filter(x -> Math.abs(x.trueHz() - 27_413) < 2).findFirst().orElseThrow();
        assertTrue(k.referencePeak());
        assertTrue(k.referenceLevelDb() < p.levelDb() - AuditPolicy.DEFAULT.negligibleDb(), k + " vs " + p.levelDb());
        assertEquals(PeakVerdict.TRUSTWORTHY, p.verdict(), p.reasoning());
        assertTrue(hz.dataNoise().isPresent() && hz.modelNoise().isPresent());
    }
}
