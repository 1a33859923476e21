package org.nullpath.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Station;
import org.nullpath.scenario.YamlTree.Entry;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;
import org.nullpath.worldline.WorldlineException;

/** Reads one craft (contract.md, "Scenario file": {@code craft}) and its legs into a worldline. */
final class CraftReader {
    static final List<String> KEYS = List.of("start-position", "heading", "start-time", "start-clock", "start-speed",
            "legs");
    static final List<String> LEG_TYPES = List.of("burn", "coast", "rocket", "sail", "profile");
    static final List<String> ROCKET_KEYS = List.of("acceleration", "exhaust-speed", "mass-ratio", "thrust",
            "initial-mass", "burnout-mass");
    static final List<String> SAIL_KEYS = List.of("beam-from", "beam-power", "mass", "reflectivity", "beam-off");
    static final List<String> PROFILE_KEYS = List.of("file");
    static final List<String> BURN_KEYS = List.of("acceleration", "duration", "duration-mission", "until-speed",
            "until-distance");
    static final List<String> BURN_ENDS = List.of("duration", "duration-mission", "until-speed", "until-distance");
    static final List<String> COAST_KEYS = List.of("duration", "duration-mission", "until-distance");
    static final Map<String, String> COAST_SPECIALS = Map.of(
            "until-speed", "a coast keeps its speed, so until-speed cannot end it; use a burn",
            "acceleration", "a coast has no acceleration; use a burn for powered flight");

    /** Where a leg was written, so that a problem found while flying it can point back at the file. */
    record LegSite(Node leg, String legPath, Node end, String endPath) {
    }

    private CraftReader() {
    }

    /** The craft, or null when it has problems (all of them added). */
    static Craft read(String name, Node node, String path, Values values, Map<String, Station> stations,
                              java.nio.file.Path scenarioFile) {
        Problems problems = values.problems();
        Fields f = Fields.of(node, path, values, "a craft", KEYS);
        if (!f.ok()) {
            return null;
        }
        Vec3 start = f.vector("start-position", Dimension.LENGTH, Vec3.ZERO);
        Vec3 heading = null;
        if (f.require("heading", "the direction of the flight line, e.g. [1, 0, 0]")) {
            heading = values.vector(f.get("heading"), f.path("heading"), Dimension.DIMENSIONLESS);
            if (heading != null && heading.isZero()) {
                f.problemAt("heading", "the heading must not be zero; give the direction of flight, e.g. [1, 0, 0]");
                heading = null;
            }
            if (heading != null && !Double.isFinite(heading.norm())) {
                f.problemAt("heading", "the heading is too long to normalise; scale it down");
                heading = null;
            }
        }
        double startTime = f.quantity("start-time", Dimension.TIME, 0.0);
        double startClock = f.quantity("start-clock", Dimension.TIME, 0.0);
        double startSpeed = f.quantity("start-speed", Dimension.SPEED, 0.0);
        if (!(Math.abs(startSpeed) < Constants.C) && !Double.isNaN(startSpeed)) {
            f.problemAt("start-speed", "the speed must be below c in magnitude, got " + Values.format(startSpeed / Constants.C)
                    + " c");
            startSpeed = Double.NaN;
        }
        List<LegSpec> legs = new ArrayList<>();
        List<LegSite> sites = new ArrayList<>();
        boolean legsOk = legs(f, values, legs, sites, new Context(stations, scenarioFile));
        if (start == null || heading == null || Double.isNaN(startTime) || Double.isNaN(startClock)
                || Double.isNaN(startSpeed) || !legsOk) {
            return null;
        }
        try {
            StraightLineCraft craft = StraightLineCraft.of(start, heading, startTime, startClock, startSpeed, legs);
            return new Craft(name, craft, legs);
        } catch (WorldlineException e) {
            int i = e.legIndex();
            if (i >= 0 && i < sites.size()) {
                LegSite s = sites.get(i);
                Node at = s.end() != null ? s.end() : s.leg();
                problems.at(at, s.end() != null ? s.endPath() : s.legPath(), e.getMessage());
            } else {
                problems.at(node, path, e.getMessage());
            }
        } catch (IllegalArgumentException | ArithmeticException e) {
            problems.at(node, path, "this craft cannot be flown: " + e.getMessage());
        }
        return null;
    }

    /** Reads the legs into {@code legs}; false when any has a problem. */
    /** What profiled legs need from the rest of the scenario. */
    private record Context(Map<String, Station> stations, java.nio.file.Path scenarioFile) {
    }

