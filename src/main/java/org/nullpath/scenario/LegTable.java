package org.nullpath.scenario;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nullpath.scenario.YamlTree.Entry;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.units.Spelling;
import org.nullpath.worldline.LegKind;
import org.nullpath.worldline.LegSpec;

/**
 * The leg table: every kind of leg the scenario file knows, under its key, with the entry that reads
 * it (docs/scenario-format.md, "Legs"). A new kind of leg is a new {@link org.nullpath.worldline.LegSpec}
 * type and one entry here.
 */
final class LegTable {
    private static final Map<String, LegEntry> ENTRIES = table();

    private static Map<String, LegEntry> table() {
        Map<String, LegEntry> m = new LinkedHashMap<>();
        m.put(LegKind.BURN.key(), ConstantLegReader::burn);
        m.put(LegKind.COAST.key(), ConstantLegReader::coast);
        m.put(LegKind.ROCKET.key(), ProfiledLegReader::rocket);
        m.put(LegKind.SAIL.key(), ProfiledLegReader::sail);
        m.put(LegKind.PROFILE.key(), ProfiledLegReader::profile);
        return java.util.Collections.unmodifiableMap(m);
    }

    /** The leg keys, in the table's order. */
    static final List<String> KEYS = List.copyOf(ENTRIES.keySet());

    private LegTable() {
    }

    /** "burn, coast, rocket, sail or profile". */
    static String listed() {
        return String.join(", ", KEYS.subList(0, KEYS.size() - 1)) + " or " + KEYS.get(KEYS.size() - 1);
    }

    /** One leg: a mapping with exactly one key, its kind. Null when it has problems (all of them added). */
    static LegEntry.Read read(Node n, String path, LegEntry.Context context) {
        Problems problems = context.values().problems();
        if (!(n instanceof MapNode m)) {
            problems.at(n, path, "expected a leg such as {burn: {acceleration: 1 g0, duration: 1 yr}} or"
                    + " {coast: {duration: 2 yr}}, got " + Values.describe(n));
            return null;
        }
        if (m.entries().isEmpty()) {
            problems.at(n, path, "a leg needs a type: " + listed());
            return null;
        }
        Entry type = null;
        boolean ok = true;
        for (Entry e : m.entries().values()) {
            String keyPath = KeyPaths.child(path, e.key());
            if (!ENTRIES.containsKey(e.key())) {
                String hint = Spelling.closest(e.key(), KEYS);
                problems.atKey(e, keyPath, "unknown leg type '" + e.key() + "'"
                        + (hint != null ? " (did you mean '" + hint + "'?)" : " (a leg is " + listed() + ")"));
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
        return ENTRIES.get(type.key()).read(type.value(), KeyPaths.child(path, type.key()), context);
    }
}
