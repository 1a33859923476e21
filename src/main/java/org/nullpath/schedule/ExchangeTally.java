package org.nullpath.schedule;

/**
 * What an exchange plan came to. Round-trip times are on the querier's own clock; NaN when none completes.
 *
 * @param name            the exchange's name
 * @param roundTrips      round trips planned
 * @param complete        round trips whose query and reply both arrive
 * @param minRoundTrip    shortest complete round trip, s
 * @param medianRoundTrip median of the complete round trips, s (the mean of the middle two for an even count)
 * @param maxRoundTrip    longest complete round trip, s
 */
public record ExchangeTally(String name, long roundTrips, long complete, double minRoundTrip, double medianRoundTrip,
                            double maxRoundTrip) {
}
