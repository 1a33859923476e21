package org.nullpath.report;

import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

/**
 * Writes a plan's files into a staging folder beside the target folder and moves them into place only
 * when everything has been written, so that after any failure the target is exactly as it was and
 * nothing is left beside it. Files an earlier plan wrote into the same folder (listed in its
 * summary.json) that this plan does not write are removed when it is moved into place; other files in
 * the folder are left alone.
 */
public final class OutputFolder implements AutoCloseable {
    /** The key under which summary.json lists the files of its plan. */
    static final String FILES_KEY = "files";

    private final Path target;
    private final Path staging;
    private boolean committed;

    private OutputFolder(Path target, Path staging) {
        this.target = target;
        this.staging = staging;
    }

    /** Starts writing for {@code target} (which may or may not exist yet). */
    public static OutputFolder begin(Path target) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new IOException(target + " exists and is not a folder");
        }
        Path parent = abs.getParent();
        if (parent == null) {
            throw new IOException("cannot write into the root folder");
        }
        Files.createDirectories(parent);
        Path staging = Files.createTempDirectory(parent, "." + abs.getFileName() + ".nullpath-");
        return new OutputFolder(abs, staging);
    }

    /** The names of the files staged so far, sorted. */
    public List<String> stagedNames() throws IOException {
        List<String> names = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(staging)) {
            ds.forEach(p -> names.add(p.getFileName().toString()));
        }
        names.sort(Comparator.naturalOrder());
        return names;
    }

    /**
     * The files an earlier plan listed in its summary.json in {@code dir} (plain names only; nothing when
     * there is no readable summary), so that files this plan no longer writes can be removed.
     */
    private static List<String> earlierPlanFiles(Path dir) {
        Path summary = dir.resolve(org.nullpath.mission.OutputNames.SUMMARY);
        List<String> names = new ArrayList<>();
        if (!Files.isRegularFile(summary)) {
            return names;
        }
        try {
            com.fasterxml.jackson.databind.JsonNode files = new com.fasterxml.jackson.databind.ObjectMapper()
                    .readTree(summary.toFile()).get(FILES_KEY);
            if (files != null && files.isArray()) {
                for (com.fasterxml.jackson.databind.JsonNode f : files) {
                    String n = f.asText();
                    if (!n.isEmpty() && !n.contains("/") && !n.contains("\\") && !n.startsWith(".")) {
                        names.add(n);
                    }
                }
            }
        } catch (IOException e) {
            // not a summary we wrote: remove nothing
        }
        return names;
    }

    /** The path to write a file named {@code name} to (inside the staging folder). */
    public Path file(String name) {
        return staging.resolve(name);
    }

    /** Moves every staged file into the target folder. */
    public void commit() throws IOException {
        if (!Files.exists(target)) {
            try {
                Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
                committed = true;
                return;
            } catch (AtomicMoveNotSupportedException e) {
                // fall back to moving file by file below
            }
            Files.createDirectories(target);
        }
        List<Path> files = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(staging)) {
            ds.forEach(files::add);
        }
        files.sort(Comparator.naturalOrder());
        List<String> staged = stagedNames();
        for (String old : earlierPlanFiles(target)) {
            if (!staged.contains(old)) {
                Files.deleteIfExists(target.resolve(old)); // written by an earlier plan, not by this one
            }
        }
        for (Path f : files) {
            Path dest = target.resolve(f.getFileName().toString());
            try {
                Files.move(f, dest, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(f, dest, StandardCopyOption.REPLACE_EXISTING);
            }
        }
        Files.deleteIfExists(staging);
        committed = true;
    }

    /** Removes the staging folder unless committed. */
    @Override
    public void close() throws IOException {
        if (!committed && Files.exists(staging)) {
            try (Stream<Path> walk = Files.walk(staging)) {
                for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }
}
