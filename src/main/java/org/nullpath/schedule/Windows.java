package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nullpath.lightcone.Horizon;
import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.link.Budget;
import org.nullpath.link.LinkTerms;
import org.nullpath.mission.Link;
import org.nullpath.mission.WindowScan;
import org.nullpath.worldline.Worldline;

/**
 * Link windows: the send-clock intervals of a scanned range in which a message would be received.
 *
 * <p>Four conditions must hold: the message arrives (before the horizon), margin >= 0, the received
 * frequency is inside the tuning range, and |Doppler rate| is within the receiver's limit. Each is a
 * continuous function of the send clock that is >= 0 where it holds. The range is first sampled at
 * {@value #SAMPLES} evenly spaced send clocks to bracket sign changes (a condition that flips twice
 * between two samples, closer together than 1/{@value #SAMPLES} of the range, can be missed); each
 * bracketed edge is then found by Brent's method (Hipparchus) to a relative accuracy of
 * {@value #EDGE_RELATIVE_ACCURACY} in the send clock, and the horizon edge is exact. Approaching a
 * horizon the margin always collapses (D -> 0, the distance -> infinity); when it does so only within
 * {@value #HORIZON_SNAP} (relative) of the horizon, the window is reported as closed by the horizon.
 *
 * <p>{@link #survey} also gives each window's open time on both clocks and its volumes (the planned rate
 * times the send-side time; the highest closing rate integrated by {@link Quadrature} to
 * {@value #VOLUME_RELATIVE_ACCURACY} estimated, 1e-6 promised), and every limit's own crossings, from the same
 * samples and the same solve: the tuning condition split into its low and high edges. All of it is per
 * scanned range and per window, never per message.
 */
public final class Windows {
    /** Evenly spaced samples used to bracket edges. */
    public static final int SAMPLES = 2048;
    /** Relative accuracy of each edge in the send clock. */
    public static final double EDGE_RELATIVE_ACCURACY = 1e-12;

    /**
     * A window whose other conditions fail only within this relative distance of the horizon is
     * reported as closed by the horizon (the 1e-9 edge tolerance of docs/output-files.md).
     */
    public static final double HORIZON_SNAP = 1e-9;

    private static final String[] NAMES = {"horizon", "margin", "tuning", "doppler-rate"};

    /** The limits whose own crossings are listed, by index into {@link Conditions#limits(double)}. */
    private static final String[] LIMITS = {"horizon", "margin", "tuning-low", "tuning-high", "doppler-rate"};

    /**
     * Relative accuracy asked of the adaptive volume (estimated error, {@link Quadrature}), a tenth of the
     * 1e-6 that docs/output-files.md promises for adaptive_volume_bits.
     */
    public static final double VOLUME_RELATIVE_ACCURACY = 1e-7;

    private Windows() {
    }

    /** The windows of one scanned range, in order. */
    public static List<WindowRow> scan(WindowScan w) {
        try {
            return scanRange(w, null);
        } catch (ArithmeticException e) {
            throw new RangeException("windows", "the scan on link " + w.link().name() + ": " + e.getMessage(), e);
        }
    }

    /**
     * The windows of one scanned range with their open durations and volumes, and every limit's own
     * crossings in the range in send order (ties in the order margin, tuning-low, tuning-high, doppler-rate,
     * horizon). A limit the link does not have gives no crossings; a limit that fails only where the signal
     * no longer arrives (at the horizon) gives none either: the horizon's row stands for it.
     */
    public static WindowSurvey survey(WindowScan w) {
        try {
            List<CrossingRow> crossings = new ArrayList<>();
            List<WindowRow> rows = scanRange(w, crossings);
            List<WindowFigures> figures = new ArrayList<>();
            for (WindowRow r : rows) {
                figures.add(figures(w.link(), r));
            }
            return new WindowSurvey(figures, crossings);
        } catch (ArithmeticException e) {
            throw new RangeException("windows", "the scan on link " + w.link().name() + ": " + e.getMessage(), e);
        }
    }

    /** A window's durations and volumes: per window, a few dozen evaluations (never per message). */
    private static WindowFigures figures(Link link, WindowRow r) {
        LinkTerms terms = link.terms().orElseThrow();
        // an offset formed from the two edges themselves; both carry the 1e-12 of the edge solve
        double sendOpen = r.closesClock() - r.opensClock();
        LinkSchedule.Evaluated opens = LinkSchedule.evaluate(link, r.opensClock());
        LinkSchedule.Evaluated closes = LinkSchedule.evaluate(link, r.closesClock());
        SignalPath first = opens.path();
        SignalPath last = closes.path();
        double receiveOpen = first.delivered() && last.delivered()
                ? LinkSchedule.arrivalInterval(link.sender(), link.receiver(), first, last)
                : Double.NaN;
        double volume = terms.dataRateBps() * sendOpen;
        // where an edge's message arrives with no finite highest rate (sender and receiver at one place, the
        // far-field rate growing as 1 / distance^2) the integral diverges: no value rather than noise
        boolean bounded = (!first.delivered() || Double.isFinite(maxDataRate(opens)))
                && (!last.delivered() || Double.isFinite(maxDataRate(closes)));
        double adaptive = bounded
                ? Quadrature.integrate(clock -> maxDataRate(link, clock), r.opensClock(), r.closesClock(),
                        VOLUME_RELATIVE_ACCURACY)
                : Double.NaN;
        return new WindowFigures(r, sendOpen, receiveOpen, volume, adaptive);
    }

