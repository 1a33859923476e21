package org.nullpath.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

import org.nullpath.mission.Sweep;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.units.Dimension;
import org.nullpath.units.UnitException;
import org.nullpath.units.Units;

/**
 * Reads a sweep file (docs/sweeps.md) and the scenario it names: every problem at the sweep file's line,
 * column and key, before anything is computed. A varied key must name a single value written in the
 * scenario, and the sweep's values must be of that value's dimension.
 */
public final class SweepReader {
    /** Most points one sweep may hold. */
    public static final long MAX_POINTS = 10_000_000L;

    private static final List<String> TOP = List.of("scenario", "vary", "draws", "seed", "random");
    private static final List<String> GRID = List.of("key", "from", "to", "steps", "values");
    private static final List<String> RANDOM = List.of("key", "normal", "uniform");

    private SweepReader() {
    }

    /** A sweep and the scenario document its points vary. */
    public record Loaded(Sweep sweep, ScenarioDocument scenario, Path sweepFile) {
    }

    /**
     * Reads {@code file} and the scenario it names (relative to the sweep file's folder).
     *
     * @throws ScenarioException with every problem of the sweep file, or those of its scenario
     */
    public static Loaded read(Path file) throws ScenarioException {
        String name = file.toString();
        String text = ScenarioBytes.readFile(file, name);
        Problems problems = new Problems(name);
        Node root = YamlTree.parse(text, problems);
        if (root == null) {
            throw problems.exception();
        }
        Values values = new Values(problems);
        Fields top = Fields.of(root, "", values, "a sweep", TOP);
        if (!top.ok()) {
            throw problems.exception();
        }
        String scenarioName = top.require("scenario", "a sweep varies one scenario") ? top.text("scenario", "a file name")
                : null;
        if (problems.any() || scenarioName == null) {
            throw problems.exception();
        }
        Path base = file.toAbsolutePath().getParent();
        Path scenarioPath = base == null ? Path.of(scenarioName) : base.resolve(scenarioName).normalize();
        ScenarioDocument doc = ScenarioDocument.read(scenarioPath);
        doc.resolve(); // the scenario itself must be valid: its own problems, at its own lines

        Set<String> seen = new LinkedHashSet<>();
        List<Sweep.Axis> grid = items(top, problems, "vary", "a list of grid keys such as [{key:"
                + " links.down.transmitter.power, values: [10 W, 40 W]}]", (n, at) -> axis(n, at, values, doc, seen));
        List<Sweep.Draw> random = items(top, problems, "random", "a list of drawn keys such as [{key:"
                + " craft.heron.start-speed, normal: [0 c, 0.001 c]}]", (n, at) -> draw(n, at, values, doc, seen));
        int draws = 0;
        if (top.has("draws")) {
            double d = top.number("draws");
            if (!Double.isNaN(d) && (d < 1 || d != Math.rint(d) || d > MAX_POINTS)) {
                top.problemAt("draws", "expected a whole number of draws from 1 to " + MAX_POINTS + ", got "
                        + Values.format(d));
            } else if (!Double.isNaN(d)) {
                draws = (int) d;
            }
            if (!top.has("random")) {
                top.problemAtKey("draws", "draws need keys to draw: give them under random");
            }
        } else if (top.has("random")) {
            top.problemAtKey("random", "random keys need a number of draws per grid point: give draws");
        }
        long seed = 0;
        if (top.has("seed")) {
            double s = top.number("seed");
            if (!Double.isNaN(s) && (s != Math.rint(s) || Math.abs(s) > 9.007199254740992E15)) {
                top.problemAt("seed", "expected a whole number, got " + Values.format(s));
            } else if (!Double.isNaN(s)) {
                seed = (long) s;
            }
        }
        if (!top.has("vary") && !top.has("random")) {
            top.problemHere("a sweep varies something: give vary (a grid) or random (draws), or both");
        }
        if (problems.any()) {
            throw problems.exception();
        }
        Sweep sweep = new Sweep(scenarioName, grid, draws, seed, random);
        try {
            if (sweep.points() > MAX_POINTS) {
                top.problemHere("the sweep has " + sweep.points() + " points, more than the " + MAX_POINTS + " one sweep"
                        + " may hold");
            }
        } catch (ArithmeticException e) {
            top.problemHere("the sweep has more points than a count can hold");
        }
        if (problems.any()) {
            throw problems.exception();
        }
        return new Loaded(sweep, doc, file);
    }

