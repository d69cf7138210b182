package org.foldbook.audit;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Locale;

import org.foldbook.model.derived.Quantities;

/**
 * The audit as one self-contained HTML file: no scripts, no external files; plots inline as SVG drawn by
 * {@link AuditCharts}. Every finding is one table row {@code <tr class="finding" data-code=…>}; every
 * peak one {@code <tr class="peak" data-verdict=…>}. The same findings as {@link JsonReport}.
 */
public final class HtmlReport {

    private HtmlReport() {
    }

    public static void write(NotebookAudit audit, Path file) throws IOException {
        Path tmp = file.resolveSibling(file.getFileName() + ".writing");
        Files.writeString(tmp, render(audit), StandardCharsets.UTF_8);
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    public static String render(NotebookAudit audit) {
        StringBuilder h = new StringBuilder(1 << 16);
        h.append("<!DOCTYPE html>\n<html lang=\"en\"><head><meta charset=\"utf-8\"><title>Audit of ")
                .append(esc(audit.notebookTitle())).append("</title>\n<style>").append(STYLE).append("</style></head><body>\n");
        h.append("<h1>Audit of the recordings in ").append(esc(audit.notebookTitle())).append("</h1>\n<p class=\"meta\">")
                .append(audit.file() == null ? "" : esc(audit.file().toString()) + " · ").append("made ")
                .append(esc(audit.madeAt().toString())).append(" · report layout ").append(JsonReport.LAYOUT).append("</p>\n");
        h.append("<div class=\"caution\"><b>Safety first.</b> This report reads recordings only. Rigs near mains, "
                + "high-voltage stimulators, shakers, lasers and rotating machinery can hurt: before you touch a rig "
                + "to re-record or check a finding, follow your lab's local rules and the instructions of qualified "
                + "staff. The figures here do not replace them.</div>\n");
        summaryTable(h, audit);
        proves(h, audit.policy());
        for (NotebookAudit.ExperimentAudit e : audit.experiments()) {
            h.append("<h2>Experiment ").append(esc(e.name())).append(" <span class=\"count\">").append(esc(e.summary().toString()))
                    .append("</span></h2>\n");
            for (ChannelAudit c : e.channels()) {
                channel(h, c);
            }
        }
        h.append("</body></html>\n");
        return h.toString();
    }

    private static void summaryTable(StringBuilder h, NotebookAudit audit) {
        Summary all = audit.summary();
        h.append("<h2>Summary</h2>\n<p>Notebook: <b class=\"sev-").append(all.worst().word()).append("\">")
                .append(esc(all.toString())).append("</b>.</p>\n<table class=\"summary\"><tr><th>experiment</th><th>channel</th>"
                        + "<th>errors</th><th>warnings</th><th>notes</th><th>peaks: trustworthy / could be folded / probably folded</th></tr>\n");
        for (NotebookAudit.ExperimentAudit e : audit.experiments()) {
            for (ChannelAudit c : e.channels()) {
                Summary s = c.summary();
                long t = c.peaks().stream().filter(p -> p.verdict() == PeakVerdict.TRUSTWORTHY).count();
                long m = c.peaks().stream().filter(p -> p.verdict() == PeakVerdict.COULD_BE_FOLDED).count();
                long b = c.peaks().stream().filter(p -> p.verdict() == PeakVerdict.PROBABLY_FOLDED).count();
                h.append("<tr><td>").append(esc(e.name())).append("</td><td>").append(esc(c.channel())).append("</td><td>")
                        .append(s.errors()).append("</td><td>").append(s.warnings()).append("</td><td>").append(s.infos())
                        .append("</td><td>").append(t).append(" / ").append(m).append(" / ").append(b).append("</td></tr>\n");
            }
        }
        h.append("</table>\n");
    }

    private static void proves(StringBuilder h, AuditPolicy p) {
        h.append("<h2>What the verdicts do and do not prove</h2>\n<ul class=\"proves\">"
                + "<li><b>trustworthy</b>: no frequency above Nyquist that the front end passes could put a peak there at "
                + "a level the chain allows (its stated out-of-band level, else 0 dBFS), or a higher-rate recording of the "
                + "same sensor shows those frequencies negligible. It does not prove the peak is what you think it is: "
                + "harmonics, interference and the mechanics of the rig are not judged here.</li>"
                + "<li><b>could be folded</b>: the chain does not rule out a source above Nyquist. It does not say one "
                + "exists; a recording at a higher rate, or the sensor's data sheet, settles it.</li>"
                + "<li><b>probably folded</b>: a higher-rate recording of the same sensor shows a source above Nyquist "
                + "that, through this chain, lands here at least " + Words.db(p.foldedMarginDb())
                + " stronger than what it shows at the peak's own frequency. It rests on the two recordings seeing the "
                + "same conditions (same machine state, same mounting); if they differ, so may the answer.</li>"
                + "<li>Figures come from the notebook as written: a missing or wrong setting makes them wrong. Levels are "
                + "in dB re full scale of the digitizer; a sine's level is read from the Welch spectrum (Hann, ENBW 1.5 bins).</li>"
                + "<li>Thresholds used (our own rules of thumb): calibration valid " + p.calibrationValidMonths()
                + " months; rails at " + String.format(Locale.ROOT, "%.1f %%", 100 * p.clipFraction()) + " of full scale; "
                + "dropout " + p.dropoutSamples() + " exact zeros; flat run " + p.flatSamples() + " identical values; "
                + "energy near Nyquist over the top " + String.format(Locale.ROOT, "%.0f %%", 100 * p.nyquistBandFraction())
                + " of the band less than " + Words.db(p.nyquistExcessDb()) + " below the broadband floor of 0–fs/4.</li></ul>\n");
    }

    private static void channel(StringBuilder h, ChannelAudit c) {
        h.append("<section class=\"channel\" id=\"").append(esc(c.subjectRef())).append("\"><h3>Channel ").append(esc(c.channel()))
                .append(" <span class=\"count\">").append(esc(c.summary().toString())).append("</span></h3>\n");
        h.append("<p><b>Chain</b> at ").append(Quantities.rate(c.rateHz())).append(": ").append(esc(String.join(" → ", c.chainText())))
                .append(". Front end passes up to ").append(Quantities.hz(c.frontEndUpperHz())).append(".");
        c.reference().ifPresent(r -> h.append(" Higher-rate recording of the same sensor used as evidence: ").append(esc(r)).append("."));
        h.append("</p>\n");
        double required = c.findings().stream().filter(f -> f.kind() == AuditKind.ALIAS_FREE_BAND)
                .mapToDouble(f -> f.value("requiredAttenuationDb")).findFirst().orElse(Double.NaN);
        if (c.rateHz() > 0) {
            h.append("<figure>").append(AuditCharts.chain(c, required)).append("</figure>\n");
        }
        c.spectrum().ifPresent(sp -> h.append("<figure>").append(AuditCharts.spectrum(sp, c.peaks())).append("</figure>\n"));
        if (c.rateHz() > 0) {
            h.append("<figure>").append(AuditCharts.foldMap(c)).append("</figure>\n");
        }
        h.append("<h4>Findings</h4>\n<table class=\"findings\"><tr><th>severity</th><th>finding</th><th>what</th></tr>\n");
        for (Finding f : c.findings()) {
            h.append("<tr class=\"finding sev-").append(f.severity().word()).append("\" data-code=\"").append(f.kind().code())
                    .append("\" data-kind=\"").append(f.kind().name()).append("\"><td>").append(f.severity().word())
                    .append("</td><td>").append(esc(f.kind().title())).append("</td><td>").append(esc(f.message()))
                    .append("</td></tr>\n");
        }
        h.append("</table>\n");
        if (!c.peaks().isEmpty()) {
            h.append("<h4>Peaks</h4>\n<table class=\"peaks\"><tr><th>at</th><th>level</th><th>verdict</th>"
                    + "<th>could come from (attenuation, level needed at the sensor)</th><th>why</th></tr>\n");
            for (PeakAssessment p : c.peaks()) {
                h.append("<tr class=\"peak v-").append(p.verdict().name().toLowerCase(Locale.ROOT)).append("\" data-verdict=\"")
                        .append(p.verdict().name()).append("\"><td>").append(Quantities.hz(p.frequencyHz())).append("</td><td>")
                        .append(dbfs(p.levelDb())).append("</td><td>").append(p.verdict().words()).append("</td><td>");
                int shown = 0;
                for (PeakCandidate k : p.candidates()) {
                    if (shown++ == 8) {
                        h.append("… ").append(p.candidates().size() - 8).append(" more");
                        break;
                    }
                    h.append(Quantities.hz(k.trueHz())).append(" (").append(Words.db(k.attenuationDb())).append(", ")
                            .append(dbfs(k.sensorLevelDb())).append(")").append(k.folded() ? "" : " in band").append("<br>");
                }
                h.append("</td><td>").append(esc(p.reasoning())).append("</td></tr>\n");
            }
            h.append("</table>\n");
        }
        h.append("</section>\n");
    }

    private static String dbfs(double v) {
        return Words.db(v).replace(" dB", " dBFS");
    }

    static String esc(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder b = new StringBuilder(s.length());
        for (char ch : s.toCharArray()) {
            switch (ch) {
            case '<' -> b.append("&lt;");
            case '>' -> b.append("&gt;");
            case '&' -> b.append("&amp;");
            case '"' -> b.append("&quot;");
            default -> b.append(ch);
            }
        }
        return b.toString();
    }

    private static final String STYLE = "body{font-family:sans-serif;max-width:900px;margin:2em auto;color:#222;line-height:1.4}"
            + "h1{font-size:1.5em}h2{border-bottom:1px solid #ccc;margin-top:1.6em}.meta,.count{color:#666;font-size:.85em;font-weight:normal}"
            + ".caution{border-left:5px solid #d68910;background:#fdf3e1;padding:.6em 1em}"
            + "table{border-collapse:collapse;width:100%;font-size:.85em;margin:.5em 0}th,td{border:1px solid #ddd;padding:3px 6px;"
            + "text-align:left;vertical-align:top}th{background:#f2f2f2}.sev-error td:first-child,b.sev-error{color:#c0392b;font-weight:bold}"
            + ".sev-warning td:first-child,b.sev-warning{color:#b9770e;font-weight:bold}.sev-info td:first-child{color:#555}"
            + ".v-probably_folded td:nth-child(3){color:#c0392b;font-weight:bold}.v-could_be_folded td:nth-child(3){color:#b9770e}"
            + ".v-trustworthy td:nth-child(3){color:#1e8449}figure{margin:.6em 0}section.channel{margin-bottom:2em}";
}