    private static double maxDataRate(Link link, double clock) {
        return maxDataRate(LinkSchedule.evaluate(link, clock));
    }

    private static double maxDataRate(LinkSchedule.Evaluated ev) {
        return ev.arrival().flatMap(LinkSchedule.Arrival::budget).map(b -> b.reception().maxDataRateBps())
                .orElse(Double.NaN);
    }

    private static List<WindowRow> scanRange(WindowScan w, List<CrossingRow> crossings) {
        Link link = w.link();
        LinkTerms terms = link.terms().orElseThrow(() -> new IllegalArgumentException(
                "window on link " + link.name() + " needs link terms"));
        Worldline sender = link.sender();
        Worldline receiver = link.receiver();
        Horizon horizon = LightCone.horizon(sender, receiver);
        double lastClock = horizon.exists() ? horizon.lastSend().clock() : Double.POSITIVE_INFINITY;
        Conditions c = new Conditions(link, terms, lastClock);

        double from = w.from();
        double to = w.to();
        List<Double> grid = new ArrayList<>();
        for (int i = 0; i <= SAMPLES; i++) {
            grid.add(from + (to - from) * i / SAMPLES);
        }
        if (lastClock > from && lastClock < to) {
            // sample just before the horizon too, so edges of the other conditions near it are bracketed
            grid.add(lastClock - 1e-9 * Math.max(Math.abs(lastClock), lastClock - from));
            grid.add(lastClock);
        }
        double[] xs = grid.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
        double[][] limits = new double[xs.length][];
        double[][] values = new double[xs.length][];
        for (int i = 0; i < xs.length; i++) {
            limits[i] = c.limits(xs[i]);
            values[i] = Conditions.window(limits[i]);
        }
        List<double[]> edges = new ArrayList<>(); // {clock, condition index}
        List<double[]> found = new ArrayList<>(); // {clock, limit index, +1 enters / -1 leaves}
        for (int i = 0; i + 1 < xs.length; i++) {
            double[] roots = new double[NAMES.length];
            for (int k = 0; k < NAMES.length; k++) {
                boolean a = values[i][k] >= 0;
                boolean b = values[i + 1][k] >= 0;
                roots[k] = Double.NaN;
                if (a != b) {
                    int condition = k;
                    double edge = k == 0 ? lastClock : refine(x -> c.window(x)[condition], xs[i], xs[i + 1]);
                    roots[k] = edge;
                    edges.add(new double[] {edge, k});
                }
            }
            if (crossings != null) {
                crossings(c, xs[i], xs[i + 1], limits[i], limits[i + 1], roots, found);
            }
        }
        if (crossings != null) {
            if (horizon.exists() && lastClock > from && lastClock <= to) {
                found.add(new double[] {lastClock, 0, -1});
            }
            // stable: ties keep the order margin, tuning-low, tuning-high, doppler-rate, horizon
            found.sort((p, q) -> Double.compare(p[0], q[0]));
            for (double[] f : found) {
                crossings.add(crossing(link, LIMITS[(int) f[1]], f[2] > 0 ? "enters" : "leaves", f[0]));
            }
        }
        edges.sort((p, q) -> Double.compare(p[0], q[0]));
        boolean[] ok = new boolean[NAMES.length];
        for (int k = 0; k < NAMES.length; k++) {
            ok[k] = values[0][k] >= 0;
        }
        List<WindowRow> rows = new ArrayList<>();
        boolean open = all(ok);
        double opened = from;
        for (double[] e : edges) {
            int k = (int) e[1];
            ok[k] = !ok[k];
            boolean now = all(ok);
            if (open && !now) {
                if (horizon.exists() && Math.abs(lastClock - e[0]) <= HORIZON_SNAP * Math.abs(lastClock)) {
                    // the margin collapses (as D -> 0 and R -> infinity) only within the edge tolerance of
                    // the horizon itself: to that tolerance the horizon closed the window
                    rows.add(new WindowRow(link.name(), opened, lastClock, NAMES[0]));
                } else {
                    rows.add(new WindowRow(link.name(), opened, e[0], NAMES[k]));
                }
            } else if (!open && now) {
                opened = e[0];
            }
            open = now;
        }
        if (open) {
            rows.add(new WindowRow(link.name(), opened, to, "end"));
        }
        return rows;
    }

