package org.nullpath.bench;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.nullpath.mission.Mission;
import org.nullpath.report.OutputFolder;
import org.nullpath.report.PlanOutput;
import org.nullpath.report.PlanResult;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.Workers;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.TearDown;

/** {@code plan} end to end (load, solve, write every CSV, report.html and the summary) for a schedule of N messages. */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@org.openjdk.jmh.annotations.State(Scope.Benchmark)
public class PlanBench {
    @Param({"100000", "1000000"})
    public int messages;

    /** Threads that compute messages (the files are the same for any number). */
    @Param({"1", "2"})
    public int threads;

    private Path dir;
    private Path scenario;

    @Setup(Level.Trial)
    public void setUp() throws IOException {
        dir = Files.createTempDirectory("nullpath-bench");
        scenario = dir.resolve("bench.yaml");
        double every = 2.0 * 31_557_600 / messages;
        Files.writeString(scenario, String.join("\n",
                "title: benchmark schedule",
                "stations:",
                "  home: {}",
                "craft:",
                "  probe:",
                "    heading: [1, 0, 0]",
                "    legs:",
                "      - burn: {acceleration: 1 g0, duration: 1 yr}",
                "      - coast: {duration: 1 yr}",
                "links:",
                "  up: {from: home, to: probe}",
                "messages:",
                "  - {link: up, first: 0 s, last: 2 yr, every: " + every + " s}",
                ""));
    }

    @Benchmark
    public long planEndToEnd() throws Exception {
        Mission s = ScenarioLoader.load(scenario);
        Path out = dir.resolve("out");
        try (OutputFolder f = OutputFolder.begin(out); Workers workers = Workers.of(threads)) {
            PlanResult r = PlanOutput.write(s, f, true, new PrintWriter(new StringWriter()), workers);
            f.commit();
            return r.links().get(0).delivered();
        }
    }

    @TearDown(Level.Iteration)
    public void clean() throws IOException {
        Path out = dir.resolve("out");
        if (Files.exists(out)) {
            try (var w = Files.walk(out)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }
}
