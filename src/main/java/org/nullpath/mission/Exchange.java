package org.nullpath.mission;

import java.util.Objects;

/**
 * Query/response round trips: queries sent on the querier's clock at {@code first + k every}, each answered
 * {@code turnaround} (responder's clock) after it arrives. The reply link goes back from the query's
 * receiver to its sender.
 *
 * @param name       its name (used in a file name)
 * @param query      the link the queries go on
 * @param reply      the link the replies come back on
 * @param turnaround responder-clock time between a query's arrival and its reply, s
 * @param first      first query's send clock, s
 * @param last       no query after this send clock, s
 * @param every      query spacing on the querier's clock, s
 */
public record Exchange(String name, Link query, Link reply, double turnaround, double first, double last,
                       double every) {
    public Exchange {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(query, "query");
        Objects.requireNonNull(reply, "reply");
    }

    /** Number of round trips. */
    public long count() {
        return MessagePlan.seriesCount(first, last, every);
    }

    /** The k-th query's send clock on the querier's clock, 0 <= k < count. */
    public double sendClock(long k) {
        return first + k * every;
    }
}
