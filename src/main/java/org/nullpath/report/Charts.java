package org.nullpath.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Stroke;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CombinedRangeXYPlot;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;
import org.jfree.svg.ViewBox;

import static org.nullpath.report.Palette.AXIS_FONT;
import static org.nullpath.report.Palette.BLACK;
import static org.nullpath.report.Palette.BLUE;
import static org.nullpath.report.Palette.FRAME;
import static org.nullpath.report.Palette.GREEN;
import static org.nullpath.report.Palette.GRID;
import static org.nullpath.report.Palette.INK;
import static org.nullpath.report.Palette.MUTED;
import static org.nullpath.report.Palette.NOTE_FONT;
import static org.nullpath.report.Palette.ORANGE;
import static org.nullpath.report.Palette.PURPLE;
import static org.nullpath.report.Palette.SKY_BLUE;
import static org.nullpath.report.Palette.TICK_FONT;
import static org.nullpath.report.Palette.VERMILLION;
import static org.nullpath.report.Palette.YELLOW;

/**
 * The report's charts: JFreeChart plots drawn to inline SVG with JFreeSVG, in nullpath's own plain
 * look. Colours come from the Okabe-Ito palette (Okabe and Ito, "Color Universal Design", 2008), which
 * stays distinguishable with the common forms of colour blindness; every series also has its own dash
 * pattern, so nothing depends on colour alone. Keys are written as HTML beside each chart, not inside it.
 *
 * <p>Output is deterministic: each SVG's definitions (clip paths) are prefixed with the figure's own id
 * instead of JFreeSVG's time-based default, coordinates are written with a fixed number of decimals
 * without the machine's locale, and ranges and tick steps are set here rather than left to auto-ranging.
 */
final class Charts {
    static {
        if (System.getProperty("java.awt.headless") == null) {
            System.setProperty("java.awt.headless", "true");
        }
    }

    // Okabe-Ito palette
    /** Width and height of a per-link chart, px (the SVG scales with the page). */
    static final int WIDTH = 900;
    static final int HEIGHT = 300;

    private Charts() {
    }

    /** How a line is drawn; each has a CSS border style for the HTML key. */
    enum Dash {
        SOLID(null, "solid"), DASHED(new float[] {7f, 4f}, "dashed"), DOTTED(new float[] {1.5f, 3f}, "dotted"),
        LONG_DASH(new float[] {12f, 4f, 3f, 4f}, "dashed");

        final float[] pattern;
        final String css;

        Dash(float[] pattern, String css) {
            this.pattern = pattern;
            this.css = css;
        }
    }

    /** What a key entry shows. */
    enum Swatch {
        LINE, BAND, POINT
    }

    /**
     * One entry of a figure's key.
     *
     * @param label  what it is, in words
     * @param colour its colour
     * @param dash   its line style
     * @param swatch a line, a shaded band or a point mark
     */
    record Key(String label, Color colour, Dash dash, Swatch swatch) {
        static Key line(String label, Color colour, Dash dash) {
            return new Key(label, colour, dash, Swatch.LINE);
        }

        static Key band(String label, Color colour) {
            return new Key(label, colour, Dash.SOLID, Swatch.BAND);
        }

        static Key point(String label, Color colour) {
            return new Key(label, colour, Dash.SOLID, Swatch.POINT);
        }
    }

    /**
     * A rendered chart.
     *
     * @param id  the SVG element's id (unique in the report)
     * @param svg the inline {@code <svg>} element
     * @param key what its lines mean
     */
    record Figure(String id, String svg, List<Key> key) {
    }

    /**
     * A series of points already in display units; NaN breaks the line.
     *
     * @param label  key label
     * @param colour line colour
     * @param dash   line style
     * @param width  line width, px
     * @param x      abscissae
     * @param y      ordinates
     */
    record Line(String label, Color colour, Dash dash, float width, double[] x, double[] y) {
    }

    /** A horizontal line across a chart (a threshold), in display units. */
    record Level(double y, String label, Color colour, Dash dash) {
    }

