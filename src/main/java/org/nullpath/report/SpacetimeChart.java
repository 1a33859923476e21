package org.nullpath.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisSpace;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.nullpath.mission.Mission;
import org.nullpath.schedule.DiagramTraces;
import org.nullpath.schedule.SampledSeries;
import org.nullpath.units.Constants;

/**
 * The spacetime diagram: mission time up, distance along the first craft's heading across, drawn at
 * equal lengths for one unit of c t and one of distance, so light along the line runs at 45 degrees.
 * The axis space is fixed, so the drawing area is known before the ranges are chosen.
 */
final class SpacetimeChart {
    /** Widest and narrowest drawing, and its height, px. */
    static final int WIDTH = 900;
    static final int MIN_WIDTH = 480;
    static final int HEIGHT = 660;

    /**
     * Colours of craft and of links' signals, from one sequence so that no craft and no link share a colour
     * (after six, a link's dash tells it apart); stations are black and grey, drawn thinner.
     */
    private static final Color[] COLOURS = {Palette.BLUE, Palette.VERMILLION, Palette.GREEN, Palette.PURPLE,
        Palette.ORANGE, Palette.SKY_BLUE};
    private static final Color[] STATIONS = {Palette.BLACK, Palette.MUTED};
    private static final Charts.Dash[] DASHES = {Charts.Dash.SOLID, Charts.Dash.DASHED, Charts.Dash.LONG_DASH};
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.BOLD, 12);

    private SpacetimeChart() {
    }

    /**
     * The diagram's ranges and the drawing's width: between {@link #MIN_WIDTH} and {@link #WIDTH}, as near
     * the content's own proportions as that allows, so that little of the drawing is left empty.
     */
    static DiagramTraces.Diagram layout(DiagramTraces.FlightLine line, boolean firstLine,
                                        List<SampledSeries.LinkSeries> series) {
        Rectangle2D a = dataArea(WIDTH);
        double overhead = WIDTH - a.getWidth();
        double height = a.getHeight();
        DiagramTraces.Diagram first = DiagramTraces.of(line, firstLine, series, (MIN_WIDTH - overhead) / height,
                (WIDTH - overhead) / height);
        int width = (int) Math.round(overhead + first.widthOverHeight() * height);
        // the exact proportions of that whole-pixel width
        return DiagramTraces.of(line, firstLine, series, (width - overhead) / height);
    }

    /** The diagram of the mission's first flight line ({@link #layout(DiagramTraces.FlightLine, boolean, List)}). */
    static DiagramTraces.Diagram layout(Mission s, List<SampledSeries.LinkSeries> series) {
        return layout(DiagramTraces.flightLines(s).get(0), true, series);
    }

    /** The drawing's width in px for a diagram laid out by {@link #layout}. */
    static int width(DiagramTraces.Diagram d) {
        Rectangle2D a = dataArea(WIDTH);
        double overhead = WIDTH - a.getWidth();
        return (int) Math.round(overhead + d.widthOverHeight() * a.getHeight());
    }

    /** Data areas found so far, by width: each costs a drawing of the empty frame. */
    private static final Map<Integer, Rectangle2D> AREAS = new ConcurrentHashMap<>();

    /** The data area of a drawing {@code width} px wide (the axis space is fixed, so it needs no data). */
    static Rectangle2D dataArea(int width) {
        Rectangle2D a = AREAS.computeIfAbsent(width,
                w -> Charts.dataArea(Charts.chart(frame("x", "t", 0, 1, 0, 1)), w, HEIGHT));
        return new Rectangle2D.Double(a.getX(), a.getY(), a.getWidth(), a.getHeight()); // callers get their own
    }

    private static XYPlot frame(String xLabel, String yLabel, double x0, double x1, double y0, double y1) {
        NumberAxis x = Axes.fixed(xLabel, x0, x1, 8);
        NumberAxis y = Axes.fixed(yLabel, y0, y1, 8);
        XYPlot plot = new XYPlot(null, x, y, null);
        Charts.style(plot);
        AxisSpace left = new AxisSpace();
        left.setLeft(74);
        plot.setFixedRangeAxisSpace(left);
        AxisSpace bottom = new AxisSpace();
        bottom.setBottom(50);
        plot.setFixedDomainAxisSpace(bottom);
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        return plot;
    }

    /** Colour of each body: stations in their own sequence, craft first in the shared one. */
    static Map<String, Color> bodyColours(DiagramTraces.Diagram d) {
        Map<String, Color> out = new LinkedHashMap<>();
        int stations = 0;
        int craft = 0;
        for (DiagramTraces.Trace t : d.bodies()) {
            out.put(t.body(), t.craft() ? COLOURS[craft++ % COLOURS.length] : STATIONS[stations++ % STATIONS.length]);
        }
        return out;
    }

    /** How many craft the diagram draws (they take the first colours of the shared sequence). */
    private static int craftCount(DiagramTraces.Diagram d) {
        return (int) d.bodies().stream().filter(DiagramTraces.Trace::craft).count();
    }

    static Charts.Figure of(DiagramTraces.Diagram d, List<String> links, Map<String, String> linkEnds, String id,
                            String title) {
        Scales.Unit tu = Scales.time(Math.max(Math.abs(d.firstTime()), Math.abs(d.lastTime())));
        Scales.Unit su = Scales.length(Math.max(d.lastAlong() - d.firstAlong(),
                Math.max(Math.abs(d.firstAlong()), Math.abs(d.lastAlong()))));
        String axisName = d.axisCraft().isEmpty() ? "the x axis" : Readable.names(d.axisCraft()) + "'s heading";
        double x0 = su.of(d.firstAlong());
        double x1 = su.of(d.lastAlong());
        double y0 = tu.of(d.firstTime());
        double y1 = tu.of(d.lastTime());
        XYPlot plot = frame("distance along " + axisName + " (" + su.symbol() + ")",
                "mission time (" + tu.symbol() + ")", x0, x1, y0, y1);
        List<Charts.Key> key = new ArrayList<>();
        Map<String, Color> bodyColour = bodyColours(d);
        Rectangle2D area = dataArea(width(d));
        int dataset = 0;

        // light rays, one series per link (and one for those that never arrive)
        XYSeriesCollection rays = new XYSeriesCollection();
        XYLineAndShapeRenderer rayRenderer = new XYLineAndShapeRenderer(true, false);
        rayRenderer.setDrawSeriesLineAsPath(true);
        int series = 0;
        List<String> drawn = links.stream().filter(l -> d.rays().stream().anyMatch(r -> r.link().equals(l))).toList();
        for (int li = 0; li < drawn.size(); li++) {
            String link = drawn.get(li);
            int k = craftCount(d) + li;
            Color c = COLOURS[k % COLOURS.length];
            Charts.Dash dash = DASHES[(k / COLOURS.length + 1) % DASHES.length];
            XYSeries arrived = new XYSeries("rays " + link, false, true);
            XYSeries lost = new XYSeries("lost " + link, false, true);
            for (DiagramTraces.Ray r : d.rays()) {
                if (!r.link().equals(link)) {
                    continue;
                }
                XYSeries target = r.delivered() ? arrived : lost;
                target.add(su.of(r.sendAlong()), tu.of(r.sendTime()), false);
                target.add(su.of(r.endAlong()), tu.of(r.endTime()), false);
                target.add(Double.NaN, Double.NaN, false);
            }
            Color translucent = new Color(c.getRed(), c.getGreen(), c.getBlue(), 215);
            if (arrived.getItemCount() > 0) {
                rays.addSeries(arrived);
                rayRenderer.setSeriesPaint(series, translucent);
                rayRenderer.setSeriesStroke(series++, Charts.stroke(dash, 1.1f));
                key.add(Charts.Key.line("signals on " + link + " (" + linkEnds.get(link) + "), send to arrival",
                        c, dash));
            }
            if (lost.getItemCount() > 0) {
                rays.addSeries(lost);
                rayRenderer.setSeriesPaint(series, translucent);
                rayRenderer.setSeriesStroke(series++, Charts.stroke(Charts.Dash.DOTTED, 1.4f));
                key.add(Charts.Key.line("sent on " + link + " after its horizon: never arrive", c,
                        Charts.Dash.DOTTED));
            }
        }
        plot.setDataset(dataset, rays);
        plot.setRenderer(dataset++, rayRenderer);

        // horizons: the receiver's asymptotic null plane where it crosses the axis
        XYSeriesCollection horizons = new XYSeriesCollection();
        XYLineAndShapeRenderer horizonRenderer = new XYLineAndShapeRenderer(true, false);
        int h = 0;
        for (DiagramTraces.NullLine line : d.horizons()) {
            XYSeries s = new XYSeries("horizon " + line.link(), false, true);
            int n = 64;
            double[] xs = new double[n + 1];
            double[] ys = new double[n + 1];
            for (int i = 0; i <= n; i++) {
                double along = d.firstAlong() + (d.lastAlong() - d.firstAlong()) * i / n;
                xs[i] = su.of(along);
                ys[i] = tu.of(line.timeAt(along));
                s.add(xs[i], ys[i], false);
            }
            horizons.addSeries(s);
            horizonRenderer.setSeriesPaint(h, Palette.INK);
            horizonRenderer.setSeriesStroke(h++, Charts.stroke(Charts.Dash.LONG_DASH, 1.5f));
            key.add(Charts.Key.line("horizon of " + line.link() + ": where " + line.body()
                    + "'s asymptote c t \u2212 s = L crosses the line; nothing sent on or above it reaches "
                    + line.body(), Palette.INK, Charts.Dash.LONG_DASH));
            labelLine(plot, "horizon of " + line.link(), xs, ys, x0, x1, y0, y1, Palette.INK);
        }
        plot.setDataset(dataset, horizons);
        plot.setRenderer(dataset++, horizonRenderer);

        // worldlines
        XYSeriesCollection bodies = new XYSeriesCollection();
        XYLineAndShapeRenderer bodyRenderer = new XYLineAndShapeRenderer(true, false);
        bodyRenderer.setDrawSeriesLineAsPath(true);
        int b = 0;
        List<double[]> placed = new ArrayList<>();
        // the leg labels' boxes first, so that the bodies' names keep clear of them; a leg label that would
        // overlap an earlier one is left out (its mark is still drawn)
        List<Boolean> legLabelled = new ArrayList<>();
        for (DiagramTraces.LegMark mark : d.legMarks()) {
            double px = (su.of(mark.alongMetres()) - x0) / (x1 - x0) * area.getWidth() + 0.012 * area.getWidth();
            double py = (y1 - tu.of(mark.timeSeconds())) / (y1 - y0) * area.getHeight();
            double[] box = {px, px + 6.6 * legLabel(mark).length(), py - 8, py + 8};
            boolean clear = py >= 0 && py <= area.getHeight();
            for (double[] p : placed) {
                clear &= !(box[0] < p[1] && box[1] > p[0] && box[2] < p[3] && box[3] > p[2]);
            }
            legLabelled.add(clear);
            if (clear) {
                placed.add(box);
            }
        }
        for (DiagramTraces.Trace t : d.bodies()) {
            XYSeries s = new XYSeries("body " + t.body(), false, true);
            double[] xs = new double[t.timeSeconds().length];
            double[] ys = new double[xs.length];
            for (int i = 0; i < xs.length; i++) {
                xs[i] = su.of(t.alongMetres()[i]);
                ys[i] = tu.of(t.timeSeconds()[i]);
                s.add(xs[i], ys[i], false);
            }
            bodies.addSeries(s);
            Color c = bodyColour.get(t.body());
            bodyRenderer.setSeriesPaint(b, c);
            bodyRenderer.setSeriesStroke(b++, new BasicStroke(t.craft() ? 2.8f : 2.0f, BasicStroke.CAP_ROUND,
                    BasicStroke.JOIN_ROUND));
            key.add(Charts.Key.line((t.craft() ? "craft " : "station ") + t.body(), c, Charts.Dash.SOLID));
            labelTop(plot, placed, t.body(), xs, ys, x0, x1, y0, y1, c, area);
        }
        plot.setDataset(dataset, bodies);
        plot.setRenderer(dataset++, bodyRenderer);

        // leg boundaries
        XYSeriesCollection marks = new XYSeriesCollection();
        XYLineAndShapeRenderer markRenderer = new XYLineAndShapeRenderer(false, true);
        int m = 0;
        Map<String, XYSeries> byCraft = new LinkedHashMap<>();
        for (int i = 0; i < d.legMarks().size(); i++) {
            DiagramTraces.LegMark mark = d.legMarks().get(i);
            XYSeries s = byCraft.computeIfAbsent(mark.craft(), k -> new XYSeries("legs " + k, false, true));
            double x = su.of(mark.alongMetres());
            double y = tu.of(mark.timeSeconds());
            s.add(x, y, false);
            if (legLabelled.get(i)) {
                XYTextAnnotation a = new XYTextAnnotation(legLabel(mark), x + 0.012 * (x1 - x0), y);
                a.setFont(Palette.NOTE_FONT);
                a.setPaint(Palette.INK);
                a.setTextAnchor(TextAnchor.CENTER_LEFT);
                plot.addAnnotation(a);
            }
        }
        for (Map.Entry<String, XYSeries> e : byCraft.entrySet()) {
            marks.addSeries(e.getValue());
            Path2D.Double diamond = new Path2D.Double();
            diamond.moveTo(0, -5);
            diamond.lineTo(5, 0);
            diamond.lineTo(0, 5);
            diamond.lineTo(-5, 0);
            diamond.closePath();
            markRenderer.setSeriesShape(m, diamond);
            markRenderer.setSeriesPaint(m, Color.WHITE);
            markRenderer.setUseOutlinePaint(true);
            markRenderer.setUseFillPaint(true);
            markRenderer.setSeriesFillPaint(m, Color.WHITE);
            markRenderer.setSeriesOutlinePaint(m, bodyColour.get(e.getKey()));
            markRenderer.setSeriesOutlineStroke(m++, new BasicStroke(1.6f));
        }
        if (!byCraft.isEmpty()) {
            key.add(Charts.Key.point("start of a leg (numbered, with its kind; the last mark: the final coast;"
                    + " labels that would overlap are left out)", Palette.INK));
        }
        plot.setDataset(dataset, marks);
        plot.setRenderer(dataset, markRenderer);

        int width = width(d);
        String svg = Charts.render(Charts.chart(plot), id, title, width, HEIGHT)
                .replaceFirst(" class=\"chart\"", " class=\"chart\" style=\"max-width: " + width + "px\"");
        return new Charts.Figure(id, svg, key);
    }

    /** "2 burn -1 g0": leg number, kind and acceleration. */
    static String legLabel(DiagramTraces.LegMark mark) {
        double a = mark.accelerationMetresPerSecond2();
        String accel = a == 0 || Double.isNaN(a) ? "" : " " + Scales.number(a / Constants.G0).replace('-', '\u2212') + " g0";
        return mark.leg() + " " + mark.kind() + accel;
    }

    /**
     * The body's name near the top of its visible worldline, moved down clear of the labels already placed
     * ({@code placed}: left, right, top, bottom edges in px, estimated from the font size).
     */
    private static void labelTop(XYPlot plot, List<double[]> placed, String text, double[] xs, double[] ys, double x0,
                                 double x1, double y0, double y1, Color c, Rectangle2D area) {
        int last = -1;
        for (int i = 0; i < xs.length; i++) {
            if (xs[i] >= x0 && xs[i] <= x1 && ys[i] >= y0 && ys[i] <= y1) {
                last = i;
            }
        }
        if (last < 0) {
            return;
        }
        int at = Math.max(0, last - Math.max(1, xs.length / 40));
        double pxPerX = area.getWidth() / (x1 - x0);
        double pxPerY = area.getHeight() / (y1 - y0);
        double px = (xs[at] - x0) * pxPerX;
        double py = (y1 - ys[at]) * pxPerY; // from the top
        double textWidth = 7.6 * text.length() + 6;
        double lineHeight = 16;
        boolean right = px + textWidth > area.getWidth() - 4;
        double left = right ? px - textWidth : px;
        // each pass moves the label below one it overlaps (by at least a pixel), so at most one pass per label
        for (int pass = 0; pass <= placed.size(); pass++) {
            boolean moved = false;
            for (double[] p : placed) {
                boolean overlapX = left < p[1] && left + textWidth > p[0];
                boolean overlapY = py - lineHeight < p[3] - 1 && py > p[2] + 1;
                if (overlapX && overlapY) {
                    py = p[3] + lineHeight;
                    moved = true;
                }
            }
            if (!moved) {
                break;
            }
        }
        placed.add(new double[] {left, left + textWidth, py - lineHeight, py});
        double x = x0 + (right ? left + textWidth - 3 : left + 3) / pxPerX;
        double y = y1 - py / pxPerY;
        XYTextAnnotation a = new XYTextAnnotation(text, x, y);
        a.setFont(LABEL);
        a.setPaint(c);
        a.setTextAnchor(right ? TextAnchor.BOTTOM_RIGHT : TextAnchor.BOTTOM_LEFT);
        plot.addAnnotation(a);
    }

    /** A label along a line, at about two thirds of its visible part. */
    private static void labelLine(XYPlot plot, String text, double[] xs, double[] ys, double x0, double x1, double y0,
                                  double y1, Color c) {
        List<Integer> visible = new ArrayList<>();
        for (int i = 0; i < xs.length; i++) {
            if (xs[i] >= x0 && xs[i] <= x1 && ys[i] >= y0 && ys[i] <= y1) {
                visible.add(i);
            }
        }
        if (visible.isEmpty()) {
            return;
        }
        int i = visible.get(visible.size() * 2 / 3);
        XYTextAnnotation a = new XYTextAnnotation(text, xs[i] + 0.01 * (x1 - x0), ys[i]);
        a.setFont(Palette.NOTE_FONT);
        a.setPaint(c);
        a.setTextAnchor(TextAnchor.TOP_LEFT);
        plot.addAnnotation(a);
    }
}
