package org.nullpath.mission;

import java.util.List;

/**
 * The names of the files a plan writes, so that the reader can keep scenario names from clashing with
 * them and the writers name them in one way.
 */
public final class OutputNames {
    private OutputNames() {
    }

    public static final String CUTOFFS = "cutoffs.csv";
    public static final String HORIZONS = "horizons.csv";
    public static final String WINDOWS = "windows.csv";
    public static final String CROSSINGS = "crossings.csv";
    public static final String REPORT = "report.html";
    public static final String SUMMARY = "summary.json";

    /** Every file name a plan may write that does not come from a scenario name. */
    public static final List<String> FIXED = List.of(CUTOFFS, HORIZONS, WINDOWS, CROSSINGS, REPORT, SUMMARY);

    /** What an exchange's file name starts with. */
    public static final String EXCHANGE_PREFIX = "exchanges-";

    /** The per-message file of a link. */
    public static String ofLink(String link) {
        return link + ".csv";
    }

    /** The round-trip file of an exchange. */
    public static String ofExchange(String exchange) {
        return EXCHANGE_PREFIX + exchange + ".csv";
    }
}
