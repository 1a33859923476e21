package org.nullpath.cli;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.function.Consumer;

import org.nullpath.mission.Sweep;
import org.nullpath.report.SweepOutput;
import org.nullpath.scenario.ScenarioDocument;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.schedule.SweepRow;

/**
 * A way of computing a sweep's points outside this process's own threads, such as the Spark engine
 * (org.nullpath.spark). The sweep command finds an engine by its class name only when asked for one, so that
 * neither plan nor an in-process sweep loads it. An engine hands back blocks of consecutive points in order;
 * each block is computed by {@link #compute}, wherever the engine runs it, from the scenario's text (never its
 * path), and its rows are encoded by the same table as the in-process run, so the files are the same bytes.
 */
public interface SweepEngine {
    /**
     * Runs {@code study}, handing {@code sink} every block in point order, on the calling thread. With
     * {@code quiet} the engine's own log says only what went wrong.
     */
    void run(Study study, boolean quiet, Consumer<Block> sink) throws Exception;

    /**
     * What a computer of points needs, all of it carried with the job.
     *
     * @param master       where the engine runs (for Spark its master URL, such as {@code local[2]})
     * @param scenarioText the scenario file's text as read
     * @param scenarioName the name the scenario was read under (problems name it)
     * @param sweep        the sweep
     * @param names        the figures' names ({@code StudyFigures.names} of the scenario)
     */
    record Study(String master, String scenarioText, String scenarioName, Sweep sweep, List<String> names)
            implements Serializable {
        public Study {
            Objects.requireNonNull(master, "master");
            Objects.requireNonNull(scenarioText, "scenarioText");
            Objects.requireNonNull(scenarioName, "scenarioName");
            Objects.requireNonNull(sweep, "sweep");
            names = List.copyOf(names);
        }
    }

    /**
     * Points {@code first} to {@code first + count - 1}, computed.
     *
     * @param first   the first point's number
     * @param count   how many points
     * @param csv     their rows of sweep.csv, encoded
     * @param figures their figures, point by point ({@code count} times the number of figures; NaN where none)
     * @param invalid how many of them are invalid
     */
    record Block(long first, int count, byte[] csv, double[] figures, long invalid) implements Serializable {
    }

    /** Computes the block of {@code count} points from {@code first}, from the study's scenario text. */
    static Block compute(Study study, long first, int count) throws ScenarioException {
        ScenarioDocument doc = ScenarioDocument.of(study.scenarioText(), study.scenarioName());
        int n = study.names().size();
        List<SweepRow> rows = new ArrayList<>(count);
        double[] figures = new double[count * n];
        long invalid = 0;
        for (int i = 0; i < count; i++) {
            SweepRow row = SweepPoints.compute(doc, study.sweep(), first + i, n);
            rows.add(row);
            if (!row.valid()) {
                invalid++;
            }
            for (int k = 0; k < n; k++) {
                figures[i * n + k] = row.figure(k);
            }
        }
        byte[] csv = SweepOutput.table(study.sweep().keys(), study.names()).encode(rows);
        return new Block(first, count, csv, figures, invalid);
    }
}
