package org.nullpath.report;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

/**
 * JSON text of a tree of maps, lists, strings, booleans, doubles, whole numbers (Long, Integer), enum
 * constants and nulls (the shape of summary.json, sweep-summary.json and the commit journal), written by
 * jackson-core's generator alone and read back ({@link #read}) by the data-binding layer. That layer would
 * write the same bytes for such a tree (its map and list serialisers call the same generator methods) but
 * costs several hundredths of a second to set up, so it is set up only when a file is read, which a plan into
 * a new folder never does (docs/performance.md).
 */
final class JsonText {
    private static final JsonFactory FACTORY = new JsonFactory();

    /** Reads a file written earlier (set up only when one is read: an earlier plan's summary, a left journal). */
    private static final class Reader {
        static final ObjectMapper JSON = new ObjectMapper();
    }

    private JsonText() {
    }

    /** The JSON tree in {@code file}. */
    static JsonNode read(Path file) throws IOException {
        return Reader.JSON.readTree(file.toFile());
    }

    /** {@code tree} as compact JSON in UTF-8. */
    static byte[] compact(Object tree) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (JsonGenerator g = FACTORY.createGenerator(out)) {
            value(g, tree);
        }
        return out.toByteArray();
    }

    /** {@code tree} into {@code file} as indented JSON (two spaces a level, "key" : value), UTF-8. */
    static void pretty(Path file, Object tree) throws IOException {
        try (OutputStream out = Files.newOutputStream(file); JsonGenerator g = FACTORY.createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            value(g, tree);
        }
    }

    private static void value(JsonGenerator g, Object v) throws IOException {
        if (v == null) {
            g.writeNull();
        } else if (v instanceof Map<?, ?> m) {
            g.writeStartObject();
            for (Map.Entry<?, ?> e : m.entrySet()) {
                g.writeFieldName(String.valueOf(e.getKey()));
                value(g, e.getValue());
            }
            g.writeEndObject();
        } else if (v instanceof Iterable<?> list) {
            g.writeStartArray();
            for (Object item : list) {
                value(g, item);
            }
            g.writeEndArray();
        } else if (v instanceof String s) {
            g.writeString(s);
        } else if (v instanceof Boolean b) {
            g.writeBoolean(b);
        } else if (v instanceof Double d) {
            g.writeNumber(d);
        } else if (v instanceof Long || v instanceof Integer) {
            // the digits of the whole number, as the data-binding layer writes either
            g.writeNumber(((Number) v).longValue());
        } else if (v instanceof Enum<?> e) {
            g.writeString(e.name());
        } else {
            throw new IllegalArgumentException("no JSON form for a " + v.getClass().getName());
        }
    }
}
