package org.nullpath.scenario;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * The problems found in one scenario file so far. After {@link #LIMIT} problems further ones are only
 * counted, so a badly broken file gives a readable list rather than a flood.
 */
final class Problems {
    /** Most problems listed one by one. */
    static final int LIMIT = 100;

    private final String file;
    private final List<Problem> list = new ArrayList<>();
    private int dropped;

    Problems(String file) {
        this.file = file;
    }

    String file() {
        return file;
    }

    /** A new list with the same problems, to go on from independently. */
    Problems copy() {
        Problems c = new Problems(file);
        c.list.addAll(list);
        c.dropped = dropped;
        return c;
    }

    void add(int line, int column, String key, String message) {
        if (list.size() < LIMIT) {
            list.add(new Problem(file, line, column, key, message));
        } else {
            dropped++;
        }
    }

    /** A problem located at a node's value. */
    void at(Located node, String key, String message) {
        add(node.line(), node.column(), key, message);
    }

    /** A problem located at a mapping key. */
    void atKey(Located entry, String key, String message) {
        add(entry.line(), entry.column(), key, message);
    }

    boolean any() {
        return !list.isEmpty();
    }

    /** Everything found, as one exception. */
    ScenarioException exception() {
        List<Problem> all = new ArrayList<>(list);
        // File order: problems about the whole file (line 0) first, then by line and column.
        all.sort(Comparator.comparingInt(Problem::line).thenComparingInt(Problem::column));
        if (dropped > 0) {
            all.add(new Problem(file, 0, 0, "", "... and " + dropped + " more problem" + (dropped == 1 ? "" : "s")
                    + " not listed"));
        }
        return new ScenarioException(all);
    }

    /** Throws when anything was found. */
    void throwIfAny() throws ScenarioException {
        if (any()) {
            throw exception();
        }
    }
}
