package org.nullpath.report;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;

import org.nullpath.mission.Link;
import org.nullpath.mission.Mission;
import org.nullpath.schedule.BudgetTally;
import org.nullpath.schedule.CutoffRow;
import org.nullpath.schedule.DiagramTraces;
import org.nullpath.schedule.ExchangeTally;
import org.nullpath.schedule.HorizonRow;
import org.nullpath.schedule.LinkTally;
import org.nullpath.schedule.SampledSeries;
import org.nullpath.schedule.CrossingRow;

/**
 * report.html: one self-contained page (inline CSS and SVG, no scripts, nothing fetched) with the
 * scenario's title, a caution, the spacetime diagram, per-link charts from a bounded sample of signals
 * ({@link SampledSeries}), the tables of cut-offs, horizons, windows and round trips, and the scenario
 * file as read. The same inputs always give the same bytes.
 */
public final class HtmlReport {
    /** The caution every report carries, word for word. */
    static final String CAUTION = "These results are planning estimates, computed from the scenario as written. "
            + "Mission-critical command timing (cut-offs, burn commands, deadlines) needs independent verification "
            + "and margin before anyone relies on it. High-power radio-frequency and laser transmitters carry "
            + "exposure and eye-safety hazards; the link budgets here say nothing about safe operation: defer to "
            + "the applicable safety rules and licensed practice.";

    private HtmlReport() {
    }

    /** Writes the report of a finished plan to {@code file}. */
    public static void write(Path file, Mission s, PlanResult result) throws IOException {
        Files.writeString(file, render(s, result), StandardCharsets.UTF_8);
    }

    /** The whole page. */
    static String render(Mission s, PlanResult r) {
        List<SampledSeries.LinkSeries> series = SampledSeries.of(s);
        StringBuilder h = new StringBuilder(1 << 20);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<title>").append(Html.escape(s.title())).append(" \u2014 nullpath plan report</title>\n")
                .append("<style>\n").append(Style.CSS).append("</style>\n</head>\n<body>\n");
        masthead(h, s, r);
        h.append("<aside class=\"caution\" id=\"caution\">\n<h2>Before relying on any of this</h2>\n<p>")
                .append(Html.escape(CAUTION)).append("</p>\n</aside>\n");
        contents(h, s);
        diagramSection(h, s, series);
        linkSections(h, s, r, series);
        tables(h, r, s.epoch());
        scenarioSection(h, s);
        h.append("<footer><p>Written by nullpath. Every value here is rounded for reading; the CSV and JSON files ")
                .append("beside this report carry full precision.</p></footer>\n</body>\n</html>\n");
        return h.toString();
    }

    private static void masthead(StringBuilder h, Mission s, PlanResult r) {
        long messages = r.links().stream().mapToLong(LinkTally::messages).sum();
        long never = r.links().stream().mapToLong(LinkTally::never).sum();
        String file = s.source().fileName();
        h.append("<header class=\"masthead\">\n<p class=\"kicker\">nullpath \u00b7 plan report</p>\n<h1 id=\"title\">")
                .append(Html.escape(s.title())).append("</h1>\n<p class=\"meta\">scenario <code>")
                .append(Html.escape(file)).append("</code> \u00b7 ").append(Readable.bodies(s)).append(" \u00b7 ")
                .append(Html.escape(Readable.planned(s, " (" + (messages - never) + " delivered, " + never
                        + " never arrive)")));
        s.epoch().ifPresent(e -> h.append(" \u00b7 mission time 0 is ").append(Html.escape(e.toString())));
        h.append("</p>\n</header>\n");
    }

    private static void contents(StringBuilder h, Mission s) {
        h.append("<nav class=\"contents\" aria-label=\"contents\">\n<ol>\n")
                .append("<li><a href=\"#spacetime\">Spacetime diagram</a></li>\n<li><a href=\"#links\">Links</a><ol>\n");
        for (Link l : s.links().values()) {
            h.append("<li><a href=\"#link-").append(Html.id(l.name())).append("\">").append(Html.escape(l.name()))
                    .append("</a></li>\n");
        }
        h.append("</ol></li>\n<li><a href=\"#tables\">Cut-offs, horizons, windows, round trips</a></li>\n")
                .append("<li><a href=\"#scenario\">The scenario as read</a></li>\n</ol>\n</nav>\n");
    }

