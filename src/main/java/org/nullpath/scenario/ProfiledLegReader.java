package org.nullpath.scenario;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.mission.Station;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;

/**
 * Reads the profiled legs of contract.md ("Profiled legs"): {@code rocket} (constant proper
 * acceleration with exhaust speed and mass ratio, or constant thrust with initial and burnout mass),
 * {@code sail} (pushed by a beam from a station) and {@code profile} (a CSV table of acceleration).
 */
final class ProfiledLegReader {
    /** Largest profile table read, in bytes. */
    static final long MAX_PROFILE_BYTES = 16L * 1024 * 1024;
    static final String CLOCK_COLUMN = "clock_s";
    static final String ACCELERATION_COLUMN = "acceleration_m_s2";

    private ProfiledLegReader() {
    }

    static LegSpec rocket(Node n, String path, Values values, CraftReader.LegSite[] site) {
        Fields f = Fields.of(n, path, values, "a rocket leg", CraftReader.ROCKET_KEYS);
        if (!f.ok()) {
            return null;
        }
        boolean thrust = f.has("thrust");
        if (thrust && f.has("acceleration")) {
            f.problemAt("thrust", "a rocket leg holds either a constant acceleration (with mass-ratio) or a constant"
                    + " thrust (with initial-mass and burnout-mass), not both");
            return null;
        }
        double ve = f.quantity("exhaust-speed", Dimension.SPEED);
        if (!Double.isNaN(ve) && !(ve > 0 && ve <= Constants.C)) {
            f.problemAt("exhaust-speed", "the exhaust speed must be above 0 and at most c, got "
                    + Values.format(ve / Constants.C) + " c");
            ve = Double.NaN;
        }
        site[0] = new CraftReader.LegSite(n, path, null, null);
        if (thrust) {
            for (String k : List.of("acceleration", "mass-ratio")) {
                if (f.has(k)) {
                    f.problemAt(k, "'" + k + "' belongs to a constant-acceleration rocket; a constant-thrust rocket"
                            + " takes thrust, initial-mass, burnout-mass and exhaust-speed");
                    return null;
                }
            }
            double force = f.quantity("thrust", Dimension.FORCE);
            double m0 = f.quantity("initial-mass", Dimension.MASS);
            double m1 = f.quantity("burnout-mass", Dimension.MASS);
            if (force == 0) {
                f.problemAt("thrust", "the thrust must not be zero; use a coast leg for unpowered flight");
                return null;
            }
            if (!Double.isNaN(m1) && !(m1 > 0)) {
                f.problemAt("burnout-mass", "the burnout mass must be positive, got " + Values.format(m1) + " kg");
                return null;
            }
            if (!Double.isNaN(m0) && !Double.isNaN(m1) && !(m1 < m0)) {
                f.problemAt("burnout-mass", "the burnout mass (" + Values.format(m1) + " kg) must be below the initial"
                        + " mass (" + Values.format(m0) + " kg)");
                return null;
            }
            if (Double.isNaN(force) || Double.isNaN(m0) || Double.isNaN(m1) || Double.isNaN(ve)) {
                return null;
            }
            return new LegSpec.ThrustRocket(force, m0, m1, ve);
        }
        for (String k : List.of("initial-mass", "burnout-mass")) {
            if (f.has(k)) {
                f.problemAt(k, "'" + k + "' belongs to a constant-thrust rocket (with thrust); a constant-acceleration"
                        + " rocket takes acceleration, exhaust-speed and mass-ratio");
                return null;
            }
        }
        double a = f.quantity("acceleration", Dimension.ACCELERATION);
        double ratio = f.number("mass-ratio");
        if (a == 0) {
            f.problemAt("acceleration", "a rocket needs a non-zero acceleration");
            return null;
        }
        if (!Double.isNaN(ratio) && !(ratio > 1)) {
            f.problemAt("mass-ratio", "the mass ratio (initial over final mass) must be greater than 1, got "
                    + Values.format(ratio));
            return null;
        }
        if (Double.isNaN(a) || Double.isNaN(ratio) || Double.isNaN(ve)) {
            return null;
        }
        return new LegSpec.Rocket(a, ve, ratio);
    }

