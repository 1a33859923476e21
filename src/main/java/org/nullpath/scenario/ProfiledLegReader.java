package org.nullpath.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nullpath.mission.Station;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegKind;
import org.nullpath.worldline.LegSpec;

/**
 * Reads the profiled legs (docs/scenario-format.md, "Legs"): {@code rocket} (constant proper
 * acceleration with exhaust speed and mass ratio, or constant thrust with initial and burnout mass),
 * {@code sail} (pushed by a beam from a station) and {@code profile} (a CSV table of acceleration, read by {@link ProfileTable}).
 * Each ends by its own physics unless an end key ({@link LegKind#LIMITED_END_KEYS}) ends it earlier.
 */
final class ProfiledLegReader {
    static final List<String> ROCKET_KEYS = ConstantLegReader.keys(List.of("acceleration", "exhaust-speed",
            "mass-ratio", "thrust", "initial-mass", "burnout-mass"), LegKind.ROCKET.endKeys());
    static final List<String> SAIL_KEYS = ConstantLegReader.keys(List.of("beam-from", "beam-power", "mass",
            "reflectivity", "beam-off"), LegKind.SAIL.endKeys());
    static final List<String> PROFILE_KEYS = ConstantLegReader.keys(List.of("file"), LegKind.PROFILE.endKeys());

    private ProfiledLegReader() {
    }

    /** An end condition given among the limited end keys, if any. */
    private record End(boolean ok, LegSpec.LegEnd end, Node node, String path) {
    }

    /** The end written (ok with a null end when none is: the leg ends by its own physics); not ok on a problem. */
    private static End end(Fields f) {
        List<String> keys = LegKind.LIMITED_END_KEYS;
        String key = LegEndReader.key(f, keys, false);
        if (key == null) {
            return new End(!LegEndReader.any(f, keys), null, null, null);
        }
        LegSpec.LegEnd end = LegEndReader.read(f, key);
        return new End(end != null, end, f.get(key), f.path(key));
    }

    static LegEntry.Read rocket(Node n, String path, LegEntry.Context context) {
        Fields f = Fields.of(n, path, context.values(), "a rocket leg", ROCKET_KEYS);
        if (!f.ok()) {
            return null;
        }
        boolean thrust = f.has("thrust");
        if (thrust && f.has("acceleration")) {
            f.problemAt("thrust", "a rocket leg holds either a constant acceleration (with mass-ratio) or a constant"
                    + " thrust (with initial-mass and burnout-mass), not both");
            return null;
        }
        double ve = f.quantity("exhaust-speed", Dimension.SPEED);
        if (!Double.isNaN(ve) && !(ve > 0 && ve <= Constants.C)) {
            f.problemAt("exhaust-speed", "the exhaust speed must be above 0 and at most c, got "
                    + Values.format(ve / Constants.C) + " c");
            ve = Double.NaN;
        }
        if (thrust) {
            if (refused(f, List.of("acceleration", "mass-ratio"), "belongs to a constant-acceleration rocket; a"
                    + " constant-thrust rocket takes thrust, initial-mass, burnout-mass and exhaust-speed")) {
                return null;
            }
            double force = f.quantity("thrust", Dimension.FORCE);
            double m0 = f.quantity("initial-mass", Dimension.MASS);
            double m1 = f.quantity("burnout-mass", Dimension.MASS);
            if (force == 0) {
                f.problemAt("thrust", "the thrust must not be zero; use a coast leg for unpowered flight");
                return null;
            }
            if (!Double.isNaN(m1) && !(m1 > 0)) {
                f.problemAt("burnout-mass", "the burnout mass must be positive, got " + Values.format(m1) + " kg");
                return null;
            }
            if (!Double.isNaN(m0) && !Double.isNaN(m1) && !(m1 < m0)) {
                f.problemAt("burnout-mass", "the burnout mass (" + Values.format(m1) + " kg) must be below the initial"
                        + " mass (" + Values.format(m0) + " kg)");
                return null;
            }
            End end = end(f);
            if (Double.isNaN(force) || Double.isNaN(m0) || Double.isNaN(m1) || Double.isNaN(ve) || !end.ok()) {
                return null;
            }
            return read(end.end() == null ? new LegSpec.ThrustRocket(force, m0, m1, ve)
                    : new LegSpec.ThrustRocket(force, m0, m1, ve, end.end()), n, path, null, null, end);
        }
        if (refused(f, List.of("initial-mass", "burnout-mass"), "belongs to a constant-thrust rocket (with thrust);"
                + " a constant-acceleration rocket takes acceleration, exhaust-speed and mass-ratio")) {
            return null;
        }
        double a = f.quantity("acceleration", Dimension.ACCELERATION);
        double ratio = f.number("mass-ratio");
        if (a == 0) {
            f.problemAt("acceleration", "a rocket needs a non-zero acceleration");
            return null;
        }
        if (!Double.isNaN(ratio) && !(ratio > 1)) {
            f.problemAt("mass-ratio", "the mass ratio (initial over final mass) must be greater than 1, got "
                    + Values.format(ratio));
            return null;
        }
        End end = end(f);
        if (Double.isNaN(a) || Double.isNaN(ratio) || Double.isNaN(ve) || !end.ok()) {
            return null;
        }
        return read(end.end() == null ? new LegSpec.Rocket(a, ve, ratio) : new LegSpec.Rocket(a, ve, ratio, end.end()),
                n, path, null, null, end);
    }