    private static void diagramSection(StringBuilder h, Mission s, List<SampledSeries.LinkSeries> series) {
        List<String> links = new ArrayList<>();
        Map<String, String> ends = new LinkedHashMap<>();
        for (Link l : s.links().values()) {
            links.add(l.name());
            ends.put(l.name(), l.from().name() + " \u2192 " + l.to().name());
        }
        List<DiagramTraces.FlightLine> lines = DiagramTraces.flightLines(s);
        h.append("<section id=\"spacetime\">\n<h2>Spacetime diagram</h2>\n");
        if (lines.size() > 1) {
            h.append("<p>The craft fly along ").append(lines.size()).append(" different lines, so each line has a ")
                    .append("panel of its own: the craft flying along it, every station projected onto it, and the ")
                    .append("signals of the links with a craft on it.</p>\n");
        }
        for (int i = 0; i < lines.size(); i++) {
            DiagramTraces.Diagram d = SpacetimeChart.layout(lines.get(i), i == 0, series);
            String suffix = i == 0 ? "" : "-" + (i + 1);
            String title = "Spacetime diagram of " + s.title() + ": mission time against distance along the flight line"
                    + (lines.size() > 1 ? " of " + Readable.names(d.axisCraft()) : "");
            Charts.Figure f = SpacetimeChart.of(d, links, ends, "svg-spacetime" + suffix, title);
            double[] a = d.axis();
            String axis = d.axisCraft().isEmpty() ? "the mission frame's x axis"
                    : Html.escape(Readable.names(d.axisCraft())) + "'s heading (" + Scales.number(a[0]) + ", "
                    + Scales.number(a[1]) + ", " + Scales.number(a[2]) + ")";
            h.append("<figure id=\"fig-spacetime").append(suffix).append("\" class=\"wide\">\n")
                    .append(f.svg()).append("\n<figcaption><p>Mission time runs up, distance along ").append(axis)
                    .append(" across; every body is projected onto that line. One unit of c\u00a0t and one of distance ")
                    .append("take the same length, so a signal along the line runs at 45\u00b0 (off the line its ")
                    .append("projection is steeper). Up to ").append(DiagramTraces.RAYS_PER_LINK)
                    .append(" signals per link, evenly spaced over its planned sends, are drawn from send to arrival.</p>\n");
            key(h, f.key());
            h.append("</figcaption>\n</figure>\n");
        }
        h.append("</section>\n");
    }

    /**
     * Links whose charts the report draws, in file order: a page with more would take minutes to draw and be
     * too long to read; every link keeps its facts, and its CSV file holds every value.
     */
    static final int CHARTED_LINKS = 40;

    private static void linkSections(StringBuilder h, Mission s, PlanResult r,
                                     List<SampledSeries.LinkSeries> series) {
        h.append("<section id=\"links\">\n<h2>Links</h2>\n");
        if (series.isEmpty()) {
            h.append("<p class=\"empty\">No links are defined in this scenario.</p>\n");
        }
        for (int i = 0; i < series.size(); i++) {
            SampledSeries.LinkSeries ls = series.get(i);
            LinkTally t = r.links().get(i);
            String id = Html.id(ls.link());
            h.append("<section class=\"link\" id=\"link-").append(id).append("\">\n<h3>").append(Html.escape(ls.link()))
                    .append(" <span class=\"ends\">").append(Html.escape(ls.from())).append(" \u2192 ")
                    .append(Html.escape(ls.to())).append("</span></h3>\n");
            facts(h, ls, t);
            if (i >= CHARTED_LINKS) {
                h.append("<p class=\"empty\">Charts are drawn for the first ").append(CHARTED_LINKS)
                        .append(" links of a scenario; this link's values are in its CSV file and in summary.json.</p>\n")
                        .append("</section>\n");
                continue;
            }
            List<CrossingRow> crossed = r.crossings().stream().filter(c -> c.link().equals(ls.link())).toList();
            for (LinkCharts.Plot p : LinkCharts.of(ls, t.maxLightTime(), crossed)) {
                h.append("<figure id=\"fig-").append(id).append('-').append(p.name()).append("\">\n<h4>")
                        .append(Html.escape(p.heading())).append("</h4>\n").append(p.figure().svg())
                        .append("\n<figcaption><p>").append(Html.escape(p.caption())).append("</p>\n");
                key(h, p.figure().key());
                h.append("</figcaption>\n</figure>\n");
            }
            h.append("</section>\n");
        }
        h.append("</section>\n");
    }

