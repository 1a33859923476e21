package org.nullpath.scenario;

import static org.nullpath.scenario.ProblemAssertions.LINKED;
import static org.nullpath.scenario.ProblemAssertions.assertOnlyProblem;
import static org.nullpath.scenario.ProblemAssertions.assertProblems;
import static org.nullpath.scenario.ProblemAssertions.at;
import static org.nullpath.scenario.ProblemAssertions.scenario;


import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Names and references between parts of a scenario: nodes, links, plans, exchanges, windows. */
class ScenarioReferencesTest {

    /**
     * One wrong name or reference, one problem at its place. {@code base}: {@code linked} puts the text after
     * ProblemAssertions.LINKED (nodes home and lark, link up, lines 1-7), {@code file} takes it as the whole file.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        unknown node in a link          | file   | "stations:\n  home: {}\ncraft:\n  lark:\n    heading: [1, 0, 0]\nlinks:\n  up: {from: hme, to: lark}" | 7 | 14 | links.up.from | unknown node 'hme' ~ did you mean 'home'?
        link from a node to itself      | file   | "stations:\n  home: {}\nlinks:\n  loop: {from: home, to: home}" | 4 | 26 | links.loop.to | two different nodes
        unknown link in a message plan  | linked | "messages:\n  - {link: upp, at: [1 d]}" | 9 | 12 | messages[0].link | unknown link 'upp' ~ did you mean 'up'?
        unknown link in a cut-off       | linked | "cutoffs:\n  - {name: c1, link: dwn, arrive-by: 1 yr}" | 9 | 22 | cutoffs[0].link | unknown link 'dwn' ~ links defined: up
        unknown link in an exchange     | linked | "exchanges:\n  - EXCHANGE(back, 1 h, 30 d)" | 9 | 36 | exchanges[0].reply | unknown link 'back'
        unknown link in a window scan   | linked | "windows:\n  - {link: dn, from: 0 d, to: 1 yr}" | 9 | 12 | windows[0].link | unknown link 'dn'
        window scan without link terms  | linked | "windows:\n  - {link: up, from: 0 d, to: 1 yr}" | 9 | 12 | windows[0].link | no radio or optical terms
        reply that does not go back     | linked | "  up2: {from: home, to: lark}\nexchanges:\n  - EXCHANGE(up2, 1 h, 30 d)" | 10 | 36 | exchanges[0].reply | must go back from the query's receiver 'lark' to its sender 'home' ~ link 'up2' goes from 'home' to 'lark'
        negative turnaround             | linked | "  down: {from: lark, to: home}\nexchanges:\n  - EXCHANGE(down, -1 h, 30 d)" | 10 | 54 | exchanges[0].turnaround | must not be negative
        zero every                      | linked | "messages:\n  - {link: up, first: 0 d, last: 1 yr, every: 0 d}" | 9 | 47 | messages[0].every | every must be a positive time
        negative every in an exchange   | linked | "  down: {from: lark, to: home}\nexchanges:\n  - EXCHANGE(down, 1 h, -30 d)" | 10 | 90 | exchanges[0].every | every must be a positive time
        at not a list of times          | linked | "messages:\n  - {link: up, at: 1 d}" | 9 | 20 | messages[0].at | expected a list of send times ~ got '1 d'
        at and a series together        | linked | "messages:\n  - {link: up, at: [1 d], every: 1 d}" | 9 | 27 | messages[0].every | either 'at: [times]' or 'first', 'last' and 'every'
        series without last             | linked | "messages:\n  - {link: up, first: 0 d, every: 1 d}" | 9 | 5 | messages[0].last | missing required key 'last'
        station and craft of one name   | file   | "stations:\n  lark: {}\ncraft:\n  lark:\n    heading: [1, 0, 0]" | 4 | 3 | craft.lark | 'lark' is already a station
        duplicate cut-off names         | linked | "cutoffs:\n  - {name: c1, link: up, arrive-by: 1 yr}\n  - {name: c1, link: up, arrive-by: 2 yr}" | 10 | 12 | cutoffs[1].name | duplicate cut-off name 'c1' ~ line 9, column 12
        duplicate exchange names (case) | linked | "  down: {from: lark, to: home}\nexchanges:\n  - EXCHANGE(down, 1 h, 30 d)\n  - EXCHANGE(down, 1 h, 30 d, Ping)" | 11 | 12 | exchanges[1].name | duplicate exchange name 'Ping' ~ ignoring case ~ line 10, column 12
        node with problems still known  | file   | "stations:\n  home:\n    velocity: [1.5 c, 0 c, 0 c]\ncraft:\n  lark:\n    heading: [1, 0, 0]\nlinks:\n  up: {from: home, to: lark}" | 3 | 15 | stations.home.velocity | below c
        """)
    void oneWrongReferenceGivesOneProblemAtItsPlace(String mistake, String base, String text, int line, int column,
                                                    String key, String gists) {
        assertOnlyProblem(scenario(base, exchanges(text)), line, column, key, gists);
    }

    /**
     * Expands EXCHANGE(reply, turnaround, every[, name]) to the exchange 'ping' (or the name given) querying on
     * up, first 0 d, last 1 yr, as one flow mapping.
     */
    private static String exchanges(String text) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("EXCHANGE\\(([^,]+), ([^,]+), ([^,)]+)(?:, ([^)]+))?\\)")
                .matcher(text);
        StringBuilder b = new StringBuilder();
        while (m.find()) {
            String name = m.group(4) == null ? "ping" : m.group(4);
            m.appendReplacement(b, "{name: " + name + ", query: up, reply: " + m.group(1) + ", turnaround: " + m.group(2)
                    + ", first: 0 d, last: 1 yr, every: " + m.group(3) + "}");
        }
        m.appendTail(b);
        return b.toString();
    }

    /**
     * Two problems, both reported in file order. The window scan on 'up' ending before it starts: 'up' has no link
     * terms either, and that is the first problem on the line.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        window ending before it starts  | linked | "windows:\n  - {link: up, from: 2 yr, to: 1 yr}" | 9 | 12 | windows[0].link | no radio or optical terms | 9 | 32 | windows[0].to | ends before it starts
        node names unsafe in file names | file   | "stations:\n  home base: {}\n  .hidden: {}" | 2 | 3 | stations.home base | may use only letters ~ 'home base' | 3 | 3 | stations..hidden | must start with a letter or digit
        link names unsafe in file names | linked | "  ../up: {from: home, to: lark}\n  CON: {from: lark, to: home}" | 8 | 3 | links.../up | may use only letters | 9 | 3 | links.CON | reserved device name
        link names clashing with output | linked | "  horizons: {from: home, to: lark}\n  UP: {from: lark, to: home}" | 8 | 3 | links.horizons | taken by nullpath's own output file horizons.csv | 9 | 3 | links.UP | 'up' and 'UP' differ only in upper and lower case
        """)
    void twoMistakesGiveTwoProblemsInFileOrder(String mistakes, String base, String text, int line1, int column1,
                                               String key1, String gists1, int line2, int column2, String key2,
                                               String gists2) {
        assertProblems(scenario(base, text), at(line1, column1, key1, gists1.split(" ~ ")),
                at(line2, column2, key2, gists2.split(" ~ ")));
    }
}
