package org.nullpath.scenario;

import java.nio.file.Path;
import java.time.Instant;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

import org.nullpath.link.LinkTerms;
import org.nullpath.mission.Craft;
import org.nullpath.mission.Cutoff;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.Mission;
import org.nullpath.mission.ScenarioText;
import org.nullpath.mission.Station;
import org.nullpath.mission.WindowScan;
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

/**
 * One pass over a scenario document (docs/scenario-format.md): the top level, stations, craft and links
 * here; message plans, cut-offs, exchanges and window scans in {@link PlanReader}. Every problem is added to
 * the document's {@link Problems}; a {@link Mission} is returned only when there is none.
 */
final class MissionReader implements References {
    static final List<String> TOP_KEYS = List.of("title", "epoch", "stations", "craft", "links", "messages", "cutoffs",
            "exchanges", "windows");
    static final List<String> STATION_KEYS = List.of("position", "velocity", "clock-offset");
    static final List<String> LINK_KEYS;

    static {
        List<String> k = new ArrayList<>(List.of("from", "to"));
        k.addAll(LinkTermsReader.TERM_KEYS);
        k.add("directions");
        LINK_KEYS = List.copyOf(k);
    }


    private final Values values;
    private final Problems problems;
    private final Path path;
    private final ScenarioText source;
    private final Map<String, Boolean> declared = new LinkedHashMap<>();
    private final Map<String, Station> stations = new LinkedHashMap<>();
    private final Map<String, Craft> craft = new LinkedHashMap<>();
    private final Map<String, LinkRef> linkInfo = new LinkedHashMap<>();
    private final Map<String, Link> links = new LinkedHashMap<>();
    private final List<Path> alsoRead = new ArrayList<>();
    private final boolean tablesAnywhere;

    MissionReader(Values values, ScenarioText source, boolean tablesAnywhere) {
        this.tablesAnywhere = tablesAnywhere;
        this.values = values;
        this.problems = values.problems();
        this.path = source.file();
        this.source = source;
    }

    Mission mission(Node root) throws ScenarioException {
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
        PlanReader plans = new PlanReader(values, this, epoch);
        List<MessagePlan> messages = plans.all(list(top, "messages", "message plans"), "messages",
                "a message plan", PlanReader.MESSAGE_KEYS, plans::message);
        List<Cutoff> cutoffs = plans.all(list(top, "cutoffs", "cut-offs"), "cutoffs", "a cut-off",
                PlanReader.CUTOFF_KEYS, plans::cutoff);
        List<Exchange> exchanges = plans.all(list(top, "exchanges", "exchanges"), "exchanges",
                "an exchange", PlanReader.EXCHANGE_KEYS, plans::exchange);
        List<WindowScan> windows = plans.all(list(top, "windows", "window scans"), "windows",
                "a window scan", PlanReader.WINDOW_KEYS, plans::window);
        problems.throwIfAny();
        return new Mission(source.reading(alsoRead), title, epoch, List.copyOf(stations.values()), List.copyOf(craft.values()), links,
                messages, cutoffs, exchanges, windows);
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

    private boolean declare(Entry e, String keyPath, boolean isCraft) {
        String what = isCraft ? "a craft name" : "a station name";
        String bad = Names.problem(e.key(), what);
        if (bad != null) {
            problems.atKey(e, keyPath, bad);
        }
        Boolean before = declared.get(e.key());
        if (before != null) {
            problems.atKey(e, keyPath, "'" + e.key() + "' is already a station; a station and a craft cannot"
                    + " share a name");
            return false;
        }
        declared.put(e.key(), isCraft);
        return bad == null;
    }

    private void station(Entry e) {
        String p = KeyPaths.child("stations", e.key());
        boolean nameOk = declare(e, p, false);
        Fields f = Fields.of(e.value(), p, values, "a station", STATION_KEYS);
        if (!f.ok()) {
            return;
        }
        Vec3 position = f.position("position");
        Vec3 velocity = f.vector("velocity", Dimension.SPEED, Vec3.ZERO);
        double offset = f.quantity("clock-offset", Dimension.TIME, 0.0);
        if (velocity != null && !(velocity.norm() < Constants.C)) {
            f.problemAt("velocity", "the speed must be below c, got " + Values.format(velocity.norm() / Constants.C)
                    + " c");
            velocity = null;
        }
        if (nameOk && position != null && velocity != null && !Double.isNaN(offset)) {
            stations.put(e.key(), new Station(e.key(), InertialWorldline.of(position, velocity, offset)));
        }
    }

    private void craft(Entry e) {
        String p = KeyPaths.child("craft", e.key());
        boolean nameOk = declare(e, p, true);
        Craft c = CraftReader.read(e.key(), e.value(), p, values, stations, path, alsoRead, tablesAnywhere);
        if (nameOk && c != null) {
            craft.put(e.key(), c);
        }
    }

    private void link(Entry e, Map<String, String> lowerCase) {
        String p = KeyPaths.child("links", e.key());
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
            linkInfo.put(e.key(), new LinkRef(e.key(), null, null, false));
            return;
        }
        String from = nodeRef(f, "from");
        String to = nodeRef(f, "to");
        boolean hasTerms = LinkTermsReader.hasTerms(f);
        linkInfo.put(e.key(), new LinkRef(e.key(), from, to, hasTerms));
        if (from != null && from.equals(to)) {
            f.problemAt("to", "a link joins two different nodes; both ends are '" + from + "'");
            from = null;
        }
        org.nullpath.mission.Node fromNode = from == null ? null : node(from);
        org.nullpath.mission.Node toNode = to == null ? null : node(to);
        Optional<LinkTerms> terms = hasTerms ? LinkTermsReader.read(f, isCraft(fromNode), isCraft(toNode))
                : Optional.empty();
        Optional<Boolean> directions = f.bool("directions", false);
        if (bad == null && fromNode != null && toNode != null && (!hasTerms || terms.isPresent())
                && directions.isPresent()) {
            links.put(e.key(), new Link(e.key(), fromNode, toNode, terms, directions.get()));
        }
    }

    /** Whether a node is a craft; null when it is not known. */
    private static Boolean isCraft(org.nullpath.mission.Node n) {
        return n == null ? null : n instanceof org.nullpath.mission.Craft;
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

    @Override
    public org.nullpath.mission.Node node(String name) {
        Station s = stations.get(name);
        return s != null ? s : craft.get(name);
    }

    @Override
    public Craft craft(String name) {
        return name == null ? null : craft.get(name);
    }

    @Override
    public Link link(LinkRef info) {
        return links.get(info.name());
    }

    @Override
    public LinkRef linkRef(Fields f, String key) {
        String name = f.text(key, "the name of a link");
        if (name == null) {
            return null;
        }
        LinkRef info = linkInfo.get(name);
        if (info == null) {
            f.problemAt(key, "unknown link '" + name + "'" + hint(name, linkInfo.keySet(), "links"));
        }
        return info;
    }

    static String hint(String name, Collection<String> known, String what) {
        if (known.isEmpty()) {
            return " (the scenario defines no " + what + ")";
        }
        String close = Spelling.closest(name, known);
        if (close != null) {
            return " (did you mean '" + close + "'?)";
        }
        return " (" + what + " defined: " + String.join(", ", known) + ")";
    }
}
