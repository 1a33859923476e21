package org.nullpath.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The streaming writer reuses the row buffers it has written: a chunk written after a longer one must hold
 * only its own rows. The expected text is each row written on its own (RFC 4180 layout, as the table writes
 * it everywhere else), so the check does not depend on the buffers at all.
 */
class TableWriterTest {
    record Row(long n, double x, String word) {
    }

    private static final Table<Row> TABLE = new Table<>(List.of(
            Column.count("n", "a count", Row::n),
            Column.number("x", "", "a number", Row::x),
            Column.text("word", "a word", Row::word)));

    private static List<Row> rows(int from, int count, String word) {
        List<Row> out = new ArrayList<>();
        for (int i = from; i < from + count; i++) {
            out.add(new Row(i, i / 7.0, word));
        }
        return out;
    }

    @Test
    void aShorterChunkAfterALongerOneHoldsOnlyItsOwnRows() throws IOException {
        List<List<Row>> chunks = List.of(rows(0, 500, "delivered"), rows(500, 3, "never"), rows(503, 200, "a, b"),
                rows(703, 1, "delivered"));
        ByteArrayOutputStream file = new ByteArrayOutputStream();
        StringBuilder expected = new StringBuilder("n,x,word\n");
        try (Table.Writer<Row> w = TABLE.open(file)) {
            for (List<Row> chunk : chunks) {
                w.append(w.encodeInPlace(chunk));
                for (Row r : chunk) {
                    expected.append(new String(TABLE.encode(List.of(r)), StandardCharsets.UTF_8));
                }
            }
        }
        String written = file.toString(StandardCharsets.UTF_8);
        assertEquals(expected.toString(), written);
        assertEquals(705, written.lines().count(), "header and 704 rows");
        assertEquals("503,71.85714285714286,\"a, b\"", written.lines().skip(504).findFirst().orElseThrow(),
                "a cell with a comma quoted (RFC 4180); 503 / 7 as Double.toString writes it");
    }
}
