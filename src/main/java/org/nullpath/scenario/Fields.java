package org.nullpath.scenario;

import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;

import org.nullpath.scenario.YamlTree.Entry;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;

/**
 * The keys of one mapping in the scenario, read with their locations. Creating it reports every key
 * that is not allowed there (with a did-you-mean when one is close). When the node is not a mapping at
 * all, one problem says so and every later read comes back absent without further complaint, so one
 * mistake gives one message. A key given with no value at all (YAML null) reads as an empty mapping.
 */
final class Fields {
    private final MapNode map;
    private final Node node;
    private final String path;
    private final Values values;
    /** Keys offered as did-you-mean for a misspelt key: their absence is not reported again. */
    private final Set<String> suggested;
    /** True when a recognised-but-misplaced key was given: missing keys are then not reported. */
    private final boolean quiet;

    private Fields(MapNode map, Node node, String path, Values values, Set<String> suggested, boolean quiet) {
        this.map = map;
        this.node = node;
        this.path = path;
        this.values = values;
        this.suggested = suggested;
        this.quiet = quiet;
    }

    /**
     * Reads {@code node} as a mapping.
     *
     * @param what     words for the expected mapping in a message ("a station")
     * @param known    the keys allowed here
     * @param specials keys that are recognised but not allowed here, each with the message to give
     */
    static Fields of(Node node, String path, Values values, String what, List<String> known,
                     Map<String, String> specials) {
        if (node instanceof Scalar s && s.type() == ScalarType.NULL) {
            // "home:" with nothing after it reads as an empty mapping: every key takes its default.
            node = new MapNode(Map.of(), s.line(), s.column(), 1, 0);
        }
        if (!(node instanceof MapNode m)) {
            values.problems().at(node, path, "expected " + what + " (a mapping of keys: " + String.join(", ", known)
                    + "), got " + Values.describe(node));
            return new Fields(null, node, path, values, Set.of(), true);
        }
        Set<String> suggested = new HashSet<>();
        boolean quiet = false;
        for (Entry e : m.entries().values()) {
            if (known.contains(e.key())) {
                continue;
            }
            String keyPath = KeyPaths.child(path, e.key());
            String special = specials.get(e.key());
            if (special != null) {
                values.problems().atKey(e, keyPath, special);
                quiet = true;
            } else {
                values.problems().atKey(e, keyPath, unknownKey(e.key(), known));
                String hint = Spelling.closest(e.key(), known);
                if (hint != null && !e.key().equals("<<")) {
                    suggested.add(hint);
                }
            }
        }
        return new Fields(m, node, path, values, suggested, quiet);
    }

    static Fields of(Node node, String path, Values values, String what, List<String> known) {
        return of(node, path, values, what, known, Map.of());
    }

    /** "unknown key 'x' (did you mean 'y'?)", or the list of keys allowed there. */
    static String unknownKey(String key, List<String> known) {
        if (key.equals("<<")) {
            return "YAML merge keys ('<<') are not supported; write the keys out";
        }
        String hint = Spelling.closest(key, known);
        if (hint != null) {
            return "unknown key '" + key + "' (did you mean '" + hint + "'?)";
        }
        return "unknown key '" + key + "' (allowed here: " + String.join(", ", known) + ")";
    }

    /** True when the node was a mapping. */
    boolean ok() {
        return map != null;
    }

    Node node() {
        return node;
    }

    String path() {
        return path;
    }

    Values values() {
        return values;
    }

    Problems problems() {
        return values.problems();
    }

    String path(String key) {
        return KeyPaths.child(path, key);
    }

    boolean has(String key) {
        return map != null && map.get(key) != null;
    }

    /** The entry for {@code key}, or null when absent. */
    Entry entry(String key) {
        return map == null ? null : map.get(key);
    }

    /** The value of {@code key}, or null when absent. */
    Node get(String key) {
        Entry e = entry(key);
        return e == null ? null : e.value();
    }

