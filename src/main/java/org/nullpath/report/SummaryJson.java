package org.nullpath.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import org.nullpath.mission.Craft;
import org.nullpath.mission.Mission;
import org.nullpath.mission.Station;
import org.nullpath.schedule.BudgetTally;
import org.nullpath.schedule.ExchangeTally;
import org.nullpath.schedule.LinkTally;
import org.nullpath.worldline.AccelerationRange;
import org.nullpath.worldline.LegSpan;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.LineState;
import org.nullpath.worldline.StraightLineCraft;

/** summary.json: title, per-craft leg and arrival events, per-link counts, horizons, cut-offs, round trips. */
final class SummaryJson {
    private SummaryJson() {
    }

    /** Each exchange plan's entry: its counts and round-trip times on the querier's clock. */
    static final Table<ExchangeTally> EXCHANGES = new Table<>(List.of(
            Column.text("name", "the exchange's name", ExchangeTally::name),
            Column.count("round_trips", "round trips planned", ExchangeTally::roundTrips),
            Column.count("complete", "round trips whose query and reply both arrive", ExchangeTally::complete),
            Column.number("min_round_trip_clock_s", "s", "shortest complete round trip", ExchangeTally::minRoundTrip),
            Column.number("median_round_trip_clock_s", "s", "median of the complete round trips",
                    ExchangeTally::medianRoundTrip),
            Column.number("max_round_trip_clock_s", "s", "longest complete round trip", ExchangeTally::maxRoundTrip)));

    /** Each link's entry: its counts and extremes (with link terms a {@code budget} entry follows). */
    static final Table<LinkTally> LINKS = new Table<>(List.of(
            Column.text("name", "the link's name", t -> t.link().name()),
            Column.text("from", "the sender", t -> t.link().from().name()),
            Column.text("to", "the receiver", t -> t.link().to().name()),
            Column.count("messages", "messages planned", LinkTally::messages),
            Column.count("delivered", "messages that arrive", LinkTally::delivered),
            Column.count("never", "messages beyond the horizon", LinkTally::never),
            Column.number("min_doppler", "", "lowest Doppler factor of the delivered messages", LinkTally::minDoppler),
            Column.number("max_doppler", "", "highest Doppler factor", LinkTally::maxDoppler),
            Column.number("min_light_time_s", "s", "shortest light time", LinkTally::minLightTime),
            Column.number("max_light_time_s", "s", "longest light time", LinkTally::maxLightTime),
            Column.count("ill_conditioned_light_times", "messages whose light time is known to worse than 1e-12"
                    + " relative", LinkTally::illConditioned)));

    /** A link's {@code budget} entry, with link terms: the budget's extremes and counts over the delivered messages. */
    static final Table<BudgetTally.Figures> BUDGETS = new Table<>(List.of(
            Column.number("worst_margin_db", "dB", "lowest link margin", BudgetTally.Figures::worstMarginDb),
            Column.number("best_margin_db", "dB", "highest link margin", BudgetTally.Figures::bestMarginDb),
            Column.count("messages_closing", "messages that close (margin, tuning range and Doppler rate)",
                    BudgetTally.Figures::closing),
            Column.number("min_rx_frequency_hz", "Hz", "lowest received frequency (with the highest: the tuning"
                    + " range a receiver needs)", BudgetTally.Figures::minRxFrequencyHz),
            Column.number("max_rx_frequency_hz", "Hz", "highest received frequency",
                    BudgetTally.Figures::maxRxFrequencyHz),
            Column.number("max_abs_doppler_rate_hz_per_s", "Hz/s", "largest size of the Doppler rate",
                    BudgetTally.Figures::maxAbsDopplerRateHzPerS),
            Column.number("max_data_rate_closing_all_bps", "bit/s", "the highest sender-frame data rate that closes"
                    + " for every delivered message", BudgetTally.Figures::minMaxDataRateBps),
            Column.number("max_data_rate_closing_any_bps", "bit/s", "the highest sender-frame data rate that closes"
                    + " for some delivered message", BudgetTally.Figures::maxMaxDataRateBps),
            Column.count("outside_tuning_range", "messages received outside the tuning range",
                    BudgetTally.Figures::outOfTuning),
            Column.count("over_doppler_rate", "messages whose Doppler rate is over the receiver's limit",
                    BudgetTally.Figures::overDopplerRate),
            Column.flag("extreme_shift", "whether some message's received frequency lies outside [carrier / 2,"
                    + " 2 carrier]", BudgetTally.Figures::extremeShift)));

