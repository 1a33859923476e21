package org.nullpath.scenario;

import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Cutoff;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.WindowScan;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.units.Dimension;
import org.nullpath.worldline.StraightLineCraft;

/**
 * Reads the scenario's plans: message plans, cut-offs, exchanges and window scans, each resolved against
 * the nodes and links read before them.
 */
final class PlanReader {
    static final List<String> MESSAGE_KEYS = List.of("link", "first", "last", "every", "at");
    static final List<String> SERIES_KEYS = List.of("first", "last", "every");
    static final List<String> CUTOFF_KEYS = List.of("name", "link", "arrive-by");
    static final List<String> EXCHANGE_KEYS = List.of("name", "query", "reply", "turnaround", "first", "last", "every");
    static final List<String> WINDOW_KEYS = List.of("link", "from", "to");

    /** Reads one item of a list section from its keys; null when it has problems (added). */
    @FunctionalInterface
    interface ItemReader<T> {
        T read(Fields item);
    }

    private final Values values;
    private final References reader;
    private final ClockTimes clocks;
    private final Map<String, Node> cutoffNames = new HashMap<>();
    private final Map<String, Node> exchangeNames = new HashMap<>();

    PlanReader(Values values, References reader, Optional<Instant> epoch) {
        this.values = values;
        this.reader = reader;
        this.clocks = new ClockTimes(values, epoch, reader);
    }

    /**
     * Every item of a list section that reads without problems, in order; {@code what} names one item ("a
     * cut-off") and {@code keys} are the keys it may have.
     */
    <T> List<T> all(List<Node> items, String section, String what, List<String> keys, ItemReader<T> one) {
        List<T> out = new ArrayList<>();
        for (int i = 0; i < items.size(); i++) {
            Fields f = Fields.of(items.get(i), KeyPaths.item(section, i), values, what, keys);
            T t = f.ok() ? one.read(f) : null;
            if (t != null) {
                out.add(t);
            }
        }
        return out;
    }

    Cutoff cutoff(Fields f) {
        return cutoff(f, cutoffNames);
    }

    Exchange exchange(Fields f) {
        return exchange(f, exchangeNames);
    }

    MessagePlan message(Fields f) {
        LinkRef link = reader.linkRef(f, "link");
        boolean series = SERIES_KEYS.stream().anyMatch(f::has);
        if (f.has("at") && series) {
            String k = SERIES_KEYS.stream().filter(f::has).findFirst().orElseThrow();
            f.problemAtKey(k, "a message plan is either 'at: [times]' or 'first', 'last' and 'every', not both");
            return null;
        }
        if (f.has("at")) {
            List<Double> at = clocks.list(f, "at", link == null ? null : link.from(), "send times");
            if (link == null || at == null || !within(f, "at", link.from(),
                    at.stream().mapToDouble(Double::doubleValue).max().orElse(0), "the last send")) {
                return null;
            }
            Link l = reader.link(link);
            return l == null ? null : new MessagePlan.At(l, List.copyOf(at));
        }
        if (!series) {
            f.problemHere("a message plan needs 'at: [times]', or 'first', 'last' and 'every'");
            return null;
        }
        String sender = link == null ? null : link.from();
        double first = clocks.at(f, "first", sender);
        double last = clocks.at(f, "last", sender);
        double every = every(f);
        if (link == null || Double.isNaN(first) || Double.isNaN(last) || Double.isNaN(every)) {
            return null;
        }
        long n = MessagePlan.seriesCount(first, last, every);
        if (n != 0 && !within(f, "last", link.from(), first + (n - 1) * every, "the last send")) {
            return null;
        }
        Link l = reader.link(link);
        return l == null ? null : new MessagePlan.Series(l, first, last, every);
    }

    /**
     * False, with a problem at {@code key}, when {@code clock} on {@code node}'s clock lies beyond what
     * double precision can hold for it (a craft whose open-ended burn passes rapidity 700 before then).
     */
    private boolean within(Fields f, String key, String node, double clock, String what) {
        Craft c = reader.craft(node);
        if (c == null || !(clock > c.worldline().maxClock())) {
            return true;
        }
        StraightLineCraft craft = c.worldline();
        f.problemAt(key, what + " (" + Values.format(clock) + " s on " + node + "'s clock) lies beyond the last"
                + " clock reading double precision can hold for it: its open-ended burn passes rapidity "
                + Values.format(StraightLineCraft.MAX_RAPIDITY) + " at " + Values.format(craft.maxClock()) + " s");
        return false;
    }

    private static double every(Fields f) {
        double every = f.quantity("every", Dimension.TIME);
        if (!Double.isNaN(every) && !(every > 0)) {
            f.problemAt("every", "every must be a positive time, got " + Values.format(every) + " s");
            return Double.NaN;
        }
        return every;
    }

