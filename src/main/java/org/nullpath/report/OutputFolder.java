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
 * nothing is left beside it.
 */
public final class OutputFolder implements AutoCloseable {
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