    /** True when {@code key} is present; otherwise adds "missing" (with {@code why}, if not null) and returns false. */
    boolean require(String key, String why) {
        if (map == null) {
            return false;
        }
        if (map.get(key) != null) {
            return true;
        }
        if (quiet || suggested.contains(key)) {
            return false;
        }
        problems().at(map, path(key), "missing required key '" + key + "'" + (why == null ? "" : ": " + why));
        return false;
    }

    boolean require(String key) {
        return require(key, null);
    }

    /** A required quantity; NaN when absent or wrong. */
    double quantity(String key, Dimension d) {
        if (!require(key)) {
            return Double.NaN;
        }
        return values.quantity(get(key), path(key), d);
    }

    /** An optional quantity with a default; NaN when present but wrong. */
    double quantity(String key, Dimension d, double absent) {
        Node n = get(key);
        return n == null ? absent : values.quantity(n, path(key), d);
    }

    /** An optional plain number with a default; NaN when present but wrong. */
    double number(String key, double absent) {
        Node n = get(key);
        return n == null ? absent : values.number(n, path(key));
    }

    /** A required plain number; NaN when absent or wrong. */
    double number(String key) {
        if (!require(key)) {
            return Double.NaN;
        }
        return values.number(get(key), path(key));
    }

    /** An optional vector with a default; null when present but wrong. */
    Vec3 vector(String key, Dimension d, Vec3 absent) {
        Node n = get(key);
        return n == null ? absent : values.vector(n, path(key), d);
    }

    /**
     * Farthest a position may lie from the origin, per axis: 1e30 m (about 1e14 ly, far beyond the observable
     * universe), so that squared distances in the light-cone solve stay within double precision.
     */
    static final double MAX_POSITION_M = 1e30;

    /** An optional position; null when present but wrong or farther than {@link #MAX_POSITION_M} (problem added). */
    Vec3 position(String key) {
        Vec3 p = vector(key, Dimension.LENGTH, Vec3.ZERO);
        if (p != null && !(Math.max(Math.abs(p.x()), Math.max(Math.abs(p.y()), Math.abs(p.z()))) <= MAX_POSITION_M)) {
            problemAt(key, "the position lies farther than nullpath computes: each coordinate at most "
                    + Values.format(MAX_POSITION_M) + " m (about 1e14 ly)");
            return null;
        }
        return p;
    }

    /** Required text; null when absent or wrong. */
    String text(String key, String what) {
        if (!require(key)) {
            return null;
        }
        return values.text(get(key), path(key), what);
    }

    /** An optional boolean: {@code absent} when the key is missing, empty when its value is not a boolean. */
    Optional<Boolean> bool(String key, boolean absent) {
        Node n = get(key);
        return n == null ? Optional.of(absent) : values.bool(n, path(key));
    }

    /** Adds a problem at the value of {@code key} (which must be present). */
    void problemAt(String key, String message) {
        problems().at(get(key), path(key), message);
    }

    /** Adds a problem at the key {@code key} itself (which must be present). */
    void problemAtKey(String key, String message) {
        problems().atKey(entry(key), path(key), message);
    }

    /** Adds a problem at the mapping as a whole. */
    void problemHere(String message) {
        problems().at(node, path, message);
    }

    /**
     * Of the keys in {@code group}, the one present; null when none or more than one is (a problem is then
     * added unless {@code optional} and none is present).
     */
    String oneOf(List<String> group, String what, boolean optional) {
        if (map == null) {
            return null;
        }
        String found = null;
        boolean clash = false;
        for (String k : group) {
            if (!has(k)) {
                continue;
            }
            if (found == null) {
                found = k;
            } else {
                problemAtKey(k, what + " is given twice: '" + found + "' and '" + k + "'; give one of "
                        + String.join(", ", group));
                clash = true;
            }
        }
        if (clash) {
            return null;
        }
        if (found == null && !optional && !quiet && group.stream().noneMatch(suggested::contains)) {
            problems().at(map, path, "missing " + what + ": give one of " + String.join(", ", group));
        }
        return found;
    }
}
