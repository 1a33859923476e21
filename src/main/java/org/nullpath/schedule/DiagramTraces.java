package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Optional;

import org.nullpath.lightcone.SignalPath;
import org.nullpath.mission.Craft;
import org.nullpath.mission.Mission;
import org.nullpath.mission.Node;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.worldline.Asymptote;
import org.nullpath.worldline.LegSpan;
import org.nullpath.worldline.LegKind;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;
import org.nullpath.worldline.Worldline;

/**
 * What a spacetime diagram of a scenario shows, projected onto one line: mission time against the
 * distance {@code s = axis . r} along the first craft's heading (through the frame origin). Every body's
 * worldline is sampled at {@value #TRACE_POINTS} mission times (plus its leg boundaries), signals at
 * {@value #RAYS_PER_LINK} evenly spaced send clocks of each link's planned range become light rays from
 * send to receive event (or, sent after a horizon, run off the top), horizons become the trace of the
 * receiver's asymptotic null plane {@code c t - d . r = L} on the line, and leg boundaries are marked.
 *
 * <p>The ranges are chosen so that one unit of {@code c t} and one unit of {@code s} take the same
 * length on the drawing, given the drawing area's width over height: a ray along the line is then at
 * 45 degrees. The time range starts at the earlier of mission time 0 and the first sampled send, and
 * reaches past the last planned send and leg boundary to take in the drawn rays' arrivals (at most
 * {@value #ARRIVAL_REACH} times further); rays that arrive later run off the top.
 */
public final class DiagramTraces {
    /** Mission times at which each worldline is sampled. */
    public static final int TRACE_POINTS = 240;
    /**
     * Rays drawn per link, at evenly spaced send clocks over its planned range (the links in turn starting
     * 0, 1/3 or 2/3 of a spacing in, so that links between the same two bodies do not hide each other).
     */
    public static final int RAYS_PER_LINK = 8;
    /** How far the time range may grow beyond the planned activity to take in arrivals, as a factor. */
    public static final double ARRIVAL_REACH = 2.0;

    private static final double PAD = 0.04;

    private DiagramTraces() {
    }

    /**
     * One flight line of the drawing: its axis, the craft that fly along it (either way), and the bodies
     * drawn on it (every station, projected onto the line, and those craft).
     *
     * @param axis   unit vector of the line's direction
     * @param craft  the craft flying along it, in file order (empty when the mission has no craft)
     * @param bodies every station, then those craft
     */
    public record FlightLine(Vec3 axis, List<Craft> craft, List<Node> bodies) {
        public FlightLine {
            craft = List.copyOf(craft);
            bodies = List.copyOf(bodies);
        }

        /** Whether {@code link} is drawn on this line: one of its ends flies along it (station links on the first). */
        boolean draws(SampledSeries.LinkSeries link, boolean firstLine) {
            boolean fromHere = craft.contains(link.route().from());
            boolean toHere = craft.contains(link.route().to());
            return fromHere || toHere || firstLine && !link.route().from().isCraft() && !link.route().to().isCraft();
        }
    }

    /** Directions closer than this (the size of their cross product) count as one flight line. */
    static final double SAME_LINE = 1e-9;

    /**
     * The flight lines to draw, one panel each: craft whose headings are parallel or opposite share a line
     * (lines offset sideways are drawn together: the projection along the axis is the same), in the order
     * their first craft appears; one line along the x axis when there is no craft.
     */
    public static List<FlightLine> flightLines(Mission s) {
        List<Vec3> axes = new ArrayList<>();
        List<List<Craft>> groups = new ArrayList<>();
        for (Craft c : s.craft()) {
            Vec3 n = c.worldline().heading();
            int g = 0;
            while (g < axes.size() && axes.get(g).cross(n).norm() >= SAME_LINE) {
                g++;
            }
            if (g == axes.size()) {
                axes.add(n);
                groups.add(new ArrayList<>());
            }
            groups.get(g).add(c);
        }
        if (axes.isEmpty()) {
            return List.of(new FlightLine(new Vec3(1, 0, 0), List.of(), List.copyOf(s.stations())));
        }
        List<FlightLine> out = new ArrayList<>();
        for (int g = 0; g < axes.size(); g++) {
            List<Node> bodies = new ArrayList<>(s.stations());
            bodies.addAll(groups.get(g));
            out.add(new FlightLine(axes.get(g), groups.get(g), bodies));
        }
        return out;
    }

