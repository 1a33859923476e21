package org.nullpath.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.nullpath.mission.Mission;
import org.nullpath.mission.Sweep;
import org.nullpath.report.OutputFolder;
import org.nullpath.report.SweepOutput;
import org.nullpath.report.SweepPage;
import org.nullpath.report.Table;
import org.nullpath.scenario.Problem;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.SweepReader;
import org.nullpath.schedule.StudyFigures;
import org.nullpath.schedule.SweepRow;
import org.nullpath.schedule.Workers;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code nullpath sweep SWEEP --out DIR}: a trade study over one scenario. */
@Command(name = "sweep", mixinStandardHelpOptions = true,
        description = "Run a trade study: the scenario a sweep file names, once per point of its grid and random"
                + " draws, each point's figures as plan would write them, into sweep.csv, sweep-summary.json and sweep.html"
                + " (all files appear together, or none on failure).")
final class SweepCommand implements Callable<Integer> {
    @Parameters(index = "0", paramLabel = "SWEEP", description = "the sweep file (YAML)")
    Path sweepFile;

    @Option(names = {"-o", "--out"}, required = true, paramLabel = "DIR", description = "folder to write into")
    Path out;

    @Mixin
    ThreadCount threads;

    @Option(names = "--quiet", description = "no progress on standard error")
    boolean quiet;

    @Option(names = "--spark", paramLabel = "MASTER", description = "compute the points as an Apache Spark job on"
            + " MASTER (local[N] in this process, or a cluster's master URL); the files are the same")
    String spark;

    /** The Spark engine, found by name only when asked for, so that Spark is not loaded otherwise. */
    static final String SPARK_ENGINE = "org.nullpath.spark.SparkSweep";

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter err = spec.commandLine().getErr();
        if (!threads.valid(err)) {
            return Main.INPUT_ERROR;
        }
        try {
            OutputFolder.checkTarget(out);
        } catch (OutputFolder.Refused e) {
            err.println("nullpath: --out: " + e.getMessage());
            return Main.INPUT_ERROR;
        }
        SweepReader.Loaded loaded;
        Mission base;
        try {
            loaded = SweepReader.read(sweepFile);
            base = loaded.scenario().resolve();
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                err.println(p.render());
            }
            return Main.INPUT_ERROR;
        }
        SweepEngine engine = null;
        if (spark != null) {
            if (!base.source().alsoRead().isEmpty()) {
                err.println("nullpath: --spark: the scenario reads profile tables (" + base.source().alsoRead().get(0)
                        + "), which a Spark job does not carry; run this sweep without --spark");
                return Main.INPUT_ERROR;
            }
            try {
                engine = Class.forName(SPARK_ENGINE).asSubclass(SweepEngine.class).getDeclaredConstructor().newInstance();
            } catch (ReflectiveOperationException | LinkageError e) {
                err.println("nullpath: --spark: Apache Spark is not on the class path (" + e + "); start nullpath with"
                        + " the launcher ./nullpath, which adds it for --spark, or with spark-submit (docs/sweeps.md)");
                return Main.INPUT_ERROR;
            }
        }
        Sweep sweep = loaded.sweep();
        List<String> keys = sweep.keys();
        List<String> names = StudyFigures.names(base);
        long points = sweep.points();
        List<double[]> columns = new ArrayList<>();
        for (int i = 0; i < names.size(); i++) {
            columns.add(new double[(int) points]);
        }
        long[] invalid = {0};
        Table<SweepRow> table = SweepOutput.table(keys, names);
        Progress progress = Progress.start(err, quiet, points);
        // interrupted (Ctrl-C, SIGTERM): the staged files are removed by the folder's own hook; DIR stays as it was
        List<Path> inputs = new ArrayList<>(base.source().inputs());
        inputs.add(sweepFile);
        OutputFolder.Commit commit;
        try (OutputFolder folder = OutputFolder.begin(out, inputs, () -> err.println("nullpath: another run is"
                + " writing into " + out + "; waiting until it is done"));
             Workers workers = threads.workers();
             Table.Writer<SweepRow> csv = table.open(folder.create(SweepOutput.CSV))) {
            if (engine == null) {
                workers.inOrder(points, p -> SweepPoints.compute(loaded.scenario(), sweep, p, names.size()), row -> {
                    csv.write(row);
                    if (!row.valid()) {
                        invalid[0]++;
                    }
                    keep(columns, row.point(), row::figure);
                    progress.step();
                });
            } else {
                SweepEngine.Study study = new SweepEngine.Study(spark, loaded.scenario().source().text(),
                        loaded.scenario().source().file().toString(), sweep, names);
                long[] next = {1};
                engine.run(study, quiet, block -> {
                    if (block.first() != next[0]) {
                        throw new IllegalStateException("the engine gave points from " + block.first() + ", expected "
                                + next[0]);
                    }
                    next[0] += block.count();
                    csv.append(block.csv());
                    invalid[0] += block.invalid();
                    for (int j = 0; j < block.count(); j++) {
                        int at = j * names.size();
                        keep(columns, block.first() + j, i -> block.figures()[at + i]);
                        progress.step();
                    }
                });
                if (next[0] != points + 1) {
                    throw new IllegalStateException("the engine gave " + (next[0] - 1) + " of " + points + " points");
                }
            }
            csv.close();
            List<SweepOutput.Spread> spreads = columns.stream().map(SweepOutput.Spread::of).toList();
            SweepOutput.summary(folder.file(SweepOutput.SUMMARY), sweep, names, points, invalid[0], spreads);
            SweepPage.write(folder.file(SweepOutput.PAGE), new SweepPage.Data(sweep, base.title(),
                    sweepFile.getFileName().toString(), names, columns, spreads, invalid[0]));
            commit = folder.commit();
        } catch (IOException | UncheckedIOException e) {
            return WriteFailure.report(err, out, e, false);
        } catch (Exception e) {
            if (engine == null && e instanceof RuntimeException r) {
                throw r; // in process: as before, to the command line's own handler
            }
            // the engine failed (Spark: a master that cannot be reached, a lost job); DIR stays as it was
            err.println("nullpath: --spark " + spark + ": the job failed: " + e);
            return Main.FAILURE;
        } finally {
            progress.close();
        }
        spec.commandLine().getOut().printf(Locale.ROOT, "%s: %d points (%d valid, %d invalid), written to %s%s%n",
                sweepFile, points, points - invalid[0], invalid[0], out,
                commit.replaced().isEmpty() ? "" : " (replacing " + commit.replaced().size() + " files already there)");
        return 0;
    }

    /** Keeps point {@code p}'s figures (figure i given by {@code figure}) in the columns the summary reads. */
    private static void keep(List<double[]> columns, long p, java.util.function.IntToDoubleFunction figure) {
        for (int i = 0; i < columns.size(); i++) {
            columns.get(i)[(int) (p - 1)] = figure.applyAsDouble(i);
        }
    }
}
