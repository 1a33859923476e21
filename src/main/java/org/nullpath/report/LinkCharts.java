package org.nullpath.report;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;

import org.nullpath.link.Budget;
import org.nullpath.link.LinkTerms;
import org.nullpath.schedule.CrossingRow;
import org.nullpath.schedule.SampledSeries;

/**
 * The charts of one link, from its sampled series: light time, Doppler factor, the point-ahead angle (where
 * the link has directions), received frequency, margin, highest data rate and the antennas' angles off
 * boresight, each against mission time at sending and against the receiver's clock at arrival, and the
 * clock image (receiver clock against sender clock).
 */
final class LinkCharts {
    private LinkCharts() {
    }

    /**
     * A chart with its place in the report.
     *
     * @param name    short name, part of the figure id
     * @param heading the figure's heading
     * @param caption what it shows, in a sentence or two
     * @param figure  the chart itself
     */
    record Plot(String name, String heading, String caption, Charts.Figure figure) {
    }

    /** Ids are {@code svg-<link>-<name>}; figures {@code fig-<link>-<name>}. */
    static String svgId(String link, String name) {
        return "svg-" + Html.id(link) + "-" + name;
    }

    static List<Plot> of(SampledSeries.LinkSeries ls) {
        return of(ls, Double.NaN, List.of());
    }