    /** A vertical line in one panel, in display units. */
    record Mark(double x, String label, Color colour, Dash dash) {
    }

    /**
     * One panel of a chart that shares its vertical axis with the others.
     *
     * @param xLabel the horizontal axis' label, with its unit
     * @param lines  the series
     * @param marks  vertical lines
     */
    record Panel(String xLabel, List<Line> lines, List<Mark> marks) {
    }

    /**
     * The vertical axis of a chart.
     *
     * @param label       label with unit
     * @param log         logarithmic
     * @param floorAtZero when the data are all >= 0, let the axis start at 0 rather than below it
     */
    record YAxis(String label, boolean log, boolean floorAtZero) {
    }

    /**
     * A chart of side-by-side panels sharing one vertical axis.
     *
     * @param band   a shaded band of the vertical axis (a tuning range), {lo, hi} in display units, or null
     * @param levels horizontal lines
     */
    static Figure panels(String id, String title, YAxis y, List<Panel> panels, double[] band, List<Level> levels,
                         List<Key> key) {
        List<Double> ys = new ArrayList<>();
        for (Panel p : panels) {
            for (Line l : p.lines()) {
                for (double v : l.y()) {
                    ys.add(v);
                }
            }
        }
        if (band != null) {
            ys.add(band[0]);
            ys.add(band[1]);
        }
        for (Level l : levels) {
            ys.add(l.y());
        }
        ValueAxis yAxis = y.log() ? Axes.log(y.label(), ys) : Axes.linear(y.label(), ys, 0.05, y.floorAtZero(), 5);
        CombinedRangeXYPlot plot = new CombinedRangeXYPlot(yAxis);
        plot.setGap(26);
        for (Panel p : panels) {
            List<Double> xs = new ArrayList<>();
            for (Line l : p.lines()) {
                for (double v : l.x()) {
                    xs.add(v);
                }
            }
            XYPlot sub = new XYPlot(dataset(p.lines(), y.log()), Axes.linear(p.xLabel(), xs, 0.01, false, 5), null,
                    renderer(p.lines()));
            style(sub);
            if (band != null) {
                IntervalMarker m = new IntervalMarker(band[0], band[1]);
                m.setPaint(new Color(YELLOW.getRed(), YELLOW.getGreen(), YELLOW.getBlue(), 110));
                m.setOutlinePaint(null);
                sub.addRangeMarker(m, Layer.BACKGROUND);
                for (double edge : band) {
                    ValueMarker e = new ValueMarker(edge, new Color(0x8A7F00), stroke(Dash.SOLID, 1f));
                    sub.addRangeMarker(e, Layer.BACKGROUND);
                }
            }
            for (Level l : levels) {
                ValueMarker m = new ValueMarker(l.y(), l.colour(), stroke(l.dash(), 1.3f));
                sub.addRangeMarker(m, Layer.FOREGROUND);
            }
            for (Mark mk : p.marks()) {
                sub.addDomainMarker(domainMarker(mk), Layer.FOREGROUND);
            }
            plot.add(sub, 1);
        }
        style(plot);
        return new Figure(id, render(chart(plot), id, title, WIDTH, HEIGHT), key);
    }

    /** A labelled vertical marker (a leg boundary, the horizon) on the horizontal axis. */
    private static ValueMarker domainMarker(Mark mk) {
        ValueMarker m = new ValueMarker(mk.x(), mk.colour(), stroke(mk.dash(), 1.4f));
        m.setLabel(mk.label());
        m.setLabelFont(NOTE_FONT);
        m.setLabelPaint(mk.colour().darker());
        m.setLabelBackgroundColor(new Color(255, 255, 255, 0));
        m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(TextAnchor.TOP_RIGHT);
        m.setLabelOffset(new RectangleInsets(4, 4, 4, 4));
        return m;
    }

