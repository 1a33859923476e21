package org.nullpath.scenario;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.units.Dimension;
import org.nullpath.worldline.LegKind;
import org.nullpath.worldline.LegSpec;

/** Reads the legs at constant proper acceleration: {@code burn} and {@code coast} (docs/scenario-format.md, "Legs"). */
final class ConstantLegReader {
    static final List<String> BURN_KEYS = keys(List.of("acceleration"), LegKind.BURN.endKeys());
    static final List<String> COAST_KEYS = LegKind.COAST.endKeys();
    static final Map<String, String> COAST_SPECIALS = Map.of(
            "until-speed", "a coast keeps its speed, so until-speed cannot end it; use a burn",
            "acceleration", "a coast has no acceleration; use a burn for powered flight");

    private ConstantLegReader() {
    }

    /** A leg's own keys followed by its end keys. */
    static List<String> keys(List<String> own, List<String> ends) {
        List<String> all = new ArrayList<>(own);
        all.addAll(ends);
        return List.copyOf(all);
    }

    static LegEntry.Read burn(Node n, String path, LegEntry.Context context) {
        Fields f = Fields.of(n, path, context.values(), "a burn", BURN_KEYS);
        if (!f.ok()) {
            return null;
        }
        double a = f.quantity("acceleration", Dimension.ACCELERATION);
        if (a == 0) {
            f.problemAt("acceleration", "a burn needs a non-zero acceleration; use a coast leg for unpowered flight");
            a = Double.NaN;
        }
        String endKey = LegEndReader.key(f, LegKind.BURN.endKeys(), true);
        LegSpec.LegEnd end = endKey == null ? null : LegEndReader.read(f, endKey);
        if (Double.isNaN(a) || end == null) {
            return null;
        }
        return new LegEntry.Read(new LegSpec.Burn(a, end), site(n, path, f, endKey));
    }

    static LegEntry.Read coast(Node n, String path, LegEntry.Context context) {
        Fields f = Fields.of(n, path, context.values(), "a coast", COAST_KEYS, COAST_SPECIALS);
        if (!f.ok()) {
            return null;
        }
        String endKey = LegEndReader.key(f, LegKind.COAST.endKeys(), true);
        LegSpec.LegEnd end = endKey == null ? null : LegEndReader.read(f, endKey);
        if (end == null) {
            return null;
        }
        return new LegEntry.Read(new LegSpec.Coast(end), site(n, path, f, endKey));
    }

    private static LegEntry.Site site(Node n, String path, Fields f, String endKey) {
        return new LegEntry.Site(n, path, null, null, f.get(endKey), f.path(endKey));
    }
}