    /** Reads one entry of a list at its key path; null on a problem (added). */
    @FunctionalInterface
    private interface EntryReader<T> {
        T read(Node entry, String path);
    }

    /** The entries of the list under {@code key}, when given: a non-empty list, each entry read by {@code one}. */
    private static <T> List<T> items(Fields top, Problems problems, String key, String what, EntryReader<T> one) {
        List<T> out = new ArrayList<>();
        if (!top.has(key)) {
            return out;
        }
        Node n = top.get(key);
        if (!(n instanceof ListNode l) || l.items().isEmpty()) {
            problems.at(n, key, "expected " + what + ", got " + Values.describe(n));
            return out;
        }
        for (int i = 0; i < l.items().size(); i++) {
            T t = one.read(l.items().get(i), KeyPaths.item(key, i));
            if (t != null) {
                out.add(t);
            }
        }
        return out;
    }

    /** The varied key of an entry, checked against the scenario; null on a problem (added). */
    private static String key(Fields f, ScenarioDocument doc, Set<String> seen) {
        if (!f.require("key", "it names the scenario value to vary")) {
            return null;
        }
        String key = f.text("key", "a scenario key path such as craft.heron.legs[0].burn.acceleration");
        if (key == null) {
            return null;
        }
        if (doc.scalarAt(key).isEmpty()) {
            f.problemAt("key", (doc.has(key) ? "'" + key + "' is a mapping or a list in the scenario, not one value"
                    : "the scenario has no value at '" + key + "'") + " (keys are the scenario's own paths, list"
                    + " indexes from 0, e.g. craft.heron.legs[0].burn.acceleration)");
            return null;
        }
        if (!seen.add(key)) {
            f.problemAt("key", "'" + key + "' is varied twice; each key may be varied once");
            return null;
        }
        return key;
    }

    /** A quantity as written: its dimension (the first whose units read it) and its number in sweep units. */
    private record Read(Dimension dimension, double number) {
    }

    private static Optional<Read> quantity(String text) {
        for (Dimension d : Dimension.values()) {
            try {
                return Optional.of(new Read(d, Units.parse(text, d).si()));
            } catch (UnitException e) {
                // not this dimension
            }
        }
        return Optional.empty();
    }

    private static String textOf(Node n) {
        return n instanceof Scalar s && (s.type() == ScalarType.TEXT || s.type() == ScalarType.NUMBER) ? s.text() : null;
    }

    /** The dimension of the scenario's own value at {@code key}, or empty for a word. */
    private static Optional<Dimension> dimensionAt(ScenarioDocument doc, String key) {
        return doc.scalarAt(key).flatMap(SweepReader::quantity).map(Read::dimension);
    }

    /** A number of the key's dimension {@code expected} (any, when empty), at {@code at}; null on a problem (added). */
    private static Read numberAt(Node n, String at, Problems problems, Optional<Dimension> expected, String key) {
        String text = textOf(n);
        Optional<Read> r = text == null ? Optional.empty() : quantity(text);
        if (r.isEmpty()) {
            problems.at(n, at, "expected a number with its unit, got " + Values.describe(n));
            return null;
        }
        if (expected.isPresent() && r.get().dimension() != expected.get()) {
            problems.at(n, at, "'" + key + "' is " + expected.get().description() + " in the scenario, got "
                    + r.get().dimension().description() + " ('" + text.trim() + "')");
            return null;
        }
        if (!Double.isFinite(r.get().number())) {
            problems.at(n, at, "expected a finite number, got '" + text.trim() + "'");
            return null;
        }
        return r.get();
    }

    private static String unit(Dimension d) {
        return d.siSymbol();
    }

