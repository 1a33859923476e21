package org.nullpath.scenario;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.BasicFileAttributes;
import java.util.Arrays;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nullpath.units.Units;

/**
 * Reads a profile leg's table of proper acceleration (docs/scenario-format.md, "Profile tables"), against
 * hostile input: the table must be a regular file (not a folder, pipe or device), inside the scenario's
 * folder tree after symbolic links are resolved unless the run allows tables anywhere, at most
 * {@value #MAX_BYTES} bytes and {@value #MAX_ROWS} samples, streamed row by row; cells are plain decimal
 * numbers ({@link Units#NUMBER}); a problem echoes at most the offending cell, control characters escaped
 * and cut to {@value #MAX_ECHO} characters, and never the file's other contents.
 */
final class ProfileTable {
    /** Largest profile table read, in bytes (16 MiB). */
    static final long MAX_BYTES = 16L * 1024 * 1024;
    /** Most samples (rows after the header) a profile table may hold. */
    static final int MAX_ROWS = 100_000;
    /** Longest cell or path echoed in a problem, in characters. */
    static final int MAX_ECHO = 40;
    static final String CLOCK_COLUMN = "clock_s";
    static final String ACCELERATION_COLUMN = "acceleration_m_s2";
    private static final List<String> COLUMNS = List.of(CLOCK_COLUMN, ACCELERATION_COLUMN);

    /** The samples read and the file they came from (its real path), or the problem (one sentence) that stopped the reading. */
    record Read(double[] clocks, double[] accelerations, Path file, String problem) {
    }

    private ProfileTable() {
    }

    private static Read problem(String p) {
        return new Read(null, null, null, p);
    }

    /** {@code text} for a problem: control and format characters as backslash-u escapes, cut to {@code max} characters. */
    static String shown(String text, int max) {
        StringBuilder b = new StringBuilder();
        int n = 0;
        for (int i = 0; i < text.length(); i = text.offsetByCodePoints(i, 1)) {
            if (n == max) {
                return b.append("...").toString();
            }
            int cp = text.codePointAt(i);
            int type = Character.getType(cp);
            if (Character.isISOControl(cp) || type == Character.FORMAT || type == Character.LINE_SEPARATOR
                    || type == Character.PARAGRAPH_SEPARATOR || cp == '\\') {
                b.append(cp == '\\' ? "\\\\" : String.format("\\u%04x", cp));
            } else {
                b.appendCodePoint(cp);
            }
            n++;
        }
        return b.toString();
    }

    static String shown(String text) {
        return shown(text, MAX_ECHO);
    }

    /**
     * Reads the table {@code name} (as written in the scenario) for the scenario in {@code scenarioFile}.
     *
     * @param anywhere whether the table may lie outside the scenario's folder tree
     */
    static Read read(String name, Path scenarioFile, boolean anywhere) {
        String what = "profile table '" + shown(name, 200) + "'";
        Path file;
        Path folder;
        try {
            folder = scenarioFile.toAbsolutePath().getParent();
            file = Path.of(name);
            if (!file.isAbsolute()) {
                file = folder == null ? file.toAbsolutePath() : folder.resolve(file);
            }
        } catch (InvalidPathException e) {
            return problem("'" + shown(name, 200) + "' is not a usable path");
        }
        Path real;
        BasicFileAttributes kind;
        try {
            real = file.toRealPath();
            kind = Files.readAttributes(real, BasicFileAttributes.class, LinkOption.NOFOLLOW_LINKS);
        } catch (NoSuchFileException e) {
            return problem(what + " not found (looked for " + shown(file.toString(), 200) + ")");
        } catch (AccessDeniedException e) {
            return problem(what + " cannot be read: permission denied");
        } catch (IOException | SecurityException e) {
            return problem(what + " cannot be read");
        }
        if (kind.isDirectory()) {
            return problem(what + " is a folder, not a table");
        }
        if (!kind.isRegularFile()) {
            return problem(what + " is not a regular file (a pipe, device or socket cannot be a profile table)");
        }
        if (!anywhere) {
            Path root;
            try {
                root = folder == null ? Path.of("").toRealPath() : folder.toRealPath();
            } catch (IOException | SecurityException e) {
                return problem(what + ": the scenario's folder cannot be resolved");
            }
            if (!real.startsWith(root)) {
                return problem(what + " lies outside the scenario's folder and the folders below it (symbolic links"
                        + " resolved); move it there, or run nullpath with --tables-anywhere to allow it");
            }
        }
        if (kind.size() > MAX_BYTES) {
            return problem(what + " is larger than " + MAX_BYTES / (1024 * 1024) + " MiB");
        }
        return parse(real, shown(name, 200));
    }

