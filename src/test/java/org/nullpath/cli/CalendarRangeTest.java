package org.nullpath.cli;

import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;

/** A send so far off that the calendar has no year for it is planned, with an empty calendar cell. */
class CalendarRangeTest {
    @TempDir
    Path tmp;

    @Test
    void aSendBeyondTheCalendarsYearsIsPlannedWithoutACalendarInstant() throws Exception {
        Path file = tmp.resolve("far.yaml");
        // two invented stations 1 light-second apart; java.time's years end at 1e9 (Instant.MAX)
        Files.writeString(file, ScenarioText.untitled().epoch("2070-01-01T00:00:00Z").station("near", "{}")
                .station("far", "{position: [299792458 m, 0 m, 0 m]}").link("out", "near", "far")
                .message("{link: out, at: [1 d, 2e9 yr]}").yaml());
        Path dir = tmp.resolve("out");
        assertEquals(0, Main.run("plan", file.toString(), "--out", dir.toString(), "--no-report"));
        List<CSVRecord> rows;
        try (Reader r = Files.newBufferedReader(dir.resolve("out.csv"))) {
            rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r).getRecords();
        }
        assertEquals("2070-01-02T00:00:00Z", rows.get(0).get("send_time_utc"));
        assertEquals("", rows.get(1).get("send_time_utc"));
        assertEquals("", rows.get(1).get("receive_time_utc"));
        // light time 1 s between stations at rest 299 792 458 m apart (c, SI 2019)
        assertEquals(1.0, Double.parseDouble(rows.get(0).get("light_time_s")), 1e-15);
    }
}