    private static void facts(StringBuilder h, SampledSeries.LinkSeries ls, LinkTally t) {
        h.append("<table class=\"facts\">\n<tbody>\n");
        row(h, "messages", t.messages() + " planned, " + t.delivered() + " delivered, " + t.never() + " never arrive");
        if (t.delivered() > 0) {
            row(h, "light time", Readable.time(t.minLightTime()) + " to " + Readable.time(t.maxLightTime())
                    + " (planned messages" + (ls.horizonCutsRange() ? "; the chart samples on towards the horizon)"
                    : ")"));
            row(h, "Doppler factor", shown(t.minDoppler()) + " to " + shown(t.maxDoppler()));
        }
        row(h, "horizon", ls.horizon().hasHorizon()
                ? "send before " + Readable.notAfter(ls.horizon().lastSendClock()) + " on " + ls.from()
                + "'s clock, or the message never arrives" : "none: every send arrives");
        if (t.budget().isPresent() && t.delivered() > 0) {
            BudgetTally.Figures b = t.budget().get();
            row(h, "margin", shown(b.worstMarginDb()) + " to " + shown(b.bestMarginDb()) + " dB; "
                    + b.closing() + " of " + t.delivered() + " delivered messages close");
            Scales.Unit f = Scales.frequency(ls.terms().orElseThrow().carrierHz());
            row(h, "received frequency", shown(f.of(b.minRxFrequencyHz())) + " to "
                    + shown(f.of(b.maxRxFrequencyHz())) + " " + f.symbol() + (b.extremeShift()
                    ? " (leaves [carrier / 2, 2 \u00d7 carrier]: another band entirely)" : ""));
            row(h, "largest |Doppler rate|", shown(b.maxAbsDopplerRateHzPerS()) + " Hz/s");
            row(h, "rate that closes for every message", shown(b.minMaxDataRateBps()) + " bit/s");
        }
        String sampled;
        if (!ls.hasPlannedSends()) {
            sampled = "nothing is planned on this link, so nothing is plotted";
        } else if (ls.samples().isEmpty()) {
            sampled = "no send in the planned range arrives, so nothing is plotted";
        } else {
            sampled = ls.samples().size() + " sampled sends from " + Readable.time(ls.firstSendClock()) + " to "
                    + Readable.time(ls.horizonCutsRange() ? ls.horizon().lastSendClock() : ls.lastSendClock())
                    + " on " + ls.from() + "'s clock" + (ls.horizonCutsRange() ? " (up to the horizon)" : "")
                    + (ls.skipped() > 0 ? "; " + ls.skipped() + " left out (beyond double precision)" : "");
        }
        row(h, "plotted", sampled);
        h.append("</tbody>\n</table>\n");
    }

    /** A number for reading, infinities as the sign. */
    private static String shown(double v) {
        if (Double.isInfinite(v)) {
            return v > 0 ? "\u221e" : "\u2212\u221e";
        }
        return Readable.number(v);
    }