    private static boolean legs(Fields f, Values values, List<LegSpec> legs, List<LegSite> sites, Context context) {
        Node n = f.get("legs");
        if (n == null || n instanceof Scalar s && s.type() == ScalarType.NULL) {
            return true;
        }
        String path = f.path("legs");
        if (!(n instanceof ListNode list)) {
            values.problems().at(n, path, "expected a list of legs such as [{burn: {acceleration: 1 g0, duration: 1 yr}}],"
                    + " got " + Values.describe(n));
            return false;
        }
        boolean ok = true;
        int last = list.items().size() - 1;
        for (int i = 0; i <= last; i++) {
            LegSite[] site = new LegSite[1];
            LegSpec leg = leg(list.items().get(i), KeyPaths.item(path, i), values, site, context);
            if (leg == null) {
                ok = false;
                continue;
            }
            if (leg.end() instanceof LegSpec.Forever && i != last) {
                values.problems().at(site[0].end(), site[0].endPath(), "an open-ended leg (duration: forever) must be"
                        + " the last leg; " + (last - i) + " more leg" + (last - i == 1 ? " follows" : "s follow") + " it");
                ok = false;
                continue;
            }
            legs.add(leg);
            sites.add(site[0]);
        }
        return ok;
    }

    /** One leg: a mapping with exactly one key, its type. Null when it has problems. */
    private static LegSpec leg(Node n, String path, Values values, LegSite[] site, Context context) {
        Problems problems = values.problems();
        if (!(n instanceof MapNode m)) {
            problems.at(n, path, "expected a leg such as {burn: {acceleration: 1 g0, duration: 1 yr}} or"
                    + " {coast: {duration: 2 yr}}, got " + Values.describe(n));
            return null;
        }
        if (m.entries().isEmpty()) {
            problems.at(n, path, "a leg needs a type: burn, coast, rocket, sail or profile");
            return null;
        }
        Entry type = null;
        boolean ok = true;
        for (Entry e : m.entries().values()) {
            String keyPath = KeyPaths.child(path, e.key());
            if (!LEG_TYPES.contains(e.key())) {
                String hint = Spelling.closest(e.key(), LEG_TYPES);
                problems.atKey(e, keyPath, "unknown leg type '" + e.key() + "'"
                        + (hint != null ? " (did you mean '" + hint + "'?)" : " (a leg is burn, coast, rocket, sail or profile)"));
                ok = false;
            } else if (type != null) {
                problems.atKey(e, keyPath, "a leg has one type, got both '" + type.key() + "' and '" + e.key()
                        + "'; write them as two legs");
                ok = false;
            } else {
                type = e;
            }
        }
        if (!ok || type == null) {
            return null;
        }
        String typePath = KeyPaths.child(path, type.key());
        switch (type.key()) {
            case "rocket" -> {
                return ProfiledLegReader.rocket(type.value(), typePath, values, site);
            }
            case "sail" -> {
                return ProfiledLegReader.sail(type.value(), typePath, values, site, context.stations());
            }
            case "profile" -> {
                return ProfiledLegReader.profile(type.value(), typePath, values, site, context.scenarioFile());
            }
            default -> {
            }
        }
        boolean burn = type.key().equals("burn");
        Fields f = burn
                ? Fields.of(type.value(), typePath, values, "a burn", BURN_KEYS)
                : Fields.of(type.value(), typePath, values, "a coast", COAST_KEYS, COAST_SPECIALS);
        if (!f.ok()) {
            return null;
        }
        double a = 0;
        if (burn) {
            a = f.quantity("acceleration", Dimension.ACCELERATION);
            if (a == 0) {
                f.problemAt("acceleration", "a burn needs a non-zero acceleration; use a coast leg for unpowered flight");
                a = Double.NaN;
            }
        }
        String endKey = f.oneOf(burn ? BURN_ENDS : COAST_KEYS, "the leg's end", false);
        LegSpec.LegEnd end = endKey == null ? null : end(f, endKey);
        if (Double.isNaN(a) || end == null) {
            return null;
        }
        site[0] = new LegSite(type.value(), typePath, f.get(endKey), f.path(endKey));
        return burn ? new LegSpec.Burn(a, end) : new LegSpec.Coast(end);
    }

    /** The leg end given by {@code key}; null on a problem. */
    private static LegSpec.LegEnd end(Fields f, String key) {
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
            default -> {
                double d = f.values().quantity(n, f.path(key), Dimension.LENGTH);
                return Double.isNaN(d) ? null : new LegSpec.UntilDistance(d);
            }
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
