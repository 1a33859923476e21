package org.nullpath.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.nullpath.mission.OutputNames;

/**
 * Writes a plan's files into a staging folder beside the target folder and moves them into place only
 * when everything has been written, so that after any failure the target is exactly as it was and
 * nothing is left beside it. The folder and its files get the permissions the user's umask gives, like
 * any other file tool's.
 *
 * <p>An earlier plan's files are removed only when nullpath can prove it wrote them: the earlier
 * summary.json lists each file with the SHA-256 digest of its content, and a file this plan does not
 * write is removed only when it is still a regular file with that digest. Anything else in the folder is
 * left alone; {@link #commit()} says what was replaced, removed and left.
 */
public final class OutputFolder implements AutoCloseable {
    /** The key under which summary.json lists the files of its plan. */
    static final String FILES_KEY = "files";

    /** The key under which summary.json gives each file's SHA-256 digest (hex), summary.json itself aside. */
    static final String DIGESTS_KEY = "file_sha256";

    /**
     * What committing did to the target folder.
     *
     * @param replaced files of the target that this plan's files replaced
     * @param removed  files an earlier plan wrote, unchanged since, that this plan does not write
     * @param kept     files an earlier plan listed that this plan does not write, left alone because they
     *                 changed since (or are no longer plain files)
     */
    public record Commit(List<String> replaced, List<String> removed, List<String> kept) {
        public Commit {
            replaced = List.copyOf(replaced);
            removed = List.copyOf(removed);
            kept = List.copyOf(kept);
        }
    }

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
        // created like any folder (the umask decides who may read it), under a name no one else picks
        SecureRandom random = new SecureRandom();
        for (int attempt = 0; ; attempt++) {
            Path staging = parent.resolve("." + abs.getFileName() + ".nullpath-" + Long.toUnsignedString(random.nextLong(), 36));
            try {
                return new OutputFolder(abs, Files.createDirectory(staging));
            } catch (FileAlreadyExistsException e) {
                if (attempt >= 16) {
                    throw e;
                }
            }
        }
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
     * The files an earlier plan recorded in its summary.json in {@code dir}, each with the SHA-256 digest of
     * the content it wrote (plain names only; nothing when there is no readable summary or it has no
     * digests): the only files a later plan may remove.
     */
    private static Map<String, String> earlierPlanFiles(Path dir) {
        Path summary = dir.resolve(OutputNames.SUMMARY);
        Map<String, String> digests = new TreeMap<>();
        if (!Files.isRegularFile(summary, LinkOption.NOFOLLOW_LINKS)) {
            return digests;
        }
        try {
            JsonNode written = new ObjectMapper().readTree(summary.toFile()).get(DIGESTS_KEY);
            if (written != null && written.isObject()) {
                written.fields().forEachRemaining(e -> {
                    String n = e.getKey();
                    if (plainName(n) && e.getValue().isTextual()) {
                        digests.put(n, e.getValue().asText());
                    }
                });
            }
        } catch (IOException e) {
            // not a summary we wrote: remove nothing
        }
        return digests;
    }

    private static boolean plainName(String n) {
        return !n.isEmpty() && !n.contains("/") && !n.contains("\\") && !n.startsWith(".") && !n.equals("..");
    }

    /** SHA-256 digests (hex) of the files staged so far, by name. */
    public Map<String, String> stagedDigests() throws IOException {
        Map<String, String> out = new TreeMap<>();
        for (String n : stagedNames()) {
            out.put(n, sha256(staging.resolve(n)));
        }
        return out;
    }

    /** The SHA-256 digest of a file's content, in lower-case hex. */
    static String sha256(Path file) throws IOException {
        MessageDigest md;
        try {
            md = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java has SHA-256", e);
        }
        try (InputStream in = Files.newInputStream(file, LinkOption.NOFOLLOW_LINKS)) {
            byte[] buf = new byte[1 << 16];
            for (int n; (n = in.read(buf)) > 0; ) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }

    /** The path to write a file named {@code name} to (inside the staging folder). */
    public Path file(String name) {
        return staging.resolve(name);
    }

    /** Moves every staged file into the target folder; says what it replaced, removed and left alone. */
    public Commit commit() throws IOException {
        if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            try {
                Files.move(staging, target, StandardCopyOption.ATOMIC_MOVE);
                committed = true;
                return new Commit(List.of(), List.of(), List.of());
            } catch (AtomicMoveNotSupportedException e) {
                // fall back to moving file by file below
            }
            Files.createDirectories(target);
        }
        List<String> staged = stagedNames();
        List<String> replaced = new ArrayList<>();
        List<String> removed = new ArrayList<>();
        List<String> kept = new ArrayList<>();
        for (Map.Entry<String, String> old : earlierPlanFiles(target).entrySet()) {
            if (staged.contains(old.getKey())) {
                continue;
            }
            Path f = target.resolve(old.getKey());
            if (!Files.exists(f, LinkOption.NOFOLLOW_LINKS)) {
                continue;
            }
            if (Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS) && sha256(f).equals(old.getValue())) {
                Files.delete(f); // written by an earlier plan, unchanged since, and not by this one
                removed.add(old.getKey());
            } else {
                kept.add(old.getKey());
            }
        }
        for (String name : staged) {
            Path dest = target.resolve(name);
            if (Files.exists(dest, LinkOption.NOFOLLOW_LINKS)) {
                replaced.add(name);
            }
            try {
                Files.move(staging.resolve(name), dest, StandardCopyOption.REPLACE_EXISTING,
                        StandardCopyOption.ATOMIC_MOVE);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(staging.resolve(name), dest, StandardCopyOption.REPLACE_EXISTING);
            }
        }
        Files.deleteIfExists(staging);
        committed = true;
        return new Commit(replaced, removed, kept);
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
