package org.nullpath.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A plan stopped at any step of writing into its folder, as a kill would stop it, leaves the folder such
 * that the next plan into it finds it wholly the earlier plan's (stopped before the journal was in place)
 * or wholly the stopped plan's (stopped after); nothing of nullpath's own is left behind. The file sets
 * are made up for this test (a.csv, b.csv, c.csv); the removal rule is the one docs/output-files.md states.
 */
class CommitAtEveryStepTest {
    @TempDir
    Path tmp;

    /** Stands for the process dying at that step. */
    private static final class Killed extends RuntimeException {
        Killed(String step) {
            super("killed after: " + step);
        }
    }

    /** The earlier plan: a.csv and b.csv, and a summary listing their digests. */
    private static final Map<String, String> OLD = Map.of("a.csv", "old a\n", "b.csv", "old b\n");
    /** The later plan: a.csv (new content) and c.csv; b.csv is no longer written. */
    private static final Map<String, String> NEW = Map.of("a.csv", "new a\n", "c.csv", "new c\n");

    private static OutputFolder stage(Path dir, Map<String, String> files) throws IOException {
        OutputFolder f = OutputFolder.begin(dir);
        for (Map.Entry<String, String> e : new TreeMap<>(files).entrySet()) {
            Files.writeString(f.file(e.getKey()), e.getValue());
        }
        StringBuilder json = new StringBuilder("{\"" + OutputFolder.DIGESTS_KEY + "\": {");
        String sep = "";
        for (Map.Entry<String, String> d : f.stagedDigests().entrySet()) {
            json.append(sep).append('"').append(d.getKey()).append("\": \"").append(d.getValue()).append('"');
            sep = ", ";
        }
        Files.writeString(f.file("summary.json"), json.append("}}\n").toString());
        return f;
    }

    private static void plan(Path dir, Map<String, String> files) throws IOException {
        try (OutputFolder f = stage(dir, files)) {
            f.commit();
        }
    }