    private static LegEntry.Read read(LegSpec spec, Node n, String path, Node own, String ownPath, End end) {
        return new LegEntry.Read(spec, new LegEntry.Site(n, path, own, ownPath, end.node(), end.path()));
    }

    /** True, with a problem at the first of {@code keys} that is given, when any is: "'key' " + why. */
    private static boolean refused(Fields f, List<String> keys, String why) {
        for (String k : keys) {
            if (f.has(k)) {
                f.problemAt(k, "'" + k + "' " + why);
                return true;
            }
        }
        return false;
    }

    static LegEntry.Read sail(Node n, String path, LegEntry.Context context) {
        Fields f = Fields.of(n, path, context.values(), "a sail leg", SAIL_KEYS);
        if (!f.ok()) {
            return null;
        }
        Map<String, Station> stations = context.stations();
        String from = f.text("beam-from", "the name of the station that beams");
        InertialWorldline station = null;
        if (from != null) {
            Station node = stations.get(from);
            if (node == null) {
                List<String> names = new ArrayList<>(stations.keySet());
                String hint = Spelling.closest(from, names);
                f.problemAt("beam-from", "'" + from + "' is not a station of this scenario"
                        + (hint != null ? " (did you mean '" + hint + "'?)" : ""));
            } else {
                station = node.worldline();
            }
        }
        double power = f.quantity("beam-power", Dimension.POWER);
        double mass = f.quantity("mass", Dimension.MASS);
        double reflectivity = f.number("reflectivity", 1.0);
        double off = f.quantity("beam-off", Dimension.TIME);
        if (!Double.isNaN(power) && !(power > 0)) {
            f.problemAt("beam-power", "the beam power must be positive");
            return null;
        }
        if (!Double.isNaN(mass) && !(mass > 0)) {
            f.problemAt("mass", "the sail's mass must be positive");
            return null;
        }
        if (!Double.isNaN(reflectivity) && !(reflectivity >= 0 && reflectivity <= 1)) {
            f.problemAt("reflectivity", "the reflectivity must lie between 0 (absorbing) and 1 (a perfect mirror), got "
                    + Values.format(reflectivity));
            return null;
        }
        End end = end(f);
        if (station == null || Double.isNaN(power) || Double.isNaN(mass) || Double.isNaN(reflectivity)
                || Double.isNaN(off) || !end.ok()) {
            return null;
        }
        return read(end.end() == null ? new LegSpec.Sail(station, power, mass, reflectivity, off)
                : new LegSpec.Sail(station, power, mass, reflectivity, off, end.end()),
                n, path, f.get("beam-from"), f.path("beam-from"), end);
    }

    static LegEntry.Read profile(Node n, String path, LegEntry.Context context) {
        Fields f = Fields.of(n, path, context.values(), "a profile leg", PROFILE_KEYS);
        if (!f.ok()) {
            return null;
        }
        Path scenarioFile = context.scenarioFile();
        End end = end(f);
        String name = f.text("file", "the path of a CSV table of clock_s and acceleration_m_s2");
        if (name == null) {
            return null;
        }
        ProfileTable.Read table = ProfileTable.read(name, scenarioFile, context.tablesAnywhere());
        if (table.problem() != null) {
            f.problemAt("file", table.problem());
            return null;
        }
        context.alsoRead().add(table.file());
        double[] clocks = table.clocks();
        double[] accelerations = table.accelerations();
        if (!end.ok()) {
            return null;
        }
        return read(end.end() == null ? new LegSpec.Profile(clocks, accelerations)
                : new LegSpec.Profile(clocks, accelerations, end.end()), n, path, f.get("file"), f.path("file"), end);
    }
}
