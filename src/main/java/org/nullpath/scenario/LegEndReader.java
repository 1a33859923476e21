package org.nullpath.scenario;

import java.util.List;

import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.worldline.LegSpec;

/**
 * Reads a leg's end condition (docs/scenario-format.md, "Legs"): {@code duration} (craft clock, or
 * {@code forever}), {@code duration-mission}, {@code until-speed}, {@code until-distance}. Every kind
 * of leg shares these readers; each kind says which of the keys it takes ({@link LegSpec#endKeys}).
 */
final class LegEndReader {
    private LegEndReader() {
    }

    /** The end key given among {@code keys}; null when none is (or on a clash, reported). */
    static String key(Fields f, List<String> keys, boolean required) {
        return f.oneOf(keys, "the leg's end", !required);
    }

    /** Whether any of {@code keys} is given. */
    static boolean any(Fields f, List<String> keys) {
        return keys.stream().anyMatch(f::has);
    }

    /** The leg end given by {@code key}; null on a problem. */
    static LegSpec.LegEnd read(Fields f, String key) {
        Node n = f.get(key);
        switch (key) {
            case "duration" -> {
                if (n instanceof Scalar s && s.type() == ScalarType.TEXT && s.text().trim().equals("forever")) {
                    return new LegSpec.Forever();
                }
                double d = f.values().quantity(n, f.path(key), Dimension.TIME);
                return nonNegative(f, key, d) ? new LegSpec.ClockDuration(d) : null;
            }
            case "duration-mission" -> {
                double d = f.values().quantity(n, f.path(key), Dimension.TIME);
                return nonNegative(f, key, d) ? new LegSpec.MissionDuration(d) : null;
            }
            case "until-speed" -> {
                double v = f.values().quantity(n, f.path(key), Dimension.SPEED);
                if (Double.isNaN(v)) {
                    return null;
                }
                if (!(Math.abs(v) < Constants.C)) {
                    f.problemAt(key, "the speed must be below c in magnitude, got " + Values.format(v / Constants.C) + " c");
                    return null;
                }
                return new LegSpec.UntilSpeed(v);
            }
            case "until-distance" -> {
                double d = f.values().quantity(n, f.path(key), Dimension.LENGTH);
                return Double.isNaN(d) ? null : new LegSpec.UntilDistance(d);
            }
            default -> throw new IllegalArgumentException("not an end key: " + key);
        }
    }

    private static boolean nonNegative(Fields f, String key, double d) {
        if (Double.isNaN(d)) {
            return false;
        }
        if (d < 0) {
            f.problemAt(key, "a leg's duration must not be negative, got " + Values.format(d) + " s");
            return false;
        }
        return true;
    }
}
