package org.nullpath.scenario;

import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.nullpath.link.LinkTerms;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.Worldline;

/**
 * A validated scenario (contract.md, "Scenario file"): every name resolved, every quantity in SI.
 * Maps keep the order of the file.
 *
 * @param file     where it was read from
 * @param title    free text
 * @param epoch    calendar instant of mission time 0, if given
 * @param nodes    stations and craft by name (stations first, then craft, each in file order)
 * @param links    links by name, in file order
 * @param messages message plans in file order
 * @param cutoffs  arrive-by deadlines
 * @param exchanges query/response round trips
 * @param windows  send-time ranges to scan for link windows
 */
public record Scenario(Path file, String title, Optional<Instant> epoch, Map<String, Node> nodes,
                       Map<String, Link> links, List<MessagePlan> messages, List<Cutoff> cutoffs,
                       List<Exchange> exchanges, List<WindowScan> windows) {

    /** What kind of body a node is. */
    public enum Kind {
        STATION, CRAFT
    }

    /**
     * A station or craft.
     *
     * @param name      its key in the file
     * @param kind      station or craft
     * @param worldline its history
     * @param legs      a craft's legs as planned (empty for a station)
     */
    public record Node(String name, Kind kind, Worldline worldline, List<LegSpec> legs) {
    }

    /**
     * A one-way link.
     *
     * @param name  its key (used in file names)
     * @param from  sending node's name
     * @param to    receiving node's name
     * @param terms radio or optical terms, if any
     */
    public record Link(String name, String from, String to, Optional<LinkTerms> terms) {
    }

    /** A plan of messages on one link, send times on the sender's clock. */
    public sealed interface MessagePlan {
        String link();

        /** Number of messages in the plan. */
        long count();

        /** The k-th send clock, 0 <= k < count. */
        double sendClock(long k);
    }

    /** {@code first + k * every} while {@code <= last + 1e-9 every}. */
    public record Series(String link, double first, double last, double every) implements MessagePlan {
        @Override
        public long count() {
            return seriesCount(first, last, every);
        }

        @Override
        public double sendClock(long k) {
            return first + k * every;
        }
    }

    /** Explicit send clocks. */
    public record At(String link, List<Double> clocks) implements MessagePlan {
        @Override
        public long count() {
            return clocks.size();
        }

        @Override
        public double sendClock(long k) {
            return clocks.get((int) k);
        }
    }

    /** The number of terms of {@code first + k every <= last + 1e-9 every}; 0 when last < first. */
    public static long seriesCount(double first, double last, double every) {
        double n = Math.floor((last - first) / every + 1e-9);
        if (n < 0) {
            return 0;
        }
        return (long) Math.min(n, 9.0e18) + 1;
    }

    /** The latest send on {@code link} whose message arrives by receiver clock {@code arriveBy}. */
    public record Cutoff(String name, String link, double arriveBy) {
    }

    /**
     * Query/response round trips: queries sent on the querier's clock at first + k every, each answered
     * {@code turnaround} (responder's clock) after it arrives.
     */
    public record Exchange(String name, String query, String reply, double turnaround, double first, double last,
                           double every) {
        public long count() {
            return seriesCount(first, last, every);
        }

        /** The k-th query's send clock on the querier's clock, 0 <= k < count. */
        public double sendClock(long k) {
            return first + k * every;
        }
    }

    /** A send-clock range scanned for link windows. */
    public record WindowScan(String link, double from, double to) {
    }
}
