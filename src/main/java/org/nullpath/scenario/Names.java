package org.nullpath.scenario;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;
import java.util.stream.Collectors;

import org.nullpath.mission.OutputNames;

/**
 * Rules for the names a scenario gives to stations, craft, links and exchanges. Link and exchange names
 * become parts of output file names ({@code <link>.csv}, {@code exchanges-<name>.csv}), so every name is
 * kept to characters that are safe in a file name on any common file system.
 */
final class Names {
    /** Longest name accepted. */
    static final int MAX_LENGTH = 64;

    private static final Pattern SAFE = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");

    /** Names some file systems refuse as a file's base name, whatever the extension. */
    private static final Set<String> DEVICE_NAMES = Set.of("con", "prn", "aux", "nul",
            "com1", "com2", "com3", "com4", "com5", "com6", "com7", "com8", "com9",
            "lpt1", "lpt2", "lpt3", "lpt4", "lpt5", "lpt6", "lpt7", "lpt8", "lpt9");

    /** Base names of the CSV files nullpath itself writes beside the per-link CSV files. */
    private static final Set<String> OUTPUT_NAMES = OutputNames.FIXED.stream().filter(n -> n.endsWith(".csv"))
            .map(n -> n.substring(0, n.length() - ".csv".length())).collect(Collectors.toUnmodifiableSet());

    private Names() {
    }

    /** Why {@code name} cannot be used, or null when it can. {@code what} is e.g. "a station name". */
    static String problem(String name, String what) {
        if (name.isEmpty()) {
            return what + " must not be empty";
        }
        if (name.length() > MAX_LENGTH) {
            return what + " may have at most " + MAX_LENGTH + " characters, got " + name.length();
        }
        if (!SAFE.matcher(name).matches()) {
            return what + " may use only letters A-Z a-z, digits, '.', '_' and '-', and must start with a letter or"
                    + " digit (names become parts of file names); got '" + name + "'";
        }
        String base = name.toLowerCase(Locale.ROOT);
        int dot = base.indexOf('.');
        if (DEVICE_NAMES.contains(dot < 0 ? base : base.substring(0, dot))) {
            return what + " '" + name + "' is a reserved device name on some systems and cannot be a file name";
        }
        if (name.endsWith(".")) {
            return what + " must not end with '.' (some systems drop it from file names)";
        }
        return null;
    }

    /** Why a link name clashes with a file nullpath writes anyway, or null. */
    static String outputClash(String linkName) {
        String base = linkName.toLowerCase(Locale.ROOT);
        if (OUTPUT_NAMES.contains(base)) {
            return "link name '" + linkName + "' is taken by nullpath's own output file " + base + ".csv";
        }
        if (base.startsWith(OutputNames.EXCHANGE_PREFIX)) {
            return "link names starting with '" + OutputNames.EXCHANGE_PREFIX + "' are taken by the exchange output"
                    + " files";
        }
        return null;
    }
}
