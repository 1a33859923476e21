package org.nullpath.schedule;

/**
 * The latest send on a link whose message still arrives by a deadline (contract.md, cutoffs.csv).
 *
 * @param name              the cut-off's name
 * @param link              link name
 * @param arriveByClock     deadline on the receiver's clock, s
 * @param latestSendClock   sender's clock at the latest send, s (NaN when unreachable)
 * @param latestSendTime    mission time of the latest send, s (NaN when unreachable)
 * @param reachable         false when no send at or after mission time 0 arrives by the deadline
 */
public record CutoffRow(String name, String link, double arriveByClock, double latestSendClock,
                        double latestSendTime, boolean reachable) {
}