    /**
     * The whole diagram.
     *
     * @param axisCraft  the craft whose heading is the axis, in file order; empty when there is no craft (the x
     *                   axis is used)
     * @param axis       unit vector of the axis (x, y, z)
     * @param firstTime  bottom of the time range, s
     * @param lastTime   top of the time range, s
     * @param firstAlong left end of the distance range, m
     * @param lastAlong  right end of the distance range, m
     * @param bodies     every station and craft in file order
     * @param rays       sampled signals, link by link in file order, in send order
     * @param horizons   one null line per link with a horizon whose receiver has an asymptote
     * @param legMarks   leg boundaries of every craft, in order
     * @param widthOverHeight the drawing's width over its height that the ranges were chosen for
     */
    public record Diagram(List<String> axisCraft, double[] axis, double firstTime, double lastTime, double firstAlong,
                          double lastAlong, List<Trace> bodies, List<Ray> rays, List<NullLine> horizons,
                          List<LegMark> legMarks, double widthOverHeight) {
    }

    /**
     * One body's worldline on the diagram.
     *
     * @param body        node name
     * @param craft       true for a craft, false for a station
     * @param timeSeconds mission times, ascending
     * @param alongMetres distance along the axis at each time
     */
    public record Trace(String body, boolean craft, double[] timeSeconds, double[] alongMetres) {
    }

    /**
     * A light ray from a send event to its receive event; for a signal that never arrives, to a point
     * beyond the top of the diagram along its direction of travel.
     *
     * @param link        link name
     * @param delivered   false for a signal sent after the link's horizon
     * @param sendTime    mission time of sending, s
     * @param sendAlong   distance along the axis at sending, m
     * @param endTime     mission time of arrival (or of the far point), s
     * @param endAlong    distance along the axis at arrival (or at the far point), m
     */
    public record Ray(String link, boolean delivered, double sendTime, double sendAlong, double endTime,
                      double endAlong) {
    }

    /**
     * The trace on the axis of the null plane {@code c t - d . r = L} that a receiver approaches for ever:
     * {@code c t - k s = L} with {@code k = d . axis}. A send on or above it never reaches the receiver.
     *
     * @param link          link whose horizon it is
     * @param body          the receiver approaching it
     * @param k             d . axis (+1 for a body running away along the axis)
     * @param limitMetres   L
     */
    public record NullLine(String link, String body, double k, double limitMetres) {
        /** Mission time on the line at distance {@code along} on the axis, s. */
        public double timeAt(double along) {
            return (limitMetres + k * along) / Constants.C;
        }
    }

    /**
     * A leg boundary of a craft.
     *
     * @param craft       craft name
     * @param leg         1-based leg number (for the end of the last finite leg: the number of legs + 1)
     * @param kind        what starts there: the leg's kind, or "coast" after the last finite leg
     * @param accelerationMetresPerSecond2 the leg's proper acceleration along the heading at its start (0 for a
     *                    coast, NaN where it is not fixed in advance)
     * @param timeSeconds mission time, s
     * @param alongMetres distance along the axis, m
     */
    public record LegMark(String craft, int leg, String kind, double accelerationMetresPerSecond2, double timeSeconds,
                          double alongMetres) {
    }

    /**
     * Builds the diagram of one flight line for a drawing area of the given width over height.
     *
     * @param line            the flight line ({@link #flightLines})
     * @param firstLine       whether it is the first (links between stations are drawn there)
     * @param series          the links' sampled series ({@link SampledSeries#of(Mission)})
     * @param widthOverHeight the drawing area's width over its height (both in the same length unit)
     */
    public static Diagram of(FlightLine line, boolean firstLine, List<SampledSeries.LinkSeries> series,
                             double widthOverHeight) {
        return of(line, firstLine, series, widthOverHeight, widthOverHeight);
    }

