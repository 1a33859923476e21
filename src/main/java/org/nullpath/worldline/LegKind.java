package org.nullpath.worldline;

import java.util.List;
import java.util.Locale;

/**
 * The kinds of leg: each kind's key in the scenario file (also its kind in summaries), its label on the
 * spacetime diagram (its own name) and the end-condition keys the scenario format offers for it. The names
 * are given here once; the reader's leg table is keyed by them.
 */
public enum LegKind {
    /** Constant proper acceleration. */
    BURN("burn", Ends.CONSTANT),
    /** Unpowered flight (it keeps its speed, so it takes no until-speed). */
    COAST("coast", Ends.COAST),
    /** Ackeret's rocket at constant proper acceleration. */
    ROCKET("rocket", Ends.LIMITED),
    /** A rocket at constant thrust: a {@code rocket} in the file, told apart on the diagram. */
    THRUST_ROCKET("rocket", Ends.LIMITED),
    /** A beam-pushed sail. */
    SAIL("sail", Ends.LIMITED),
    /** A tabled acceleration profile. */
    PROFILE("profile", Ends.LIMITED);

    /** The end keys of every leg that ends by its own physics unless told to end earlier (rocket, sail, profile). */
    public static final List<String> LIMITED_END_KEYS = Ends.LIMITED;

    private final String key;
    private final List<String> endKeys;

    LegKind(String key, List<String> endKeys) {
        this.key = key;
        this.endKeys = endKeys;
    }

    /** The label on the spacetime diagram: the kind's own name in lower case ("burn", "thrustrocket"). */
    public String label() {
        return name().toLowerCase(Locale.ROOT).replace("_", "");
    }

    /** The key in the scenario file. */
    public String key() {
        return key;
    }

    /** The end-condition keys the scenario format offers for this kind. */
    public List<String> endKeys() {
        return endKeys;
    }

    /** End-key lists shared by several kinds. */
    private static final class Ends {
        /** Legs at constant acceleration. */
        static final List<String> CONSTANT = List.of("duration", "duration-mission", "until-speed", "until-distance");
        /** A coast. */
        static final List<String> COAST = List.of("duration", "duration-mission", "until-distance");
        /** Legs that end by their own physics unless told to end earlier. */
        static final List<String> LIMITED = List.of("until-speed", "until-distance");
    }
}
