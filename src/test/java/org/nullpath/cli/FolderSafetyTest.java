package org.nullpath.cli;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
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

    private static String mission(String extraLink) {
        return """
                title: Tern folder trial
                stations:
                  dock: {}
                craft:
                  tern:
                    heading: [1, 0, 0]
                    legs:
                      - burn: {acceleration: 0.1 g0, duration: 30 d}
                links:
                  up: {from: dock, to: tern}
                %s
                messages:
                  - {link: up, first: 0 d, last: 20 d, every: 10 d}
                """.formatted(extraLink);
    }

    private record Outcome(int code, String out, String err) {
    }

    private static Outcome run(String... args) {
        PrintStream oldOut = System.out;
        PrintStream oldErr = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            return new Outcome(Main.run(args), out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.setOut(oldOut);
            System.setErr(oldErr);
        }
    }

    private Outcome plan(String yaml, Path dir) throws IOException {
        Path file = tmp.resolve("tern.yaml");
        Files.writeString(file, yaml);
        Outcome o = run("plan", file.toString(), "--out", dir.toString(), "--no-report");
        assertEquals(0, o.code(), o.err());
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
        Outcome o = plan(mission(""), dir);
        assertEquals("keep me", Files.readString(dir.resolve("precious.txt")));
        assertTrue(o.out().contains("left alone (an earlier plan wrote them, but they have changed since):"
                + " precious.txt"), o.out());
    }

    @Test
    void aFileAnEarlierPlanWroteIsRemovedOnlyWhileItIsUnchanged() throws IOException {
        Path dir = tmp.resolve("out");
        plan(mission("  down: {from: tern, to: dock}"), dir);
        assertTrue(Files.exists(dir.resolve("down.csv")));
        Outcome second = plan(mission(""), dir);
        assertFalse(Files.exists(dir.resolve("down.csv")));
        assertTrue(second.out().contains("removed what an earlier plan wrote there and this one does not: down.csv"),
                second.out());
        assertTrue(second.out().contains("(replacing 4 files already there)"), second.out());

        plan(mission("  down: {from: tern, to: dock}"), dir);
        Files.writeString(dir.resolve("down.csv"), "my notes\n", java.nio.file.StandardOpenOption.APPEND);
        Outcome fourth = plan(mission(""), dir);
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
        plan(mission(""), dir);
        Path plain = Files.createDirectory(tmp.resolve("made-by-hand"));
        Set<PosixFilePermission> expected = Files.getPosixFilePermissions(plain);
        assertEquals(expected, Files.getPosixFilePermissions(dir));
        Path file = Files.createFile(tmp.resolve("made-by-hand.txt"));
        assertEquals(Files.getPosixFilePermissions(file), Files.getPosixFilePermissions(dir.resolve("up.csv")));
    }
}
