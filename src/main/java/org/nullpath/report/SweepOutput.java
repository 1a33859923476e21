package org.nullpath.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nullpath.mission.Sweep;
import org.nullpath.schedule.SweepRow;

/**
 * The files of a trade study (docs/sweeps.md): sweep.csv, one row per point as it is computed, and
 * sweep-summary.json, the distribution of every figure over the valid points.
 */
public final class SweepOutput {
    /** The files a sweep writes. */
    public static final String CSV = "sweep.csv";
    public static final String SUMMARY = "sweep-summary.json";
    public static final String PAGE = "sweep.html";

    private SweepOutput() {
    }

    /** The columns of sweep.csv for a sweep over {@code keys} with figures {@code names}. */
    public static Table<SweepRow> table(List<String> keys, List<String> names) {
        List<Column<SweepRow>> c = new ArrayList<>();
        c.add(Column.count("point", "1, 2, ... in the sweep's order", SweepRow::point));
        c.add(Column.text("status", "valid, or invalid when the point's scenario is refused", r -> r.valid() ? "valid"
                : "invalid"));
        c.add(Column.text("problem", "the invalid point's problem, on one line", SweepRow::problem));
        for (int i = 0; i < keys.size(); i++) {
            int k = i;
            c.add(new Column<>(keys.get(i), "", "the value of this key (SI base units; dB stay dB)", r -> {
                Sweep.Value v = r.values().get(k);
                return v.word() ? v.scenarioText() : (Object) v.number();
            }));
        }
        for (int i = 0; i < names.size(); i++) {
            int k = i;
            c.add(Column.number(names.get(i), "", "a figure as plan writes it", r -> r.figure(k)));
        }
        return new Table<>(c);
    }

    /** Each figure's entry in sweep-summary.json. */
    static final Table<Spread> SPREADS = new Table<>(List.of(
            Column.count("points", "valid points with a value", Spread::points),
            Column.number("min", "", "least value", Spread::min),
            Column.number("max", "", "greatest value", Spread::max),
            Column.number("mean", "", "mean (compensated summation)", Spread::mean),
            Column.number("p5", "", "5th percentile", Spread::p5),
            Column.number("p50", "", "median", Spread::p50),
            Column.number("p95", "", "95th percentile", Spread::p95)));

    /**
     * The distribution of one figure over the valid points that have it: min, max, mean and the 5th, 50th and
     * 95th percentiles by linear interpolation between order statistics (Hyndman &amp; Fan's definition 7, the
     * default of R's quantile and of numpy.percentile).
     */
    public record Spread(long points, double min, double max, double mean, double p5, double p50, double p95) {
        public static Spread of(double[] values) {
            double[] v = Arrays.stream(values).filter(x -> !Double.isNaN(x)).sorted().toArray();
            if (v.length == 0) {
                return new Spread(0, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN, Double.NaN);
            }
            // mean by Kahan-compensated summation of the sorted values
            double sum = 0;
            double carry = 0;
            for (double x : v) {
                double y = x - carry;
                double t = sum + y;
                carry = (t - sum) - y;
                sum = t;
            }
            return new Spread(v.length, v[0], v[v.length - 1], sum / v.length, percentile(v, 0.05), percentile(v, 0.5),
                    percentile(v, 0.95));
        }

        /** Definition 7: h = (n - 1) p, between the floor(h)-th and the next order statistic (0-based). */
        static double percentile(double[] sorted, double p) {
            double h = (sorted.length - 1) * p;
            int lo = (int) Math.floor(h);
            int hi = Math.min(lo + 1, sorted.length - 1);
            return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
        }
    }

    /**
     * Writes sweep-summary.json: the study, the count of valid and invalid points and each figure's spread
     * ({@code spreads}, in the order of {@code names}).
     */
    public static void summary(Path file, Sweep sweep, List<String> names, long points, long invalid,
                               List<Spread> spreads) throws IOException {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("scenario", sweep.scenario());
        root.put("points", points);
        root.put("valid", points - invalid);
        root.put("invalid", invalid);
        root.put("seed", sweep.seed());
        root.put("percentiles", "linear between order statistics (Hyndman & Fan definition 7), over the valid points"
                + " with a value");
        Map<String, Object> figures = new LinkedHashMap<>();
        for (int i = 0; i < names.size(); i++) {
            figures.put(names.get(i), SPREADS.json(spreads.get(i)));
        }
        root.put("figures", figures);
        JsonText.pretty(file, root);
    }
}
