package org.nullpath.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.nullpath.mission.Sweep;

/**
 * sweep.html: one self-contained page (no scripts, nothing fetched) in the plan report's look: the spread of
 * every figure, each varying figure against the grid (a line for one grid key, a heat map for two, a line
 * per key for more, averaged over the other keys and the draws) and a histogram of it over the random draws.
 */
public final class SweepPage {
    /** Most figures charted; every figure is in the table. */
    static final int CHARTED = 24;
    private static final int BINS = 30;

    private SweepPage() {
    }

    /**
     * The study's values: {@code figures.get(f)[p]} is figure f at point p + 1 (NaN for none or an invalid
     * point), {@code spreads.get(f)} its spread.
     */
    public record Data(Sweep sweep, String title, String sweepFile, List<String> names, List<double[]> figures,
                       List<SweepOutput.Spread> spreads, long invalid) {
    }

    public static void write(Path file, Data d) throws IOException {
        Files.writeString(file, render(d), StandardCharsets.UTF_8);
    }

    static String render(Data d) {
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>")
                .append(Html.escape(d.title())).append(" \u00b7 sweep</title>\n<style>\n").append(Style.CSS)
                .append("</style>\n</head>\n<body>\n");
        long points = d.sweep().points();
        h.append("<header class=\"masthead\">\n<p class=\"kicker\">nullpath \u00b7 sweep report</p>\n<h1 id=\"title\">")
                .append(Html.escape(d.title())).append("</h1>\n<p class=\"meta\">sweep <code>")
                .append(Html.escape(d.sweepFile())).append("</code> over <code>").append(Html.escape(d.sweep().scenario()))
                .append("</code> \u00b7 ").append(points).append(" points (").append(points - d.invalid())
                .append(" valid, ").append(d.invalid()).append(" invalid)");
        if (d.sweep().draws() > 0) {
            h.append(" \u00b7 ").append(d.sweep().draws()).append(" draws per grid point, seed ").append(d.sweep().seed());
        }
        h.append("</p>\n</header>\n<aside class=\"caution\"><h2>Caution</h2><p>").append(Html.escape(HtmlReport.CAUTION))
                .append("</p></aside>\n");
        spreads(h, d);
        List<Integer> charted = charted(d);
        if (!d.sweep().grid().isEmpty() && !charted.isEmpty()) {
            grid(h, d, charted);
        }
        if (d.sweep().draws() > 0 && !charted.isEmpty()) {
            h.append("<section id=\"draws\">\n<h2>Over the random draws</h2>\n");
            for (int f : charted) {
                String name = d.names().get(f);
                figure(h, SweepCharts.histogram("hist-" + f, name + " over the draws", name, d.figures().get(f), BINS),
                        "How " + name + " is spread over the " + points + " points.");
            }
            h.append("</section>\n");
        }
        h.append("<footer><p>Written by nullpath. Every value here is rounded for reading; sweep.csv and ")
                .append("sweep-summary.json beside this page carry full precision.</p></footer>\n</body>\n</html>\n");
        return h.toString();
    }

    /** The figures that vary over the valid points, at most {@link #CHARTED}. */
    private static List<Integer> charted(Data d) {
        List<Integer> out = new ArrayList<>();
        for (int f = 0; f < d.names().size() && out.size() < CHARTED; f++) {
            SweepOutput.Spread s = d.spreads().get(f);
            if (s.points() > 1 && s.max() > s.min()) {
                out.add(f);
            }
        }
        return out;
    }

    private static void spreads(StringBuilder h, Data d) {
        h.append("<section id=\"spread\">\n<h2>Figures</h2>\n<p>Over the valid points that have the figure; ")
                .append("percentiles interpolate between order statistics.</p>\n<table>\n<thead><tr><th>figure</th>")
                .append("<th>points</th><th>min</th><th>5th</th><th>median</th><th>95th</th><th>max</th><th>mean</th>")
                .append("</tr></thead>\n<tbody>\n");
        for (int f = 0; f < d.names().size(); f++) {
            SweepOutput.Spread s = d.spreads().get(f);
            h.append("<tr><td><code>").append(Html.escape(d.names().get(f))).append("</code></td><td>").append(s.points());
            for (double v : new double[] {s.min(), s.p5(), s.p50(), s.p95(), s.max(), s.mean()}) {
                h.append("</td><td>").append(SweepCharts.shown(v));
            }
            h.append("</td></tr>\n");
        }
        h.append("</tbody>\n</table>\n</section>\n");
    }