    /**
     * The charts of one link; {@code longestPlannedLightTime} (NaN when unknown) is marked on the light-time
     * chart when the samples run on towards the horizon past the planned messages, so that the chart and the
     * link's facts (which count planned messages only) can be read together. The link's {@code crossings}
     * (crossings.csv) are marked on the margin chart (margin) and the frequency chart (tuning-low, tuning-high)
     * at their mission time of sending.
     */
    static List<Plot> of(SampledSeries.LinkSeries ls, double longestPlannedLightTime, List<CrossingRow> crossings) {
        List<Plot> out = new ArrayList<>();
        List<SampledSeries.Sample> samples = ls.samples();
        if (samples.isEmpty()) {
            return out;
        }
        int n = samples.size();
        double[] sendTime = new double[n];
        double[] rxClock = new double[n];
        double maxSend = 0;
        double maxRx = 0;
        for (int i = 0; i < n; i++) {
            sendTime[i] = samples.get(i).sendTime();
            rxClock[i] = samples.get(i).receiveClock();
            maxSend = Math.max(maxSend, Math.abs(sendTime[i]));
            maxRx = Math.max(maxRx, Math.abs(rxClock[i]));
        }
        Scales.Unit tSend = Scales.time(maxSend);
        Scales.Unit tRx = Scales.time(maxRx);
        double[] x1 = scaled(sendTime, tSend);
        double[] x2 = scaled(rxClock, tRx);
        String x1Label = "mission time at sending (" + tSend.symbol() + ")";
        String x2Label = ls.to() + "'s clock at arrival (" + tRx.symbol() + ")";
        List<Charts.Mark> horizonMark = new ArrayList<>();
        List<Charts.Key> horizonKey = new ArrayList<>();
        if (ls.horizonCutsRange()) {
            horizonMark.add(new Charts.Mark(tSend.of(ls.horizon().lastSendTime()), "horizon", Palette.PURPLE,
                    Charts.Dash.DOTTED));
            horizonKey.add(Charts.Key.line("horizon: sends from here on never arrive", Palette.PURPLE,
                    Charts.Dash.DOTTED));
        }
        String link = ls.link();

        // light time
        double[] light = column(samples, SampledSeries.Sample::lightTime);
        Scales.Unit lu = Scales.time(max(light));
        List<Charts.Level> planned = new ArrayList<>();
        List<Charts.Key> plannedKey = new ArrayList<>();
        String plannedNote = "";
        if (ls.horizonCutsRange() && longestPlannedLightTime < max(light)) {
            planned.add(new Charts.Level(lu.of(longestPlannedLightTime), "longest planned message",
                    Palette.MUTED, Charts.Dash.DASHED));
            plannedKey.add(Charts.Key.line("longest light time of a planned message ("
                    + Readable.time(longestPlannedLightTime) + "): the samples go on towards the horizon",
                    Palette.MUTED, Charts.Dash.DASHED));
            plannedNote = " The samples run on towards the horizon, past the last planned message, so the curve"
                    + " climbs beyond the link's longest planned light time (the dashed level).";
        }
        out.add(plot(link, "light-time", "Light time",
                "How long each sampled signal is in flight in the mission frame (arrival minus sending, in mission"
                        + " time)." + plannedNote,
                new Charts.YAxis("light time (" + lu.symbol() + ")", false, true),
                List.of(series("light time", Palette.BLUE, Charts.Dash.SOLID, x1, x2, scaled(light, lu))),
                horizonMark, null, planned, with(with(List.of(Charts.Key.line("light time", Palette.BLUE,
                        Charts.Dash.SOLID)), horizonKey), plannedKey), x1Label, x2Label));

        // Doppler factor, or the frequency offset when the shift is small
        double[] doppler = column(samples, SampledSeries.Sample::doppler);
        double[] offset = column(samples, SampledSeries.Sample::frequencyOffset);
        double maxOffset = Math.max(Math.abs(min(offset)), Math.abs(max(offset)));
        if (maxOffset >= 1e-3) {
            boolean log = min(doppler) > 0 && max(doppler) / min(doppler) > 30;
            out.add(plot(link, "doppler", "Doppler factor",
                    "The Doppler factor D = f received / f sent: below 1 the signal arrives red-shifted (and the"
                            + " receiver's clock sees the sender's seconds stretched by 1/D), above 1 blue-shifted.",
                    new Charts.YAxis("Doppler factor D", log, false),
                    List.of(series("Doppler factor", Palette.BLUE, Charts.Dash.SOLID, x1, x2, doppler)),
                    horizonMark, null, List.of(new Charts.Level(1, "no shift", Palette.MUTED, Charts.Dash.DASHED)),
                    with(List.of(Charts.Key.line("Doppler factor D", Palette.BLUE, Charts.Dash.SOLID),
                            Charts.Key.line("D = 1: no shift", Palette.MUTED, Charts.Dash.DASHED)), horizonKey),
                    x1Label, x2Label));
        } else {
            int exp = maxOffset > 0 ? (int) Math.floor(Math.log10(maxOffset) / 3) * 3 : 0;
            double unit = Math.pow(10, exp);
            String label = exp == 0 ? "frequency offset D \u2212 1" : "frequency offset D \u2212 1 (\u00d710"
                    + Scales.superscript(exp) + ")";
            double[] off = new double[n];
            for (int i = 0; i < n; i++) {
                off[i] = offset[i] / unit;
            }
            out.add(plot(link, "doppler", "Doppler shift",
                    "The shift is small here, so the frequency offset D \u2212 1 (computed without cancellation)"
                            + " is drawn rather than D itself.",
                    new Charts.YAxis(label, false, false),
                    List.of(series("offset", Palette.BLUE, Charts.Dash.SOLID, x1, x2, off)), horizonMark, null,
                    List.of(new Charts.Level(0, "no shift", Palette.MUTED, Charts.Dash.DASHED)),
                    with(List.of(Charts.Key.line("frequency offset D \u2212 1", Palette.BLUE, Charts.Dash.SOLID),
                            Charts.Key.line("0: no shift", Palette.MUTED, Charts.Dash.DASHED)), horizonKey),
                    x1Label, x2Label));
        }

        // clock image
        double[] sendClock = column(samples, SampledSeries.Sample::sendClock);
        Scales.Unit cu = Scales.time(Math.max(Math.max(Math.abs(min(sendClock)), Math.abs(max(sendClock))), maxRx));
        double[] cx = scaled(sendClock, cu);
        double[] cy = scaled(rxClock, cu);
        double[] diagX = {min(cx), max(cx)};
        List<Charts.Line> clockLines = List.of(
                new Charts.Line("equal readings", Palette.MUTED, Charts.Dash.DASHED, 1.2f, diagX, diagX.clone()),
                new Charts.Line("clock image", Palette.BLUE, Charts.Dash.SOLID, 2.2f, cx, cy));
        List<Charts.Mark> clockMarks = new ArrayList<>();
        if (ls.horizonCutsRange()) {
            clockMarks.add(new Charts.Mark(cu.of(ls.horizon().lastSendClock()), "horizon", Palette.PURPLE,
                    Charts.Dash.DOTTED));
        }
        String clockId = svgId(link, "clock-image");
        String clockTitle = "Clock image on " + link + ": " + ls.to() + "'s clock at arrival against " + ls.from()
                + "'s clock at sending";
        Plot clockImage = new Plot("clock-image", "Clock image",
                "Each sampled send maps a reading of " + ls.from() + "'s clock to the reading of " + ls.to()
                        + "'s clock when it arrives; the slope is 1/D. The dashed line marks equal readings.",
                Charts.single(clockId, clockTitle, ls.from() + "'s clock at sending (" + cu.symbol() + ")",
                        ls.to() + "'s clock at arrival (" + cu.symbol() + ")", clockLines, clockMarks,
                        with(List.of(Charts.Key.line("arrival reading against sending reading", Palette.BLUE,
                                Charts.Dash.SOLID), Charts.Key.line("equal readings", Palette.MUTED,
                                Charts.Dash.DASHED)), horizonKey), Charts.WIDTH, 340));

        pointAhead(out, ls, samples, x1, x2, horizonMark, horizonKey, x1Label, x2Label);
        if (ls.terms().isEmpty()) {
            out.add(clockImage);
            return out;
        }
        LinkTerms terms = ls.terms().get();
        // received (and transmitted) frequency with the tuning range
        double[] rx = budgetColumn(samples, b -> b.frequency().rxFrequencyHz());
        double[] tx = budgetColumn(samples, b -> b.frequency().txFrequencyHz());
        Scales.Unit fu = Scales.frequency(terms.carrierHz());
        double[] band = terms.hasTuningRange() ? new double[] {fu.of(terms.tuningMinHz()), fu.of(terms.tuningMaxHz())}
                : null;
        List<Charts.Key> fKey = new ArrayList<>(List.of(
                Charts.Key.line("received frequency (receiver's frame)", Palette.BLUE, Charts.Dash.SOLID),
                Charts.Key.line(terms.precompensate() ? "transmitted frequency: carrier / D (pre-compensated)"
                        : "transmitted frequency (sender's frame)", Palette.VERMILLION, Charts.Dash.DASHED)));
        if (band != null) {
            fKey.add(Charts.Key.band("receiver tuning range", Palette.YELLOW));
        }
        out.add(plot(link, "frequency", "Received frequency",
                "The frequency the receiver sees, and what the sender transmits"
                        + (band == null ? "; no tuning range is given for this receiver."
                        : "; the shaded band is the receiver's tuning range."),
                new Charts.YAxis("frequency (" + fu.symbol() + ")", false, false),
                List.of(series("transmitted", Palette.VERMILLION, Charts.Dash.DASHED, x1, x2, scaled(tx, fu)),
                        series("received", Palette.BLUE, Charts.Dash.SOLID, x1, x2, scaled(rx, fu))),
                withMarks(horizonMark, crossings, tSend, "tuning-low", "tuning-high"), band, List.of(),
                withKey(with(fKey, horizonKey), crossings, "tuning-low", "tuning-high"), x1Label, x2Label));

        // margin
        double[] margin = budgetColumn(samples, b -> b.reception().marginDb());
        boolean photons = terms.detection() == LinkTerms.Detection.PHOTON_COUNTING;
        out.add(plot(link, "margin", "Link margin",
                (photons ? "Received photons per bit over the required number, in dB." : "Eb/N0 over the required"
                        + " Eb/N0, in dB.") + " The link closes where the margin is at or above 0 dB.",
                new Charts.YAxis("margin (dB)", false, false),
                List.of(series("margin", Palette.BLUE, Charts.Dash.SOLID, x1, x2, margin)),
                withMarks(horizonMark, crossings, tSend, "margin"), null,
                List.of(new Charts.Level(0, "0 dB", Palette.BLACK, Charts.Dash.DASHED)),
                withKey(with(List.of(Charts.Key.line("margin", Palette.BLUE, Charts.Dash.SOLID),
                        Charts.Key.line("0 dB: closes at and above", Palette.BLACK, Charts.Dash.DASHED)), horizonKey),
                        crossings, "margin"), x1Label, x2Label));

        // highest data rate that closes
        double[] rate = budgetColumn(samples, b -> b.reception().maxDataRateBps());
        Scales.Unit ru = Scales.dataRate(terms.dataRateBps());
        out.add(plot(link, "data-rate", "Highest data rate that closes",
                "The highest sender-frame data rate that would close with zero margin, against the planned rate.",
                new Charts.YAxis("data rate (" + ru.symbol() + ")", true, false),
                List.of(series("highest rate", Palette.BLUE, Charts.Dash.SOLID, x1, x2, scaled(rate, ru))),
                horizonMark, null,
                List.of(new Charts.Level(ru.of(terms.dataRateBps()), "planned", Palette.VERMILLION, Charts.Dash.DASHED)),
                with(List.of(Charts.Key.line("highest rate that closes", Palette.BLUE, Charts.Dash.SOLID),
                        Charts.Key.line("planned rate (" + Scales.number(ru.of(terms.dataRateBps())) + " "
                                + ru.symbol() + ")", Palette.VERMILLION, Charts.Dash.DASHED)), horizonKey),
                x1Label, x2Label));

        // antennas off boresight, and the pointing loss they cost
        double[] txOff = budgetColumn(samples, b -> Math.toDegrees(b.pointing().txOffBoresightRadians()));
        double[] rxOff = budgetColumn(samples, b -> Math.toDegrees(b.pointing().rxOffBoresightRadians()));
        double[] loss = budgetColumn(samples, b -> b.pointing().lossDb());
        if (Math.max(max(txOff), max(rxOff)) > 0) { // drawn unless both antennas track exactly
            out.add(plot(link, "boresight", "Antennas off boresight",
                    "The angle between where each antenna must point (the aim at the transmitter, the look at the"
                            + " receiver, aberration included) and its boresight; for a tracking antenna its pointing"
                            + " error. The largest pointing loss of both antennas together among these samples is "
                            + Scales.number(max(loss)) + " dB; it is included in the margin.",
                    new Charts.YAxis("angle off boresight (\u00b0)", false, false),
                    List.of(series("transmitter", Palette.VERMILLION, Charts.Dash.DASHED, x1, x2, txOff),
                            series("receiver", Palette.BLUE, Charts.Dash.SOLID, x1, x2, rxOff)),
                    horizonMark, null, List.of(),
                    with(List.of(Charts.Key.line(ls.from() + "'s transmitter", Palette.VERMILLION, Charts.Dash.DASHED),
                            Charts.Key.line(ls.to() + "'s receiver", Palette.BLUE, Charts.Dash.SOLID)), horizonKey),
                    x1Label, x2Label));
        }
        out.add(clockImage);
        return out;
    }

