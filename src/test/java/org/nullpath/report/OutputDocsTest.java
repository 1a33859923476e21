package org.nullpath.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.Test;

import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * docs/output-files.md documents every output file and every column from the same lists the code writes
 * them from ({@link PlanOutput#FILES}, {@link Tables}): each table in the docs must be exactly the one the
 * lists give. Run {@link #main} to print the tables after changing a list.
 */
class OutputDocsTest {
    private static final Path DOC = Path.of("docs", "output-files.md");

    /** The docs' tables, each under the heading it follows, as the code's lists give them. */
    static Map<String, String> tables() {
        Map<String, String> out = new LinkedHashMap<>();
        StringBuilder files = new StringBuilder("| file | what it holds |\n|---|---|\n");
        for (PlanOutput.OutputFile f : PlanOutput.FILES) {
            files.append("| `").append(f.name()).append("` | ").append(f.meaning()).append(" |\n");
        }
        out.put("## The files", files.toString());
        out.put("### Columns of every link", columns(Tables.MESSAGE));
        out.put("### Budget columns of a coherent (radio) link", columns(Tables.COHERENT));
        out.put("### Budget columns of a photon-counting (optical) link", columns(Tables.PHOTON_COUNTING));
        List<Column<org.nullpath.schedule.MessageRow>> all = Tables.messages(Optional.empty(),
                Optional.of(Instant.EPOCH)).columns();
        out.put("### Last columns", columns(all.subList(Tables.MESSAGE.size(), all.size())));
        out.put("### Pointing columns", columns(Tables.POINTING));
        out.put("### Antenna pointing columns of a link with link terms", columns(Tables.ANTENNA_POINTING));
        out.put("## `cutoffs.csv`", columns(Tables.cutoffs(Optional.of(Instant.EPOCH)).columns()));
        out.put("## `horizons.csv`", columns(Tables.horizons(Optional.of(Instant.EPOCH)).columns()));
        out.put("## `exchanges-<name>.csv`", columns(Tables.EXCHANGES.columns()));
        out.put("## `windows.csv`", columns(Tables.WINDOWS.columns()));
        out.put("### Each link's entry in `summary.json`", keys(SummaryJson.LINKS.columns()));
        out.put("### A link's `budget` entry", keys(SummaryJson.BUDGETS.columns()));
        return out;
    }

    private static String columns(List<? extends Column<?>> columns) {
        return table("column", columns);
    }

    /** A JSON object's keys, in the same layout. */
    private static String keys(List<? extends Column<?>> columns) {
        return table("key", columns);
    }

    private static String table(String first, List<? extends Column<?>> columns) {
        StringBuilder b = new StringBuilder("| " + first + " | unit | meaning |\n|---|---|---|\n");
        for (Column<?> c : columns) {
            b.append("| `").append(c.name()).append("` | ").append(c.unit()).append(" | ").append(c.meaning())
                    .append(" |\n");
        }
        return b.toString();
    }

    @Test
    void everyDocumentedTableIsTheOneTheCodeWrites() throws IOException {
        String doc = Files.readString(DOC, StandardCharsets.UTF_8);
        for (Map.Entry<String, String> e : tables().entrySet()) {
            int at = doc.indexOf("\n" + e.getKey() + "\n");
            assertTrue(at >= 0, "docs/output-files.md has no heading '" + e.getKey() + "'");
            int table = doc.indexOf("\n|", at + 1);
            int end = doc.indexOf("\n\n", table + 1);
            String written = doc.substring(table + 1, end < 0 ? doc.length() : end + 1);
            assertTrue(written.equals(e.getValue()), "under '" + e.getKey() + "' docs/output-files.md should have\n"
                    + e.getValue() + "but has\n" + written);
        }
    }

    /** Prints the tables for docs/output-files.md. */
    public static void main(String[] args) {
        tables().forEach((heading, table) -> System.out.println(heading + "\n\n" + table));
    }
}
