package org.nullpath.schedule;

import java.util.ArrayList;
import java.util.List;
import java.util.PriorityQueue;

import org.nullpath.scenario.Scenario;

/**
 * The send clocks of all message plans of one link, merged into one ascending stream without
 * holding them in memory (a k-way merge over the plans, each of which is sorted). An explicit
 * {@code at} list is sorted once (its size is bounded by the file).
 */
final class SendOrder {
    private record Cursor(double[] sorted, Scenario.Series series, long count, long[] next) {
        double peek() {
            return sorted != null ? sorted[(int) next[0]] : series.sendClock(next[0]);
        }
    }

    private final PriorityQueue<Cursor> queue;

    SendOrder(List<Scenario.MessagePlan> plans) {
        queue = new PriorityQueue<>((x, y) -> Double.compare(x.peek(), y.peek()));
        for (Scenario.MessagePlan p : plans) {
            Cursor c;
            if (p instanceof Scenario.At at) {
                double[] s = at.clocks().stream().mapToDouble(Double::doubleValue).sorted().toArray();
                c = new Cursor(s, null, s.length, new long[] {0});
            } else {
                Scenario.Series series = (Scenario.Series) p;
                c = new Cursor(null, series, series.count(), new long[] {0});
            }
            if (c.count() > 0) {
                queue.add(c);
            }
        }
    }

    static List<Scenario.MessagePlan> plansOf(Scenario s, String link) {
        List<Scenario.MessagePlan> out = new ArrayList<>();
        for (Scenario.MessagePlan p : s.messages()) {
            if (p.link().equals(link)) {
                out.add(p);
            }
        }
        return out;
    }

    boolean hasNext() {
        return !queue.isEmpty();
    }

    double next() {
        Cursor c = queue.poll();
        double v = c.peek();
        c.next()[0]++;
        if (c.next()[0] < c.count()) {
            queue.add(c);
        }
        return v;
    }
}