    /** A single-panel chart with a linear vertical axis (the clock image). */
    static Figure single(String id, String title, String xLabel, String yLabel, List<Line> lines, List<Mark> marks,
                         List<Key> key, int width, int height) {
        List<Double> xs = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        for (Line l : lines) {
            for (double v : l.x()) {
                xs.add(v);
            }
            for (double v : l.y()) {
                ys.add(v);
            }
        }
        XYPlot plot = new XYPlot(dataset(lines), Axes.linear(xLabel, xs, 0.01, false, 6),
                Axes.linear(yLabel, ys, 0.04, true, 6), renderer(lines));
        style(plot);
        for (Mark mk : marks) {
            plot.addDomainMarker(domainMarker(mk), Layer.FOREGROUND);
        }
        return new Figure(id, render(chart(plot), id, title, width, height), key);
    }

    static XYSeriesCollection dataset(List<Line> lines) {
        return dataset(lines, false);
    }

    /** The lines as a dataset; non-finite values (and with {@code positiveOnly}, values <= 0) become gaps. */
    static XYSeriesCollection dataset(List<Line> lines, boolean positiveOnly) {
        XYSeriesCollection c = new XYSeriesCollection();
        for (int i = 0; i < lines.size(); i++) {
            Line l = lines.get(i);
            // keys must be unique within a collection; the label is shown in the HTML key, not here
            XYSeries s = new XYSeries(i + ": " + l.label(), false, true);
            for (int k = 0; k < l.x().length; k++) {
                double x = l.x()[k];
                double y = l.y()[k];
                // a value that cannot be drawn (an infinite margin at zero distance) leaves a gap
                boolean drawable = Double.isFinite(x) && Double.isFinite(y) && (!positiveOnly || y > 0);
                s.add(x, drawable ? y : Double.NaN, false);
            }
            c.addSeries(s);
        }
        return c;
    }

    static XYLineAndShapeRenderer renderer(List<Line> lines) {
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        r.setDrawSeriesLineAsPath(true);
        for (int i = 0; i < lines.size(); i++) {
            r.setSeriesPaint(i, lines.get(i).colour());
            r.setSeriesStroke(i, stroke(lines.get(i).dash(), lines.get(i).width()));
        }
        return r;
    }

