package org.nullpath.schedule;

import java.util.List;
import java.util.Objects;

import org.nullpath.mission.Sweep;

/**
 * One point of a trade study (a row of sweep.csv, docs/sweeps.md).
 *
 * @param point   1, 2, ... in the sweep's order
 * @param values  the varied keys' values, in column order
 * @param problem empty for a point whose scenario is valid and computed; else its one-line problem
 * @param figures the figures in {@link StudyFigures#names} order (all NaN for an invalid point)
 */
public record SweepRow(long point, List<Sweep.Value> values, String problem, double[] figures) {
    public SweepRow {
        values = List.copyOf(values);
        Objects.requireNonNull(problem, "problem");
        figures = figures.clone();
    }

    /** True when the point's scenario was valid and computed. */
    public boolean valid() {
        return problem.isEmpty();
    }

    @Override
    public double[] figures() {
        return figures.clone();
    }

    /** Figure {@code i}, without copying the array. */
    public double figure(int i) {
        return figures[i];
    }
}
