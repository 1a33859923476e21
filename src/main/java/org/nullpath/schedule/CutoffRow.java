package org.nullpath.schedule;

/**
 * The latest send on a link whose message still arrives by a deadline (docs/output-files.md, cutoffs.csv).
 *
 * @param name              the cut-off's name
 * @param link              link name
 * @param arriveByClock     deadline on the receiver's clock, s
 * @param latestSendClock   sender's clock at the latest send, s (NaN when unreachable)
 * @param latestSendTime    mission time of the latest send, s (NaN when unreachable)
 * @param reachable         false when no send on the sender's worldline arrives by the deadline (with
 *                          worldlines defined for all times, as here, every deadline is reachable)
 * @param beforeStart       the latest send lies before mission time 0 (nullpath's own column)
 */
public record CutoffRow(String name, String link, double arriveByClock, double latestSendClock,
                        double latestSendTime, boolean reachable, boolean beforeStart) {
}
