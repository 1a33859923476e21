package org.nullpath.mission;

import java.util.List;
import java.util.Objects;

import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;

/**
 * A craft flying legs along a straight line.
 *
 * @param name      its key in the scenario file
 * @param worldline its history, legs flown
 * @param legs      its legs as planned, in order
 */
public record Craft(String name, StraightLineCraft worldline, List<LegSpec> legs) implements Node {
    public Craft {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(worldline, "worldline");
        legs = List.copyOf(legs);
    }

    @Override
    public boolean isCraft() {
        return true;
    }
}
