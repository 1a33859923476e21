package org.nullpath.report;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The JSON writer against jackson-databind's ObjectMapper (the general-purpose library that wrote these files
 * before): the same bytes, compact and indented, for trees of every kind of value the outputs hold.
 */
class JsonTextTest {
    @TempDir
    Path dir;

    static Map<String, Object> tree() {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("title", "Gull \"one\" \u00e9t\u00e9 \\ tab\t line\n end \u0001");
        root.put("count", 1_000_000L);
        root.put("small", 7);
        root.put("ratio", 0.1 + 0.2);
        root.put("tiny", 4.9e-324);
        root.put("huge", -1.7976931348623157e308);
        root.put("negative zero", -0.0);
        root.put("not a number", Double.NaN);
        root.put("infinite", Double.POSITIVE_INFINITY);
        root.put("whole", 3.0);
        root.put("int extremes", List.of(Integer.MIN_VALUE, Integer.MAX_VALUE, Long.MIN_VALUE, Long.MAX_VALUE));
        root.put("yes", true);
        root.put("no", false);
        root.put("none", null);
        root.put("unit", Thread.State.RUNNABLE);
        root.put("empty list", List.of());
        root.put("empty map", Map.of());
        root.put("list", Arrays.asList(1.5, null, "x", List.of(2L, Map.of("k", "v"))));
        Map<String, Object> nested = new TreeMap<>();
        nested.put("b", 2.5e-13);
        nested.put("a", new ArrayList<>(List.of("first", "second")));
        root.put("nested", nested);
        return root;
    }

    @Test
    void compactJsonIsTheObjectMappersBytes() throws Exception {
        assertArrayEquals(new ObjectMapper().writeValueAsBytes(tree()), JsonText.compact(tree()));
    }

    @Test
    void indentedJsonIsTheObjectMappersBytes() throws Exception {
        Path mine = dir.resolve("mine.json");
        Path theirs = dir.resolve("theirs.json");
        JsonText.pretty(mine, tree());
        new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValue(theirs.toFile(), tree());
        assertArrayEquals(Files.readAllBytes(theirs), Files.readAllBytes(mine));
    }

    @Test
    void aValueWithNoJsonFormIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> JsonText.compact(Map.of("x", new Object())));
        assertThrows(IllegalArgumentException.class, () -> JsonText.compact(Map.of("x", 1.5f)));
    }
}
