package org.nullpath.cli;

import java.util.Arrays;
import java.util.List;
import java.util.Map;

import org.nullpath.mission.Mission;
import org.nullpath.mission.Printable;
import org.nullpath.mission.Sweep;
import org.nullpath.scenario.Problem;
import org.nullpath.scenario.ScenarioDocument;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.schedule.RangeException;
import org.nullpath.schedule.StudyFigures;
import org.nullpath.schedule.SweepRow;

/**
 * One point of a trade study computed from the loaded scenario: the document with the point's values
 * replaced, resolved, and its figures; an invalid point with its problem on one line. The same on any thread
 * and in any process that holds the same scenario text and sweep.
 */
public final class SweepPoints {
    private SweepPoints() {
    }

    /** Point {@code p} of {@code sweep} over {@code doc}, with {@code figures} figures. */
    public static SweepRow compute(ScenarioDocument doc, Sweep sweep, long p, int figures) {
        Map<String, Sweep.Value> values = sweep.point(p);
        List<Sweep.Value> row = List.copyOf(values.values());
        try {
            ScenarioDocument d = doc;
            for (Map.Entry<String, Sweep.Value> e : values.entrySet()) {
                d = d.with(e.getKey(), e.getValue().scenarioText());
            }
            Mission m = d.resolve();
            return new SweepRow(p, row, "", StudyFigures.of(m));
        } catch (ScenarioException e) {
            Problem first = e.problems().get(0);
            String more = e.problems().size() > 1 ? " (and " + (e.problems().size() - 1) + " more)" : "";
            return new SweepRow(p, row, Printable.of(first.key() + ": " + first.message() + more), none(figures));
        } catch (RangeException e) {
            return new SweepRow(p, row, Printable.of(e.key() + ": " + e.getMessage()), none(figures));
        }
    }

    private static double[] none(int figures) {
        double[] v = new double[figures];
        Arrays.fill(v, Double.NaN);
        return v;
    }
}
