package org.nullpath.schedule;

/**
 * What an exchange plan came to.
 *
 * @param name       the exchange's name
 * @param roundTrips round trips planned
 * @param complete   round trips whose query and reply both arrive
 */
public record ExchangeTally(String name, long roundTrips, long complete) {
}
