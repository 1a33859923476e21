package org.nullpath.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import org.nullpath.mission.Craft;
import org.nullpath.mission.Link;
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
            Link l = t.link();
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("name", l.name());
            m.put("from", l.from().name());
            m.put("to", l.to().name());
            m.put("messages", t.messages());
            m.put("delivered", t.delivered());
            m.put("never", t.never());
            m.put("min_doppler", nan(t.minDoppler()));
            m.put("max_doppler", nan(t.maxDoppler()));
            m.put("min_light_time_s", nan(t.minLightTime()));
            m.put("max_light_time_s", nan(t.maxLightTime()));
            m.put("ill_conditioned_light_times", t.illConditioned());
            if (t.budget().isPresent()) {
                BudgetTally.Figures b = t.budget().get();
                Map<String, Object> bm = new LinkedHashMap<>();
                bm.put("worst_margin_db", nan(b.worstMarginDb()));
                bm.put("best_margin_db", nan(b.bestMarginDb()));
                bm.put("messages_closing", b.closing());
                bm.put("min_rx_frequency_hz", nan(b.minRxFrequencyHz()));
                bm.put("max_rx_frequency_hz", nan(b.maxRxFrequencyHz()));
                bm.put("max_abs_doppler_rate_hz_per_s", nan(b.maxAbsDopplerRateHzPerS()));
                bm.put("max_data_rate_closing_all_bps", nan(b.minMaxDataRateBps()));
                bm.put("max_data_rate_closing_any_bps", nan(b.maxMaxDataRateBps()));
                bm.put("outside_tuning_range", b.outOfTuning());
                bm.put("over_doppler_rate", b.overDopplerRate());
                bm.put("extreme_shift", b.extremeShift());
                m.put("budget", bm);
            }
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
        new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValue(file.toFile(), root);
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