    /** The point-ahead angle, where the link has directions: how far ahead of the seen receiver to aim. */
    private static void pointAhead(List<Plot> out, SampledSeries.LinkSeries ls, List<SampledSeries.Sample> samples,
                                   double[] x1, double[] x2, List<Charts.Mark> horizonMark,
                                   List<Charts.Key> horizonKey, String x1Label, String x2Label) {
        double[] ahead = column(samples, s -> s.directions().map(d -> d.pointAheadRadians() * 1e6).orElse(Double.NaN));
        if (Axes.extent(ahead).isEmpty()) {
            return;
        }
        out.add(plot(ls.link(), "point-ahead", "Point-ahead angle",
                "In " + ls.from() + "'s frame at sending: the angle between where the signal must leave to meet "
                        + ls.to() + " and where " + ls.to() + " is seen at that moment (its light on the send"
                        + " event's past cone). A narrow beam must lead the seen receiver by this angle.",
                new Charts.YAxis("point-ahead (\u00b5rad)", false, false),
                List.of(series("point-ahead", Palette.BLUE, Charts.Dash.SOLID, x1, x2, ahead)), horizonMark, null,
                List.of(), with(List.of(Charts.Key.line("point-ahead angle", Palette.BLUE, Charts.Dash.SOLID)),
                        horizonKey), x1Label, x2Label));
    }