    private static void grid(StringBuilder h, Data d, List<Integer> charted) {
        List<Sweep.Axis> grid = d.sweep().grid();
        h.append("<section id=\"grid\">\n<h2>Against the grid</h2>\n");
        if (grid.size() == 2 && numeric(grid.get(0)) && numeric(grid.get(1))) {
            for (int f : charted) {
                String name = d.names().get(f);
                double[][] z = means(d, f, 0, 1);
                figure(h, SweepCharts.heatMap("heat-" + f, name, grid.get(0).key(), values(grid.get(0)),
                        grid.get(1).key(), values(grid.get(1)), z), name + " over " + grid.get(0).key() + " and "
                        + grid.get(1).key() + (d.sweep().draws() > 0 ? ", the mean over the draws" : "")
                        + "; each cell one grid point, darker is higher.");
            }
        } else {
            for (int k = 0; k < grid.size(); k++) {
                if (!numeric(grid.get(k))) {
                    continue;
                }
                for (int f : charted) {
                    String name = d.names().get(f);
                    double[] x = values(grid.get(k));
                    double[] y = means(d, f, k, -1)[0];
                    figure(h, SweepCharts.lines("line-" + k + "-" + f, name + " against " + grid.get(k).key(),
                            grid.get(k).key(), x, name, List.of(name), List.of(y)), name + " against "
                            + grid.get(k).key() + (grid.size() > 1 || d.sweep().draws() > 0
                            ? ", the mean over the other keys and the draws" : "") + ".");
                }
            }
        }
        h.append("</section>\n");
    }

    private static boolean numeric(Sweep.Axis a) {
        return a.values().stream().noneMatch(Sweep.Value::word);
    }

    private static double[] values(Sweep.Axis a) {
        return a.values().stream().mapToDouble(Sweep.Value::number).toArray();
    }

    /**
     * Means of figure f per value of grid key a (and of key b, or one row when b is -1), over every other key
     * and the draws; NaN where no valid point has the figure.
     */
    private static double[][] means(Data d, int f, int a, int b) {
        List<Sweep.Axis> grid = d.sweep().grid();
        int na = grid.get(a).values().size();
        int nb = b < 0 ? 1 : grid.get(b).values().size();
        double[][] sum = new double[na][nb];
        long[][] n = new long[na][nb];
        double[] fig = d.figures().get(f);
        for (int p = 0; p < fig.length; p++) {
            if (Double.isNaN(fig[p])) {
                continue;
            }
            int[] idx = d.sweep().gridIndex(p + 1);
            int i = idx[a];
            int j = b < 0 ? 0 : idx[b];
            sum[i][j] += fig[p];
            n[i][j]++;
        }
        double[][] out = new double[b < 0 ? 1 : na][];
        if (b < 0) {
            out[0] = new double[na];
            for (int i = 0; i < na; i++) {
                out[0][i] = n[i][0] == 0 ? Double.NaN : sum[i][0] / n[i][0];
            }
            return out;
        }
        for (int i = 0; i < na; i++) {
            out[i] = new double[nb];
            for (int j = 0; j < nb; j++) {
                out[i][j] = n[i][j] == 0 ? Double.NaN : sum[i][j] / n[i][j];
            }
        }
        return out;
    }

    private static void figure(StringBuilder h, Charts.Figure fig, String caption) {
        h.append("<figure id=\"").append(fig.id()).append("\">\n").append(fig.svg()).append("\n<figcaption><p>")
                .append(Html.escape(caption)).append("</p>");
        if (!fig.key().isEmpty()) {
            h.append("<ul class=\"key\">");
            for (Charts.Key k : fig.key()) {
                h.append("<li>").append(Html.escape(k.label())).append("</li>");
            }
            h.append("</ul>");
        }
        h.append("</figcaption>\n</figure>\n");
    }
}
