package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Collectors;

import org.junit.jupiter.api.function.Executable;

/** Helpers for tests that a bad scenario gives exactly the expected problems. */
final class ProblemAssertions {
    static final String FILE = "scenario.yaml";

    private ProblemAssertions() {
    }

    /** Every problem of a scenario that must not load. */
    static List<Problem> problemsOf(String yaml) {
        ScenarioException e = assertThrows(ScenarioException.class, () -> ScenarioLoader.load(yaml, FILE));
        assertTrue(!e.problems().isEmpty(), "a ScenarioException carries at least one problem");
        return e.problems();
    }

    /** The one problem of a scenario with exactly one thing wrong. */
    static Problem onlyProblemOf(String yaml) {
        List<Problem> all = problemsOf(yaml);
        assertEquals(1, all.size(), () -> "expected one problem, got:\n" + rendered(all));
        return all.get(0);
    }

    /**
     * The one problem of a scenario that {@code load} must refuse, checked to lie at {@code line}, {@code column}
     * and {@code key} (in whatever file it names).
     */
    static Problem onlyProblemAt(Executable load, int line, int column, String key) {
        ScenarioException e = assertThrows(ScenarioException.class, load);
        List<Problem> all = e.problems();
        assertEquals(1, all.size(), () -> rendered(all));
        Problem p = all.get(0);
        assertEquals(line, p.line(), p.render());
        assertEquals(column, p.column(), p.render());
        assertEquals(key, p.key(), p.render());
        return p;
    }

    static String rendered(List<Problem> problems) {
        return problems.stream().map(Problem::render).collect(Collectors.joining("\n"));
    }

    /** Asserts where a problem is and that its message contains every one of {@code gist}. */
    static void assertProblem(Problem p, int line, int column, String key, String... gist) {
        assertAll(p.render(),
                () -> assertEquals(FILE, p.file(), "file"),
                () -> assertEquals(line, p.line(), "line"),
                () -> assertEquals(column, p.column(), "column"),
                () -> assertEquals(key, p.key(), "key"),
                () -> {
                    for (String g : gist) {
                        assertTrue(p.message().contains(g), "message should contain '" + g + "': " + p.message());
                    }
                });
    }

    /** Lines 1-5 of the tables: station home at the origin, craft lark heading +x. */
    static final String NODES = """
            stations:
              home: {}
            craft:
              lark:
                heading: [1, 0, 0]
            """;

    /** Lines 1-6 of the leg tables: {@link #NODES}, then lark's legs from line 7 on. */
    static final String LEGS = NODES + "    legs:\n";

    /** Lines 1-7 of the reference tables: {@link #NODES} and one link 'up' from home to lark. */
    static final String LINKED = NODES + "links:\n  up: {from: home, to: lark}\n";

    /**
     * A scenario from a table row: {@code text} with its {@code \n} escapes made new lines, after the lines of
     * {@code base}: {@code file} (nothing before it), {@code legs} ({@link #LEGS}, each line of the text a leg
     * item) or {@code linked} ({@link #LINKED}).
     */
    static String scenario(String base, String text) {
        String body = text.replace("\\n", "\n");
        return switch (base) {
            case "file" -> body + "\n";
            case "legs" -> LEGS + body.lines().map(l -> "      - " + l + "\n").reduce("", String::concat);
            case "linked" -> LINKED + body + "\n";
            default -> throw new IllegalArgumentException("unknown base " + base);
        };
    }

    /** A table row with one problem: where it is and what its message contains ({@code gists} split at " ~ "). */
    static void assertOnlyProblem(String yaml, int line, int column, String key, String gists) {
        assertProblem(onlyProblemOf(yaml), line, column, key, gists.split(" ~ "));
    }

    /** Where one of several expected problems is, and what its message contains. */
    record At(int line, int column, String key, String... gist) {
    }

    static At at(int line, int column, String key, String... gist) {
        return new At(line, column, key, gist);
    }

    /** Exactly these problems, in this order. */
    static void assertProblems(String yaml, At... expected) {
        List<Problem> all = problemsOf(yaml);
        assertEquals(expected.length, all.size(), () -> rendered(all));
        for (int i = 0; i < expected.length; i++) {
            At e = expected[i];
            assertProblem(all.get(i), e.line(), e.column(), e.key(), e.gist());
        }
    }
}
