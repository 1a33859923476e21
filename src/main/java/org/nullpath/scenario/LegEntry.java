package org.nullpath.scenario;

import java.nio.file.Path;
import java.util.Map;

import org.nullpath.mission.Station;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.worldline.LegSpec;

/**
 * How one kind of leg is read from the scenario file: one entry of {@link LegTable}, under the leg's
 * key (docs/scenario-format.md, "Legs").
 */
interface LegEntry {

    /**
     * Reads the body of a leg ({@code node}, at {@code path}, the mapping under the leg's key).
     *
     * @return the leg and where it was written, or null when it has problems (all of them added)
     */
    Read read(Node node, String path, Context context);

    /**
     * What legs may need from the rest of the scenario: {@code alsoRead} collects the other files legs
     * read (profile tables), so that a plan never writes over them; {@code tablesAnywhere}: whether a profile
     * table may lie outside the scenario's folder tree (the command line's {@code --tables-anywhere}).
     */
    record Context(Values values, Map<String, Station> stations, Path scenarioFile, java.util.List<Path> alsoRead,
                   boolean tablesAnywhere) {
    }

    /** A leg read, and where it was written. */
    record Read(LegSpec spec, Site site) {
    }

    /**
     * Where a leg was written, so that a problem found while flying it can point back at the file: at
     * its end condition ({@code end}, when the problem is about the end and one was written), else at
     * the key that sets the leg's own physics ({@code own}, e.g. the beam station), else at the end,
     * else at the leg.
     */
    record Site(Node leg, String legPath, Node own, String ownPath, Node end, String endPath) {

        /** The node a problem with the flight points at, and its key path. */
        Node at(boolean aboutEnd) {
            return aboutEnd && end != null ? end : own != null ? own : end != null ? end : leg;
        }

        String pathAt(boolean aboutEnd) {
            return aboutEnd && end != null ? endPath : own != null ? ownPath : end != null ? endPath : legPath;
        }
    }
}
