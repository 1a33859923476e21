package org.nullpath.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.nullpath.scenario.Problem;
import org.nullpath.scenario.Scenario;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.LinkSchedule;
import org.nullpath.worldline.StraightLineCraft;

/** Loading and checking a scenario for the commands, with errors printed one per line. */
final class Inputs {
    private Inputs() {
    }

    /** Default cap on the messages one plan may compute. */
    static final long DEFAULT_MAX_MESSAGES = 50_000_000L;

    /** The latest clock a node's worldline can be asked about (a craft on an open-ended burn has one). */
    private static double maxClock(Scenario s, String node) {
        return s.nodes().get(node).worldline() instanceof StraightLineCraft c ? c.maxClock() : Double.POSITIVE_INFINITY;
    }

    /**
     * Sends, deadlines and scans on the clock of a craft beyond the reach of doubles (an open-ended burn
     * past rapidity 700) are refused before any computing, so that check and plan agree.
     */
    static List<Problem> rangeProblems(Path file, Scenario s) {
        List<Problem> out = new ArrayList<>();
        String f = file.toString();
        String why = " lies beyond the last clock reading double precision can hold for this craft (its open-ended"
                + " burn passes rapidity 700 at clock ";
        for (int i = 0; i < s.messages().size(); i++) {
            Scenario.MessagePlan m = s.messages().get(i);
            long n = m.count();
            if (n == 0) {
                continue;
            }
            double last = m instanceof Scenario.At at ? at.clocks().stream().mapToDouble(Double::doubleValue).max()
                    .orElse(0) : m.sendClock(n - 1);
            double limit = maxClock(s, s.links().get(m.link()).from());
            if (last > limit) {
                out.add(new Problem(f, 0, 0, "messages[" + i + "]", "the last send (" + last + " s)" + why + limit
                        + " s)"));
            }
        }
        for (int i = 0; i < s.cutoffs().size(); i++) {
            Scenario.Cutoff c = s.cutoffs().get(i);
            double limit = maxClock(s, s.links().get(c.link()).to());
            if (c.arriveBy() > limit) {
                out.add(new Problem(f, 0, 0, "cutoffs[" + i + "].arrive-by", "the deadline (" + c.arriveBy() + " s)"
                        + why + limit + " s)"));
            }
        }
        for (int i = 0; i < s.exchanges().size(); i++) {
            Scenario.Exchange e = s.exchanges().get(i);
            long n = e.count();
            double limit = maxClock(s, s.links().get(e.query()).from());
            if (n > 0 && e.first() + (n - 1) * e.every() > limit) {
                out.add(new Problem(f, 0, 0, "exchanges[" + i + "].last", "the last query" + why + limit + " s)"));
            }
        }
        for (int i = 0; i < s.windows().size(); i++) {
            Scenario.WindowScan w = s.windows().get(i);
            double limit = maxClock(s, s.links().get(w.link()).from());
            if (w.to() > limit) {
                out.add(new Problem(f, 0, 0, "windows[" + i + "].to", "the end of the scan (" + w.to() + " s)" + why
                        + limit + " s)"));
            }
        }
        return out;
    }

    /** Loads and validates; on problems prints them and returns null. */
    static Scenario load(Path file, long maxMessages, PrintWriter err) {
        Scenario s;
        try {
            s = ScenarioLoader.load(file);
        } catch (ScenarioException e) {
            for (Problem p : e.problems()) {
                err.println(p.render());
            }
            return null;
        }
        List<Problem> range = rangeProblems(file, s);
        if (!range.isEmpty()) {
            range.forEach(p -> err.println(p.render()));
            return null;
        }
        long planned = LinkSchedule.plannedMessages(s);
        if (planned > maxMessages) {
            err.println(new Problem(file.toString(), 0, 0, "messages", planned + " messages planned, more than the cap of "
                    + maxMessages + " per plan (raise it with --max-messages)").render());
            return null;
        }
        return s;
    }
}
