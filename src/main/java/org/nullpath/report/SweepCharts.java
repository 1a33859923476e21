package org.nullpath.report;

import java.awt.Color;
import java.awt.Paint;
import java.util.ArrayList;
import java.util.List;

import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;

/**
 * The charts of a trade study's page: a figure against one grid key (one line per value of a second key), a
 * heat map of a figure over two grid keys, and a histogram of a figure over random draws. Drawn with
 * JFreeChart into inline SVG in the plan report's style.
 */
final class SweepCharts {
    private SweepCharts() {
    }

    private static final Color[] LINES = {Palette.BLUE, Palette.VERMILLION, Palette.GREEN, Palette.ORANGE,
        Palette.PURPLE, Palette.SKY_BLUE, Palette.BLACK, Palette.YELLOW};

    /** A figure against a grid key: {@code y[k][i]} at {@code x[i]} for each line k. */
    static Charts.Figure lines(String id, String title, String xLabel, double[] x, String yLabel, List<String> names,
                               List<double[]> y) {
        List<Charts.Line> lines = new ArrayList<>();
        List<Charts.Key> key = new ArrayList<>();
        for (int k = 0; k < y.size(); k++) {
            Color c = LINES[k % LINES.length];
            Charts.Dash dash = k < LINES.length ? Charts.Dash.SOLID : Charts.Dash.DASHED;
            lines.add(new Charts.Line(names.get(k), c, dash, 2.0f, x, y.get(k)));
            if (y.size() > 1) {
                key.add(Charts.Key.line(names.get(k), c, dash));
            }
        }
        return Charts.panels(id, title, new Charts.YAxis(yLabel, false, false),
                List.of(new Charts.Panel(xLabel, lines, List.of())), null, List.of(), key);
    }

    /** A heat map of {@code z[i][j]} over grid values {@code x[i]} and {@code y[j]} (NaN cells left blank). */
    static Charts.Figure heatMap(String id, String title, String xLabel, double[] x, String yLabel, double[] y,
                                 double[][] z) {
        DefaultXYZDataset data = new DefaultXYZDataset();
        int n = x.length * y.length;
        double[][] cells = new double[3][n];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (int i = 0; i < x.length; i++) {
            xs.add((double) i);
            for (int j = 0; j < y.length; j++) {
                int c = i * y.length + j;
                cells[0][c] = i;
                cells[1][c] = j;
                cells[2][c] = z[i][j];
                if (!Double.isNaN(z[i][j])) {
                    lo = Math.min(lo, z[i][j]);
                    hi = Math.max(hi, z[i][j]);
                }
            }
        }
        for (int j = 0; j < y.length; j++) {
            ys.add((double) j);
        }
        data.addSeries(title, cells);
        XYBlockRenderer r = new XYBlockRenderer();
        double low = lo;
        double high = hi > lo ? hi : lo + 1;
        r.setPaintScale(new Shades(Double.isFinite(low) ? low : 0, Double.isFinite(low) ? high : 1));
        XYPlot plot = new XYPlot(data, Axes.linear(xLabel + " (grid step)", xs, 0.08, false, Math.min(x.length, 8)),
                Axes.linear(yLabel + " (grid step)", ys, 0.08, false, Math.min(y.length, 8)), r);
        Charts.style(plot);
        return new Charts.Figure(id, Charts.render(Charts.chart(plot), id, title, Charts.WIDTH, Charts.HEIGHT),
                List.of(Charts.Key.band("low " + shown(low), Shades.LOW),
                        Charts.Key.band("high " + shown(high), Shades.HIGH)));
    }

    /** A histogram of the values (NaN skipped) in {@code bins} equal bins. */
    static Charts.Figure histogram(String id, String title, String xLabel, double[] values, int bins) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (!Double.isNaN(v)) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        XYIntervalSeries s = new XYIntervalSeries("points");
        List<Double> xs = new ArrayList<>();
        List<Double> counts = new ArrayList<>();
        if (Double.isFinite(lo)) {
            double width = hi > lo ? (hi - lo) / bins : Math.max(Math.abs(lo) * 1e-9, 1e-300);
            long[] n = new long[bins];
            for (double v : values) {
                if (!Double.isNaN(v)) {
                    n[Math.min(bins - 1, (int) ((v - lo) / width))]++;
                }
            }
            for (int b = 0; b < bins; b++) {
                double a = lo + b * width;
                s.add(a + width / 2, a, a + width, n[b], 0, n[b]);
                xs.add(a);
                xs.add(a + width);
                counts.add((double) n[b]);
            }
        }
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        data.addSeries(s);
        XYBarRenderer r = new XYBarRenderer(0.05);
        r.setBarPainter(new StandardXYBarPainter());
        r.setShadowVisible(false);
        r.setSeriesPaint(0, Palette.BLUE);
        XYPlot plot = new XYPlot(data, Axes.linear(xLabel, xs, 0.02, false, 6), Axes.linear("points", counts, 0.05,
                true, 5), r);
        Charts.style(plot);
        return new Charts.Figure(id, Charts.render(Charts.chart(plot), id, title, Charts.WIDTH, Charts.HEIGHT), List.of());
    }

    /** A figure for reading: six significant digits, or a dash where there is none. */
    static String shown(double v) {
        return Double.isNaN(v) ? "\u2013" : String.format(java.util.Locale.ROOT, "%.6g", v);
    }

    /** From light to dark blue, low to high. */
    private record Shades(double lo, double hi) implements PaintScale {
        static final Color LOW = new Color(0xE8F1F8);
        static final Color HIGH = new Color(0x08306B);

        @Override
        public double getLowerBound() {
            return lo;
        }

        @Override
        public double getUpperBound() {
            return hi;
        }

        @Override
        public Paint getPaint(double v) {
            if (Double.isNaN(v)) {
                return Color.WHITE;
            }
            double f = Math.max(0, Math.min(1, (v - lo) / (hi - lo)));
            return new Color(mix(LOW.getRed(), HIGH.getRed(), f), mix(LOW.getGreen(), HIGH.getGreen(), f),
                    mix(LOW.getBlue(), HIGH.getBlue(), f));
        }

        private static int mix(int a, int b, double f) {
            return (int) Math.round(a + (b - a) * f);
        }
    }
}
