package org.foldbook.ui.walkthrough;

import java.util.List;

import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Entities;

/**
 * The printable walkthrough: one self-contained HTML page (no external file, script or font) for a lab's
 * wiki, holding the cautions and every stage of every chain walked through, each stage's chart as inline
 * SVG from {@link WalkthroughCharts}. Built as a jsoup document and written as XHTML, so it is well-formed
 * XML as well as HTML. Free of SWT; the pages are computed before (on the UI thread), this runs anywhere.
 */
public final class WalkthroughHtml {

    private static final String STYLE = """
            body { font-family: sans-serif; max-width: 60em; margin: 2em auto; color: #222; line-height: 1.4; }
            h1 { font-size: 1.6em; } h2 { font-size: 1.3em; border-bottom: 2px solid #005ab5; margin-top: 2em; }
            h3 { font-size: 1.1em; margin-top: 1.5em; }
            .path { font-family: monospace; background: #f3f3f3; padding: 0.4em; }
            .cautions { border-left: 6px solid #dc3220; padding-left: 1em; }
            table { border-collapse: collapse; margin: 0.8em 0; } td, th { border: 1px solid #bbb; padding: 0.2em 0.6em; text-align: left; }
            th { background: #eef; } td.how { color: #666; font-size: 0.9em; }
            .chart svg { max-width: 100%; height: auto; }
            @media print { h2 { page-break-before: always; } .chart { page-break-inside: avoid; } }
            """;

    private WalkthroughHtml() {
    }

    /**
     * The page for {@code walkthroughs} (the chains of one rig, or one chain), titled after the rig
     * {@code rig}. Reads no model object (see {@link Walkthrough#words}).
     *
     * @param source a line saying where the figures come from (the notebook file), shown under the title
     */
    public static String page(String rig, List<Walkthrough> walkthroughs, String source) {
        Document doc = Document.createShell("");
        doc.outputSettings().syntax(Document.OutputSettings.Syntax.xml).escapeMode(Entities.EscapeMode.xhtml)
                .charset("UTF-8").prettyPrint(true);
        doc.head().appendElement("meta").attr("charset", "UTF-8");
        doc.title("Rig walkthrough: " + rig);
        doc.head().appendElement("style").appendText(STYLE);
        Element body = doc.body();
        body.appendElement("h1").text("Rig walkthrough: " + rig);
        body.appendElement("p").text(source);
        body.appendElement("p").text("Every figure on this page is computed from the notebook by Foldbook; "
                + "they do not replace the lab's own rules and the instructions of qualified staff.");
        if (!walkthroughs.isEmpty()) { // the rig's cautions once, at the top
            stage(body, walkthroughs.get(0).pages().get(0), "cautions").addClass("cautions");
        }
        for (Walkthrough w : walkthroughs) {
            Element chain = body.appendElement("section").addClass("chain").attr("id", "chain-" + slug(w.words().chainId()));
            chain.appendElement("h2").text("Chain: " + w.words().chain());
            chain.appendElement("p").addClass("path").text(w.path());
            for (StagePage page : w.pages()) {
                if (page.kind() != StagePage.Kind.CAUTIONS) {
                    stage(chain, page, "stage-" + slug(w.words().chainId()) + "-" + (page.stageIndex() + 1));
                }
            }
        }
        return doc.outerHtml();
    }

    private static Element stage(Element parent, StagePage page, String id) {
        Element section = parent.appendElement("section").addClass("stage").attr("data-kind", page.kind().name())
                .attr("id", id);
        section.appendElement("h3").text(page.title());
        for (String p : page.paragraphs()) {
            section.appendElement("p").text(p);
        }
        if (!page.figures().isEmpty()) {
            Element table = section.appendElement("table");
            Element head = table.appendElement("tr");
            head.appendElement("th").text("Figure");
            head.appendElement("th").text("Value");
            head.appendElement("th").text("How");
            for (StagePage.Figure f : page.figures()) {
                Element row = table.appendElement("tr");
                row.appendElement("td").text(f.name());
                row.appendElement("td").text(f.value());
                row.appendElement("td").addClass("how").text(f.how());
            }
        }
        page.chart().ifPresent(c -> section.appendElement("div").addClass("chart").append(WalkthroughCharts.svg(c)));
        return section;
    }

    private static String slug(String id) {
        return id == null ? "unnamed" : id.toLowerCase(java.util.Locale.ROOT).replaceAll("[^a-z0-9]+", "-");
    }
}
