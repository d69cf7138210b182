package org.foldbook.audit;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;

/**
 * The audit as JSON for scripts. Layout {@value #LAYOUT} (a new number when a field changes meaning or
 * goes; fields may be added without one):
 *
 * <pre>
 * { "layout": "foldbook-audit/1", "notebook": title, "file": path|null, "madeAt": ISO-8601,
 *   "policy": { calibrationValidMonths, clipFraction, ... },
 *   "summary": { "errors": n, "warnings": n, "infos": n, "worst": "error|warning|info" },
 *   "experiments": [ { "name", "summary": {...}, "channels": [ {
 *       "experiment", "channel", "ref" (URI fragment in the notebook), "rateHz", "frontEndUpperHz",
 *       "chain": [stage text...], "reference": label|null, "summary": {...},
 *       "findings": [ { "kind": AuditKind name, "code": int, "severity", "subject", "ref", "message",
 *                       "figures": { name: { "value": number|null, "unit": text } } } ],
 *       "peaks": [ { "frequencyHz", "levelDbfs", "verdict": PeakVerdict name, "reasoning",
 *                    "candidates": [ { "trueHz", "folded", "attenuationDb", "sensorLevelDbfs",
 *                                      "referenceLevelDbfs", "referencePeak" } ] } ],
 *       "foldBands": [ { "fromHz", "toHz", "landsFromHz", "landsToHz", "leastAttenuationDb" } ],
 *       "foldedNoise": [ { "source": "model|data", "riseDb", "basis" } ] } ] } ] }
 * </pre>
 * Numbers that are not finite are written as null.
 */
public final class JsonReport {
    public static final String LAYOUT = "foldbook-audit/1";

    private JsonReport() {
    }

    /** Writes {@code audit} to {@code file} (through a temporary file, so a reader never sees half of it). */
    public static void write(NotebookAudit audit, Path file) throws IOException {
        Path tmp = file.resolveSibling(file.getFileName() + ".writing");
        try (OutputStream out = Files.newOutputStream(tmp)) {
            write(audit, out);
        }
        Files.move(tmp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
    }

    public static void write(NotebookAudit audit, OutputStream out) throws IOException {
        try (JsonGenerator g = new JsonFactory().createGenerator(out, JsonEncoding.UTF8)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("layout", LAYOUT);
            g.writeStringField("notebook", audit.notebookTitle());
            g.writeStringField("file", audit.file() == null ? null : audit.file().toString());
            g.writeStringField("madeAt", audit.madeAt().toString());
            AuditPolicy p = audit.policy();
            g.writeObjectFieldStart("policy");
            g.writeNumberField("calibrationValidMonths", p.calibrationValidMonths());
            num(g, "clipFraction", p.clipFraction());
            num(g, "dcFractionOfFullScale", p.dcFractionOfFullScale());
            g.writeNumberField("dropoutSamples", p.dropoutSamples());
            g.writeNumberField("flatSamples", p.flatSamples());
            num(g, "nyquistBandFraction", p.nyquistBandFraction());
            num(g, "nyquistExcessDb", p.nyquistExcessDb());
            num(g, "foldedMarginDb", p.foldedMarginDb());
            num(g, "negligibleDb", p.negligibleDb());
            num(g, "unusedBits", p.unusedBits());
            g.writeEndObject();
            summary(g, audit.summary());
            g.writeArrayFieldStart("experiments");
            for (NotebookAudit.ExperimentAudit e : audit.experiments()) {
                g.writeStartObject();
                g.writeStringField("name", e.name());
                summary(g, e.summary());
                g.writeArrayFieldStart("channels");
                for (ChannelAudit c : e.channels()) {
                    channel(g, c);
                }
                g.writeEndArray();
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
    }

    private static void channel(JsonGenerator g, ChannelAudit c) throws IOException {
        g.writeStartObject();
        g.writeStringField("experiment", c.experiment());
        g.writeStringField("channel", c.channel());
        g.writeStringField("ref", c.subjectRef());
        num(g, "rateHz", c.rateHz());
        num(g, "frontEndUpperHz", c.frontEndUpperHz());
        g.writeArrayFieldStart("chain");
        for (String s : c.chainText()) {
            g.writeString(s);
        }
        g.writeEndArray();
        g.writeStringField("reference", c.reference().orElse(null));
        summary(g, c.summary());
        g.writeArrayFieldStart("findings");
        for (Finding f : c.findings()) {
            g.writeStartObject();
            g.writeStringField("kind", f.kind().name());
            g.writeNumberField("code", f.kind().code());
            g.writeStringField("severity", f.severity().word());
            g.writeStringField("subject", f.subject());
            g.writeStringField("ref", f.subjectRef());
            g.writeStringField("message", f.message());
            g.writeObjectFieldStart("figures");
            for (Figure x : f.figures()) {
                g.writeObjectFieldStart(x.name());
                num(g, "value", x.value());
                g.writeStringField("unit", x.unit());
                g.writeEndObject();
            }
            g.writeEndObject();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("peaks");
        for (PeakAssessment p : c.peaks()) {
            g.writeStartObject();
            num(g, "frequencyHz", p.frequencyHz());
            num(g, "levelDbfs", p.levelDb());
            g.writeStringField("verdict", p.verdict().name());
            g.writeStringField("reasoning", p.reasoning());
            g.writeArrayFieldStart("candidates");
            for (PeakCandidate k : p.candidates()) {
                g.writeStartObject();
                num(g, "trueHz", k.trueHz());
                g.writeBooleanField("folded", k.folded());
                num(g, "attenuationDb", k.attenuationDb());
                num(g, "sensorLevelDbfs", k.sensorLevelDb());
                num(g, "referenceLevelDbfs", k.referenceLevelDb());
                g.writeBooleanField("referencePeak", k.referencePeak());
                g.writeEndObject();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("foldBands");
        for (ChannelAudit.FoldBandView b : c.foldBands()) {
            g.writeStartObject();
            num(g, "fromHz", b.fromHz());
            num(g, "toHz", b.toHz());
            num(g, "landsFromHz", b.landsFromHz());
            num(g, "landsToHz", b.landsToHz());
            num(g, "leastAttenuationDb", b.leastAttenuationDb());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeArrayFieldStart("foldedNoise");
        for (FoldedNoise n : java.util.stream.Stream.of(c.modelNoise(), c.dataNoise()).flatMap(java.util.Optional::stream).toList()) {
            g.writeStartObject();
            g.writeStringField("source", n.source());
            num(g, "riseDb", n.riseDb());
            g.writeStringField("basis", n.basis());
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeEndObject();
    }

    private static void summary(JsonGenerator g, Summary s) throws IOException {
        g.writeObjectFieldStart("summary");
        g.writeNumberField("errors", s.errors());
        g.writeNumberField("warnings", s.warnings());
        g.writeNumberField("infos", s.infos());
        g.writeStringField("worst", s.worst().word());
        g.writeEndObject();
    }

    private static void num(JsonGenerator g, String name, double v) throws IOException {
        if (Double.isFinite(v)) {
            g.writeNumberField(name, v);
        } else {
            g.writeNullField(name);
        }
    }
}