    /** Two lines (one per panel) from one y column. */
    private record Pair(String label, Charts.Dash dash, java.awt.Color colour, double[] x1, double[] x2, double[] y) {
    }

    private static Pair series(String label, java.awt.Color colour, Charts.Dash dash, double[] x1, double[] x2,
                               double[] y) {
        return new Pair(label, dash, colour, x1, x2, y);
    }

    private static Plot plot(String link, String name, String heading, String caption, Charts.YAxis y,
                             List<Pair> pairs, List<Charts.Mark> leftMarks, double[] band, List<Charts.Level> levels,
                             List<Charts.Key> key, String x1Label, String x2Label) {
        List<Charts.Line> left = new ArrayList<>();
        List<Charts.Line> right = new ArrayList<>();
        for (Pair p : pairs) {
            left.add(new Charts.Line(p.label(), p.colour(), p.dash(), 2.2f, p.x1(), p.y()));
            right.add(new Charts.Line(p.label(), p.colour(), p.dash(), 2.2f, p.x2(), p.y()));
        }
        String id = svgId(link, name);
        String title = heading + " on " + link + ": left against mission time at sending, right against the"
                + " receiver's clock at arrival";
        Charts.Figure f = Charts.panels(id, title, y, List.of(new Charts.Panel(x1Label, left, leftMarks),
                new Charts.Panel(x2Label, right, List.of())), band, levels, key);
        return new Plot(name, heading, caption + " Left: against mission time at sending; right: against the"
                + " receiver's clock at arrival.", f);
    }

