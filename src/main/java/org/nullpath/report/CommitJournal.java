package org.nullpath.report;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * The record, kept in the output folder while a plan's files are moved into it, of what the move is to
 * do: which staged files go where and which earlier files are removed. It is written whole (to a side
 * name, flushed to disk, then renamed) before the first file moves; from then on the new plan is decided,
 * and whoever finds the record (the plan itself, or the next plan into the folder after a kill) carries it
 * out to the end. Each step can be done again without harm, so a kill while carrying it out is harmless too.
 */
final class CommitJournal {
    /** The record's name inside the output folder. */
    static final String NAME = ".nullpath-journal";
    /** The name it is written under before it counts. */
    static final String DRAFT = NAME + ".new";
    /** What a staging folder's name inside the output folder starts with. */
    static final String STAGE_PREFIX = ".nullpath-stage-";

    /** Told of each step of a commit as it is done (tests stop a commit there, as a kill would). */
    @FunctionalInterface
    interface Steps {
        Steps NONE = step -> { };

        void done(String step) throws IOException;
    }

    /**
     * What one commit does.
     *
     * @param stage    the staging folder's name inside the output folder
     * @param moves    the staged files, in the order moved (summary.json last)
     * @param removals earlier plans' files to remove, each with the digest it must still have
     */
    record Plan(String stage, List<String> moves, Map<String, String> removals) {
        Plan {
            moves = List.copyOf(moves);
            removals = new TreeMap<>(removals);
        }
    }

    private CommitJournal() {
    }

    /** Writes the record for {@code plan} into {@code dir}; once this returns, the commit is decided. */
    static void write(Path dir, Plan plan, Steps steps) throws IOException {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("stage", plan.stage());
        root.put("move", plan.moves());
        root.put("remove", plan.removals());
        Path draft = dir.resolve(DRAFT);
        try (FileChannel ch = FileChannel.open(draft, StandardOpenOption.CREATE, StandardOpenOption.TRUNCATE_EXISTING,
                StandardOpenOption.WRITE)) {
            ByteBuffer b = ByteBuffer.wrap(JsonText.compact(root));
            while (b.hasRemaining()) {
                ch.write(b);
            }
            ch.force(true);
        }
        steps.done("journal drafted");
        Files.move(draft, dir.resolve(NAME), StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        steps.done("journal in place");
    }

    /**
     * Brings {@code dir} to a whole state, under its lock: a decided commit that was cut short is carried
     * out, a draft record is dropped, and every staging folder is removed (their owners are gone, or the
     * caller would not hold the lock).
     */
    static void recover(Path dir) throws IOException {
        Path record = dir.resolve(NAME);
        if (Files.isRegularFile(record, LinkOption.NOFOLLOW_LINKS)) {
            carryOut(dir, read(record), Steps.NONE);
        }
        Files.deleteIfExists(dir.resolve(DRAFT));
        List<Path> stale = new ArrayList<>();
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, p -> p.getFileName().toString().startsWith(STAGE_PREFIX))) {
            ds.forEach(stale::add);
        }
        for (Path p : stale) {
            if (Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS)) {
                deleteTree(p);
            }
        }
    }

    private static Plan read(Path record) throws IOException {
        JsonNode root;
        try {
            root = JsonText.read(record);
        } catch (IOException e) {
            throw new IOException(record + " (left by an interrupted plan) cannot be read: " + e.getMessage(), e);
        }
        String stage = root.path("stage").asText("");
        if (!stage.startsWith(STAGE_PREFIX) || stage.contains("/") || stage.contains("\\")) {
            throw new IOException(record + " (left by an interrupted plan) names no staging folder of nullpath's");
        }
        List<String> moves = new ArrayList<>();
        root.path("move").forEach(n -> moves.add(n.asText()));
        Map<String, String> removals = new TreeMap<>();
        root.path("remove").fields().forEachRemaining(e -> removals.put(e.getKey(), e.getValue().asText()));
        for (String n : moves) {
            checkPlain(record, n);
        }
        for (String n : removals.keySet()) {
            checkPlain(record, n);
        }
        return new Plan(stage, moves, removals);
    }

    private static void checkPlain(Path record, String name) throws IOException {
        if (!plainName(name)) {
            throw new IOException(record + " (left by an interrupted plan) names '" + name + "', not a plain file name");
        }
    }

    /** Moves, removes, drops the staging folder and the record, telling {@code steps} of each. */
    static void carryOut(Path dir, Plan plan, Steps steps) throws IOException {
        Path stage = dir.resolve(plan.stage());
        for (String name : plan.moves()) {
            Path from = stage.resolve(name);
            if (Files.exists(from, LinkOption.NOFOLLOW_LINKS)) { // else moved before a kill
                Path to = dir.resolve(name);
                try {
                    Files.move(from, to, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
                } catch (AtomicMoveNotSupportedException e) {
                    Files.move(from, to, StandardCopyOption.REPLACE_EXISTING); // same folder: a rename all the same
                }
            }
            steps.done("moved " + name);
        }
        for (Map.Entry<String, String> old : plan.removals().entrySet()) {
            Path f = dir.resolve(old.getKey());
            if (Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS) && sha256(f).equals(old.getValue())) {
                Files.delete(f);
            }
            steps.done("removed " + old.getKey());
        }
        if (Files.exists(stage, LinkOption.NOFOLLOW_LINKS)) {
            deleteTree(stage);
        }
        steps.done("staging removed");
        Files.deleteIfExists(dir.resolve(NAME));
        steps.done("journal removed");
    }

    /** Whether {@code n} names a file right inside a folder (no folders, not hidden, not a special name). */
    static boolean plainName(String n) {
        return !n.isEmpty() && !n.contains("/") && !n.contains("\\") && !n.startsWith(".") && !n.equals("..");
    }

    /** Removes a folder and everything in it (links are removed, not followed). */
    static void deleteTree(Path root) throws IOException {
        try (Stream<Path> walk = Files.walk(root)) {
            for (Path p : walk.sorted(Comparator.reverseOrder()).toList()) {
                try {
                    Files.deleteIfExists(p);
                } catch (NoSuchFileException e) {
                    // gone already
                }
            }
        }
    }

    /** A file's SHA-256 digest (lower-case hex) as it was written, and how many bytes it had then. */
    record Digested(String sha256, long bytes) {
    }

    /** {@code out}, digesting what passes through it; {@code done} gets the digest when it is closed. */
    static OutputStream digesting(OutputStream out, java.util.function.Consumer<Digested> done) {
        MessageDigest md = newSha256();
        return new OutputStream() {
            private long bytes;

            @Override
            public void write(int b) throws IOException {
                out.write(b);
                md.update((byte) b);
                bytes++;
            }

            @Override
            public void write(byte[] b, int off, int len) throws IOException {
                out.write(b, off, len);
                md.update(b, off, len);
                bytes += len;
            }

            @Override
            public void flush() throws IOException {
                out.flush();
            }

            @Override
            public void close() throws IOException {
                out.close();
                done.accept(new Digested(HexFormat.of().formatHex(md.digest()), bytes));
            }
        };
    }

    private static MessageDigest newSha256() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java has SHA-256", e);
        }
    }

    /** The SHA-256 digest of a file's content, in lower-case hex. */
    static String sha256(Path file) throws IOException {
        MessageDigest md = newSha256();
        try (InputStream in = Files.newInputStream(file, LinkOption.NOFOLLOW_LINKS)) {
            byte[] buf = new byte[1 << 16];
            for (int n; (n = in.read(buf)) > 0; ) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }
}
