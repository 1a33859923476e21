package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.solvers.AllowedSolution;
import org.hipparchus.analysis.solvers.BracketingNthOrderBrentSolver;
import org.nullpath.lightcone.Horizon;
import org.nullpath.lightcone.LightCone;
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

    private Windows() {
    }

    /** The windows of one scanned range, in order. */
    public static List<WindowRow> scan(WindowScan w) {
        try {
            return scanRange(w);
        } catch (ArithmeticException e) {
            throw new RangeException("windows", "the scan on link " + w.link().name() + ": " + e.getMessage(), e);
        }
    }

    private static List<WindowRow> scanRange(WindowScan w) {
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
        double[][] values = new double[xs.length][];
        for (int i = 0; i < xs.length; i++) {
            values[i] = c.values(xs[i]);
        }
        List<double[]> edges = new ArrayList<>(); // {clock, condition index}
        for (int i = 0; i + 1 < xs.length; i++) {
            for (int k = 0; k < NAMES.length; k++) {
                boolean a = values[i][k] >= 0;
                boolean b = values[i + 1][k] >= 0;
                if (a != b) {
                    double edge = k == 0 ? lastClock : refine(c, k, xs[i], xs[i + 1], values[i][k]);
                    edges.add(new double[] {edge, k});
                }
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

    private static double refine(Conditions c, int k, double lo, double hi, double atLo) {
        DoubleUnaryOperator f = x -> {
            double v = c.values(x)[k];
            // beyond the horizon a condition has no value: count it as failing
            return Double.isNaN(v) ? -1.0 : v;
        };
        double scale = Math.max(Math.abs(lo), Math.abs(hi));
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(EDGE_RELATIVE_ACCURACY,
                EDGE_RELATIVE_ACCURACY * Math.max(scale, 1.0), 0.0, 5);
        return solver.solve(400, f::applyAsDouble, lo, hi, AllowedSolution.ANY_SIDE);
    }

    /** The four condition functions at a send clock: >= 0 where the condition holds. */
    private record Conditions(Link link, LinkTerms terms, double lastClock) {
        double[] values(double clock) {
            double[] v = new double[4];
            v[0] = lastClock - clock > 0 ? Math.min(lastClock - clock, 1.0) : -1.0;
            if (!(clock < lastClock)) {
                Arrays.fill(v, 1, 4, -1.0);
                return v;
            }
            LinkSchedule.Evaluated ev = LinkSchedule.evaluate(link, clock);
            if (ev.arrival().isEmpty()) {
                Arrays.fill(v, -1.0);
                return v;
            }
            Budget b = ev.arrival().get().budget().orElseThrow();
            v[1] = Double.isNaN(b.marginDb()) ? 1.0 : b.marginDb(); // at one place the link trivially closes
            v[2] = terms.hasTuningRange()
                    ? Math.min(b.rxFrequencyHz() - terms.tuningMinHz(), terms.tuningMaxHz() - b.rxFrequencyHz())
                    : 1.0;
            v[3] = terms.hasDopplerRateLimit() ? terms.maxDopplerRateHzPerS() - Math.abs(b.dopplerRateHzPerS()) : 1.0;
            return v;
        }
    }
}
