package org.nullpath.report;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ConcurrentHashMap;

import com.fasterxml.jackson.databind.JsonNode;
import org.nullpath.mission.OutputNames;

/**
 * Writes a plan's files into the target folder so that it holds either the earlier plan's files or this
 * plan's, never a mixture, whatever moment the process is stopped at (docs/output-files.md, "How DIR is
 * written"):
 *
 * <ul>
 * <li>the plan takes the folder's {@link FolderLock} (a second plan into the folder waits), then finishes
 *     what an earlier, killed plan left there ({@link CommitJournal#recover});</li>
 * <li>files are written into a hidden staging folder inside the target, so on the target's own file
 *     system: every later move is a rename;</li>
 * <li>{@link #commit()} checks every place a file goes, writes the {@link CommitJournal} (from then on
 *     the new plan is decided) and carries it out;</li>
 * <li>a shutdown hook removes the staging folder when the process is asked to stop (SIGTERM, SIGINT)
 *     before the commit, and lets a commit under way finish; after a hard kill the next plan does both.</li>
 * </ul>
 *
 * <p>An earlier plan's files are removed only when nullpath can prove it wrote them: the earlier
 * summary.json lists each file with the SHA-256 digest of its content, and a file this plan does not
 * write is removed only when it is still a regular file with that digest and not an input of this plan.
 * The folder and its files get the permissions the user's umask gives.
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
     * @param inputs   files an earlier plan listed, unchanged, left alone because this plan reads them
     */
    public record Commit(List<String> replaced, List<String> removed, List<String> kept, List<String> inputs) {
        public Commit {
            replaced = List.copyOf(replaced);
            removed = List.copyOf(removed);
            kept = List.copyOf(kept);
            inputs = List.copyOf(inputs);
        }

        /** What committing did, no earlier file left alone for being an input. */
        public Commit(List<String> replaced, List<String> removed, List<String> kept) {
            this(replaced, removed, kept, List.of());
        }
    }

    /** A target the plan cannot write to as asked (a usage error: nothing was changed). */
    public static final class Refused extends IOException {
        private static final long serialVersionUID = 1L;

        Refused(String message) {
            super(message);
        }
    }

    private final Path target;
    private final Path staging;
    /** Digests taken while writing, by staged file name (see {@link #create}). */
    private final Map<String, CommitJournal.Digested> digested = new ConcurrentHashMap<>();
    private final Path firstCreated;
    private final List<Path> inputs;
    private final FolderLock lock;
    private final Thread onStop = new Thread(this::stop, "nullpath-output-cleanup");
    private CommitJournal.Steps steps = CommitJournal.Steps.NONE;
    private boolean committed;
    private boolean closed;

    private OutputFolder(Path target, Path staging, Path firstCreated, List<Path> inputs, FolderLock lock) {
        this.target = target;
        this.staging = staging;
        this.firstCreated = firstCreated;
        this.inputs = inputs;
        this.lock = lock;
    }

    /**
     * Refuses a target no plan can be written to: an empty name, the root folder, or something that exists
     * and is not a folder (a file, a device such as /dev/null).
     */
    public static Path checkTarget(Path target) throws Refused {
        if (target.toString().isBlank()) {
            throw new Refused("the output folder's name is empty");
        }
        Path abs = target.toAbsolutePath().normalize();
        if (abs.getParent() == null) {
            throw new Refused(target + " is the root folder; give a folder of its own for the plan's files");
        }
        if (Files.exists(abs) && !Files.isDirectory(abs)) {
            throw new Refused(target + " exists and is not a folder");
        }
        for (Path p = abs.getParent(); p != null; p = p.getParent()) {
            if (Files.exists(p)) {
                if (!Files.isDirectory(p)) {
                    throw new Refused(target + " lies under " + p + ", which is not a folder");
                }
                break;
            }
        }
        return abs;
    }

    /** Starts writing for {@code target} (which may or may not exist yet), protecting no input files. */
    public static OutputFolder begin(Path target) throws IOException {
        return begin(target, List.of(), () -> { });
    }

    /**
     * Starts writing for {@code target}: creates it if missing, takes its lock (running {@code onWait} once
     * if another plan holds it, then waiting), finishes or clears what a killed plan left there and makes
     * the staging folder. No file of {@code inputs} will be replaced or removed.
     */
    public static OutputFolder begin(Path target, Collection<Path> inputs, Runnable onWait) throws IOException {
        Path abs = checkTarget(target);
        Path firstCreated = null;
        for (Path p = abs; p != null && !Files.exists(p, LinkOption.NOFOLLOW_LINKS); p = p.getParent()) {
            firstCreated = p;
        }
        Files.createDirectories(abs);
        FolderLock lock = FolderLock.acquire(abs, onWait);
        try {
            CommitJournal.recover(abs);
            SecureRandom random = new SecureRandom();
            for (int attempt = 0; ; attempt++) {
                String name = CommitJournal.STAGE_PREFIX + Long.toUnsignedString(random.nextLong(), 36);
                try {
                    Path staging = Files.createDirectory(abs.resolve(name)); // the umask decides who may read it
                    List<Path> in = new ArrayList<>();
                    for (Path p : inputs) {
                        in.add(p.toAbsolutePath().normalize());
                    }
                    OutputFolder f = new OutputFolder(abs, staging, firstCreated, List.copyOf(in), lock);
                    Runtime.getRuntime().addShutdownHook(f.onStop);
                    return f;
                } catch (FileAlreadyExistsException e) {
                    if (attempt >= 16) {
                        throw e;
                    }
                }
            }
        } catch (IOException | RuntimeException e) {
            lock.close();
            removeCreated(abs, firstCreated);
            throw e;
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
            JsonNode written = JsonText.read(summary).get(DIGESTS_KEY);
            if (written != null && written.isObject()) {
                written.fields().forEachRemaining(e -> {
                    String n = e.getKey();
                    if (CommitJournal.plainName(n) && e.getValue().isTextual()) {
                        digests.put(n, e.getValue().asText());
                    }
                });
            }
        } catch (IOException e) {
            // not a summary we wrote: remove nothing
        }
        return digests;
    }

    /** SHA-256 digests (hex) of the files staged so far, by name. */
    public Map<String, String> stagedDigests() throws IOException {
        Map<String, String> out = new TreeMap<>();
        for (String n : stagedNames()) {
            Path f = staging.resolve(n);
            CommitJournal.Digested d = digested.get(n);
            out.put(n, d != null && d.bytes() == Files.size(f) ? d.sha256() : CommitJournal.sha256(f));
        }
        return out;
    }

    /**
     * Opens the staged file {@code name} for writing; its SHA-256 digest is taken from the bytes as they are
     * written, so that {@link #stagedDigests} need not read a large file again.
     */
    public OutputStream create(String name) throws IOException {
        return CommitJournal.digesting(Files.newOutputStream(file(name)), d -> digested.put(name, d));
    }

    /** The path to write a file named {@code name} to (inside the staging folder). */
    public Path file(String name) {
        return staging.resolve(name);
    }

    /** Lets a test stop the commit after a given step, as a kill would. */
    void watchSteps(CommitJournal.Steps watcher) {
        this.steps = watcher;
    }

    /**
     * Moves every staged file into the target folder; says what it replaced, removed and left alone.
     *
     * @throws Refused when a folder, link or other non-plain file, or an input of this plan, stands where
     *                 an output file goes (nothing has been moved then)
     */
    public synchronized Commit commit() throws IOException {
        if (closed) {
            throw new IOException("stopped before its files were moved into " + target);
        }
        List<String> staged = stagedNames();
        List<String> blocked = new ArrayList<>();
        List<String> replaced = new ArrayList<>();
        for (String name : staged) {
            Path dest = target.resolve(name);
            if (isInput(dest)) {
                blocked.add(name + " (an input of this plan)");
            } else if (Files.exists(dest, LinkOption.NOFOLLOW_LINKS)) {
                if (Files.isRegularFile(dest, LinkOption.NOFOLLOW_LINKS)) {
                    replaced.add(name);
                } else {
                    blocked.add(name + (Files.isDirectory(dest, LinkOption.NOFOLLOW_LINKS) ? " (a folder)"
                            : Files.isSymbolicLink(dest) ? " (a link)" : " (not a plain file)"));
                }
            }
        }
        if (!blocked.isEmpty()) {
            throw new Refused("in " + target + ", where the plan writes its files, stands " + String.join(", ", blocked)
                    + "; nothing was changed (move it away or choose another folder)");
        }
        Map<String, String> removals = new TreeMap<>();
        List<String> kept = new ArrayList<>();
        List<String> read = new ArrayList<>();
        for (Map.Entry<String, String> old : earlierPlanFiles(target).entrySet()) {
            Path f = target.resolve(old.getKey());
            if (staged.contains(old.getKey()) || !Files.exists(f, LinkOption.NOFOLLOW_LINKS)) {
                continue;
            }
            if (!Files.isRegularFile(f, LinkOption.NOFOLLOW_LINKS) || !CommitJournal.sha256(f).equals(old.getValue())) {
                kept.add(old.getKey());
            } else if (isInput(f)) {
                read.add(old.getKey());
            } else {
                removals.put(old.getKey(), old.getValue()); // written by an earlier plan, unchanged since, and not by this one
            }
        }
        List<String> moves = new ArrayList<>(staged);
        if (moves.remove(OutputNames.SUMMARY)) {
            moves.add(OutputNames.SUMMARY); // last: the summary is there only when the rest is
        }
        CommitJournal.Plan plan = new CommitJournal.Plan(staging.getFileName().toString(), moves, removals);
        CommitJournal.write(target, plan, steps);
        committed = true;
        try {
            CommitJournal.carryOut(target, plan, steps);
        } catch (IOException e) {
            throw new IOException(e.getMessage() + " (this plan's files are all staged and recorded in "
                    + target.resolve(CommitJournal.NAME) + ": the next plan into the folder moves them in first)", e);
        }
        return new Commit(replaced, new ArrayList<>(removals.keySet()), kept, read);
    }

    private boolean isInput(Path p) {
        Path n = p.toAbsolutePath().normalize();
        for (Path in : inputs) {
            try {
                if (n.equals(in) || (Files.exists(n) && Files.exists(in) && Files.isSameFile(n, in))) {
                    return true;
                }
            } catch (IOException e) {
                return true; // cannot tell: treat it as one
            }
        }
        return false;
    }

    /** Removes the staging folder unless committed, gives up the lock, removes a target it created for nothing. */
    @Override
    public synchronized void close() throws IOException {
        if (closed) {
            return;
        }
        closed = true;
        try {
            Runtime.getRuntime().removeShutdownHook(onStop);
        } catch (IllegalStateException e) {
            // shutting down: the hook is this very call, or has made it
        }
        try {
            for (int attempt = 0; !committed && Files.exists(staging, LinkOption.NOFOLLOW_LINKS); attempt++) {
                try {
                    CommitJournal.deleteTree(staging);
                } catch (IOException e) {
                    if (attempt >= 4) {
                        throw e; // the writer (stopping) keeps adding files; the next plan removes the rest
                    }
                }
            }
        } finally {
            lock.close();
            if (!committed) {
                removeCreated(target, firstCreated);
            }
        }
    }

    /** The shutdown hook: waits for a commit under way (it holds the monitor), else drops the staging. */
    private void stop() {
        try {
            close(); // the writer may still be adding files while this runs: close() tries again
        } catch (IOException | RuntimeException e) {
            // nothing more can be done while the process stops; the next plan clears what is left
        }
    }

    /** Gives up the lock and leaves everything else where it is, as a killed process does (tests only). */
    synchronized void abandonAsIfKilled() throws IOException {
        closed = true;
        Runtime.getRuntime().removeShutdownHook(onStop);
        lock.dropAsIfKilled();
    }

    /** Removes the folders from {@code dir} up to {@code firstCreated} while they are empty. */
    private static void removeCreated(Path dir, Path firstCreated) {
        if (firstCreated == null) {
            return;
        }
        for (Path p = dir; p != null && p.startsWith(firstCreated); p = p.getParent()) {
            try {
                Files.deleteIfExists(p);
            } catch (IOException e) {
                return; // not empty (someone else's files): leave it
            }
        }
    }
}