    /**
     * Builds the diagram for a drawing area whose width over height may be chosen between two bounds:
     * the one nearest the content's own proportions (its distance span over its c t span) is taken, and
     * the other range widened to match. {@link Diagram#widthOverHeight()} says which was taken.
     */
    public static Diagram of(FlightLine line, boolean firstLine, List<SampledSeries.LinkSeries> allSeries,
                             double minWidthOverHeight, double maxWidthOverHeight) {
        if (!(minWidthOverHeight > 0) || !(maxWidthOverHeight >= minWidthOverHeight)
                || !Double.isFinite(maxWidthOverHeight)) {
            throw new IllegalArgumentException("the drawing's width over height must be positive, got "
                    + minWidthOverHeight + " to " + maxWidthOverHeight);
        }
        List<String> axisCraft = line.craft().stream().map(Craft::name).toList();
        Vec3 axis = line.craft().isEmpty() ? line.axis() : line.craft().get(0).worldline().atTime(0).direction().unit();
        List<SampledSeries.LinkSeries> series = allSeries.stream().filter(ls -> line.draws(ls, firstLine)).toList();

        // rays and the extent of planned activity
        List<Ray> rays = new ArrayList<>();
        List<double[]> lostSends = new ArrayList<>(); // {series index, send time, send along, k}
        double first = 0;
        double base = Double.NEGATIVE_INFINITY;
        double arrivals = Double.NEGATIVE_INFINITY;
        for (int li = 0; li < series.size(); li++) {
            SampledSeries.LinkSeries ls = series.get(li);
            if (!ls.hasPlannedSends()) {
                continue;
            }
            Worldline sender = ls.route().sender();
            Worldline receiver = ls.route().receiver();
            first = Math.min(first, sender.atClock(ls.firstSendClock()).timeSeconds());
            base = Math.max(base, sender.atClock(ls.lastSendClock()).timeSeconds());
            Optional<Asymptote> asymptote = receiver.asymptote();
            double lo = ls.firstSendClock();
            double hi = ls.lastSendClock();
            int count = hi > lo ? RAYS_PER_LINK : 1;
            // links that share their ends would draw the same rays: stagger each link's by a third of a spacing
            double phase = (li % 3) / 3.0;
            for (int i = 0; i < count; i++) {
                double clock = count == 1 ? lo : lo + (hi - lo) * Math.min(1.0, (i + phase) / (count - 1 + 2 / 3.0));
                SignalPath p;
                try {
                    p = LinkSchedule.signal(sender, receiver, clock);
                } catch (ArithmeticException e) {
                    continue; // beyond what doubles can hold: not drawn
                }
                if (p.delivered()) {
                    rays.add(new Ray(ls.link(), true, p.send().timeSeconds(), axis.dot(p.send().position()),
                            p.receive().timeSeconds(), axis.dot(p.receive().position())));
                    arrivals = Math.max(arrivals, p.receive().timeSeconds());
                } else if (asymptote.isPresent()) {
                    lostSends.add(new double[] {li, p.send().timeSeconds(), axis.dot(p.send().position()),
                            asymptote.get().direction().dot(axis)});
                }
            }
        }
        List<LegMark> marks = new ArrayList<>();
        for (Craft n : line.craft()) {
            StraightLineCraft craft = n.worldline();
            List<LegSpan> legs = craft.legs();
            for (LegSpan span : legs) {
                marks.add(mark(n.name(), span.index() + 1, kindOf(span.spec()),
                        span.spec().accelerationMetresPerSecond2(), craft, span.start().timeSeconds(), axis));
            }
            if (!legs.isEmpty() && !legs.get(legs.size() - 1).openEnded()) {
                LegSpan last = legs.get(legs.size() - 1);
                marks.add(mark(n.name(), last.index() + 2, LegKind.COAST.key(), 0.0, craft, last.end().timeSeconds(), axis));
            }
        }
        for (LegMark m : marks) {
            first = Math.min(first, m.timeSeconds());
            base = Math.max(base, m.timeSeconds());
        }
        if (!(base > first)) {
            base = first + Constants.DAY;
        }
        double last = base;
        if (arrivals > last) {
            last = Math.min(arrivals, first + ARRIVAL_REACH * (base - first));
        }
        double span = last - first;
        last += PAD * span;
        first -= 0.5 * PAD * span;

        // the distance range from the bodies over the time range, the drawn rays and the leg marks
        List<Trace> traces = traces(line, axis, first, last, marks);
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (Trace t : traces) {
            for (double x : t.alongMetres()) {
                lo = Math.min(lo, x);
                hi = Math.max(hi, x);
            }
        }
        for (Ray r : rays) {
            if (r.endTime() <= last) {
                lo = Math.min(lo, Math.min(r.sendAlong(), r.endAlong()));
                hi = Math.max(hi, Math.max(r.sendAlong(), r.endAlong()));
            }
        }
        double width = hi - lo;
        if (!(width > 0)) {
            width = Constants.C * (last - first) * 0.1;
        }
        lo -= PAD * width;
        hi += PAD * width;

        // equal lengths for c t and s on the drawing
        double ctSpan = Constants.C * (last - first);
        double alongSpan = hi - lo;
        double widthOverHeight = Math.min(maxWidthOverHeight, Math.max(minWidthOverHeight, alongSpan / ctSpan));
        if (ctSpan * widthOverHeight > alongSpan) {
            double mid = 0.5 * (lo + hi);
            double half = 0.5 * ctSpan * widthOverHeight;
            lo = mid - half;
            hi = mid + half;
        } else {
            last = first + alongSpan / widthOverHeight / Constants.C;
            traces = traces(line, axis, first, last, marks);
        }

        for (double[] q : lostSends) {
            SampledSeries.LinkSeries ls = series.get((int) q[0]);
            double beyond = last + (last - first);
            rays.add(new Ray(ls.link(), false, q[1], q[2], beyond, q[2] + q[3] * Constants.C * (beyond - q[1])));
        }
        // links in file order; within a link, delivered rays in send order, then the lost ones
        List<Ray> ordered = new ArrayList<>();
        for (SampledSeries.LinkSeries ls : series) {
            for (Ray r : rays) {
                if (r.link().equals(ls.link())) {
                    ordered.add(r);
                }
            }
        }

        List<NullLine> lines = new ArrayList<>();
        for (SampledSeries.LinkSeries ls : series) {
            if (!ls.horizon().hasHorizon()) {
                continue;
            }
            Optional<Asymptote> a = ls.route().receiver().asymptote();
            if (a.isPresent()) {
                lines.add(new NullLine(ls.link(), ls.to(), a.get().direction().dot(axis), a.get().limitMetres()));
            }
        }
        double[] axisArray = {axis.x(), axis.y(), axis.z()};
        return new Diagram(axisCraft, axisArray, first, last, lo, hi, Collections.unmodifiableList(traces),
                Collections.unmodifiableList(ordered), Collections.unmodifiableList(lines),
                Collections.unmodifiableList(marks), widthOverHeight);
    }

    private static LegMark mark(String craft, int leg, String kind, double a, Worldline w, double t, Vec3 axis) {
        return new LegMark(craft, leg, kind, a, t, axis.dot(w.atTime(t).position()));
    }

    /** A leg's kind in a word, as the leg labels itself. */
    static String kindOf(LegSpec spec) {
        return spec.label();
    }

    private static List<Trace> traces(FlightLine line, Vec3 axis, double first, double last, List<LegMark> marks) {
        List<Trace> out = new ArrayList<>();
        for (Node n : line.bodies()) {
            List<Double> times = new ArrayList<>();
            for (int i = 0; i <= TRACE_POINTS - 1; i++) {
                times.add(first + (last - first) * i / (TRACE_POINTS - 1));
            }
            for (LegMark m : marks) {
                if (m.craft().equals(n.name()) && m.timeSeconds() > first && m.timeSeconds() < last) {
                    times.add(m.timeSeconds());
                }
            }
            double[] t = times.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
            double[] along = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                along[i] = axis.dot(n.worldline().atTime(t[i]).position());
            }
            out.add(new Trace(n.name(), n.isCraft(), t, along));
        }
        return out;
    }
}
