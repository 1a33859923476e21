package org.nullpath.testkit;

import java.util.ArrayList;
import java.util.List;

/**
 * Test helper: one fluent builder for scenario YAML, so that tests state only what their mission needs
 * instead of repeating the same block of stations, craft and links. Every entry is written as flow or
 * block YAML under its section, in the order given; sections come out in the order of the scenario format
 * (title, epoch, stations, craft, links, messages, cutoffs, exchanges, windows). The text is built line by
 * line, so a test that checks a line number can count it: {@link #lineOf(String)} says where a text landed.
 *
 * <p>Names used with it in the tests (craft, stations, links) are invented.
 */
public final class ScenarioText {
    private String title;
    private String epoch;
    private final List<String> stations = new ArrayList<>();
    private final List<String> craft = new ArrayList<>();
    private final List<String> links = new ArrayList<>();
    private final List<String> messages = new ArrayList<>();
    private final List<String> cutoffs = new ArrayList<>();
    private final List<String> exchanges = new ArrayList<>();
    private final List<String> extra = new ArrayList<>();

    private ScenarioText() {
    }

    /** A new mission with a title line. */
    public static ScenarioText titled(String title) {
        ScenarioText m = new ScenarioText();
        m.title = title;
        return m;
    }

    /** A new mission without a title line (the loader's default title). */
    public static ScenarioText untitled() {
        return new ScenarioText();
    }

    /** The common shape of many tests: station {@code home} at the origin, nothing else yet. */
    public static ScenarioText home() {
        return untitled().station("home", "{}");
    }

    /**
     * Station {@code home} and one craft {@code name} heading +x on the given legs (each a flow mapping such
     * as {@code burn: {acceleration: 1 g0, duration: forever}}).
     */
    public static ScenarioText homeAndCraft(String name, String... legs) {
        return home().craft(name, "heading: [1, 0, 0]", legs);
    }

    public ScenarioText epoch(String instant) {
        this.epoch = instant;
        return this;
    }

    /** A station: {@code name: body}, body a flow mapping ({@code {}} for one at rest at the origin). */
    public ScenarioText station(String name, String body) {
        stations.add("  " + name + ": " + body);
        return this;
    }

    /**
     * A craft: its own keys (one YAML line each, e.g. {@code heading: [1, 0, 0]}, {@code start-speed: 0.1 c})
     * then its legs, each a flow mapping written as one list item.
     */
    public ScenarioText craft(String name, String keys, String... legs) {
        craft.add("  " + name + ":");
        for (String k : keys.split("\n")) {
            craft.add("    " + k);
        }
        if (legs.length > 0) {
            craft.add("    legs:");
            for (String leg : legs) {
                craft.add("      - " + leg);
            }
        }
        return this;
    }

    /** A link without budget terms. */
    public ScenarioText link(String name, String from, String to) {
        return link(name, from, to, null);
    }

    /**
     * A link with budget terms ({@code terms}: one key a line, block YAML, written under the link), or without
     * them ({@code terms} null).
     */
    public ScenarioText link(String name, String from, String to, String terms) {
        if (terms == null) {
            links.add("  " + name + ": {from: " + from + ", to: " + to + "}");
            return this;
        }
        links.add("  " + name + ":");
        links.add("    from: " + from);
        links.add("    to: " + to);
        terms.strip().lines().forEach(t -> links.add("    " + t));
        return this;
    }

    /**
     * Budget terms for {@link #link(String, String, String, String)}: an invented X-band radio link (8.4 GHz
     * carrier, a 2 m dish sending {@code power}, a 34 m dish at 30 K receiving 1 kbit/s, Eb/N0 2.5 dB required),
     * for tests that need a budget on a link rather than particular figures. Its keys
     * ({@code transmitter.power}, {@code receiver.noise-temperature}, ...) are what a sweep may vary.
     */
    public static String radioTerms(String power) {
        return """
                carrier: 8.4 GHz
                transmitter: {power: %s, antenna: {diameter: 2 m, efficiency: 0.6}}
                receiver: {antenna: {diameter: 34 m, efficiency: 0.6}, noise-temperature: 30 K}
                data-rate: 1 kbit/s
                required-eb-n0: 2.5 dB
                """.formatted(power);
    }

    /** One message plan, a flow mapping such as {@code {link: up, first: 0 d, last: 1 yr, every: 30 d}}. */
    public ScenarioText message(String plan) {
        messages.add("  - " + plan);
        return this;
    }

    public ScenarioText cutoff(String plan) {
        cutoffs.add("  - " + plan);
        return this;
    }

    public ScenarioText exchange(String plan) {
        exchanges.add("  - " + plan);
        return this;
    }

    /** Any further top-level text, appended as it is (for keys the builder has no method for). */
    public ScenarioText then(String text) {
        extra.add(text.stripTrailing());
        return this;
    }

    /** The scenario text. */
    public String yaml() {
        StringBuilder b = new StringBuilder();
        if (title != null) {
            b.append("title: ").append(title).append('\n');
        }
        if (epoch != null) {
            b.append("epoch: ").append(epoch).append('\n');
        }
        section(b, "stations", stations);
        section(b, "craft", craft);
        section(b, "links", links);
        section(b, "messages", messages);
        section(b, "cutoffs", cutoffs);
        section(b, "exchanges", exchanges);
        for (String e : extra) {
            b.append(e).append('\n');
        }
        return b.toString();
    }

    /** 1-based line of the first line of the scenario text that contains {@code text}; fails when none does. */
    public int lineOf(String text) {
        String[] lines = yaml().split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            if (lines[i].contains(text)) {
                return i + 1;
            }
        }
        throw new AssertionError("'" + text + "' is not in the scenario:\n" + yaml());
    }

    @Override
    public String toString() {
        return yaml();
    }

    private static void section(StringBuilder b, String name, List<String> lines) {
        if (lines.isEmpty()) {
            return;
        }
        b.append(name).append(":\n");
        for (String l : lines) {
            b.append(l).append('\n');
        }
    }
}
