package org.nullpath.schedule;

import java.util.List;
import java.util.PriorityQueue;

import org.nullpath.mission.MessagePlan;

/**
 * The send clocks of all message plans of one link, merged into one ascending stream without
 * holding them in memory (a k-way merge over the plans, each of which yields its clocks in ascending order).
 */
final class SendOrder {
    private static final class Cursor {
        private final MessagePlan plan;
        private final long count;
        private long next;

        Cursor(MessagePlan plan) {
            this.plan = plan;
            this.count = plan.count();
        }

        double peek() {
            return plan.sendClock(next);
        }
    }

    private final PriorityQueue<Cursor> queue;

    SendOrder(List<MessagePlan> plans) {
        queue = new PriorityQueue<>((x, y) -> Double.compare(x.peek(), y.peek()));
        for (MessagePlan p : plans) {
            Cursor c = new Cursor(p);
            if (c.count > 0) {
                queue.add(c);
            }
        }
    }

    boolean hasNext() {
        return !queue.isEmpty();
    }

    double next() {
        Cursor c = queue.poll();
        double v = c.peek();
        c.next++;
        if (c.next < c.count) {
            queue.add(c);
        }
        return v;
    }
}
