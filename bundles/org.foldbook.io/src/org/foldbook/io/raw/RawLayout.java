package org.foldbook.io.raw;

import java.io.IOException;
import java.nio.ByteOrder;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.foldbook.io.RecordingDescriptor;
import org.foldbook.io.RecordingFormatException;
import org.foldbook.io.SampleType;

/**
 * Layout of a raw binary recording: given by the notebook, or read from a sidecar text file
 * {@code <recording file name>.rawlayout} of our own design, one {@code key = value} a line, '#' comments:
 *
 * <pre>
 * foldbook-raw-layout = 1
 * sample-type  = int16            # uint8 int8 int16 uint16 int24 int32 uint32 int64 float32 float64
 * byte-order   = little           # little | big
 * channels     = 3
 * arrangement  = interleaved      # interleaved (frame after frame) | planar (channel after channel)
 * header-bytes = 512              # bytes to skip before the first sample (default 0)
 * sample-rate  = 25000            # samples per second per channel
 * frames       = 100000           # optional; default: all whole frames after the header
 * names        = x, y, z          # optional, comma separated
 * units        = m/s^2, m/s^2, V  # optional, one for all or one per channel
 * scale        = 0.000122         # optional, value = stored * scale + offset; one or one per channel
 * offset       = 0
 * </pre>
 *
 * @param frames number of frames, or -1 for "all whole frames after the header"
 */
