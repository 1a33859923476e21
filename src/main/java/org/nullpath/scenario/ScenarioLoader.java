package org.nullpath.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.InvalidPathException;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.nullpath.link.LinkTerms;
import org.nullpath.scenario.YamlTree.Entry;
import org.nullpath.scenario.YamlTree.ListNode;
import org.nullpath.scenario.YamlTree.MapNode;
import org.nullpath.scenario.YamlTree.Node;
import org.nullpath.scenario.YamlTree.Scalar;
import org.nullpath.scenario.YamlTree.ScalarType;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.units.Dimension;
import org.nullpath.units.Spelling;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.StraightLineCraft;

/**
 * Reads a scenario file (contract.md, "Scenario file" and "Link budget additions") into a validated
 * {@link Scenario}.
 *
 * <p>Every problem found is reported, not only the first: each names the file, the 1-based line and
 * column of the offending value (or key), and the dotted key path such as
 * {@code craft.lark.legs[0].burn.acceleration}. When there is any problem, one {@link ScenarioException}
 * carries them all and no scenario is returned.
 *
 * <p>Hostile input is bounded: files over {@link #MAX_FILE_BYTES} are refused before they are parsed,
 * nesting is limited to 64 levels, and aliases that could expand without bound are refused.
 */
public final class ScenarioLoader {
    /** Largest scenario file read: 4 MiB. */
    public static final long MAX_FILE_BYTES = 4L * 1024 * 1024;

    static final List<String> TOP_KEYS = List.of("title", "epoch", "stations", "craft", "links", "messages", "cutoffs",
            "exchanges", "windows");
    static final List<String> STATION_KEYS = List.of("position", "velocity", "clock-offset");
    static final List<String> LINK_KEYS;
    static final List<String> MESSAGE_KEYS = List.of("link", "first", "last", "every", "at");
    static final List<String> SERIES_KEYS = List.of("first", "last", "every");
    static final List<String> CUTOFF_KEYS = List.of("name", "link", "arrive-by");
    static final List<String> EXCHANGE_KEYS = List.of("name", "query", "reply", "turnaround", "first", "last", "every");
    static final List<String> WINDOW_KEYS = List.of("link", "from", "to");

    static {
        List<String> k = new ArrayList<>(List.of("from", "to"));
        k.addAll(LinkTermsReader.TERM_KEYS);
        LINK_KEYS = List.copyOf(k);
    }

    private ScenarioLoader() {
    }

    /**
     * Reads and validates the scenario in {@code file}. Problems name the file as {@code file.toString()}.
     *
     * @throws ScenarioException with every problem found, including a missing, unreadable or oversized file
     */
    public static Scenario load(Path file) throws ScenarioException {
        String name = file.toString();
        String text = readFile(file, name);
        return read(text, name, file);
    }

    /**
     * Reads and validates scenario text, naming it {@code displayName} in problems (and as the scenario's
     * file and default title).
     *
     * @throws ScenarioException with every problem found
     */
    public static Scenario load(String text, String displayName) throws ScenarioException {
        long bytes = text.length() > MAX_FILE_BYTES ? text.length()
                : text.getBytes(StandardCharsets.UTF_8).length;
        if (bytes > MAX_FILE_BYTES) {
            throw single(displayName, tooLarge(bytes));
        }
        Path path;
        try {
            path = Path.of(displayName);
        } catch (InvalidPathException e) {
            path = Path.of("scenario.yaml");
        }
        return read(stripBom(text), displayName, path);
    }

    // ---------------------------------------------------------------- file reading

