package org.nullpath.testkit;

import java.io.IOException;
import java.io.PrintStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.nullpath.cli.Main;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** Test helper: writes a scenario, runs {@code nullpath} in-process (output captured) and reads the CSVs back. */
public final class PlanRun {
    private PlanRun() {
    }

    /** Exit code and what was printed. */
    public record Outcome(int exitCode, String out, String err) {
    }

    public static Outcome run(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        java.io.ByteArrayOutputStream out = new java.io.ByteArrayOutputStream();
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            int code = Main.run(args);
            return new Outcome(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    /** Writes {@code yaml} to {@code dir/name.yaml}, plans it into {@code dir/out}, asserts success, returns out. */
    public static Path plan(Path dir, String name, String yaml) throws IOException {
        Path file = dir.resolve(name + ".yaml");
        Files.writeString(file, yaml);
        Path out = dir.resolve("out-" + name);
        Outcome o = run("plan", file.toString(), "--out", out.toString());
        assertEquals(0, o.exitCode(), () -> "plan failed: " + o.err());
        return out;
    }

    public static List<CSVRecord> csv(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }
}
