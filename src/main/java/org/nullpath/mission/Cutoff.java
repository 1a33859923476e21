package org.nullpath.mission;

import java.util.Objects;

/**
 * A deadline: the latest send on {@code link} whose message arrives by receiver clock {@code arriveBy}.
 *
 * @param name     its name in the scenario file
 * @param link     the link the command goes on
 * @param arriveBy the deadline on the receiver's clock, s
 */
public record Cutoff(String name, Link link, double arriveBy) {
    public Cutoff {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(link, "link");
    }
}