    /** {@code marks} and a mark at each crossing of one of {@code limits}, at its mission time of sending. */
    private static List<Charts.Mark> withMarks(List<Charts.Mark> marks, List<CrossingRow> crossings, Scales.Unit t,
                                               String... limits) {
        List<Charts.Mark> out = new ArrayList<>(marks);
        for (CrossingRow c : crossings) {
            if (List.of(limits).contains(c.limit())) {
                out.add(new Charts.Mark(t.of(c.sendTime()), c.limit() + " " + c.direction(), Palette.GREEN,
                        Charts.Dash.DASHED));
            }
        }
        return out;
    }

    /** {@code key} with the crossings' entry when one of {@code limits} is crossed. */
    private static List<Charts.Key> withKey(List<Charts.Key> key, List<CrossingRow> crossings, String... limits) {
        boolean any = crossings.stream().anyMatch(c -> List.of(limits).contains(c.limit()));
        return any ? with(key, List.of(Charts.Key.line("crossing of " + String.join(" or ", limits)
                + " (crossings.csv; sending, mission time)", Palette.GREEN, Charts.Dash.DASHED))) : key;
    }

    private static List<Charts.Key> with(List<Charts.Key> a, List<Charts.Key> b) {
        List<Charts.Key> out = new ArrayList<>(a);
        out.addAll(b);
        return out;
    }

    private static double[] column(List<SampledSeries.Sample> samples, ToDoubleFunction<SampledSeries.Sample> f) {
        double[] out = new double[samples.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = f.applyAsDouble(samples.get(i));
        }
        return out;
    }

    private static double[] budgetColumn(List<SampledSeries.Sample> samples, ToDoubleFunction<Budget> f) {
        return column(samples, s -> s.budget().map(f::applyAsDouble).orElse(Double.NaN));
    }

    private static double[] scaled(double[] v, Scales.Unit u) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = u.of(v[i]);
        }
        return out;
    }

    /** The largest finite value, 0 when there is none. */
    private static double max(double[] v) {
        return finiteExtent(v)[1];
    }

    /** The smallest finite value, 0 when there is none. */
    private static double min(double[] v) {
        return finiteExtent(v)[0];
    }

    /** {min, max} of the finite values; {0, 0} when there are none. */
    private static double[] finiteExtent(double[] v) {
        return Axes.extent(v).orElse(new double[] {0, 0});
    }
}