public record RawLayout(SampleType sampleType, ByteOrder byteOrder, int channels, boolean interleaved,
        long headerBytes, double sampleRate, long frames, List<String> names, List<String> units,
        double[] scale, double[] offset) implements RecordingDescriptor {

    public static final String SIDECAR_SUFFIX = ".rawlayout";
    private static final Set<String> KEYS = Set.of("foldbook-raw-layout", "sample-type", "byte-order", "channels",
            "arrangement", "header-bytes", "sample-rate", "frames", "names", "units", "scale", "offset");

    public RawLayout {
        if (sampleType == null) {
            throw new IllegalArgumentException("sampleType: null");
        }
        if (byteOrder == null) {
            throw new IllegalArgumentException("byteOrder: null");
        }
        if (channels < 1 || channels > 65535) {
            throw new IllegalArgumentException("channels: " + channels + " is outside 1..65535");
        }
        if (headerBytes < 0) {
            throw new IllegalArgumentException("headerBytes: " + headerBytes + " is negative");
        }
        if (!(sampleRate > 0) || !Double.isFinite(sampleRate)) {
            throw new IllegalArgumentException("sampleRate: " + sampleRate + " is not a positive finite rate");
        }
        if (frames < -1) {
            throw new IllegalArgumentException("frames: " + frames + " (use -1 for all)");
        }
        names = perChannel("names", names, channels, null);
        units = perChannel("units", units, channels, "");
        scale = perChannel("scale", scale, channels, 1.0);
        offset = perChannel("offset", offset, channels, 0.0);
        for (int c = 0; c < channels; c++) {
            if (!Double.isFinite(scale[c]) || !Double.isFinite(offset[c])) {
                throw new IllegalArgumentException("scale/offset: channel " + (c + 1) + " has a non-finite value");
            }
        }
    }

    /** A layout with default names, no units, scale 1, offset 0, all frames. */
    public static RawLayout of(SampleType type, ByteOrder order, int channels, boolean interleaved,
            long headerBytes, double sampleRate) {
        return new RawLayout(type, order, channels, interleaved, headerBytes, sampleRate, -1, null, null, null, null);
    }

    private static List<String> perChannel(String what, List<String> given, int channels, String fill) {
        List<String> out = new ArrayList<>();
        if (given == null || given.isEmpty()) {
            for (int c = 1; c <= channels; c++) {
                out.add(fill != null ? fill : "ch" + c);
            }
        } else if (given.size() == 1 && fill != null) {
            for (int c = 0; c < channels; c++) {
                out.add(given.get(0));
            }
        } else if (given.size() == channels) {
            out.addAll(given);
        } else {
            throw new IllegalArgumentException(what + ": " + given.size() + " values for " + channels + " channels");
        }
        return List.copyOf(out);
    }

    private static double[] perChannel(String what, double[] given, int channels, double fill) {
        double[] out = new double[channels];
        if (given == null || given.length == 0) {
            Arrays.fill(out, fill);
        } else if (given.length == 1) {
            Arrays.fill(out, given[0]);
        } else if (given.length == channels) {
            System.arraycopy(given, 0, out, 0, channels);
        } else {
            throw new IllegalArgumentException(what + ": " + given.length + " values for " + channels + " channels");
        }
        return out;
    }

    @Override
    public double[] scale() {
        return scale.clone();
    }

    @Override
    public double[] offset() {
        return offset.clone();
    }

    public int frameBytes() {
        return sampleType.bytes() * channels;
    }

    /** The sidecar path of a recording: its name plus {@value #SIDECAR_SUFFIX}. */
    public static Path sidecarOf(Path recording) {
        return recording.resolveSibling(recording.getFileName() + SIDECAR_SUFFIX);
    }

    /** Parses a sidecar file (read-only); errors name the sidecar and the line. */
    public static RawLayout readSidecar(Path sidecar) throws IOException {
        List<String> lines;
        try {
            lines = Files.readAllLines(sidecar, StandardCharsets.UTF_8);
        } catch (java.nio.charset.CharacterCodingException e) {
            throw new RecordingFormatException(sidecar, "whole file", "not UTF-8 text", e);
        }
        Map<String, String> values = new HashMap<>();
        Map<String, Integer> lineOf = new HashMap<>();
        for (int i = 0; i < lines.size(); i++) {
            String line = lines.get(i);
            int hash = line.indexOf('#');
            if (hash >= 0) {
                line = line.substring(0, hash);
            }
            if (line.isBlank()) {
                continue;
            }
            int eq = line.indexOf('=');
            if (eq < 0) {
                throw RecordingFormatException.atLine(sidecar, i + 1, 1, "expected 'key = value'");
            }
            String key = line.substring(0, eq).trim().toLowerCase(java.util.Locale.ROOT);
            if (!KEYS.contains(key)) {
                throw RecordingFormatException.atLine(sidecar, i + 1, 1, "unknown key '" + key + "'");
            }
            if (values.put(key, line.substring(eq + 1).trim()) != null) {
                throw RecordingFormatException.atLine(sidecar, i + 1, 1, "key '" + key + "' given twice");
            }
            lineOf.put(key, i + 1);
        }
        Sidecar s = new Sidecar(sidecar, values, lineOf);
        if (!"1".equals(values.get("foldbook-raw-layout"))) {
            throw RecordingFormatException.atLine(sidecar, lineOf.getOrDefault("foldbook-raw-layout", 1), 1,
                    "missing or unknown 'foldbook-raw-layout' version (this reader knows 1)");
        }
        try {
            String order = s.require("byte-order").toLowerCase(java.util.Locale.ROOT);
            String arrangement = values.getOrDefault("arrangement", "interleaved").toLowerCase(java.util.Locale.ROOT);
            if (!order.equals("little") && !order.equals("big")) {
                throw s.error("byte-order", "'" + order + "' is not little or big");
            }
            if (!arrangement.equals("interleaved") && !arrangement.equals("planar")) {
                throw s.error("arrangement", "'" + arrangement + "' is not interleaved or planar");
            }
            SampleType type;
            try {
                type = SampleType.fromName(s.require("sample-type"));
            } catch (IllegalArgumentException e) {
                throw s.error("sample-type", e.getMessage());
            }
            return new RawLayout(type, order.equals("little") ? ByteOrder.LITTLE_ENDIAN : ByteOrder.BIG_ENDIAN,
                    (int) s.number("channels", true), arrangement.equals("interleaved"),
                    (long) s.number("header-bytes", false), s.number("sample-rate", true),
                    values.containsKey("frames") ? (long) s.number("frames", true) : -1, s.list("names"),
                    s.list("units"), s.numbers("scale"), s.numbers("offset"));
        } catch (IllegalArgumentException e) {
            throw new RecordingFormatException(sidecar, "layout", e.getMessage(), e);
        }
    }

    private record Sidecar(Path file, Map<String, String> values, Map<String, Integer> lineOf) {
        RecordingFormatException error(String key, String problem) {
            return RecordingFormatException.atLine(file, lineOf.getOrDefault(key, 1), 1, key + ": " + problem);
        }

        String require(String key) throws RecordingFormatException {
            String v = values.get(key);
            if (v == null || v.isEmpty()) {
                throw RecordingFormatException.atLine(file, 1, 1, "required key '" + key + "' missing");
            }
            return v;
        }

        double number(String key, boolean required) throws RecordingFormatException {
            String v = required ? require(key) : values.getOrDefault(key, "0");
            try {
                double d = Double.parseDouble(v);
                if (!Double.isFinite(d)) {
                    throw error(key, "'" + v + "' is not finite");
                }
                if (!key.equals("sample-rate") && d != Math.rint(d)) {
                    throw error(key, "'" + v + "' is not a whole number");
                }
                return d;
            } catch (NumberFormatException e) {
                throw error(key, "'" + v + "' is not a number");
            }
        }

        List<String> list(String key) {
            String v = values.get(key);
            return v == null ? null : Arrays.stream(v.split(",", -1)).map(String::trim).toList();
        }

        double[] numbers(String key) throws RecordingFormatException {
            List<String> l = list(key);
            if (l == null) {
                return null;
            }
            double[] out = new double[l.size()];
            for (int i = 0; i < out.length; i++) {
                try {
                    out[i] = Double.parseDouble(l.get(i));
                } catch (NumberFormatException e) {
                    throw error(key, "'" + l.get(i) + "' is not a number");
                }
            }
            return out;
        }
    }
}
