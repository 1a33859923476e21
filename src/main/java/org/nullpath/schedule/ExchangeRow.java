package org.nullpath.schedule;

/**
 * One query/response round trip (docs/output-files.md, exchanges-NAME.csv). Values that do not exist are NaN.
 *
 * @param exchange            1, 2, ... within the exchange plan
 * @param querySendClock      querier's clock when the query leaves, s
 * @param queryReceiveClock   responder's clock when it arrives, s
 * @param replySendClock      responder's clock when the reply leaves (arrival + turnaround), s
 * @param replyReceiveClock   querier's clock when the reply arrives, s
 * @param roundTripClock      replyReceiveClock - querySendClock on the querier's own clock, s
 * @param complete            false when the query or the reply never arrives
 */
public record ExchangeRow(long exchange, double querySendClock, double queryReceiveClock, double replySendClock,
                          double replyReceiveClock, double roundTripClock, boolean complete) {
}