    private static String readFile(Path file, String name) throws ScenarioException {
        if (Files.isDirectory(file)) {
            throw single(name, "cannot read the scenario: it is a directory, not a file");
        }
        byte[] bytes;
        try {
            long size = Files.size(file);
            if (size > MAX_FILE_BYTES) {
                throw single(name, tooLarge(size));
            }
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) MAX_FILE_BYTES + 1);
            }
        } catch (NoSuchFileException e) {
            throw single(name, "cannot read the scenario: no such file");
        } catch (AccessDeniedException e) {
            throw single(name, "cannot read the scenario: permission denied");
        } catch (IOException | SecurityException e) {
            throw single(name, "cannot read the scenario: " + e.getMessage());
        }
        if (bytes.length > MAX_FILE_BYTES) {
            throw single(name, tooLarge(bytes.length));
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(bytes);
        CharBuffer out = CharBuffer.allocate(bytes.length + 1);
        CoderResult r = decoder.decode(in, out, true);
        if (!r.isError()) {
            r = decoder.flush(out);
        }
        if (r.isError()) {
            int offset = in.position();
            int line = 1;
            int lineStart = 0;
            for (int i = 0; i < offset; i++) {
                if (bytes[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            throw new ScenarioException(List.of(new Problem(name, line, offset - lineStart + 1, "",
                    String.format(Locale.ROOT, "the file is not UTF-8 text: byte 0x%02X cannot start a character here",
                            bytes[offset] & 0xff))));
        }
        out.flip();
        return stripBom(out.toString());
    }

    private static String stripBom(String text) {
        return text.startsWith("\uFEFF") ? text.substring(1) : text;
    }

    private static String tooLarge(long bytes) {
        return "the scenario is " + bytes + " bytes long; nullpath reads scenario files of at most 4 MiB ("
                + MAX_FILE_BYTES + " bytes)";
    }

    private static ScenarioException single(String file, String message) {
        return new ScenarioException(List.of(new Problem(file, 0, 0, "", message)));
    }

    // ---------------------------------------------------------------- the document

    private static Scenario read(String text, String name, Path path) throws ScenarioException {
        Problems problems = new Problems(name);
        Node root = YamlTree.parse(text, problems);
        if (root == null) {
            throw problems.exception();
        }
        return new ScenarioLoader.Reading(new Values(problems), path).scenario(root);
    }

    /** What the loader knows about a link while reading references to it. */
    private record LinkInfo(String name, String from, String to, boolean hasTerms) {
    }

    /** One pass over a document. */
    private static final class Reading {
        private final Values values;
        private final Problems problems;
        private final Path path;
        private final Map<String, Scenario.Kind> declared = new LinkedHashMap<>();
        private final Map<String, Scenario.Node> nodes = new LinkedHashMap<>();
        private final Map<String, LinkInfo> linkInfo = new LinkedHashMap<>();
        private final Map<String, Scenario.Link> links = new LinkedHashMap<>();

        Reading(Values values, Path path) {
            this.values = values;
            this.problems = values.problems();
            this.path = path;
        }

        Scenario scenario(Node root) throws ScenarioException {
            Fields top = Fields.of(root, "", values, "a scenario", TOP_KEYS);
            if (!top.ok()) {
                throw problems.exception();
            }
            String title = defaultTitle();
            if (top.has("title")) {
                String t = values.text(top.get("title"), "title", "a title (free text)");
                title = t == null ? title : t;
            }
            Optional<Instant> epoch = Optional.empty();
            if (top.has("epoch")) {
                epoch = epoch(top);
            }
            for (Entry e : section(top, "stations", "station names, each with its station")) {
                station(e);
            }
            for (Entry e : section(top, "craft", "craft names, each with its craft")) {
                craft(e);
            }
            if (declared.isEmpty()) {
                problems.at(root, "", "a scenario needs at least one station or craft");
            }
            Map<String, String> lowerCaseLinks = new HashMap<>();
            for (Entry e : section(top, "links", "link names, each with its link")) {
                link(e, lowerCaseLinks);
            }
            List<Scenario.MessagePlan> messages = new ArrayList<>();
            List<Node> items = list(top, "messages", "message plans");
            for (int i = 0; i < items.size(); i++) {
                Scenario.MessagePlan m = message(items.get(i), Values.item("messages", i));
                if (m != null) {
                    messages.add(m);
                }
            }
            List<Scenario.Cutoff> cutoffs = new ArrayList<>();
            Map<String, Node> cutoffNames = new HashMap<>();
            items = list(top, "cutoffs", "cut-offs");
            for (int i = 0; i < items.size(); i++) {
                Scenario.Cutoff c = cutoff(items.get(i), Values.item("cutoffs", i), cutoffNames);
                if (c != null) {
                    cutoffs.add(c);
                }
            }
            List<Scenario.Exchange> exchanges = new ArrayList<>();
            Map<String, Node> exchangeNames = new HashMap<>();
            items = list(top, "exchanges", "exchanges");
            for (int i = 0; i < items.size(); i++) {
                Scenario.Exchange x = exchange(items.get(i), Values.item("exchanges", i), exchangeNames);
                if (x != null) {
                    exchanges.add(x);
                }
            }
            List<Scenario.WindowScan> windows = new ArrayList<>();
            items = list(top, "windows", "window scans");
            for (int i = 0; i < items.size(); i++) {
                Scenario.WindowScan w = window(items.get(i), Values.item("windows", i));
                if (w != null) {
                    windows.add(w);
                }
            }
            problems.throwIfAny();
            return new Scenario(path, title, epoch, Collections.unmodifiableMap(nodes),
                    Collections.unmodifiableMap(links), List.copyOf(messages), List.copyOf(cutoffs),
                    List.copyOf(exchanges), List.copyOf(windows));
        }

        private String defaultTitle() {
            Path f = path.getFileName();
            return f == null ? path.toString() : f.toString();
        }

        private Optional<Instant> epoch(Fields top) {
            String t = values.text(top.get("epoch"), "epoch", "an ISO-8601 instant such as 2061-03-01T00:00:00Z");
            if (t == null) {
                return Optional.empty();
            }
            try {
                return Optional.of(Instant.parse(t.trim()));
            } catch (DateTimeParseException e) {
                top.problemAt("epoch", "expected an ISO-8601 instant such as 2061-03-01T00:00:00Z (date, 'T', time,"
                        + " and 'Z' or an offset), got '" + t + "'");
                return Optional.empty();
            }
        }

        /** The entries of a mapping of names; empty when absent, null or wrong (problem added). */
        private Iterable<Entry> section(Fields top, String key, String what) {
            Node n = top.get(key);
            if (n == null || n instanceof Scalar s && s.type() == ScalarType.NULL) {
                return List.of();
            }
            if (!(n instanceof MapNode m)) {
                top.problemAt(key, "expected a mapping of " + what + ", got " + Values.describe(n));
                return List.of();
            }
            return m.entries().values();
        }

        /** The items of a list; empty when absent, null or wrong (problem added). */
        private List<Node> list(Fields top, String key, String what) {
            Node n = top.get(key);
            if (n == null || n instanceof Scalar s && s.type() == ScalarType.NULL) {
                return List.of();
            }
            if (!(n instanceof ListNode l)) {
                top.problemAt(key, "expected a list of " + what + " (each item starting with '- '), got "
                        + Values.describe(n));
                return List.of();
            }
            return l.items();
        }

        private boolean declare(Entry e, String keyPath, Scenario.Kind kind) {
            String what = kind == Scenario.Kind.STATION ? "a station name" : "a craft name";
            String bad = Names.problem(e.key(), what);
            if (bad != null) {
                problems.atKey(e, keyPath, bad);
            }
            Scenario.Kind before = declared.get(e.key());
            if (before != null) {
                problems.atKey(e, keyPath, "'" + e.key() + "' is already a station; a station and a craft cannot"
                        + " share a name");
                return false;
            }
            declared.put(e.key(), kind);
            return bad == null;
        }

        private void station(Entry e) {
            String p = Values.child("stations", e.key());
            boolean nameOk = declare(e, p, Scenario.Kind.STATION);
            Fields f = Fields.of(e.value(), p, values, "a station", STATION_KEYS);
            if (!f.ok()) {
                return;
            }
            Vec3 position = f.vector("position", Dimension.LENGTH, Vec3.ZERO);
            Vec3 velocity = f.vector("velocity", Dimension.SPEED, Vec3.ZERO);
            double offset = f.quantity("clock-offset", Dimension.TIME, 0.0);
            if (velocity != null && !(velocity.norm() < Constants.C)) {
                f.problemAt("velocity", "the speed must be below c, got " + Values.format(velocity.norm() / Constants.C)
                        + " c");
                velocity = null;
            }
            if (nameOk && position != null && velocity != null && !Double.isNaN(offset)) {
                nodes.put(e.key(), new Scenario.Node(e.key(), Scenario.Kind.STATION,
                        InertialWorldline.of(position, velocity, offset), List.of()));
            }
        }

        private void craft(Entry e) {
            String p = Values.child("craft", e.key());
            boolean nameOk = declare(e, p, Scenario.Kind.CRAFT);
            Scenario.Node n = CraftReader.read(e.key(), e.value(), p, values, nodes, path);
            if (nameOk && n != null) {
                nodes.put(e.key(), n);
            }
        }

        private void link(Entry e, Map<String, String> lowerCase) {
            String p = Values.child("links", e.key());
            String bad = Names.problem(e.key(), "a link name");
            if (bad == null) {
                bad = Names.outputClash(e.key());
            }
            if (bad != null) {
                problems.atKey(e, p, bad);
            }
            String other = lowerCase.putIfAbsent(e.key().toLowerCase(Locale.ROOT), e.key());
            if (other != null) {
                problems.atKey(e, p, "link names '" + other + "' and '" + e.key() + "' differ only in upper and lower"
                        + " case; their output files would clash on some systems");
                bad = "clash";
            }
            Fields f = Fields.of(e.value(), p, values, "a link", LINK_KEYS);
            if (!f.ok()) {
                linkInfo.put(e.key(), new LinkInfo(e.key(), null, null, false));
                return;
            }
            String from = nodeRef(f, "from");
            String to = nodeRef(f, "to");
            boolean hasTerms = LinkTermsReader.hasTerms(f);
            linkInfo.put(e.key(), new LinkInfo(e.key(), from, to, hasTerms));
            if (from != null && from.equals(to)) {
                f.problemAt("to", "a link joins two different nodes; both ends are '" + from + "'");
                from = null;
            }
            Optional<LinkTerms> terms = hasTerms ? LinkTermsReader.read(f) : Optional.empty();
            if (bad == null && from != null && to != null && (!hasTerms || terms.isPresent())) {
                links.put(e.key(), new Scenario.Link(e.key(), from, to, terms));
            }
        }

        /** A required reference to a station or craft; null when absent or unknown (problem added). */
        private String nodeRef(Fields f, String key) {
            String name = f.text(key, "the name of a station or craft");
            if (name == null) {
                return null;
            }
            if (declared.containsKey(name)) {
                return name;
            }
            f.problemAt(key, "unknown node '" + name + "'" + hint(name, declared.keySet(), "stations and craft"));
            return null;
        }

        /** A required reference to a link; null when absent or unknown (problem added). */
        private LinkInfo linkRef(Fields f, String key) {
            String name = f.text(key, "the name of a link");
            if (name == null) {
                return null;
            }
            LinkInfo info = linkInfo.get(name);
            if (info == null) {
                f.problemAt(key, "unknown link '" + name + "'" + hint(name, linkInfo.keySet(), "links"));
            }
            return info;
        }

        private static String hint(String name, Collection<String> known, String what) {
            if (known.isEmpty()) {
                return " (the scenario defines no " + what + ")";
            }
            String close = Spelling.closest(name, known);
            if (close != null) {
                return " (did you mean '" + close + "'?)";
            }
            return " (" + what + " defined: " + String.join(", ", known) + ")";
        }

        private Scenario.MessagePlan message(Node item, String p) {
            Fields f = Fields.of(item, p, values, "a message plan", MESSAGE_KEYS);
            if (!f.ok()) {
                return null;
            }
            LinkInfo link = linkRef(f, "link");
            boolean series = SERIES_KEYS.stream().anyMatch(f::has);
            if (f.has("at") && series) {
                String k = SERIES_KEYS.stream().filter(f::has).findFirst().orElseThrow();
                f.problemAtKey(k, "a message plan is either 'at: [times]' or 'first', 'last' and 'every', not both");
                return null;
            }
            if (f.has("at")) {
                List<Double> at = values.quantities(f.get("at"), f.path("at"), Dimension.TIME, "send times");
                if (link == null || at == null || !within(f, "at", link.from(),
                        at.stream().mapToDouble(Double::doubleValue).max().orElse(0), "the last send")) {
                    return null;
                }
                return new Scenario.At(link.name(), List.copyOf(at));
            }
            if (!series) {
                f.problemHere("a message plan needs 'at: [times]', or 'first', 'last' and 'every'");
                return null;
            }
            double first = f.quantity("first", Dimension.TIME);
            double last = f.quantity("last", Dimension.TIME);
            double every = every(f);
            if (link == null || Double.isNaN(first) || Double.isNaN(last) || Double.isNaN(every)) {
                return null;
            }
            Scenario.Series plan = new Scenario.Series(link.name(), first, last, every);
            long n = plan.count();
            return n == 0 || within(f, "last", link.from(), plan.sendClock(n - 1), "the last send") ? plan : null;
        }

        /**
         * False, with a problem at {@code key}, when {@code clock} on {@code node}'s clock lies beyond what
         * double precision can hold for it (a craft whose open-ended burn passes rapidity 700 before then).
         */
        private boolean within(Fields f, String key, String node, double clock, String what) {
            Scenario.Node n = node == null ? null : nodes.get(node);
            if (n == null || !(n.worldline() instanceof StraightLineCraft craft) || !(clock > craft.maxClock())) {
                return true;
            }
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

        private Scenario.Cutoff cutoff(Node item, String p, Map<String, Node> names) {
            Fields f = Fields.of(item, p, values, "a cut-off", CUTOFF_KEYS);
            if (!f.ok()) {
                return null;
            }
            String name = f.text("name", "a name for the cut-off");
            if (name != null && name.isBlank()) {
                f.problemAt("name", "a cut-off name must not be empty");
                name = null;
            }
            if (name != null && !unique(f, name, names, "cut-off", false)) {
                name = null;
            }
            LinkInfo link = linkRef(f, "link");
            double arriveBy = f.quantity("arrive-by", Dimension.TIME);
            if (name == null || link == null || Double.isNaN(arriveBy)
                    || !within(f, "arrive-by", link.to(), arriveBy, "the deadline")) {
                return null;
            }
            return new Scenario.Cutoff(name, link.name(), arriveBy);
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

        private Scenario.Exchange exchange(Node item, String p, Map<String, Node> names) {
            Fields f = Fields.of(item, p, values, "an exchange", EXCHANGE_KEYS);
            if (!f.ok()) {
                return null;
            }
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
            LinkInfo query = linkRef(f, "query");
            LinkInfo reply = linkRef(f, "reply");
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
            double first = f.quantity("first", Dimension.TIME);
            double last = f.quantity("last", Dimension.TIME);
            double every = every(f);
            if (name == null || !linksOk || Double.isNaN(turnaround) || Double.isNaN(first) || Double.isNaN(last)
                    || Double.isNaN(every)) {
                return null;
            }
            Scenario.Exchange exchange = new Scenario.Exchange(name, query.name(), reply.name(), turnaround, first, last,
                    every);
            long n = exchange.count();
            return n == 0 || within(f, "last", query.from(), exchange.sendClock(n - 1), "the last query") ? exchange : null;
        }

        private Scenario.WindowScan window(Node item, String p) {
            Fields f = Fields.of(item, p, values, "a window scan", WINDOW_KEYS);
            if (!f.ok()) {
                return null;
            }
            LinkInfo link = linkRef(f, "link");
            if (link != null && !link.hasTerms()) {
                f.problemAt("link", "link '" + link.name() + "' has no radio or optical terms, so it has no windows to"
                        + " scan; give it carrier, transmitter, receiver, data-rate and a requirement");
                link = null;
            }
            double from = f.quantity("from", Dimension.TIME);
            double to = f.quantity("to", Dimension.TIME);
            if (!Double.isNaN(from) && !Double.isNaN(to) && to < from) {
                f.problemAt("to", "the scan ends before it starts: to (" + Values.format(to) + " s) is before from ("
                        + Values.format(from) + " s)");
                return null;
            }
            if (link == null || Double.isNaN(from) || Double.isNaN(to)
                    || !within(f, "to", link.from(), to, "the end of the scan")) {
                return null;
            }
            return new Scenario.WindowScan(link.name(), from, to);
        }
    }
}