    static LegSpec sail(Node n, String path, Values values, CraftReader.LegSite[] site,
                        Map<String, Station> stations) {
        Fields f = Fields.of(n, path, values, "a sail leg", CraftReader.SAIL_KEYS);
        if (!f.ok()) {
            return null;
        }
        String from = f.text("beam-from", "the name of the station that beams");
        InertialWorldline station = null;
        if (from != null) {
            Station node = stations.get(from);
            if (node == null) {
                List<String> names = new ArrayList<>(stations.keySet());
                String hint = Spelling.closest(from, names);
                f.problemAt("beam-from", "'" + from + "' is not a station of this scenario"
                        + (hint != null ? " (did you mean '" + hint + "'?)" : ""));
            } else {
                station = node.worldline();
            }
        }
        double power = f.quantity("beam-power", Dimension.POWER);
        double mass = f.quantity("mass", Dimension.MASS);
        double reflectivity = f.number("reflectivity", 1.0);
        double off = f.quantity("beam-off", Dimension.TIME);
        if (!Double.isNaN(power) && !(power > 0)) {
            f.problemAt("beam-power", "the beam power must be positive");
            return null;
        }
        if (!Double.isNaN(mass) && !(mass > 0)) {
            f.problemAt("mass", "the sail's mass must be positive");
            return null;
        }
        if (!Double.isNaN(reflectivity) && !(reflectivity >= 0 && reflectivity <= 1)) {
            f.problemAt("reflectivity", "the reflectivity must lie between 0 (absorbing) and 1 (a perfect mirror), got "
                    + Values.format(reflectivity));
            return null;
        }
        if (station == null || Double.isNaN(power) || Double.isNaN(mass) || Double.isNaN(reflectivity)
                || Double.isNaN(off)) {
            return null;
        }
        site[0] = new CraftReader.LegSite(n, path, f.get("beam-from"), f.path("beam-from"));
        return new LegSpec.Sail(station, power, mass, reflectivity, off);
    }

    static LegSpec profile(Node n, String path, Values values, CraftReader.LegSite[] site, Path scenarioFile) {
        Fields f = Fields.of(n, path, values, "a profile leg", CraftReader.PROFILE_KEYS);
        if (!f.ok()) {
            return null;
        }
        String name = f.text("file", "the path of a CSV table of clock_s and acceleration_m_s2");
        if (name == null) {
            return null;
        }
        Path file;
        try {
            file = Path.of(name);
            if (!file.isAbsolute()) {
                Path dir = scenarioFile.toAbsolutePath().getParent();
                file = dir == null ? file : dir.resolve(file);
            }
        } catch (InvalidPathException e) {
            f.problemAt("file", "'" + name + "' is not a usable path");
            return null;
        }
        String problem;
        List<double[]> rows = new ArrayList<>();
        problem = readTable(file, name, rows);
        if (problem != null) {
            f.problemAt("file", problem);
            return null;
        }
        double[] clocks = new double[rows.size()];
        double[] accelerations = new double[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            clocks[i] = rows.get(i)[0];
            accelerations[i] = rows.get(i)[1];
        }
        site[0] = new CraftReader.LegSite(n, path, f.get("file"), f.path("file"));
        return new LegSpec.Profile(clocks, accelerations);
    }

    /** Reads the table into {@code rows}; returns a problem naming the file, row and column, or null. */
    private static String readTable(Path file, String name, List<double[]> rows) {
        if (!Files.isRegularFile(file)) {
            return "profile table '" + name + "' not found (looked for " + file + ")";
        }
        try {
            if (Files.size(file) > MAX_PROFILE_BYTES) {
                return "profile table '" + name + "' is larger than " + MAX_PROFILE_BYTES / (1024 * 1024) + " MiB";
            }
        } catch (IOException e) {
            return "profile table '" + name + "' cannot be read: " + e.getMessage();
        }
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setTrim(true)
                .setIgnoreEmptyLines(true).get();
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8); CSVParser parser = format.parse(r)) {
            List<String> header = parser.getHeaderNames();
            for (String column : List.of(CLOCK_COLUMN, ACCELERATION_COLUMN)) {
                if (!header.contains(column)) {
                    return name + ": the header needs the columns " + CLOCK_COLUMN + " and " + ACCELERATION_COLUMN
                            + ", found " + header;
                }
            }
            double previous = Double.NEGATIVE_INFINITY;
            for (CSVRecord rec : parser) {
                long row = rec.getRecordNumber() + 1; // the header is row 1
                double[] v = new double[2];
                String[] columns = {CLOCK_COLUMN, ACCELERATION_COLUMN};
                for (int k = 0; k < 2; k++) {
                    String cell = rec.isMapped(columns[k]) && rec.isSet(columns[k]) ? rec.get(columns[k]) : "";
                    try {
                        v[k] = Double.parseDouble(cell);
                    } catch (NumberFormatException e) {
                        return name + ": row " + row + ", column " + columns[k] + ": expected a number, got '" + cell + "'";
                    }
                    if (!Double.isFinite(v[k])) {
                        return name + ": row " + row + ", column " + columns[k] + ": expected a finite number, got '"
                                + cell + "'";
                    }
                }
                if (rows.isEmpty() && v[0] != 0) {
                    return name + ": row " + row + ", column " + CLOCK_COLUMN + ": the first sample must be at clock 0"
                            + " (the leg start), got " + Values.format(v[0]);
                }
                if (!(v[0] > previous)) {
                    return name + ": row " + row + ", column " + CLOCK_COLUMN + ": clock values must increase strictly"
                            + " (got " + Values.format(v[0]) + " after " + Values.format(previous) + ")";
                }
                previous = v[0];
                rows.add(v);
            }
        } catch (IOException | IllegalArgumentException | IllegalStateException e) {
            return "profile table '" + name + "' cannot be read as CSV: " + e.getMessage();
        }
        if (rows.size() < 2) {
            return name + ": a profile needs at least two samples, found " + rows.size();
        }
        return null;
    }
}
