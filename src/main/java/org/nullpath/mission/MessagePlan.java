package org.nullpath.mission;

import java.util.List;
import java.util.Objects;

/**
 * A plan of messages on one link, send times on the sender's clock. Every plan yields its send clocks
 * in ascending order, so plans of one link merge into one stream in send order.
 */
public sealed interface MessagePlan permits MessagePlan.Series, MessagePlan.At {
    /** The link the messages go on. */
    Link link();

    /** Number of messages in the plan. */
    long count();

    /** The k-th send clock in ascending order, 0 <= k < count. */
    double sendClock(long k);

    /** {@code first + k * every} while {@code <= last + 1e-9 every}. */
    record Series(Link link, double first, double last, double every) implements MessagePlan {
        public Series {
            Objects.requireNonNull(link, "link");
        }

        @Override
        public long count() {
            return seriesCount(first, last, every);
        }

        @Override
        public double sendClock(long k) {
            return first + k * every;
        }
    }

    /** Explicit send clocks, held in ascending order. */
    record At(Link link, List<Double> clocks) implements MessagePlan {
        public At {
            Objects.requireNonNull(link, "link");
            clocks = clocks.stream().sorted().toList();
        }

        @Override
        public long count() {
            return clocks.size();
        }

        @Override
        public double sendClock(long k) {
            return clocks.get((int) k);
        }
    }

    /** The number of terms of {@code first + k every <= last + 1e-9 every}; 0 when last < first. */
    static long seriesCount(double first, double last, double every) {
        double n = Math.floor((last - first) / every + 1e-9);
        if (n < 0) {
            return 0;
        }
        return (long) Math.min(n, 9.0e18) + 1;
    }
}
