package org.foldbook.cli;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.foldbook.dsp.filter.AnalogFilter;
import org.foldbook.dsp.fold.Folding;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/**
 * {@code foldbook fold}: the quick fold calculator. For each tone at the given rate: where it appears
 * (|f − k·fs|, its Nyquist zone, mirrored or not) and every true frequency in the front end's band that
 * appears at that same place, each with the chain filter's attenuation when {@code --filter} is given.
 * Arithmetic only ({@link Folding}); no recording is read.
 */
@Command(name = "fold", mixinStandardHelpOptions = true, sortOptions = false,
        description = {"Quick fold calculator: tone(s), a sampling rate and the front end's band -> the apparent "
                + "frequency of each tone and every candidate true frequency that lands on the same place.",
            "  foldbook fold --rate 25600 --band 0:20000 22100 60000"},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:done", "2:usage error (the message names the option)"})
final class FoldCommand implements Callable<Integer> {
    @Parameters(paramLabel = "TONE_HZ", arity = "1..*", converter = CliValues.Positive.class,
            description = "true frequencies of the tones, Hz")
    java.util.List<Double> tones;
    @Option(names = "--rate", required = true, paramLabel = "HZ", converter = CliValues.Positive.class,
            description = "sampling rate, S/s")
    double rate;
    @Option(names = "--band", paramLabel = "LO:HI", converter = CliValues.Band.class,
            description = "the band the front end passes (sensor and conditioner); candidates are listed inside "
                    + "it (default 0 to the highest tone)")
    CliValues.BandHz band;
    @Option(names = "--filter", paramLabel = "KIND:...", description = "the chain's anti-alias filter "
            + "(butterworth:ORDER:HZ, bessel:ORDER:HZ or rc:HZ): its attenuation at each tone and candidate")
    String filter;
    @Option(names = "--format", paramLabel = "text|json", description = "text (default) or json")
    String format = "text";
    @Spec
    CommandSpec spec;

    @Override
    public Integer call() throws JsonProcessingException {
        if (!format.equals("text") && !format.equals("json")) {
            throw new IllegalArgumentException("--format must be one of text, json, was '" + format + "'");
        }
        AnalogFilter f = filter == null ? null : SweepCommand.filter(filter);
        double lo = band == null ? 0 : band.low();
        double hi = band == null ? max(tones) : band.high();
        ObjectNode root = new ObjectMapper().createObjectNode();
        root.put("format", "foldbook-fold").put("version", 1).put("rate", rate).put("nyquist", rate / 2);
        root.putObject("band").put("low", lo).put("high", hi);
        ArrayNode list = root.putArray("tones");
        for (double t : tones) {
            ObjectNode n = list.addObject();
            double apparent = Folding.apparentHz(t, rate);
            long zone = Folding.nyquistZone(t, rate);
            n.put("frequency", t).put("apparent", apparent).put("zone", zone)
                    .put("mirrored", Folding.isMirroredZone(zone)).put("folds", zone > 1);
            if (f != null) {
                n.put("attenuationDb", f.attenuationDb(t));
            }
            ArrayNode cands = n.putArray("candidates");
            for (double c : Folding.trueFrequencies(apparent, rate, hi)) {
                if (c >= lo) {
                    ObjectNode cn = cands.addObject().put("frequency", c).put("zone", Folding.nyquistZone(c, rate));
                    if (f != null) {
                        cn.put("attenuationDb", f.attenuationDb(c));
                    }
                }
            }
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format.equals("json")) {
            out.println(new ObjectMapper().writerWithDefaultPrettyPrinter().writeValueAsString(root));
        } else {
            text(root, out);
        }
        out.flush();
        return Main.OK;
    }

    private static void text(ObjectNode root, PrintWriter out) {
        out.printf(Locale.ROOT, "sampled at %s S/s (Nyquist %s Hz); front-end band %s to %s Hz%n",
                n(root.get("rate").asDouble()), n(root.get("nyquist").asDouble()),
                n(root.get("band").get("low").asDouble()), n(root.get("band").get("high").asDouble()));
        for (var t : root.get("tones")) {
            out.printf(Locale.ROOT, "%s Hz -> appears at %s Hz (Nyquist zone %d%s)%s%n", n(t.get("frequency").asDouble()),
                    n(t.get("apparent").asDouble()), t.get("zone").asLong(),
                    t.get("mirrored").asBoolean() ? ", mirrored" : "",
                    t.has("attenuationDb") ? String.format(Locale.ROOT, ", filter takes %.1f dB off",
                            t.get("attenuationDb").asDouble()) : "");
            StringBuilder b = new StringBuilder("  true frequencies in the band that appear there:");
            for (var c : t.get("candidates")) {
                b.append(' ').append(n(c.get("frequency").asDouble()));
                if (c.has("attenuationDb")) {
                    b.append(String.format(Locale.ROOT, " (%.1f dB)", c.get("attenuationDb").asDouble()));
                }
            }
            out.println(b);
        }
    }

    private static String n(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? String.valueOf((long) v) : String.format(Locale.ROOT, "%.6g", v);
    }

    private static double max(java.util.List<Double> v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m;
    }
}
