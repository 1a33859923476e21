package org.nullpath.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.io.Reader;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** What the terminal tells an operator: deadlines never later than they are, one count everywhere. */
class OperatorAnswersTest {
    @TempDir
    Path tmp;

    /** Invented mission: a crewed ship at 1 g0 for a year, then coasting. */
    private static final String SHIP = """
            title: Osprey outbound
            epoch: 2071-05-01T00:00:00Z
            stations:
              quay: {}
            craft:
              osprey:
                heading: [0, 1, 0]
                legs:
                  - burn: {acceleration: 1 g0, duration: 1 yr}
            links:
              up: {from: quay, to: osprey}
              down: {from: osprey, to: quay}
            messages:
              - {link: up, first: 0 d, last: 300 d, every: 30 d}
            cutoffs:
              - {name: trim, link: up, arrive-by: 0.7 yr}
            exchanges:
              - {name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 90 d, every: 30 d}
            """;

    private record Outcome(int code, String out, String err) {
    }

    private static Outcome run(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
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

    private static List<CSVRecord> csv(Path file) throws IOException {
        try (Reader r = Files.newBufferedReader(file)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
    }

    @Test
    void theCutOffShownIsNeverLaterThanTheCutOffComputed() throws IOException {
        Path file = tmp.resolve("osprey.yaml");
        Files.writeString(file, SHIP);
        Path dir = tmp.resolve("out");
        Outcome o = run("plan", file.toString(), "--out", dir.toString(), "--no-report");
        assertEquals(0, o.code(), o.err());
        CSVRecord row = csv(dir.resolve("cutoffs.csv")).get(0);
        BigDecimal latest = new BigDecimal(row.get("latest_send_clock_s"));
        Matcher m = Pattern.compile("cut-off trim +on up: send by ([0-9.]+) (yr|d) on the sender's clock \\((\\S+)\\)")
                .matcher(o.out());
        assertTrue(m.find(), o.out());
        // Julian year 31 557 600 s and day 86 400 s (IAU)
        BigDecimal unit = new BigDecimal(m.group(2).equals("yr") ? "31557600" : "86400");
        BigDecimal shown = new BigDecimal(m.group(1)).multiply(unit);
        assertTrue(shown.compareTo(latest) <= 0, "shown " + shown + " s is later than " + latest + " s");
        // seven significant digits: short of the true value by less than 1e-6 of it
        assertTrue(latest.subtract(shown).compareTo(latest.multiply(new BigDecimal("1e-6"))) < 0, o.out());
        Instant shownAt = Instant.parse(m.group(3));
        Instant trueAt = Instant.parse(row.get("latest_send_time_utc"));
        assertTrue(!shownAt.isAfter(trueAt) && trueAt.getEpochSecond() - shownAt.getEpochSecond() < 1,
                shownAt + " against " + trueAt);
    }

    @Test
    void checkAndPlanCountThePlannedMessagesInTheSameWords() throws IOException {
        Path file = tmp.resolve("osprey.yaml");
        Files.writeString(file, SHIP);
        Outcome check = run("check", file.toString());
        Outcome plan = run("plan", file.toString(), "--out", tmp.resolve("out").toString(), "--no-report");
        // 11 uplink messages (0 to 300 d every 30 d) and 4 round trips (0 to 90 d every 30 d) of two messages
        String words = "19 messages planned: 11 on links";
        assertTrue(check.out().contains(words + ", 8 in 4 round trips"), check.out());
        assertTrue(plan.out().contains(words + " (11 delivered, 0 never arrive), 8 in 4 round trips"), plan.out());
    }
}
