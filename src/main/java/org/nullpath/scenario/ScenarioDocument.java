package org.nullpath.scenario;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.nullpath.mission.Mission;
import org.nullpath.mission.ScenarioText;
import org.nullpath.scenario.YamlTree.Entry;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;

/**
 * A scenario file read into its located tree, not yet resolved. {@link #resolve()} builds the
 * {@link Mission}; {@link #with(String, String)} gives the same document with one value replaced, without
 * reading the file again, so that a study can resolve many variants of one scenario cheaply. A problem in a
 * replaced value is reported at the place of the value it replaces (or of the mapping it is added to).
 */
public final class ScenarioDocument {
    private final ScenarioText source;
    private final Problems parsed;
    private final Node root;

    private ScenarioDocument(ScenarioText source, Problems parsed, Node root) {
        this.source = source;
        this.parsed = parsed;
        this.root = root;
    }

    /**
     * Reads {@code file} into its tree. Problems name the file as {@code file.toString()}.
     *
     * @throws ScenarioException when the file cannot be read or is not one readable YAML document
     */
    public static ScenarioDocument read(Path file) throws ScenarioException {
        String name = file.toString();
        return parse(ScenarioBytes.readFile(file, name), name, file);
    }

    /**
     * Reads scenario text into its tree, naming it {@code displayName} in problems.
     *
     * @throws ScenarioException when it is too large or not one readable YAML document
     */
    public static ScenarioDocument of(String text, String displayName) throws ScenarioException {
        return parse(ScenarioBytes.checkedText(text, displayName), displayName, ScenarioBytes.pathOf(displayName));
    }

    private static ScenarioDocument parse(String text, String name, Path path) throws ScenarioException {
        Problems problems = new Problems(name);
        Node root = YamlTree.parse(text, problems);
        if (root == null) {
            throw problems.exception();
        }
        return new ScenarioDocument(new ScenarioText(path, text), problems, root);
    }

    /** The scenario as read: the original text, and the values replaced in it. */
    public ScenarioText source() {
        return source;
    }

    /**
     * The resolved mission, validated.
     *
     * @throws ScenarioException with every problem found, each at its file, line, column and key
     */
    public Mission resolve() throws ScenarioException {
        return resolve(false);
    }

    /**
     * The resolved mission, validated; with {@code tablesAnywhere}, profile tables may lie outside the
     * scenario's folder tree (docs/scenario-format.md, "Profile tables").
     *
     * @throws ScenarioException with every problem found, each at its file, line, column and key
     */
    public Mission resolve(boolean tablesAnywhere) throws ScenarioException {
        Problems problems = parsed.copy();
        return new MissionReader(new Values(problems), source, tablesAnywhere).mission(root);
    }

    /**
     * This document with the value at {@code keyPath} (such as {@code craft.lark.legs[0].burn.acceleration},
     * list indexes from 0) replaced by {@code value}, read as a YAML scalar ({@code "0.5 g0"}, {@code "2"},
     * {@code "true"}). A key missing from an existing mapping is added there.
     *
     * @throws ScenarioException when the path leads nowhere in this document, or the value is not one scalar
     */
    public ScenarioDocument with(String keyPath, String value) throws ScenarioException {
        Scalar parsedValue = scalar(value, keyPath);
        return new ScenarioDocument(source.replacing(keyPath, value), parsed, replace(root, keyPath, "", parsedValue));
    }

    /** True when {@code keyPath} names a value written in this document. */
    public boolean has(String keyPath) {
        return find(keyPath) != null;
    }

    /** The text of the single value at {@code keyPath}, when there is one there (not a mapping or a list). */
    public Optional<String> scalarAt(String keyPath) {
        return find(keyPath) instanceof Scalar s ? Optional.of(s.text()) : Optional.empty();
    }

    private Node find(String keyPath) {
        Node n = root;
        String rest = keyPath;
        while (!rest.isEmpty()) {
            Step s = step(n, rest);
            if (s == null || s.child() == null) {
                return null;
            }
            n = s.child();
            rest = s.rest();
        }
        return n;
    }