    private static void row(StringBuilder h, String name, String value) {
        h.append("<tr><th scope=\"row\">").append(Html.escape(name)).append("</th><td>").append(Html.escape(value))
                .append("</td></tr>\n");
    }

    private static void key(StringBuilder h, List<Charts.Key> key) {
        if (key.isEmpty()) {
            return;
        }
        h.append("<ul class=\"key\">\n");
        for (Charts.Key k : key) {
            String colour = Charts.hex(k.colour());
            String style = switch (k.swatch()) {
                case LINE -> "border-top: 3px " + k.dash().css + " " + colour;
                case BAND -> "background: " + colour + "; opacity: 0.6; height: 0.8em";
                case POINT -> "border: 2px solid " + colour + "; width: 0.5em; height: 0.5em; transform: rotate(45deg)";
            };
            h.append("<li><span class=\"swatch\" style=\"").append(style).append("\"></span>")
                    .append(Html.escape(k.label())).append("</li>\n");
        }
        h.append("</ul>\n");
    }

    /** A time for a table cell: shown by {@code shown}, with the exact seconds on hover; a dash where there is none. */
    private static String timeCell(double seconds, java.util.function.DoubleFunction<String> shown) {
        if (Double.isNaN(seconds)) {
            return "<td class=\"none\">\u2014</td>";
        }
        return "<td title=\"" + Cells.num(seconds) + " s\">" + Html.escape(shown.apply(seconds)) + "</td>";
    }

    /** A time, rounded to the nearest. */
    private static String time(double seconds) {
        return timeCell(seconds, Readable::time);
    }

    /** A latest time: shown rounded toward earlier. */
    private static String latest(double seconds) {
        return timeCell(seconds, Readable::notAfter);
    }

    /** An earliest time: shown rounded toward later. */
    private static String earliest(double seconds) {
        return timeCell(seconds, Readable::notBefore);
    }

    /** A data volume, SI-prefixed for reading, the exact bits on hover. */
    private static String volume(double bits) {
        if (Double.isNaN(bits)) {
            return "<td class=\"none\">\u2014</td>";
        }
        return "<td title=\"" + Cells.num(bits) + " bit\">" + Html.escape(Readable.volume(bits)) + "</td>";
    }

    private static String cell(String text) {
        return "<td>" + Html.escape(text) + "</td>";
    }

    /** A column of a report table: its header and the cell (HTML, escaped) of a row. */
    private record Shown<R>(String header, Function<R, String> cell) {
    }

    /**
     * A report table under its heading: the intro and the rows, or the {@code empty} note when there are no
     * rows ({@code empty} null: the table is shown even then).
     */
    private static <R> void table(StringBuilder h, String id, String heading, String intro, String empty, List<R> rows,
                                  List<Shown<R>> columns) {
        h.append("<h3 id=\"").append(id).append("\">").append(heading).append("</h3>\n");
        if (rows.isEmpty() && empty != null) {
            h.append("<p class=\"empty\">").append(empty).append("</p>\n");
            return;
        }
        h.append("<p>").append(intro).append("</p>\n<table class=\"grid\">\n<thead><tr>");
        for (Shown<R> c : columns) {
            h.append("<th>").append(c.header()).append("</th>");
        }
        h.append("</tr></thead>\n<tbody>\n");
        for (R r : rows) {
            h.append("<tr>");
            for (Shown<R> c : columns) {
                h.append(c.cell().apply(r));
            }
            h.append("</tr>\n");
        }
        h.append("</tbody>\n</table>\n");
    }