    private Cutoff cutoff(Fields f, Map<String, Node> names) {
        String name = f.text("name", "a name for the cut-off");
        if (name != null && name.isBlank()) {
            f.problemAt("name", "a cut-off name must not be empty");
            name = null;
        }
        // one rule for every name: cut-off names reach terminals and spreadsheet cells
        String bad = name == null ? null : Names.problem(name, "a cut-off name");
        if (bad != null) {
            f.problemAt("name", bad);
            name = null;
        }
        if (name != null && !unique(f, name, names, "cut-off", false)) {
            name = null;
        }
        LinkRef link = reader.linkRef(f, "link");
        double arriveBy = clocks.at(f, "arrive-by", link == null ? null : link.to());
        if (name == null || link == null || Double.isNaN(arriveBy)
                || !within(f, "arrive-by", link.to(), arriveBy, "the deadline")) {
            return null;
        }
        Link l = reader.link(link);
        return l == null ? null : new Cutoff(name, l, arriveBy);
    }

    /** False (with a problem) when {@code name} was used before; case-insensitive for file names. */
    private boolean unique(Fields f, String name, Map<String, Node> names, String what, boolean fileName) {
        String key = fileName ? name.toLowerCase(Locale.ROOT) : name;
        Node first = names.putIfAbsent(key, f.get("name"));
        if (first != null) {
            f.problemAt("name", "duplicate " + what + " name '" + name + "'" + (fileName ? " (names are compared"
                    + " ignoring case, as they become file names)" : "") + "; the first is at line " + first.line()
                    + ", column " + first.column());
            return false;
        }
        return true;
    }

    private Exchange exchange(Fields f, Map<String, Node> names) {
        String name = f.text("name", "a name for the exchange");
        if (name != null) {
            String bad = Names.problem(name, "an exchange name");
            if (bad != null) {
                f.problemAt("name", bad);
                name = null;
            } else if (!unique(f, name, names, "exchange", true)) {
                name = null;
            }
        }
        LinkRef query = reader.linkRef(f, "query");
        LinkRef reply = reader.linkRef(f, "reply");
        boolean linksOk = query != null && reply != null;
        if (linksOk && query.from() != null && query.to() != null && reply.from() != null && reply.to() != null
                && !(reply.from().equals(query.to()) && reply.to().equals(query.from()))) {
            f.problemAt("reply", "the reply link must go back from the query's receiver '" + query.to()
                    + "' to its sender '" + query.from() + "'; link '" + reply.name() + "' goes from '"
                    + reply.from() + "' to '" + reply.to() + "'");
            linksOk = false;
        }
        double turnaround = f.quantity("turnaround", Dimension.TIME);
        if (turnaround < 0) {
            f.problemAt("turnaround", "the turnaround must not be negative, got " + Values.format(turnaround) + " s");
            turnaround = Double.NaN;
        }
        double first = clocks.at(f, "first", query == null ? null : query.from());
        double last = clocks.at(f, "last", query == null ? null : query.from());
        double every = every(f);
        if (name == null || !linksOk || Double.isNaN(turnaround) || Double.isNaN(first) || Double.isNaN(last)
                || Double.isNaN(every)) {
            return null;
        }
        long n = MessagePlan.seriesCount(first, last, every);
        if (n != 0 && !within(f, "last", query.from(), first + (n - 1) * every, "the last query")) {
            return null;
        }
        Link q = reader.link(query);
        Link r = reader.link(reply);
        return q == null || r == null ? null : new Exchange(name, q, r, turnaround, first, last, every);
    }

    WindowScan window(Fields f) {
        LinkRef link = reader.linkRef(f, "link");
        if (link != null && !link.hasTerms()) {
            f.problemAt("link", "link '" + link.name() + "' has no radio or optical terms, so it has no windows to"
                    + " scan; give it carrier, transmitter, receiver, data-rate and a requirement");
            link = null;
        }
        double from = clocks.at(f, "from", link == null ? null : link.from());
        double to = clocks.at(f, "to", link == null ? null : link.from());
        if (!Double.isNaN(from) && !Double.isNaN(to) && to < from) {
            f.problemAt("to", "the scan ends before it starts: to (" + Values.format(to) + " s) is before from ("
                    + Values.format(from) + " s)");
            return null;
        }
        if (link == null || Double.isNaN(from) || Double.isNaN(to)
                || !within(f, "to", link.from(), to, "the end of the scan")) {
            return null;
        }
        Link l = reader.link(link);
        return l == null ? null : new WindowScan(l, from, to);
    }
}