    /**
     * A problem at {@code keyPath}: at the line and column of the deepest value along the path written in this
     * document (a mapping key's own place where the path ends at a key), so that a finding made while computing
     * points at the scenario like any reading problem.
     */
    public Problem problemAt(String keyPath, String message) {
        Node n = root;
        int line = 0;
        int column = 0;
        String rest = keyPath;
        while (!rest.isEmpty()) {
            Step s = step(n, rest);
            if (s == null || s.child() == null) {
                break;
            }
            Located at = s.child();
            if (s.key() != null && n instanceof MapNode m) {
                at = m.get(s.key());
            }
            line = at.line();
            column = at.column();
            n = s.child();
            rest = s.rest();
        }
        return new Problem(source.file().toString(), line, column, keyPath, message);
    }

    private Scalar scalar(String value, String keyPath) throws ScenarioException {
        Problems p = new Problems(source.file().toString());
        Node n = YamlTree.parse(value, p);
        if (!(n instanceof Scalar s)) {
            throw ScenarioBytes.single(source.file().toString(), "the value '" + value + "' for " + keyPath
                    + " is not a single value");
        }
        return s;
    }

    /** One step down a key path: the key or index taken, the child there (null if missing), the rest. */
    private record Step(String key, int index, Node child, String rest) {
    }

    private static Step step(Node n, String path) {
        if (path.startsWith("[")) {
            int close = path.indexOf(']');
            if (!(n instanceof ListNode l) || close < 0) {
                return null;
            }
            int i;
            try {
                i = Integer.parseInt(path.substring(1, close));
            } catch (NumberFormatException e) {
                return null;
            }
            String rest = path.substring(close + 1);
            rest = rest.startsWith(".") ? rest.substring(1) : rest;
            return i >= 0 && i < l.items().size() ? new Step(null, i, l.items().get(i), rest) : null;
        }
        if (!(n instanceof MapNode m)) {
            return null;
        }
        // names may hold '.', so take the longest key of this mapping that the path starts with
        String best = null;
        for (String k : m.entries().keySet()) {
            if (path.startsWith(k) && (path.length() == k.length() || path.charAt(k.length()) == '.'
                    || path.charAt(k.length()) == '[') && (best == null || k.length() > best.length())) {
                best = k;
            }
        }
        String key = best;
        if (key == null) {
            int end = 0;
            while (end < path.length() && path.charAt(end) != '.' && path.charAt(end) != '[') {
                end++;
            }
            key = path.substring(0, end);
        }
        String rest = path.substring(key.length());
        rest = rest.startsWith(".") ? rest.substring(1) : rest;
        Entry e = m.get(key);
        return new Step(key, -1, e == null ? null : e.value(), rest);
    }

    private Node replace(Node n, String path, String done, Scalar value) throws ScenarioException {
        Step s = step(n, path);
        String here = s == null ? done : s.key() != null ? KeyPaths.child(done, s.key()) : KeyPaths.item(done, s.index());
        if (s == null || (s.child() == null && !s.rest().isEmpty())) {
            throw nowhere(n, path, done);
        }
        if (s.child() == null || s.rest().isEmpty()) {
            Located at = s.child() != null ? s.child() : n;
            Node v = new Scalar(value.text(), value.type(), value.number(), at.line(), at.column());
            return put(n, s, v);
        }
        return put(n, s, replace(s.child(), s.rest(), here, value));
    }

    private static Node put(Node n, Step s, Node child) {
        if (n instanceof ListNode l) {
            List<Node> items = new ArrayList<>(l.items());
            items.set(s.index(), child);
            return new ListNode(Collections.unmodifiableList(items), l.line(), l.column(), l.size(), l.height());
        }
        MapNode m = (MapNode) n;
        Map<String, Entry> entries = new LinkedHashMap<>(m.entries());
        Entry old = entries.get(s.key());
        entries.put(s.key(), old != null ? new Entry(old.key(), old.line(), old.column(), child)
                : new Entry(s.key(), m.line(), m.column(), child));
        return new MapNode(Collections.unmodifiableMap(entries), m.line(), m.column(), m.size() + (old == null ? 1 : 0),
                m.height());
    }

    private ScenarioException nowhere(Node n, String path, String done) {
        String where = done.isEmpty() ? "the top level" : done;
        return new ScenarioException(List.of(new Problem(source.file().toString(), n.line(), n.column(), done,
                "the key path leads nowhere: nothing at '" + path + "' under " + where)));
    }
}
