package org.nullpath.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;

/**
 * {@code sweep --spark local[2]}: the same bytes as the in-process run with one thread, for a grid with random
 * draws and an invalid point (an acceleration of 0, which the scenario refuses). The reference is the tool's own
 * in-process sweep, which SweepCommandTest holds to plan's figures. Invented craft and station.
 */
class SparkSweepTest {
    @TempDir
    Path tmp;

    @Test
    void localSparkWritesTheSameBytesAsOneThread() throws IOException {
        SkuaBase.write(tmp, "Spark base");
        Path sweep = tmp.resolve("study.yaml");
        Files.writeString(sweep, """
                scenario: base.yaml
                vary:
                  - {key: "craft.skua.legs[0].burn.acceleration", values: [1 g0, 0 g0, 2 g0]}
                draws: 3
                seed: 5
                random:
                  - {key: "craft.skua.legs[0].burn.duration", uniform: [50 d, 70 d]}
                """);
        String s = sweep.toString();
        assertEquals(0, PlanRun.run("sweep", s, "--out", tmp.resolve("one").toString(), "--quiet", "--threads", "1")
                .exitCode());
        PlanRun.Outcome o = PlanRun.run("sweep", s, "--out", tmp.resolve("spark").toString(), "--quiet", "--spark",
                "local[2]");
        assertEquals(0, o.exitCode(), o.err());
        for (String f : List.of("sweep.csv", "sweep-summary.json")) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve("one/" + f)), Files.readAllBytes(tmp.resolve("spark/" + f)), f);
        }
        // 3 grid values x 3 draws, the three points of acceleration 0 invalid
        assertEquals(List.of("valid", "valid", "valid", "invalid", "invalid", "invalid", "valid", "valid", "valid"),
                PlanRun.csv(tmp.resolve("spark/sweep.csv")).stream().map(r -> r.get("status")).toList());
    }
}
