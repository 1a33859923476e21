package org.nullpath.cli;

import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import java.io.IOException;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

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
    private static final String SHIP = ScenarioText.titled("Osprey outbound").epoch("2071-05-01T00:00:00Z")
            .station("quay", "{}")
            .craft("osprey", "heading: [0, 1, 0]", "burn: {acceleration: 1 g0, duration: 1 yr}")
            .link("up", "quay", "osprey").link("down", "osprey", "quay")
            .message("{link: up, first: 0 d, last: 300 d, every: 30 d}")
            .cutoff("{name: trim, link: up, arrive-by: 0.7 yr}")
            .exchange("{name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 90 d, every: 30 d}")
            .yaml();

    @Test
    void theCutOffShownIsNeverLaterThanTheCutOffComputed() throws IOException {
        Path file = tmp.resolve("osprey.yaml");
        Files.writeString(file, SHIP);
        Path dir = tmp.resolve("out");
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", dir.toString(), "--no-report");
        assertEquals(0, o.exitCode(), o.err());
        CSVRecord row = PlanRun.csv(dir.resolve("cutoffs.csv")).get(0);
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
    void theTerminalGivesTimesWherePeopleNeedTimes() throws IOException {
        Path file = tmp.resolve("osprey.yaml");
        Files.writeString(file, SHIP);
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", tmp.resolve("out").toString(), "--no-report");
        // hyperbolic motion (Rindler 2006): after 1 yr at g0 the rapidity is g0 yr / c = 1.0322953, mission time
        // (c / g0) sinh(1.0322953) = 1.187312 yr, speed tanh(1.0322953) = 0.774827 c; computed in Python
        assertTrue(o.out().contains("craft osprey      last leg ends at 1.000 yr on its clock, 1.187 yr mission time"
                + " (2072-07-07T15:58:"), o.out());
        assertTrue(o.out().contains("at 0.774827 c; then it coasts"), o.out());
        // 4 round trips, each on the querier's clock; their extremes and median are read back from the CSV
        List<CSVRecord> trips = PlanRun.csv(tmp.resolve("out").resolve("exchanges-ping.csv"));
        double[] t = trips.stream().mapToDouble(r -> Double.parseDouble(r.get("round_trip_clock_s"))).sorted().toArray();
        String line = "exchange ping       4 of 4 round trips complete; round trip "
                + org.nullpath.report.Readable.time(t[0]) + " to " + org.nullpath.report.Readable.time(t[3])
                + ", median " + org.nullpath.report.Readable.time((t[1] + t[2]) / 2) + " on the querier's clock";
        assertTrue(o.out().contains(line), line + " in\n" + o.out());
    }

    @Test
    void anOpenEndedLastLegIsNamedForWhatItIs() throws IOException {
        // an open-ended coast after a burn is not a burn (it was once shown as "an open-ended burn")
        Path file = tmp.resolve("wren.yaml");
        Files.writeString(file, ScenarioText.titled("Wren coasts on").station("mast", "{}")
                .craft("wren", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: 1 yr}",
                        "coast: {duration: forever}")
                .link("down", "wren", "mast").message("{link: down, at: [0 s]}").yaml());
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", tmp.resolve("w").toString(), "--no-report");
        assertEquals(0, o.exitCode(), o.err());
        // hyperbolic motion (Rindler 2006): 1 yr at g0 takes (c / g0) sinh(g0 yr / c) = 1.187312 yr mission time
        assertTrue(o.out().contains("its last leg, an open-ended coast, starts at 1.000 yr on its clock (1.187 yr"
                + " mission time) and never ends"), o.out());
        Files.writeString(file, ScenarioText.titled("Wren burns on").station("mast", "{}")
                .craft("wren", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
                .link("down", "wren", "mast").message("{link: down, at: [0 s]}").yaml());
        o = PlanRun.run("plan", file.toString(), "--out", tmp.resolve("w").toString(), "--no-report");
        assertTrue(o.out().contains("its last leg, an open-ended burn, starts at 0 s on its clock"), o.out());
    }

    @Test
    void profiledLegsGiveTheirAccelerationRangeInTheSummary() throws IOException {
        Files.writeString(tmp.resolve("steps.csv"), "clock_s,acceleration_m_s2\n0,0\n50,12\n100,-3\n");
        Path file = tmp.resolve("kite.yaml");
        Files.writeString(file, ScenarioText.titled("Kite profiled legs").station("mast", "{}")
                .craft("kite", "heading: [1, 0, 0]",
                        "sail: {beam-from: mast, beam-power: 1 GW, mass: 1 kg, reflectivity: 1, beam-off: 60 s}",
                        "rocket: {thrust: 2 MN, initial-mass: 100 t, burnout-mass: 20 t, exhaust-speed: 0.1 c}",
                        "profile: {file: steps.csv}")
                .link("down", "kite", "mast").message("{link: down, at: [0 s]}").yaml());
        Path dir = tmp.resolve("out");
        assertEquals(0, PlanRun.run("plan", file.toString(), "--out", dir.toString(), "--no-report").exitCode());
        com.fasterxml.jackson.databind.JsonNode legs = new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(dir.resolve("summary.json").toFile()).get("craft").get(0).get("legs");
        double c = 299_792_458.0; // SI 2019
        // sail (Kulkarni, Lubin & Zhang 2018): a = (1 + R) P D^2 / (m c), D = exp(-eta) for a station at rest
        double a0 = 2 * 1e9 / (1.0 * c);
        double etaEnd = legs.get(0).get("end").get("rapidity").asDouble();
        assertTrue(legs.get(0).get("acceleration_m_s2").isNull());
        assertEquals(a0, legs.get(0).get("acceleration_start_m_s2").asDouble(), 1e-12 * a0);
        assertEquals(a0 * Math.exp(-2 * etaEnd), legs.get(0).get("acceleration_end_m_s2").asDouble(), 1e-9 * a0);
        assertEquals(a0, legs.get(0).get("acceleration_largest_m_s2").asDouble(), 1e-12 * a0);
        // constant thrust: a = F / m, from 2 MN / 100 t = 20 m/s^2 to 2 MN / 20 t = 100 m/s^2
        assertEquals(20, legs.get(1).get("acceleration_start_m_s2").asDouble(), 1e-12 * 20);
        assertEquals(100, legs.get(1).get("acceleration_end_m_s2").asDouble(), 1e-12 * 100);
        assertEquals(100, legs.get(1).get("acceleration_largest_m_s2").asDouble(), 1e-12 * 100);
        // the table: 0 at the start, -3 at the end, 12 the largest (linear between samples)
        assertEquals(0, legs.get(2).get("acceleration_start_m_s2").asDouble());
        assertEquals(-3, legs.get(2).get("acceleration_end_m_s2").asDouble());
        assertEquals(12, legs.get(2).get("acceleration_largest_m_s2").asDouble());
    }

    @Test
    void checkAndPlanCountThePlannedMessagesInTheSameWords() throws IOException {
        Path file = tmp.resolve("osprey.yaml");
        Files.writeString(file, SHIP);
        PlanRun.Outcome check = PlanRun.run("check", file.toString());
        PlanRun.Outcome plan = PlanRun.run("plan", file.toString(), "--out", tmp.resolve("out").toString(), "--no-report");
        // 11 uplink messages (0 to 300 d every 30 d) and 4 round trips (0 to 90 d every 30 d) of two messages
        String words = "19 messages planned: 11 on links";
        assertTrue(check.out().contains(words + ", 8 in 4 round trips"), check.out());
        assertTrue(plan.out().contains(words + " (11 delivered, 0 never arrive), 8 in 4 round trips"), plan.out());
    }
}