    /**
     * Writes summary.json; {@code written} are the other files of the plan with their SHA-256 digests, so that
     * a later plan into the same folder can prove which files it may remove.
     */
    static void write(Path file, Mission s, PlanResult r, Map<String, String> written) throws IOException {
        Map<String, Object> root = new LinkedHashMap<>();
        root.put("title", s.title());
        root.put("scenario", s.source().fileName());
        root.put("epoch", s.epoch().map(Object::toString).orElse(null));
        List<Object> craft = new ArrayList<>();
        List<Object> stations = new ArrayList<>();
        for (Station st : s.stations()) {
            stations.add(st.name());
        }
        for (Craft n : s.craft()) {
            StraightLineCraft c = n.worldline();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", n.name());
            List<Object> legs = new ArrayList<>();
            LineState arrival = null;
            for (LegSpan span : c.legs()) {
                Map<String, Object> leg = new LinkedHashMap<>();
                leg.put("leg", span.index() + 1);
                leg.put("kind", kind(span.spec()));
                AccelerationRange a = span.acceleration();
                boolean constant = a.atStart() == a.atEnd() && a.atStart() == a.largestMagnitude();
                // one number only where the acceleration is one number; a profiled leg gives its range
                leg.put("acceleration_m_s2", constant ? nan(a.atStart()) : null);
                leg.put("acceleration_start_m_s2", nan(a.atStart()));
                leg.put("acceleration_end_m_s2", nan(a.atEnd()));
                leg.put("acceleration_largest_m_s2", nan(a.largestMagnitude()));
                leg.put("start", event(span.start()));
                leg.put("end", span.end() == null ? null : event(span.end()));
                leg.put("rapidity_gained", span.end() == null ? null : span.end().rapidity() - span.start().rapidity());
                propellant(span.spec(), leg);
                legs.add(leg);
                if (span.end() != null) {
                    arrival = span.end();
                }
            }
            m.put("legs", legs);
            boolean open = !c.legs().isEmpty() && c.legs().get(c.legs().size() - 1).openEnded();
            m.put("arrival", open || arrival == null ? null : event(arrival));
            m.put("open_ended", open);
            craft.add(m);
        }
        root.put("stations", stations);
        root.put("craft", craft);
        List<Object> links = new ArrayList<>();
        for (LinkTally t : r.links()) {
            Map<String, Object> m = LINKS.json(t);
            t.budget().ifPresent(b -> m.put("budget", BUDGETS.json(b)));
            links.add(m);
        }
        root.put("links", links);
        root.put("horizons", Tables.horizons(Optional.empty()).json(r.horizons()));
        root.put("cutoffs", Tables.cutoffs(Optional.empty()).json(r.cutoffs()));
        root.put("exchanges", EXCHANGES.json(r.exchanges()));
        root.put("windows", Tables.WINDOWS.json(r.windows()));
        List<String> files = new ArrayList<>(written.keySet());
        files.add(file.getFileName().toString());
        files.sort(null);
        root.put(OutputFolder.FILES_KEY, files);
        root.put(OutputFolder.DIGESTS_KEY, new TreeMap<>(written));
        JsonText.pretty(file, root);
    }

    /** A leg's kind: its key in the scenario file. */
    static String kind(LegSpec spec) {
        return spec.key();
    }

    /** The leg's own figures (rockets: the propellant story; sails: the beam), as the leg names them. */
    private static void propellant(LegSpec spec, Map<String, Object> leg) {
        leg.putAll(spec.figures());
    }

    private static Map<String, Object> event(LineState st) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("clock_s", st.clock());
        m.put("time_s", st.timeSeconds());
        m.put("distance_m", st.along());
        m.put("speed_c", Math.tanh(st.rapidity()));
        m.put("rapidity", st.rapidity());
        return m;
    }

    /** JSON has no NaN or infinity: values that do not exist (or are not finite) become null. */
    private static Double nan(double v) {
        return Double.isFinite(v) ? v : null;
    }
}
