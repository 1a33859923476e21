package org.nullpath.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Station;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;
import org.nullpath.worldline.WorldlineException;

/**
 * Reads one craft (docs/scenario-format.md, "Craft") and its legs (each read by its entry of
 * {@link LegTable}) into a worldline.
 */
final class CraftReader {
    static final List<String> KEYS = List.of("start-position", "heading", "start-time", "start-clock", "start-speed",
            "legs");

    private CraftReader() {
    }

    /** The craft, or null when it has problems (all of them added). */
    static Craft read(String name, Node node, String path, Values values, Map<String, Station> stations,
                              java.nio.file.Path scenarioFile, List<java.nio.file.Path> alsoRead, boolean tablesAnywhere) {
        Problems problems = values.problems();
        Fields f = Fields.of(node, path, values, "a craft", KEYS);
        if (!f.ok()) {
            return null;
        }
        Vec3 start = f.position("start-position");
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
        List<LegEntry.Site> sites = new ArrayList<>();
        boolean legsOk = legs(f, values, legs, sites, new LegEntry.Context(values, stations, scenarioFile, alsoRead,
                tablesAnywhere));
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
                LegEntry.Site s = sites.get(i);
                problems.at(s.at(e.aboutEnd()), s.pathAt(e.aboutEnd()), e.getMessage());
            } else {
                problems.at(node, path, e.getMessage());
            }
        } catch (IllegalArgumentException | ArithmeticException e) {
            problems.at(node, path, "this craft cannot be flown: " + e.getMessage());
        }
        return null;
    }

    /** Reads the legs into {@code legs} and where each was written into {@code sites}; false when any has a problem. */
    private static boolean legs(Fields f, Values values, List<LegSpec> legs, List<LegEntry.Site> sites,
                                LegEntry.Context context) {
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
            LegEntry.Read read = LegTable.read(list.items().get(i), KeyPaths.item(path, i), context);
            if (read == null) {
                ok = false;
                continue;
            }
            LegEntry.Site site = read.site();
            if (read.spec().end().openEnded() && i != last) {
                values.problems().at(site.at(true), site.pathAt(true), "an open-ended leg (duration: forever) must be"
                        + " the last leg; " + (last - i) + " more leg" + (last - i == 1 ? " follows" : "s follow") + " it");
                ok = false;
                continue;
            }
            legs.add(read.spec());
            sites.add(site);
        }
        return ok;
    }
}