    private static void tables(StringBuilder h, PlanResult r, Optional<Instant> epoch) {
        h.append("<section id=\"tables\">\n<h2>Cut-offs, horizons, windows and round trips</h2>\n");
        List<Shown<CutoffRow>> cutoffColumns = new ArrayList<>(List.of(
                new Shown<>("cut-off", c -> cell(c.name())),
                new Shown<>("link", c -> cell(c.link())),
                new Shown<>("arrive by (receiver's clock)", c -> time(c.arriveByClock())),
                new Shown<>("latest send (sender's clock)", c -> latest(c.latestSendClock())),
                new Shown<>("latest send (mission time)", c -> latest(c.latestSendTime()))));
        epoch.ifPresent(e -> cutoffColumns.add(new Shown<>("latest send (calendar)",
                c -> cell(Readable.instantNotAfter(e, c.latestSendTime())))));
        cutoffColumns.add(new Shown<>("status", c -> cell(!c.reachable() ? "unreachable" : c.beforeStart()
                ? "ok, but the latest send lies before the mission starts" : "ok")));
        table(h, "table-cutoffs", "Cut-offs", "The latest send on a link whose message still arrives by a deadline on"
                + " the receiver's clock, shown rounded toward earlier (hover for the full value in seconds).",
                "No cut-offs are asked for in this scenario.", r.cutoffs(), cutoffColumns);
        table(h, "table-horizons", "Horizons", "For each link, the last send that still arrives; a send at or after it"
                + " never does.", null, r.horizons(), List.of(
                new Shown<>("link", x -> cell(x.link())),
                new Shown<>("horizon", x -> cell(x.hasHorizon() ? "yes" : "none")),
                new Shown<>("send before (sender's clock)", x -> latest(x.lastSendClock())),
                new Shown<>("send before (mission time)", x -> latest(x.lastSendTime()))));
        table(h, "table-windows", "Link windows", "Send-clock intervals in which a message would be received: margin"
                + " at or above 0 dB, inside the tuning range and within the Doppler-rate limit.", "No link window was"
                + " found (or none was asked for): a window needs a <code>windows</code> entry on a link with link"
                + " terms.", r.windows(), List.of(
                new Shown<>("link", w -> cell(w.window().link())),
                new Shown<>("opens (sender's clock)", w -> earliest(w.window().opensClock())),
                new Shown<>("closes (sender's clock)", w -> latest(w.window().closesClock())),
                new Shown<>("open (sender's clock)", w -> time(w.sendOpenSeconds())),
                new Shown<>("open (receiver's clock)", w -> time(w.receiveOpenSeconds())),
                new Shown<>("closed by", w -> cell(w.window().closedBy())),
                new Shown<>("data at the planned rate", w -> volume(w.volumeBits())),
                new Shown<>("data at the highest closing rate", w -> volume(w.adaptiveVolumeBits()))));
        table(h, "table-round-trips", "Round trips", "Query and reply exchanges; each round trip's time on the"
                + " querier's clock is in its <code>exchanges-NAME.csv</code>.", "No query and reply exchanges are"
                + " planned in this scenario.", r.exchanges(), List.of(
                new Shown<>("exchange", e -> cell(e.name())),
                new Shown<>("planned", e -> cell(Long.toString(e.roundTrips()))),
                new Shown<>("complete", e -> cell(Long.toString(e.complete()))),
                new Shown<>("never complete", e -> cell(Long.toString(e.roundTrips() - e.complete()))),
                new Shown<>("shortest (querier's clock)", e -> time(e.minRoundTrip())),
                new Shown<>("median", e -> time(e.medianRoundTrip())),
                new Shown<>("longest", e -> time(e.maxRoundTrip()))));
        h.append("</section>\n");
    }

    private static void scenarioSection(StringBuilder h, Mission s) {
        h.append("<section id=\"scenario\">\n<h2>The scenario as read</h2>\n");
        if (s.source().replaced().isEmpty()) {
            h.append("<p>The file exactly as planned, with its units.</p>\n");
        } else {
            h.append("<p>The file as read, with these values replaced for this plan:</p>\n<ul>\n");
            s.source().replaced().forEach((k, v) -> h.append("<li><code>").append(Html.escape(k)).append(": ")
                    .append(Html.escape(v)).append("</code></li>\n"));
            h.append("</ul>\n");
        }
        h.append("<pre class=\"scenario\">").append(Html.escape(s.source().text())).append("</pre>\n");
        h.append("</section>\n");
    }
}