    private static Read parse(Path file, String name) {
        CSVFormat format = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).setTrim(true)
                .setIgnoreEmptyLines(true).get();
        double[] clocks = new double[1024];
        double[] acc = new double[1024];
        int n = 0;
        long lastLine = 0;
        try (Reader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            CSVParser parser;
            try {
                parser = format.parse(r);
            } catch (IllegalArgumentException e) {
                return problem(name + ": the header (row 1) cannot be read: its column names must be distinct and not"
                        + " empty");
            } catch (IOException | UncheckedIOException | IllegalStateException e) {
                return problem(name + ": row 1 (the header), " + quoting(file, 0, List.of()));
            }
            List<String> header = parser.getHeaderNames();
            for (String column : COLUMNS) {
                if (!header.contains(column)) {
                    return problem(name + ": the header (row 1) needs the columns " + CLOCK_COLUMN + " and "
                            + ACCELERATION_COLUMN + "; it has no column " + column);
                }
            }
            lastLine = parser.getCurrentLineNumber();
            double previous = Double.NEGATIVE_INFINITY;
            var rows = parser.iterator();
            while (true) {
                CSVRecord rec;
                try {
                    if (!rows.hasNext()) {
                        break;
                    }
                    rec = rows.next();
                } catch (UncheckedIOException | IllegalStateException e) {
                    return problem(name + ": row " + (n + 2) + ", " + quoting(file, lastLine, header));
                }
                lastLine = parser.getCurrentLineNumber();
                long row = rec.getRecordNumber() + 1; // the header is row 1
                if (n == MAX_ROWS) {
                    return problem(name + ": row " + row + ": a profile table holds at most " + MAX_ROWS + " samples");
                }
                double[] v = new double[2];
                for (int k = 0; k < 2; k++) {
                    String column = COLUMNS.get(k);
                    String cell = rec.isMapped(column) && rec.isSet(column) ? rec.get(column) : "";
                    String at = name + ": row " + row + ", column " + column + ": ";
                    if (!Units.NUMBER.matcher(cell).matches()) {
                        return problem(at + "expected a number, got '" + shown(cell) + "' (plain decimals only, such as"
                                + " 9.81, -0.5 or 2e-3)");
                    }
                    v[k] = Double.parseDouble(cell);
                    if (!Double.isFinite(v[k])) {
                        return problem(at + "the number '" + shown(cell) + "' is beyond what double precision holds");
                    }
                }
                if (n == 0 && v[0] != 0) {
                    return problem(name + ": row " + row + ", column " + CLOCK_COLUMN + ": the first sample must be at"
                            + " clock 0 (the leg start), got " + Values.format(v[0]));
                }
                if (!(v[0] > previous)) {
                    return problem(name + ": row " + row + ", column " + CLOCK_COLUMN + ": clock values must increase"
                            + " strictly (got " + Values.format(v[0]) + " after " + Values.format(previous) + ")");
                }
                previous = v[0];
                if (n == clocks.length) {
                    clocks = Arrays.copyOf(clocks, 2 * n);
                    acc = Arrays.copyOf(acc, 2 * n);
                }
                clocks[n] = v[0];
                acc[n] = v[1];
                n++;
            }
        } catch (IOException | UncheckedIOException e) {
            return problem(name + " cannot be read");
        }
        if (n < 2) {
            return problem(name + ": a profile needs at least two samples, found " + n);
        }
        return new Read(Arrays.copyOf(clocks, n), Arrays.copyOf(acc, n), file, null);
    }

    /**
     * What is wrong with the quoting of the record that starts after line {@code after}: the column whose
     * quote is never closed when one is (the parser reads to the end of the file looking for it), else a
     * general sentence. Reads the file again up to that record; echoes nothing of it.
     */
    private static String quoting(Path file, long after, List<String> header) {
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line = null;
            for (long i = 0; i <= after; i++) {
                line = r.readLine();
            }
            while (line != null && line.isBlank()) {
                line = r.readLine();
            }
            if (line != null) {
                boolean quoted = false;
                int cell = 0;
                int opened = -1;
                for (int i = 0; i < line.length(); i++) {
                    char ch = line.charAt(i);
                    if (ch == '"') {
                        quoted = !quoted;
                        if (quoted) {
                            opened = cell;
                        }
                    } else if (ch == ',' && !quoted) {
                        cell++;
                    }
                }
                if (quoted) {
                    String column = opened < header.size() ? header.get(opened) : "number " + (opened + 1);
                    return "column " + shown(column) + ": a quoted cell is never closed (its closing \" is missing)";
                }
            }
        } catch (IOException | UncheckedIOException e) {
            // fall through to the general sentence
        }
        return "the row's quoting cannot be read (a \" inside a cell must be doubled, and a quoted cell closed)";
    }
}
