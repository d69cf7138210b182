package org.foldbook.ui.walkthrough;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import javax.xml.parsers.DocumentBuilderFactory;

import org.foldbook.model.Rig;
import org.foldbook.model.SignalChain;
import org.foldbook.demo.GearboxDemo;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.select.Elements;
import org.junit.jupiter.api.DisplayName;
import org.junit.jupiter.api.Test;

/**
 * The printable walkthrough of the demo rig (SYNTHETIC): parsed by jsoup (an HTML5 parser) and by the JDK's
 * XML parser (well-formedness), it holds the cautions once and a section for every stage of every chain,
 * each with its figures as computed, and every chart as inline SVG drawn by JFreeChart.
 */
class WalkthroughHtmlTest {

    @Test
    @DisplayName("the exported page is well-formed, self-contained and holds every stage with its numbers and charts")
    void exportedPage() throws Exception {
        Rig rig = GearboxDemo.build().getRigs().get(0);
        List<Walkthrough> all = rig.getChains().stream().map(c -> Walkthrough.of(rig, c, WhatIf.NONE, null)).toList();
        String html = WalkthroughHtml.page("gearbox stand GB-2", all, "Computed from the demo notebook.");

        // well-formed XML (XHTML output): the JDK's parser throws on any unclosed or mis-nested element
        var factory = DocumentBuilderFactory.newInstance();
        factory.setNamespaceAware(true);
        org.w3c.dom.Document xml = factory.newDocumentBuilder()
                .parse(new ByteArrayInputStream(html.getBytes(StandardCharsets.UTF_8)));
        assertEquals("html", xml.getDocumentElement().getLocalName());

        Document doc = Jsoup.parse(html);
        assertEquals("Rig walkthrough: gearbox stand GB-2", doc.title());
        assertEquals(1, doc.select("section.cautions").size());
        assertTrue(doc.select("section.cautions").text().contains(rig.getNotes()));
        // self-contained: no script, no external style sheet, image or font
        assertTrue(doc.select("script, link, img, [src]").isEmpty(), doc.select("script, link, img, [src]").toString());

        int charts = 0;
        for (Walkthrough w : all) {
            SignalChain chain = w.chain();
            Element section = doc.getElementById("chain-" + chain.getId().toLowerCase().replaceAll("[^a-z0-9]+", "-"));
            assertNotNull(section, chain.getId());
            Elements stages = section.select("section.stage");
            assertEquals(chain.getStages().size(), stages.size(), chain.getId()); // every stage, in order
            for (int i = 0; i < stages.size(); i++) {
                StagePage page = w.pages().get(i + 1);
                assertEquals(page.title(), stages.get(i).selectFirst("h3").text());
                assertEquals(page.figures().size(), stages.get(i).select("tr").size() - 1);
                assertEquals(page.chart().isPresent() ? 1 : 0, stages.get(i).select("div.chart svg").size(), page.title());
                charts += page.chart().isPresent() ? 1 : 0;
            }
        }
        Elements svgs = doc.select("div.chart svg");
        assertEquals(charts, svgs.size());
        assertTrue(charts >= 8, "charts: " + charts);
        for (Element svg : svgs) {
            assertTrue(svg.select("path, line, polyline").size() > 10, "a drawn chart, not an empty frame");
        }
        // the numbers as the walkthrough computed them (hand-worked in WalkthroughPresenterTest)
        Element housing = doc.getElementById("chain-ch-hz");
        assertTrue(housing.text().contains("Lowest safe rate for 0 – 10 kHz 42 kS/s"), housing.text());
        assertTrue(doc.getElementById("chain-ch-cam").text().contains("Apparent rotation +24.5 rev/s (forward)"));
        // the fold-back bands' labels are drawn into the filter chart
        assertTrue(doc.getElementById("stage-ch-hz-3").select("svg").text().contains("folds back: 12.8 kHz – 32 kHz"));
    }
}