    private static Sweep.Axis axis(Node item, String path, Values values, ScenarioDocument doc, Set<String> seen) {
        Fields f = Fields.of(item, path, values, "a grid key", GRID);
        if (!f.ok()) {
            return null;
        }
        String key = key(f, doc, seen);
        boolean list = f.has("values");
        boolean range = f.has("from") || f.has("to") || f.has("steps");
        if (list == range) {
            f.problemHere("a grid key takes either values: [...] or from, to and steps");
            return null;
        }
        if (key == null) {
            return null;
        }
        Optional<Dimension> expected = dimensionAt(doc, key);
        List<Sweep.Value> out = new ArrayList<>();
        if (list) {
            Node v = f.get("values");
            if (!(v instanceof ListNode l) || l.items().isEmpty()) {
                f.problemAt("values", "expected a list of values such as [10 W, 40 W], got " + Values.describe(v));
                return null;
            }
            for (int i = 0; i < l.items().size(); i++) {
                Node e = l.items().get(i);
                String text = textOf(e);
                String at = KeyPaths.item(f.path("values"), i);
                if (text == null) {
                    values.problems().at(e, at, "expected a value, got " + Values.describe(e));
                    return null;
                }
                if (expected.isEmpty()) {
                    // the scenario gives a word there (such as forever): values are written as they are
                    out.add(new Sweep.Value(text, quantity(text).map(Read::number).orElse(Double.NaN)));
                    continue;
                }
                Read r = numberAt(e, at, values.problems(), expected, key);
                if (r == null) {
                    return null;
                }
                out.add(Sweep.number(r.number(), unit(expected.get())));
            }
            return new Sweep.Axis(key, out);
        }
        if (!f.require("from") | !f.require("to") | !f.require("steps")) {
            return null;
        }
        if (expected.isEmpty()) {
            f.problemAt("from", "'" + key + "' is not a number in the scenario; vary it with values: [...]");
            return null;
        }
        Read from = numberAt(f.get("from"), f.path("from"), values.problems(), expected, key);
        Read to = numberAt(f.get("to"), f.path("to"), values.problems(), expected, key);
        double steps = f.number("steps");
        if (from == null || to == null || Double.isNaN(steps)) {
            return null;
        }
        if (steps < 1 || steps != Math.rint(steps) || steps > MAX_POINTS) {
            f.problemAt("steps", "expected a whole number of values from 1 to " + MAX_POINTS + " (from and to"
                    + " included), got " + Values.format(steps));
            return null;
        }
        int n = (int) steps;
        if (n == 1 && from.number() != to.number()) {
            f.problemAt("steps", "one step gives one value: from and to must then be equal");
            return null;
        }
        for (int i = 0; i < n; i++) {
            // inclusive and linear; the ends exactly as written
            double w = (double) i / (n - 1);
            double x = i == n - 1 ? to.number() : i == 0 ? from.number() : from.number() * (1 - w) + to.number() * w;
            out.add(Sweep.number(x, unit(expected.get())));
        }
        return new Sweep.Axis(key, out);
    }

    private static Sweep.Draw draw(Node item, String path, Values values, ScenarioDocument doc, Set<String> seen) {
        Fields f = Fields.of(item, path, values, "a drawn key", RANDOM);
        if (!f.ok()) {
            return null;
        }
        String key = key(f, doc, seen);
        String law = f.oneOf(List.of("normal", "uniform"), "a distribution", false);
        if (key == null || law == null) {
            return null;
        }
        Optional<Dimension> expected = dimensionAt(doc, key);
        if (expected.isEmpty()) {
            f.problemAt("key", "'" + key + "' is not a number in the scenario, so it cannot be drawn");
            return null;
        }
        Node n = f.get(law);
        String words = law.equals("normal") ? "[mean, standard deviation]" : "[low, high]";
        if (!(n instanceof ListNode l) || l.items().size() != 2) {
            f.problemAt(law, "expected " + words + ", got " + Values.describe(n));
            return null;
        }
        double[] ab = new double[2];
        for (int i = 0; i < 2; i++) {
            Read r = numberAt(l.items().get(i), KeyPaths.item(f.path(law), i), values.problems(), expected, key);
            if (r == null) {
                return null;
            }
            ab[i] = r.number();
        }
        if (law.equals("normal") && !(ab[1] >= 0)) {
            f.problemAt(law, "the standard deviation must not be negative");
            return null;
        }
        if (law.equals("uniform") && !(ab[1] >= ab[0])) {
            f.problemAt(law, "the high end must not be below the low end");
            return null;
        }
        return new Sweep.Draw(key, law.equals("normal") ? Sweep.Law.NORMAL : Sweep.Law.UNIFORM, ab[0], ab[1],
                unit(expected.get()));
    }
}