    /** Every entry of the folder (hidden ones too) with its content. */
    private static Map<String, String> listing(Path dir) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (Stream<Path> s = Files.list(dir)) {
            for (Path p : s.toList()) {
                out.put(p.getFileName().toString(), Files.isRegularFile(p) ? Files.readString(p) : "<folder>");
            }
        }
        return out;
    }

    private Map<String, String> planned(Map<String, String> files) throws IOException {
        Path dir = tmp.resolve("reference-" + files.hashCode());
        plan(dir, files);
        return listing(dir);
    }

    private List<String> stepsOfOneCommit() throws IOException {
        Path dir = tmp.resolve("steps");
        plan(dir, OLD);
        List<String> steps = new ArrayList<>();
        try (OutputFolder f = stage(dir, NEW)) {
            f.watchSteps(steps::add);
            f.commit();
        }
        return steps;
    }

    @Test
    void aCommitHasTheStepsTheJournalPromises() throws IOException {
        assertEquals(List.of("journal drafted", "journal in place", "moved a.csv", "moved c.csv", "moved summary.json",
                "removed b.csv", "staging removed", "journal removed"), stepsOfOneCommit());
    }

    @Test
    void aKillAtAnyStepLeavesTheFolderWhollyOldOrWhollyNewForTheNextPlan() throws IOException {
        Map<String, String> old = planned(OLD);
        Map<String, String> fresh = planned(NEW);
        assertEquals(Map.of("a.csv", "old a\n", "b.csv", "old b\n", "summary.json", old.get("summary.json")), old);
        assertEquals(Map.of("a.csv", "new a\n", "c.csv", "new c\n", "summary.json", fresh.get("summary.json")), fresh);
        List<String> steps = stepsOfOneCommit();
        for (int k = 0; k < steps.size(); k++) {
            String at = steps.get(k);
            Path dir = tmp.resolve("kill-" + k);
            plan(dir, OLD);
            OutputFolder f = stage(dir, NEW);
            f.watchSteps(step -> {
                if (step.equals(at)) {
                    throw new Killed(step);
                }
            });
            assertThrows(Killed.class, f::commit);
            f.abandonAsIfKilled();
            OutputFolder.begin(dir).close(); // the next plan into the folder, failing before it commits
            Map<String, String> expected = k < steps.indexOf("journal in place") ? old : fresh;
            assertEquals(expected, listing(dir), "killed after: " + at);
        }
    }

    @Test
    void aKillWhileWritingLeavesStagingThatTheNextPlanRemoves() throws IOException {
        Path dir = tmp.resolve("out");
        plan(dir, OLD);
        Map<String, String> before = listing(dir);
        OutputFolder f = stage(dir, NEW);
        f.abandonAsIfKilled();
        assertTrue(listing(dir).keySet().stream().anyMatch(n -> n.startsWith(CommitJournal.STAGE_PREFIX)));
        assertTrue(listing(dir).containsKey(FolderLock.NAME), "a killed plan's lock file stays (its lock does not)");
        OutputFolder.begin(dir).close();
        assertEquals(before, listing(dir));
    }

    @Test
    void aFolderOrLinkWhereAFileGoesIsRefusedBeforeAnythingMoves() throws IOException {
        Path dir = tmp.resolve("out");
        plan(dir, OLD);
        Files.createDirectory(dir.resolve("c.csv"));
        Files.createSymbolicLink(dir.resolve("summary.json.tmp"), dir.resolve("a.csv"));
        Map<String, String> before = listing(dir);
        try (OutputFolder f = stage(dir, NEW)) {
            OutputFolder.Refused e = assertThrows(OutputFolder.Refused.class, f::commit);
            assertTrue(e.getMessage().contains("c.csv (a folder)"), e.getMessage());
        }
        assertEquals(before, listing(dir));

        Files.delete(dir.resolve("c.csv"));
        Files.createSymbolicLink(dir.resolve("c.csv"), dir.resolve("a.csv"));
        before = listing(dir);
        try (OutputFolder f = stage(dir, NEW)) {
            OutputFolder.Refused e = assertThrows(OutputFolder.Refused.class, f::commit);
            assertTrue(e.getMessage().contains("c.csv (a link)"), e.getMessage());
        }
        assertEquals(before, listing(dir));
    }

    @Test
    void anInputOfThePlanIsNeitherReplacedNorRemoved() throws IOException {
        Path dir = tmp.resolve("out");
        plan(dir, OLD);
        Map<String, String> before = listing(dir);
        try (OutputFolder f = OutputFolder.begin(dir, List.of(dir.resolve("a.csv")), () -> { })) {
            Files.writeString(f.file("a.csv"), "new a\n");
            assertThrows(OutputFolder.Refused.class, f::commit);
        }
        assertEquals(before, listing(dir));
        // b.csv, written by the earlier plan and unchanged, would be removed, but this plan reads it
        OutputFolder.Commit c;
        try (OutputFolder f = OutputFolder.begin(dir, List.of(tmp.resolve("out/../out/b.csv")), () -> { })) {
            Files.writeString(f.file("c.csv"), "new c\n");
            c = f.commit();
        }
        assertEquals(List.of("b.csv"), c.inputs());
        assertEquals(List.of(), c.kept());
        assertEquals("old b\n", Files.readString(dir.resolve("b.csv")));
    }

    @Test
    void aSecondPlanIntoTheFolderWaitsForTheFirst() throws Exception {
        Path dir = tmp.resolve("out");
        CountDownLatch waiting = new CountDownLatch(1);
        AtomicBoolean firstDone = new AtomicBoolean();
        List<String> seenBySecond = new ArrayList<>();
        OutputFolder first = stage(dir, OLD);
        Thread second = new Thread(() -> {
            try (OutputFolder f = OutputFolder.begin(dir, List.of(), waiting::countDown)) {
                assertTrue(firstDone.get(), "the second plan got the folder while the first held it");
                seenBySecond.addAll(listing(dir).keySet());
                Files.writeString(f.file("c.csv"), "second\n");
                f.commit();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        second.start();
        assertTrue(waiting.await(10, TimeUnit.SECONDS), "the second plan did not say it waits");
        first.commit();
        firstDone.set(true);
        first.close();
        second.join(10_000);
        assertFalse(second.isAlive());
        assertEquals(List.of(FolderLock.NAME, "a.csv", "b.csv", "summary.json"),
                seenBySecond.stream().filter(n -> !n.startsWith(CommitJournal.STAGE_PREFIX)).sorted().toList());
        // the second plan writes only c.csv: the first plan's a.csv and b.csv, unchanged, are removed
        assertEquals(List.of("c.csv", "summary.json"), new ArrayList<>(listing(dir).keySet()));
    }

    @Test
    void aFolderThePlanCreatedIsRemovedWhenThePlanFails() throws IOException {
        Path dir = tmp.resolve("new/deeper/out");
        try (OutputFolder f = OutputFolder.begin(dir)) {
            Files.writeString(f.file("a.csv"), "x\n");
        }
        assertFalse(Files.exists(tmp.resolve("new")));
    }

    @Test
    void aCommitThatFailsAfterItsJournalIsFinishedByTheNextPlan() throws IOException {
        Map<String, String> fresh = planned(NEW);
        Path dir = tmp.resolve("out");
        plan(dir, OLD);
        try (OutputFolder f = stage(dir, NEW)) {
            f.watchSteps(step -> {
                if (step.equals("moved c.csv")) {
                    throw new IOException("disk trouble");
                }
            });
            IOException e = assertThrows(IOException.class, f::commit);
            assertTrue(e.getMessage().startsWith("disk trouble (this plan's files are all staged and recorded in "
                    + dir.resolve(CommitJournal.NAME) + ": the next plan into the folder moves them in first)"),
                    e.getMessage());
        }
        assertTrue(Files.exists(dir.resolve(CommitJournal.NAME)), "closing a decided plan keeps its journal");
        OutputFolder.begin(dir).close();
        assertEquals(fresh, listing(dir));
    }
}
