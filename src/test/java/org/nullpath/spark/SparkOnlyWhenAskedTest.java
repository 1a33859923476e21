package org.nullpath.spark;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.cli.Main;

/**
 * Spark is loaded for {@code sweep --spark} only, and then logs quietly. Each case runs nullpath's Main in a
 * child Java process on the test class path, which holds Spark's jars (they are a test dependency), so a
 * plan or an in-process sweep that touched Spark would load its classes there; the class-loading log
 * ({@code -Xlog:class+load}) says which classes were loaded. Invented craft and station.
 */
class SparkOnlyWhenAskedTest {
    @TempDir
    Path tmp;

    private Path sweep;

    @BeforeEach
    void files() throws IOException {
        SkuaBase.write(tmp, "Loading");
        sweep = tmp.resolve("study.yaml");
        Files.writeString(sweep, """
                scenario: base.yaml
                vary:
                  - {key: "craft.skua.legs[0].burn.acceleration", values: [0.5 g0, 1 g0, 2 g0]}
                """);
    }

    /** What a child run said and which classes it loaded. */
    private record Child(int exitCode, String out, String err, List<String> sparkClasses) {
    }

    private Child run(String name, String... args) throws IOException, InterruptedException {
        Path classes = tmp.resolve(name + ".classes");
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        // the module openings Spark needs on Java 17, as this test process was given them (pom.xml)
        ManagementFactory.getRuntimeMXBean().getInputArguments().stream()
                .filter(a -> a.startsWith("--add-opens") || a.startsWith("-Dio.netty") || a.startsWith("-Djdk.reflect"))
                .forEach(command::add);
        command.addAll(List.of("-Xmx512m", "-Xlog:class+load=info:file=" + classes, "-cp",
                System.getProperty("java.class.path"), Main.class.getName()));
        command.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(command);
        pb.redirectOutput(tmp.resolve(name + ".out").toFile());
        pb.redirectError(tmp.resolve(name + ".err").toFile());
        Process p = pb.start();
        if (!p.waitFor(5, TimeUnit.MINUTES)) {
            p.destroyForcibly();
            throw new AssertionError(name + " did not end in 5 minutes");
        }
        List<String> spark = Files.readAllLines(classes).stream()
                .filter(l -> l.contains(" org.apache.spark.") || l.contains(" scala.")).toList();
        return new Child(p.exitValue(), Files.readString(tmp.resolve(name + ".out")),
                Files.readString(tmp.resolve(name + ".err")), spark);
    }

    @Test
    void planAndAnInProcessSweepLoadNoSparkClass() throws Exception {
        Child plan = run("plan", "plan", tmp.resolve("base.yaml").toString(), "--out", tmp.resolve("p").toString());
        assertEquals(0, plan.exitCode(), plan.err());
        assertEquals(List.of(), plan.sparkClasses());
        Child inProcess = run("sweep", "sweep", sweep.toString(), "--out", tmp.resolve("s").toString(), "--quiet");
        assertEquals(0, inProcess.exitCode(), inProcess.err());
        assertEquals(List.of(), inProcess.sparkClasses());
    }

    @Test
    void aQuietSparkSweepSaysNothingOnStandardErrorAndWritesTheSameFile() throws Exception {
        Child inProcess = run("sweep", "sweep", sweep.toString(), "--out", tmp.resolve("s").toString(), "--quiet");
        assertEquals(0, inProcess.exitCode(), inProcess.err());
        Child spark = run("spark", "sweep", sweep.toString(), "--out", tmp.resolve("k").toString(), "--quiet",
                "--spark", "local[1]");
        assertEquals(0, spark.exitCode(), spark.err());
        assertTrue(spark.sparkClasses().size() > 100, "Spark did run: " + spark.sparkClasses().size() + " classes");
        assertEquals("", spark.err()); // no INFO lines, no harmless warnings, no progress
        assertTrue(spark.out().contains("3 points (3 valid, 0 invalid)"), spark.out());
        assertArrayEquals(Files.readAllBytes(tmp.resolve("s/sweep.csv")), Files.readAllBytes(tmp.resolve("k/sweep.csv")));
    }
}
