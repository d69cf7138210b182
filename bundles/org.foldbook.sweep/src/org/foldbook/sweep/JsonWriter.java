package org.foldbook.sweep;

/**
 * A minimal streaming JSON writer (RFC 8259) with no dependencies: objects, arrays, strings, numbers,
 * booleans, null. Non-finite numbers, which JSON cannot hold, are written as {@code null}. Doubles are
 * written with Java's shortest round-trip form, so a reader gets back the exact value.
 *
 * <p>It tracks only whether a comma is due; nesting errors (a value where a name is due) are the
 * caller's to avoid, which the result types here do by construction.
 */
public final class JsonWriter {
    private final StringBuilder out = new StringBuilder();
    private boolean needComma;

    public JsonWriter beginObject() {
        comma();
        out.append('{');
        needComma = false;
        return this;
    }

    public JsonWriter endObject() {
        out.append('}');
        needComma = true;
        return this;
    }

    public JsonWriter beginArray() {
        comma();
        out.append('[');
        needComma = false;
        return this;
    }

    public JsonWriter endArray() {
        out.append(']');
        needComma = true;
        return this;
    }

    /** Writes a member name; the next call writes its value. */
    public JsonWriter name(String name) {
        comma();
        string(name);
        out.append(':');
        needComma = false;
        return this;
    }

    public JsonWriter value(String s) {
        comma();
        if (s == null) {
            out.append("null");
        } else {
            string(s);
        }
        needComma = true;
        return this;
    }

    public JsonWriter value(double v) {
        comma();
        if (!Double.isFinite(v)) {
            out.append("null");
        } else if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            out.append((long) v).append(".0");
        } else {
            out.append(Double.toString(v));
        }
        needComma = true;
        return this;
    }

    public JsonWriter value(long v) {
        comma();
        out.append(v);
        needComma = true;
        return this;
    }

    public JsonWriter value(boolean v) {
        comma();
        out.append(v);
        needComma = true;
        return this;
    }

    public JsonWriter member(String name, String v) {
        return name(name).value(v);
    }

    public JsonWriter member(String name, double v) {
        return name(name).value(v);
    }

    public JsonWriter member(String name, long v) {
        return name(name).value(v);
    }

    @Override
    public String toString() {
        return out.toString();
    }

    private void comma() {
        if (needComma) {
            out.append(',');
        }
    }

    private void string(String s) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                default -> {
                    if (c < 0x20) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }
}