    static Stroke stroke(Dash dash, float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash.pattern, 0f);
    }

    static JFreeChart chart(XYPlot plot) {
        JFreeChart chart = new JFreeChart(null, AXIS_FONT, plot, false);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setBorderVisible(false);
        chart.setPadding(new RectangleInsets(8, 4, 4, 14));
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        return chart;
    }

    static void style(XYPlot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(FRAME);
        plot.setOutlineStroke(new BasicStroke(0.8f));
        plot.setDomainGridlinePaint(GRID);
        plot.setRangeGridlinePaint(GRID);
        plot.setDomainGridlineStroke(new BasicStroke(0.8f));
        plot.setRangeGridlineStroke(new BasicStroke(0.8f));
        plot.setAxisOffset(new RectangleInsets(2, 2, 2, 2));
        plot.setInsets(new RectangleInsets(2, 2, 2, 2));
    }

    /**
     * Draws the chart to an inline SVG element with the given id, with a {@code <title>} for readers of
     * the SVG on its own and without the namespace declarations HTML does not need.
     */
    static String render(JFreeChart chart, String id, String title, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix(id + "-");
        g.setGeomDoubleConverter(Charts::coordinate);
        g.setTransformDoubleConverter(Charts::transform);
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height), (ChartRenderingInfo) null);
        String svg = g.getSVGElement(id, false, new ViewBox(0, 0, width, height), null, null);
        return inline(svg, id, title);
    }

    /** The data area a chart would draw into, found by drawing it once to a throwaway SVG. */
    static Rectangle2D dataArea(JFreeChart chart, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        g.setDefsKeyPrefix("measure-");
        ChartRenderingInfo info = new ChartRenderingInfo();
        chart.draw(g, new Rectangle2D.Double(0, 0, width, height), info);
        return info.getPlotInfo().getDataArea();
    }

    static String inline(String svg, String id, String title) {
        int close = svg.indexOf('>');
        // inline SVG in HTML needs no namespace declarations, and nothing here uses the xlink or jfreesvg ones
        String s = svg.substring(0, close).replaceAll(" xmlns(:[a-z]+)?=(['\"])[^'\"]*\\2", "")
                + svg.substring(close);
        close = s.indexOf('>');
        String open = s.substring(0, close);
        String rest = s.substring(close + 1);
        return open + " role=\"img\" aria-labelledby=\"" + id + "-title\"" + " class=\"chart\">"
                + "<title id=\"" + id + "-title\">" + Html.escape(title) + "</title>" + rest;
    }

    static String coordinate(double v) {
        return fixed(v, 2);
    }

    static String transform(double v) {
        return fixed(v, 4);
    }

    /**
     * {@code v} with {@code places} decimals as {@code String.format("%.Nf")} writes it (the decimal digits of
     * {@code Double.toString} rounded half up; a minus sign for every negative value, -0.0 included), then
     * trimmed. A chart has thousands of coordinates: the formatter's parsing of its pattern on every call, and
     * then BigDecimal's rounding, were most of the cost of drawing them, so the digits are rounded here as text
     * ({@code ChartsCoordinatesTest} holds the result to the formatter's).
     */
    static String fixed(double v, int places) {
        if (!Double.isFinite(v)) {
            return trim(String.format(Locale.ROOT, "%." + places + "f", v));
        }
        String digits = halfUp(Double.toString(Math.abs(v)), places);
        return trim(Double.compare(v, 0.0) < 0 ? "-" + digits : digits);
    }

    /**
     * A non-negative {@code Double.toString} text ({@code 123.45}, {@code 1.0E-5}, {@code 1.234E10}) rounded half
     * up to {@code places} decimals and written plainly with exactly that many: what
     * {@code new BigDecimal(s).setScale(places, RoundingMode.HALF_UP).toPlainString()} gives.
     */
    static String halfUp(String s, int places) {
        int e = s.indexOf('E');
        String mantissa = e < 0 ? s : s.substring(0, e);
        int point = mantissa.indexOf('.');
        // the digits, and how many of them stand before the decimal point (may be <= 0, or beyond them all)
        StringBuilder d = new StringBuilder(mantissa.length() + places + 2)
                .append(mantissa, 0, point).append(mantissa, point + 1, mantissa.length());
        int whole = point + (e < 0 ? 0 : Integer.parseInt(s.substring(e + 1)));
        if (whole < 1) { // leading zeroes, so that at least one digit stands before the point
            d.insert(0, "0".repeat(1 - whole));
            whole = 1;
        }
        int keep = whole + places;
        boolean up = keep < d.length() && d.charAt(keep) >= '5';
        if (keep < d.length()) {
            d.setLength(keep);
        }
        while (d.length() < keep) {
            d.append('0');
        }
        if (up) { // add one in the last kept place, carrying
            int i = keep - 1;
            while (i >= 0 && d.charAt(i) == '9') {
                d.setCharAt(i--, '0');
            }
            if (i < 0) {
                d.insert(0, '1');
                whole++;
            } else {
                d.setCharAt(i, (char) (d.charAt(i) + 1));
            }
        }
        int lead = 0;
        while (lead < whole - 1 && d.charAt(lead) == '0') {
            lead++;
        }
        String integer = d.substring(lead, whole);
        return places == 0 ? integer : integer + "." + d.substring(whole);
    }

    /** Trailing zeroes and a bare point removed, "-0" as "0". */
    static String trim(String s) {
        if (s.indexOf('.') >= 0) {
            int end = s.length();
            while (s.charAt(end - 1) == '0') {
                end--;
            }
            if (s.charAt(end - 1) == '.') {
                end--;
            }
            s = s.substring(0, end);
        }
        return s.equals("-0") ? "0" : s;
    }

    /** A colour as CSS hex. */
    static String hex(Color c) {
        return String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }
}
