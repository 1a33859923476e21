package org.nullpath.mission;

import java.time.Instant;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * A resolved mission: every node, link and plan of a scenario, each reference resolved to the object it
 * names, every quantity in SI. Lists and maps keep the order of the scenario file.
 *
 * @param source    the scenario as loaded
 * @param title     free text
 * @param epoch     calendar instant of mission time 0, if given
 * @param stations  stations in file order
 * @param craft     craft in file order
 * @param links     links by name, in file order
 * @param messages  message plans in file order
 * @param cutoffs   arrive-by deadlines in file order
 * @param exchanges query/response round trips in file order
 * @param windows   send-clock ranges scanned for link windows, in file order
 */
public record Mission(ScenarioText source, String title, Optional<Instant> epoch, List<Station> stations,
                      List<Craft> craft, Map<String, Link> links, List<MessagePlan> messages, List<Cutoff> cutoffs,
                      List<Exchange> exchanges, List<WindowScan> windows) {
    public Mission {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(title, "title");
        Objects.requireNonNull(epoch, "epoch");
        stations = List.copyOf(stations);
        craft = List.copyOf(craft);
        links = Collections.unmodifiableMap(new LinkedHashMap<>(links));
        messages = List.copyOf(messages);
        cutoffs = List.copyOf(cutoffs);
        exchanges = List.copyOf(exchanges);
        windows = List.copyOf(windows);
    }

    /** Stations then craft by name, each in file order. */
    public Map<String, Node> nodes() {
        Map<String, Node> all = new LinkedHashMap<>();
        stations.forEach(s -> all.put(s.name(), s));
        craft.forEach(c -> all.put(c.name(), c));
        return Collections.unmodifiableMap(all);
    }

    /** The craft of that name. */
    public Optional<Craft> craft(String name) {
        return craft.stream().filter(c -> c.name().equals(name)).findFirst();
    }

    /** The message plans on {@code link}, in file order. */
    public List<MessagePlan> plansOn(Link link) {
        List<MessagePlan> out = new ArrayList<>();
        for (MessagePlan p : messages) {
            if (p.link() == link) {
                out.add(p);
            }
        }
        return out;
    }

    /** Total messages planned: every message plan, plus a query and a reply for each exchange round trip. */
    public long plannedMessages() {
        long trips = plannedRoundTrips();
        return saturatingAdd(plannedOnLinks(), saturatingAdd(trips, trips));
    }

    /** Messages of the message plans. */
    public long plannedOnLinks() {
        long n = 0;
        for (MessagePlan p : messages) {
            n = saturatingAdd(n, p.count());
        }
        return n;
    }

    /** Round trips of the exchanges (each a query and a reply). */
    public long plannedRoundTrips() {
        long n = 0;
        for (Exchange e : exchanges) {
            n = saturatingAdd(n, e.count());
        }
        return n;
    }

    private static long saturatingAdd(long a, long b) {
        long r = a + b;
        return r < 0 ? Long.MAX_VALUE : r;
    }
}
