package org.nullpath.spark;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.broadcast.Broadcast;
import org.apache.spark.sql.SparkSession;
import org.nullpath.cli.SweepEngine;

/**
 * The sweep as an Apache Spark job (docs/sweeps.md, "On Apache Spark"). The study (the scenario's text and the
 * sweep, never a path) is broadcast with the job; the points are cut into ranges of consecutive point numbers,
 * one range a partition; each partition computes its rows and encodes them with sweep.csv's own table
 * ({@link SweepEngine#compute}); the driver collects the partitions a wave at a time, in order, and hands them
 * on, so that the files are written on the driver, by the sweep command, exactly as in process.
 *
 * <p>Found by the sweep command by name only, for {@code --spark}; nothing else refers to this package.
 */
public final class SparkSweep implements SweepEngine {
    /** Most points in one partition: a few seconds of work, and a bounded block of rows to collect. */
    static final int MOST_PER_PARTITION = 5_000;
    /** Partitions per core of the job's default parallelism, to even out points that take longer. */
    static final int PARTITIONS_PER_CORE = 4;

    public SparkSweep() {
        // found by name (Class.forName) and made with this constructor
    }

    @Override
    public void run(Study study, boolean quiet, Consumer<Block> sink) throws Exception {
        quietLog(quiet);
        SparkSession active = SparkSession.getActiveSession().getOrElse(() -> null);
        SparkSession session = active != null ? active : open(study);
        try {
            JavaSparkContext jsc = JavaSparkContext.fromSparkContext(session.sparkContext());
            Broadcast<Study> shared = jsc.broadcast(study);
            List<long[]> ranges = ranges(study.sweep().points(), jsc.defaultParallelism());
            JavaRDD<Block> blocks = jsc.parallelize(ranges, ranges.size())
                    .map(r -> SweepEngine.compute(shared.value(), r[0], (int) r[1]));
            int wave = Math.max(1, 2 * jsc.defaultParallelism());
            for (int from = 0; from < ranges.size(); from += wave) {
                int[] ids = new int[Math.min(wave, ranges.size() - from)];
                for (int i = 0; i < ids.length; i++) {
                    ids[i] = from + i;
                }
                for (List<Block> partition : blocks.collectPartitions(ids)) {
                    partition.forEach(sink);
                }
            }
            shared.destroy();
        } finally {
            if (active == null) {
                session.stop();
            }
        }
    }

    /** The log configuration used when nullpath starts the job itself: warnings (errors only when quiet). */
    static final String LOG_CONFIGURATION = "org/nullpath/spark/sweep-log4j2.properties";

    /**
     * Started by nullpath rather than by spark-submit and with no log configuration of the user's own, Spark
     * logs through {@link #LOG_CONFIGURATION}: warnings and errors on standard error (errors only with
     * {@code quiet}), not Spark's default stream of INFO lines. Takes effect only before Spark's logging
     * starts, which is here: nothing of Spark has run yet in a process started for one sweep.
     */
    private static void quietLog(boolean quiet) {
        if (System.getProperty("spark.master") != null || System.getProperty("log4j2.configurationFile") != null
                || System.getProperty("log4j.configurationFile") != null) {
            return;
        }
        System.setProperty("nullpath.spark.log", quiet ? "error" : "warn");
        System.setProperty("log4j2.configurationFile", LOG_CONFIGURATION);
    }

    private static SparkSession open(Study study) {
        SparkSession.Builder b = SparkSession.builder().appName("nullpath sweep " + study.sweep().scenario())
                .config("spark.ui.showConsoleProgress", "false"); // the sweep command shows its own progress
        if (System.getProperty("spark.master") == null) {
            b = b.master(study.master()); // under spark-submit its --master is kept
        }
        if (study.master().startsWith("local") && System.getProperty("spark.ui.enabled") == null) {
            b = b.config("spark.ui.enabled", "false"); // no web page for a job inside this process
        }
        return b.getOrCreate();
    }

    /**
     * Points 1 to {@code points} as ranges {first, count} of consecutive numbers, in order: about
     * {@link #PARTITIONS_PER_CORE} per core, at most {@link #MOST_PER_PARTITION} points each.
     */
    static List<long[]> ranges(long points, int cores) {
        long per = Math.max(1, Math.min(MOST_PER_PARTITION,
                (points + (long) PARTITIONS_PER_CORE * cores - 1) / ((long) PARTITIONS_PER_CORE * cores)));
        List<long[]> out = new ArrayList<>();
        for (long first = 1; first <= points; first += per) {
            out.add(new long[] {first, Math.min(per, points - first + 1)});
        }
        return out;
    }
}
