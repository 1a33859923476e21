package org.nullpath.scenario;

import java.nio.file.Path;

import org.nullpath.mission.Mission;

/**
 * Reads a scenario file (docs/scenario-format.md) into a resolved {@link Mission}.
 *
 * <p>Every problem found is reported, not only the first: each names the file, the 1-based line and
 * column of the offending value (or key), and the dotted key path such as
 * {@code craft.lark.legs[0].burn.acceleration}. When there is any problem, one {@link ScenarioException}
 * carries them all and no mission is returned.
 *
 * <p>Hostile input is bounded: files over {@link #MAX_FILE_BYTES} are refused before they are parsed,
 * nesting is limited to 64 levels, and aliases that could expand without bound are refused.
 */
public final class ScenarioLoader {
    /** Largest scenario file read: 4 MiB. */
    public static final long MAX_FILE_BYTES = 4L * 1024 * 1024;

    private ScenarioLoader() {
    }

    /**
     * Reads and validates the scenario in {@code file}. Problems name the file as {@code file.toString()}.
     *
     * @throws ScenarioException with every problem found, including a missing, unreadable or oversized file
     */
    public static Mission load(Path file) throws ScenarioException {
        return load(file, false);
    }

    /**
     * As {@link #load(Path)}; with {@code tablesAnywhere}, profile tables may lie outside the scenario's folder
     * tree (by default they must lie inside it, symbolic links resolved).
     *
     * @throws ScenarioException with every problem found
     */
    public static Mission load(Path file, boolean tablesAnywhere) throws ScenarioException {
        return ScenarioDocument.read(file).resolve(tablesAnywhere);
    }

    /**
     * Reads and validates scenario text, naming it {@code displayName} in problems (and as the scenario's
     * file and default title).
     *
     * @throws ScenarioException with every problem found
     */
    public static Mission load(String text, String displayName) throws ScenarioException {
        return ScenarioDocument.of(text, displayName).resolve();
    }
}
