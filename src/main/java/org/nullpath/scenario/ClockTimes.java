package org.nullpath.scenario;

import java.time.DateTimeException;
import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;

import org.nullpath.mission.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.units.Dimension;
import org.nullpath.units.Units;

/**
 * Readings of a node's clock as a scenario writes them: a time ({@code 30 d}), or, when the scenario has an
 * {@code epoch}, a calendar instant ({@code 2063-06-01T00:00:00Z}), read as what that node's clock shows at
 * the mission time of that instant (mission time 0 is the epoch).
 */
final class ClockTimes {
    /** Text that is meant as a calendar instant: a date with a time. */
    private static final Pattern INSTANT = Pattern.compile("\\s*[+-]?\\d{4,}-\\d{2}-\\d{2}T.*");

    private final Values values;
    private final Optional<Instant> epoch;
    private final References refs;

    ClockTimes(Values values, Optional<Instant> epoch, References refs) {
        this.values = values;
        this.epoch = epoch;
        this.refs = refs;
    }

    /** A required reading of {@code node}'s clock at {@code key}; NaN when absent or wrong (problem added). */
    double at(Fields f, String key, String node) {
        if (!f.require(key)) {
            return Double.NaN;
        }
        return reading(f.get(key), f.path(key), node);
    }

    /** A list of readings of {@code node}'s clock; null when not a list or any is wrong (every problem added). */
    List<Double> list(Fields f, String key, String node, String what) {
        return values.list(f.get(key), f.path(key), Dimension.TIME, what, (item, path) -> reading(item, path, node));
    }

    private double reading(YamlTree.Node n, String path, String nodeName) {
        if (!(n instanceof Scalar s) || s.type() != ScalarType.TEXT || !INSTANT.matcher(s.text()).matches()) {
            return values.quantity(n, path, Dimension.TIME);
        }
        if (epoch.isEmpty()) {
            values.problems().at(n, path, "'" + s.text().trim() + "' is a calendar instant, which needs an 'epoch' at the"
                    + " top of the scenario (the instant of mission time 0); or give a time such as "
                    + Units.example(Dimension.TIME));
            return Double.NaN;
        }
        Instant instant;
        try {
            instant = Instant.parse(s.text().trim());
        } catch (DateTimeException e) {
            values.problems().at(n, path, "expected a time such as " + Units.example(Dimension.TIME) + " or an ISO-8601"
                    + " instant such as 2063-06-01T00:00:00Z, got '" + s.text().trim() + "'");
            return Double.NaN;
        }
        Node node = nodeName == null ? null : refs.node(nodeName);
        if (node == null) {
            return Double.NaN; // the node itself has problems, reported where it is written
        }
        Duration d = Duration.between(epoch.get(), instant);
        double missionTime = d.getSeconds() + d.getNano() * 1e-9;
        try {
            double clock = node.worldline().atTime(missionTime).clock();
            if (Double.isFinite(clock)) {
                return clock;
            }
        } catch (ArithmeticException e) {
            // beyond what doubles hold for this node: said below
        }
        values.problems().at(n, path, "at " + instant + " (" + Values.format(missionTime) + " s of mission time) "
                + nodeName + "'s clock lies beyond what double precision can hold");
        return Double.NaN;
    }
}