    private static boolean all(boolean[] ok) {
        for (boolean b : ok) {
            if (!b) {
                return false;
            }
        }
        return true;
    }

    /**
     * The crossings of limits 1 to 4 between two samples at which each has a value: the margin's and the
     * Doppler rate's are the window edges already found on the same bracket (the same function), the
     * tuning edges' each solved on its own.
     */
    private static void crossings(Conditions c, double lo, double hi, double[] atLo, double[] atHi, double[] roots,
                                  List<double[]> found) {
        for (int m = 1; m < LIMITS.length; m++) {
            if (!c.has(m) || Double.isNaN(atLo[m]) || Double.isNaN(atHi[m]) || (atLo[m] >= 0) == (atHi[m] >= 0)) {
                continue;
            }
            int limit = m;
            double root = switch (m) {
                case 1 -> Double.isNaN(roots[1]) ? refine(x -> c.limits(x)[limit], lo, hi) : roots[1];
                case 4 -> Double.isNaN(roots[3]) ? refine(x -> c.limits(x)[limit], lo, hi) : roots[3];
                default -> refine(x -> c.limits(x)[limit], lo, hi);
            };
            found.add(new double[] {root, m, atHi[m] >= 0 ? 1 : -1});
        }
    }

    private static CrossingRow crossing(Link link, String limit, String direction, double clock) {
        SignalPath p = LinkSchedule.evaluate(link, clock).path();
        return new CrossingRow(link.name(), limit, direction, clock, p.send().timeSeconds(),
                p.delivered() ? p.receive().clock() : Double.NaN);
    }

    private static double refine(DoubleUnaryOperator value, double lo, double hi) {
        DoubleUnaryOperator f = x -> {
            double v = value.applyAsDouble(x);
            // beyond the horizon a condition has no value: count it as failing
            return Double.isNaN(v) ? -1.0 : v;
        };
        double scale = Math.max(Math.abs(lo), Math.abs(hi));
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(EDGE_RELATIVE_ACCURACY,
                EDGE_RELATIVE_ACCURACY * Math.max(scale, 1.0), 0.0, 5);
        return solver.solve(400, f::applyAsDouble, lo, hi, AllowedSolution.ANY_SIDE);
    }

    /** The condition functions at a send clock: >= 0 where the condition holds. */
    private record Conditions(Link link, LinkTerms terms, double lastClock) {
        /**
         * The five limits at a send clock: horizon, margin, tuning-low (f_rx - f_low), tuning-high
         * (f_high - f_rx), Doppler rate (limit - |rate|); 1 for a limit the link does not have, NaN where the
         * signal does not arrive (the horizon's own value is then -1).
         */
        double[] limits(double clock) {
            double[] v = new double[5];
            v[0] = lastClock - clock > 0 ? Math.min(lastClock - clock, 1.0) : -1.0;
            if (!(clock < lastClock)) {
                Arrays.fill(v, 1, 5, Double.NaN);
                return v;
            }
            LinkSchedule.Evaluated ev = LinkSchedule.evaluate(link, clock);
            if (ev.arrival().isEmpty()) {
                v[0] = -1.0;
                Arrays.fill(v, 1, 5, Double.NaN);
                return v;
            }
            Budget b = ev.arrival().get().budget().orElseThrow();
            double margin = b.reception().marginDb();
            Budget.FrequencyPlan f = b.frequency();
            v[1] = Double.isNaN(margin) ? 1.0 : margin; // at one place the link trivially closes
            v[2] = terms.hasTuningRange() ? f.rxFrequencyHz() - terms.tuningMinHz() : 1.0;
            v[3] = terms.hasTuningRange() ? terms.tuningMaxHz() - f.rxFrequencyHz() : 1.0;
            v[4] = terms.hasDopplerRateLimit() ? terms.maxDopplerRateHzPerS() - Math.abs(f.dopplerRateHzPerS()) : 1.0;
            return v;
        }

        /** Whether the link has limit m (the margin and horizon always; the others when given). */
        boolean has(int m) {
            return switch (m) {
                case 2, 3 -> terms.hasTuningRange();
                case 4 -> terms.hasDopplerRateLimit();
                default -> true;
            };
        }

        /** The four window conditions at a send clock: horizon, margin, tuning, Doppler rate. */
        double[] window(double clock) {
            return window(limits(clock));
        }

        /** The window conditions from the limits: both tuning edges at once; -1 where there is no value. */
        static double[] window(double[] l) {
            double[] v = {l[0], l[1], Math.min(l[2], l[3]), l[4]};
            for (int k = 1; k < v.length; k++) {
                if (Double.isNaN(v[k])) {
                    v[k] = -1.0;
                }
            }
            return v;
        }
    }
}
