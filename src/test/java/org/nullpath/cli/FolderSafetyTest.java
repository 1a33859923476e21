package org.nullpath.cli;

import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.Set;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** A plan removes only what it can prove an earlier plan wrote, and creates its folder like any tool. */
class FolderSafetyTest {
    @TempDir
    Path tmp;

    private static String mission(boolean down) {
        ScenarioText m = ScenarioText.titled("Tern folder trial").station("dock", "{}")
                .craft("tern", "heading: [1, 0, 0]", "burn: {acceleration: 0.1 g0, duration: 30 d}")
                .link("up", "dock", "tern").message("{link: up, first: 0 d, last: 20 d, every: 10 d}");
        return (down ? m.link("down", "tern", "dock") : m).yaml();
    }

    private PlanRun.Outcome plan(String yaml, Path dir) throws IOException {
        Path file = tmp.resolve("tern.yaml");
        Files.writeString(file, yaml);
        PlanRun.Outcome o = PlanRun.run("plan", file.toString(), "--out", dir.toString(), "--no-report");
        assertEquals(0, o.exitCode(), o.err());
        return o;
    }

    @Test
    void aSummaryThatListsAForeignFileDeletesNothing() throws IOException {
        Path dir = tmp.resolve("out");
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("precious.txt"), "keep me");
        // a summary.json nullpath did not write, naming the file with and without a digest
        Files.writeString(dir.resolve("summary.json"), "{\"files\": [\"precious.txt\"], \"file_sha256\":"
                + " {\"precious.txt\": \"0000000000000000000000000000000000000000000000000000000000000000\"}}");
        PlanRun.Outcome o = plan(mission(false), dir);
        assertEquals("keep me", Files.readString(dir.resolve("precious.txt")));
        assertTrue(o.out().contains("left alone (an earlier plan wrote them, but they have changed since):"
                + " precious.txt"), o.out());
    }

    @Test
    void aFileAnEarlierPlanWroteIsRemovedOnlyWhileItIsUnchanged() throws IOException {
        Path dir = tmp.resolve("out");
        plan(mission(true), dir);
        assertTrue(Files.exists(dir.resolve("down.csv")));
        PlanRun.Outcome second = plan(mission(false), dir);
        assertFalse(Files.exists(dir.resolve("down.csv")));
        assertTrue(second.out().contains("removed what an earlier plan wrote there and this one does not: down.csv"),
                second.out());
        assertTrue(second.out().contains("(replacing 4 files already there)"), second.out());

        plan(mission(true), dir);
        Files.writeString(dir.resolve("down.csv"), "my notes\n", java.nio.file.StandardOpenOption.APPEND);
        PlanRun.Outcome fourth = plan(mission(false), dir);
        assertTrue(Files.exists(dir.resolve("down.csv")), "a file changed since the earlier plan is left alone");
        assertTrue(fourth.out().contains("left alone (an earlier plan wrote them, but they have changed since):"
                + " down.csv"), fourth.out());
    }

    @Test
    void theOutputFolderGetsThePermissionsAnyNewFolderGets() throws IOException {
        if (!tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            return; // permissions as the umask gives them are a POSIX notion
        }
        Path dir = tmp.resolve("out");
        plan(mission(false), dir);
        Path plain = Files.createDirectory(tmp.resolve("made-by-hand"));
        Set<PosixFilePermission> expected = Files.getPosixFilePermissions(plain);
        assertEquals(expected, Files.getPosixFilePermissions(dir));
        Path file = Files.createFile(tmp.resolve("made-by-hand.txt"));
        assertEquals(Files.getPosixFilePermissions(file), Files.getPosixFilePermissions(dir.resolve("up.csv")));
    }
}
