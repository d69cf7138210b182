package org.foldbook.sweep;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * The tests' view of JSON, read by Jackson (an outside, strict RFC 8259 reader; trailing tokens and
 * malformed input are rejected): objects as {@code Map<String,Object>} in order, arrays as
 * {@code List<Object>}, every number as {@code Double}, plus String, Boolean and null.
 */
final class TestJson {
    private static final ObjectMapper MAPPER = new ObjectMapper()
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            .disable(JsonParser.Feature.ALLOW_NON_NUMERIC_NUMBERS);

    private TestJson() {
    }

    /** Parses {@code text}; malformed JSON is an IllegalArgumentException with Jackson's message. */
    static Object parse(String text) {
        try {
            return plain(MAPPER.readTree(text));
        } catch (IOException e) {
            throw new IllegalArgumentException("not JSON: " + e.getMessage(), e);
        }
    }

    private static Object plain(JsonNode n) {
        if (n.isObject()) {
            Map<String, Object> m = new LinkedHashMap<>();
            for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext();) {
                Map.Entry<String, JsonNode> e = it.next();
                m.put(e.getKey(), plain(e.getValue()));
            }
            return m;
        }
        if (n.isArray()) {
            List<Object> l = new ArrayList<>();
            n.forEach(c -> l.add(plain(c)));
            return l;
        }
        if (n.isNumber()) {
            return n.doubleValue(); // decimal text -> nearest double, as Double.parseDouble rounds it
        }
        if (n.isTextual()) {
            return n.textValue();
        }
        if (n.isBoolean()) {
            return n.booleanValue();
        }
        return null;
    }

    @SuppressWarnings("unchecked")
    static Map<String, Object> obj(Object o) {
        return (Map<String, Object>) o;
    }

    @SuppressWarnings("unchecked")
    static List<Object> arr(Object o) {
        return (List<Object>) o;
    }
}
