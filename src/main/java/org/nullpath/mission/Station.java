package org.nullpath.mission;

import java.util.Objects;

import org.nullpath.worldline.InertialWorldline;

/**
 * An inertial node: at rest or in uniform motion, its clock its proper time plus an offset.
 *
 * @param name      its key in the scenario file
 * @param worldline its history
 */
public record Station(String name, InertialWorldline worldline) implements Node {
    public Station {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(worldline, "worldline");
    }

    @Override
    public boolean isCraft() {
        return false;
    }
}
