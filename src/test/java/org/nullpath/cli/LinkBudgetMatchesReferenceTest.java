package org.nullpath.cli;

import java.io.IOException;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.cli.BudgetReference.Expected;
import org.nullpath.cli.BudgetReference.Gain;
import org.nullpath.cli.BudgetReference.Terms;
import org.nullpath.reference.RefCraft;
import org.nullpath.reference.RefStation;
import org.nullpath.reference.RefWorldline;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.SendClocks;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.SendClocks.series;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * End to end: {@code plan} on scenarios with radio and optical link terms (invented craft and stations),
 * every budget column of every message compared with {@link BudgetReference}: an independent 100-digit
 * BigDecimal budget in the receiver-frame form (docs/link-budget.md, rx_power_dbw; Friis, Proc. IRE 34,
 * 1946; Rybicki &amp; Lightman 1979, ch. 4) built on the states of the independent reference solver
 * {@code org.nullpath.reference} (it shares no code with src/main). N0 = k_B T with k_B exact (SI 2019);
 * photon rate P_rx / (h f_rx) with h exact (SI 2019); aperture gains e (pi d f / c)^2 (Balanis, <i>Antenna
 * Theory</i>) at their own frequencies. Scenario inputs reach the reference as the very doubles the
 * scenario's quantities convert to (number times unit factor).
 *
 * <p>Tolerances are the product's and are not to be loosened: 1e-12 relative for frequencies, data rates,
 * photon rates and photons per bit; 1e-9 dB absolute for dB columns; 1e-6 relative for the Doppler rate;
 * booleans exact.
 */
class LinkBudgetMatchesReferenceTest {
    static final double REL = 1e-12;
    static final double DB = 1e-9;
    static final double RATE_REL = 1e-6;
    /**
     * Doppler rates are not compared for messages whose send or receive event lies within this much mission
     * time of a leg boundary of that body: the rate jumps there (the acceleration does), so a numerical
     * derivative across it means nothing and the product takes the value of the leg that starts there.
     */
    static final BigDecimal NEAR_BOUNDARY = BigDecimal.valueOf(DAY);

    @TempDir
    Path tmp;
    static Path out;

    // invented station and craft, built for the reference from the same doubles the scenario converts to
    static final RefStation HOME = RefStation.of(new double[] {0, 0, 0}, null, 0);
    static final RefStation RIDGE = RefStation.of(new double[] {0.1 * LY, 0.3 * LY, 0}, null, 0);
    static final RefStation DRIFT = RefStation.of(new double[] {0, 0.02 * LY, 0}, new double[] {0.05 * C, 0, 0},
            100);
    /** Kestrel leaves home at 1 g0 for a year of its clock, coasts a year, then coasts on for ever. */
    static final RefCraft KESTREL = RefCraft.start(new double[] {0, 0, 0}, new double[] {1, 0, 0}, 0, 0, 0)
            .burnForClock(1 * G0, 1 * YR)
            .coastForClock(1 * YR);
    /** Wren comes in towards home from 1.5 ly at 0.4 c and brakes at 0.5 g0 to a stop. */
    static final RefCraft WREN = RefCraft.start(new double[] {1.5 * LY, 0, 0}, new double[] {1, 0, 0}, 0, 0,
                    -0.4 * C)
            .burnUntilSpeed(0.5 * G0, 0 * C);

    static final String SCENARIO = """
            title: link budget reference check (invented craft and stations)
            stations:
              home: {}
              drift: {position: [0 ly, 0.02 ly, 0 ly], velocity: [0.05 c, 0 c, 0 c], clock-offset: 100 s}
              ridge: {position: [0.1 ly, 0.3 ly, 0 ly]}
            craft:
              kestrel:
                heading: [1, 0, 0]
                legs:
                  - burn: {acceleration: 1 g0, duration: 1 yr}
                  - coast: {duration: 1 yr}
              wren:
                start-position: [1.5 ly, 0 ly, 0 ly]
                heading: [1, 0, 0]
                start-speed: -0.4 c
                legs:
                  - burn: {acceleration: 0.5 g0, until-speed: 0 c}
            links:
              up:
                from: home
                to: kestrel
                carrier: 7.2 GHz
                transmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.7}, losses: 1 dB}
                receiver:
                  antenna: {diameter: 4 m, efficiency: 0.6}
                  noise-temperature: 300 K
                  losses: 1 dB
                  tuning-range: [5.0 GHz, 7.4 GHz]
                  max-doppler-rate: 150 Hz/s
                  detection: coherent
                data-rate: 1 kbit/s
                required-eb-n0: 2.5 dB
              up-pre:
                from: home
                to: kestrel
                carrier: 7.2 GHz
                precompensate: true
                transmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.7}, losses: 1 dB}
                receiver:
                  antenna: {diameter: 4 m, efficiency: 0.6}
                  noise-temperature: 300 K
                  losses: 1 dB
                data-rate: 1 kbit/s
                required-eb-n0: 2.5 dB
              down:
                from: wren
                to: home
                carrier: 8.4 GHz
                transmitter: {power: 100 W, antenna: {gain: 50 dBi}, losses: 0.5 dB}
                receiver:
                  antenna: {diameter: 70 m, efficiency: 0.65}
                  noise-temperature: 20 K
                  losses: 0.3 dB
                  tuning-range: [8.0 GHz, 11.0 GHz]
                  max-doppler-rate: 200 Hz/s
                data-rate: 10 kbit/s
                required-eb-n0: 9.6 dB
              laser:
                from: kestrel
                to: home
                wavelength: 1064 nm
                transmitter: {power: 5 W, antenna: {diameter: 0.5 m, efficiency: 0.8}, losses: 3 dB}
                receiver:
                  antenna: {diameter: 10 m, efficiency: 0.5}
                  losses: 2 dB
                  tuning-range: [150 THz, 300 THz]
                  max-doppler-rate: 5 MHz/s
                  detection: photon-counting
                data-rate: 1 kbit/s
                required-photons-per-bit: 2
              cross:
                from: home
                to: drift
                carrier: 2.2 GHz
                transmitter: {power: 1 kW, antenna: {gain: 60 dBi}}
                receiver:
                  antenna: {gain: 55 dBi}
                  noise-temperature: 50 K
                  tuning-range: [2.12 GHz, 2.21 GHz]
                  max-doppler-rate: 2 Hz/s
                data-rate: 100 bit/s
                required-eb-n0: 4 dB
              aside:
                from: kestrel
                to: ridge
                carrier: 8.4 GHz
                transmitter: {power: 200 W, antenna: {diameter: 3 m, efficiency: 0.6}, losses: 1 dB}
                receiver:
                  antenna: {diameter: 34 m, efficiency: 0.7}
                  noise-temperature: 30 K
                  losses: 0.5 dB
                  tuning-range: [6.5 GHz, 8.6 GHz]
                  max-doppler-rate: 100 Hz/s
                data-rate: 50 bit/s
                required-eb-n0: 2 dB
            messages:
              - {link: up, first: 5 d, last: 2.5 yr, every: 45 d}
              - {link: up-pre, first: 5 d, last: 2.5 yr, every: 45 d}
              - {link: down, first: 5 d, last: 1.5 yr, every: 40 d}
              - {link: laser, first: 5 d, last: 2.5 yr, every: 50 d}
              - {link: cross, first: 0 d, last: 2 yr, every: 30 d}
              - {link: aside, first: 5 d, last: 2.2 yr, every: 60 d}
            """;

    /** Plans afresh for every test, so that a mutation tool running one test at a time sees its use of the product. */
    @BeforeEach
    void plan() throws IOException {
        out = PlanRun.plan(tmp, "budget", SCENARIO);
    }

    // ---------------------------------------------------------------- the links

    @Test
    void radioUplinkToARecedingCraftMatchesReference() throws IOException {
        Terms t = new Terms(7.2 * 1e9, false, 20 * 1e3, Gain.aperture(34, 0.7), 1, Gain.aperture(4, 0.6), 300, 1,
                5.0 * 1e9, 7.4 * 1e9, 150, false, 1 * 1e3, 2.5);
        Seen seen = assertBudgetsMatch("up", t, HOME, KESTREL);
        assertTrue(seen.redShifted && seen.inRange == 3 && seen.rate == 3, "the scenario exercises both sides: "
                + seen);
    }

    @Test
    void precompensatedUplinkMatchesReferenceAndArrivesAtTheCarrier() throws IOException {
        // no tuning range and no rate limit on this receiver: both flags are true throughout
        Terms t = new Terms(7.2 * 1e9, true, 20 * 1e3, Gain.aperture(34, 0.7), 1, Gain.aperture(4, 0.6), 300, 1,
                Double.NaN, Double.NaN, Double.NaN, false, 1 * 1e3, 2.5);
        List<CSVRecord> rows = PlanRun.csv(out.resolve("up-pre.csv"));
        assertBudgetsMatch("up-pre", t, HOME, KESTREL);
        for (CSVRecord r : rows) {
            // docs/link-budget.md: a pre-compensating sender transmits f_nom / D, so the receiver sees the carrier itself
            assertEquals(7.2e9, num(r, "rx_frequency_hz"), REL * 7.2e9, "rx frequency, row " + r.get("message"));
            assertEquals(7.2e9 / num(r, "doppler"), num(r, "tx_frequency_hz"), REL * num(r, "tx_frequency_hz"));
        }
    }

    @Test
    void radioDownlinkFromAnApproachingCraftMatchesReference() throws IOException {
        Terms t = new Terms(8.4 * 1e9, false, 100, Gain.fixed(50), 0.5, Gain.aperture(70, 0.65), 20, 0.3,
                8.0 * 1e9, 11.0 * 1e9, 200, false, 10 * 1e3, 9.6);
        Seen seen = assertBudgetsMatch("down", t, WREN, HOME);
        assertTrue(seen.blueShifted && seen.inRange == 3 && seen.rate == 3, "the scenario exercises both sides: "
                + seen);
    }

    @Test
    void opticalPhotonCountingDownlinkMatchesReference() throws IOException {
        // the carrier from the wavelength as the scenario converts it: c / (1064 x 1e-9 m)
        Terms t = new Terms(C / (1064 * 1e-9), false, 5, Gain.aperture(0.5, 0.8), 3, Gain.aperture(10, 0.5),
                Double.NaN, 2, 150 * 1e12, 300 * 1e12, 5 * 1e6, true, 1 * 1e3, 2);
        Seen seen = assertBudgetsMatch("laser", t, KESTREL, HOME);
        assertTrue(seen.redShifted && seen.inRange == 3 && seen.rate == 3, "the scenario exercises both sides: "
                + seen);
    }

    @Test
    void stationToStationLinkWithOneStationMovingMatchesReference() throws IOException {
        Terms t = new Terms(2.2 * 1e9, false, 1 * 1e3, Gain.fixed(60), 0, Gain.fixed(55), 50, 0,
                2.12 * 1e9, 2.21 * 1e9, 2, false, 100, 4);
        Seen seen = assertBudgetsMatch("cross", t, HOME, DRIFT);
        assertTrue(seen.inRange == 3 && seen.rate == 3, "the scenario exercises both sides: " + seen);
    }

    @Test
    void radioDownlinkFromAnAcceleratingCraftToAStationOffItsFlightLineMatchesReference() throws IOException {
        // the photon crosses the craft's line of motion at an angle: general Doppler factor, numerical rate
        Terms t = new Terms(8.4 * 1e9, false, 200, Gain.aperture(3, 0.6), 1, Gain.aperture(34, 0.7), 30, 0.5,
                6.5 * 1e9, 8.6 * 1e9, 100, false, 50, 2);
        Seen seen = assertBudgetsMatch("aside", t, KESTREL, RIDGE);
        assertTrue(seen.inRange == 3 && seen.rate == 3, "the scenario exercises both sides: " + seen);
    }

    /**
     * summary.json's budget figures of every link are the extremes and counts of that link's budget columns,
     * whose every value the tests above hold to the reference: the same doubles, so compared exactly.
     */
    @org.junit.jupiter.params.ParameterizedTest(name = "{0}")
    @org.junit.jupiter.params.provider.CsvSource({"up, 7.2e9", "up-pre, 7.2e9", "down, 8.4e9", "laser, NaN",
        "cross, 2.2e9", "aside, 8.4e9"})
    void summaryBudgetFiguresAreTheExtremesAndCountsOfTheLinkFile(String link, double carrierHz) throws IOException {
        if (Double.isNaN(carrierHz)) {
            carrierHz = C / (1064 * 1e-9); // the laser's carrier, from its wavelength as the scenario converts it
        }
        List<CSVRecord> rows = PlanRun.csv(out.resolve(link + ".csv"));
        double worst = Double.POSITIVE_INFINITY;
        double best = Double.NEGATIVE_INFINITY;
        double minRx = Double.POSITIVE_INFINITY;
        double maxRx = Double.NEGATIVE_INFINITY;
        double maxRate = 0;
        double minMax = Double.POSITIVE_INFINITY;
        double maxMax = Double.NEGATIVE_INFINITY;
        long closing = 0;
        long outOfTuning = 0;
        long overRate = 0;
        for (CSVRecord r : rows) {
            double margin = num(r, "margin_db");
            worst = Math.min(worst, margin);
            best = Math.max(best, margin);
            minRx = Math.min(minRx, num(r, "rx_frequency_hz"));
            maxRx = Math.max(maxRx, num(r, "rx_frequency_hz"));
            maxRate = Math.max(maxRate, Math.abs(num(r, "doppler_rate_hz_per_s")));
            minMax = Math.min(minMax, num(r, "max_data_rate_bps"));
            maxMax = Math.max(maxMax, num(r, "max_data_rate_bps"));
            boolean inRange = Boolean.parseBoolean(r.get("in_tuning_range"));
            boolean withinRate = Boolean.parseBoolean(r.get("within_doppler_rate"));
            // a message closes when its margin is not negative, it is in the tuning range and within the rate
            closing += margin >= 0 && inRange && withinRate ? 1 : 0;
            outOfTuning += inRange ? 0 : 1;
            overRate += withinRate ? 0 : 1;
        }
        com.fasterxml.jackson.databind.JsonNode b = null;
        for (com.fasterxml.jackson.databind.JsonNode l : new com.fasterxml.jackson.databind.ObjectMapper()
                .readTree(out.resolve("summary.json").toFile()).get("links")) {
            if (l.get("name").asText().equals(link)) {
                assertEquals(rows.size(), l.get("delivered").asLong(), link + ": every message delivered");
                b = l.get("budget");
            }
        }
        assertTrue(b != null && b.isObject(), link + ": summary.json has the link's budget figures");
        assertEquals(worst, b.get("worst_margin_db").asDouble(), 0.0, link + " worst_margin_db");
        assertEquals(best, b.get("best_margin_db").asDouble(), 0.0, link + " best_margin_db");
        assertEquals(minRx, b.get("min_rx_frequency_hz").asDouble(), 0.0, link + " min_rx_frequency_hz");
        assertEquals(maxRx, b.get("max_rx_frequency_hz").asDouble(), 0.0, link + " max_rx_frequency_hz");
        assertEquals(maxRate, b.get("max_abs_doppler_rate_hz_per_s").asDouble(), 0.0, link + " max |rate|");
        assertEquals(minMax, b.get("max_data_rate_closing_all_bps").asDouble(), 0.0, link + " closing all");
        assertEquals(maxMax, b.get("max_data_rate_closing_any_bps").asDouble(), 0.0, link + " closing any");
        assertEquals(closing, b.get("messages_closing").asLong(), link + " messages_closing");
        assertEquals(outOfTuning, b.get("outside_tuning_range").asLong(), link + " outside_tuning_range");
        assertEquals(overRate, b.get("over_doppler_rate").asLong(), link + " over_doppler_rate");
        // extreme: some received frequency outside [carrier / 2, 2 carrier] (docs/link-budget.md)
        assertEquals(minRx < carrierHz / 2 || maxRx > 2 * carrierHz, b.get("extreme_shift").asBoolean(),
                link + " extreme_shift");
    }

    @Test
    void machinPiAgreesWithTheDoubleNearestPi() {
        assertEquals(Math.PI, BudgetReference.PI.doubleValue(), 0.0);
        assertEquals(0, BudgetReference.PI.round(new MathContext(50)).compareTo(
                new BigDecimal("3.1415926535897932384626433832795028841971693993751")));
    }

    // ---------------------------------------------------------------- helpers

    /** What a link's rows covered: bit 1 = a true seen, bit 2 = a false seen. */
    static final class Seen {
        int inRange;
        int rate;
        boolean redShifted;
        boolean blueShifted;
        int rateCompared;

        @Override
        public String toString() {
            return "inRange " + inRange + ", withinRate " + rate + ", red " + redShifted + ", blue " + blueShifted
                    + ", rates compared " + rateCompared;
        }
    }

    /** The send clocks of each link's one series in {@link #SCENARIO} ({@link SendClocks}). */
    private static double[] clocksOf(String link) {
        return switch (link) {
            case "up", "up-pre" -> series(5 * DAY, 2.5 * YR, 45 * DAY);
            case "down" -> series(5 * DAY, 1.5 * YR, 40 * DAY);
            case "laser" -> series(5 * DAY, 2.5 * YR, 50 * DAY);
            case "cross" -> series(0 * DAY, 2 * YR, 30 * DAY);
            case "aside" -> series(5 * DAY, 2.2 * YR, 60 * DAY);
            default -> throw new IllegalArgumentException(link);
        };
    }

    private static Seen assertBudgetsMatch(String link, Terms t, RefWorldline sender, RefWorldline receiver)
            throws IOException {
        List<CSVRecord> rows = PlanRun.csv(out.resolve(link + ".csv"));
        double[] clocks = clocksOf(link);
        assertTrue(clocks.length >= 10, link + ": planned sends " + clocks.length);
        assertEquals(clocks.length, rows.size(), link + ": one row per planned send");
        List<BigDecimal> senderEdges = boundaries(sender);
        List<BigDecimal> receiverEdges = boundaries(receiver);
        Seen seen = new Seen();
        for (int i = 0; i < rows.size(); i++) {
            CSVRecord r = rows.get(i);
            String at = link + " row " + (i + 1);
            assertEquals(Integer.toString(i + 1), r.get("message"), at + " message number");
            assertEquals(clocks[i], num(r, "send_clock_s"), 0.0, at + " send_clock_s");
            BigDecimal sendClock = new BigDecimal(clocks[i]);
            BigDecimal sendTime = new BigDecimal(num(r, "send_time_s"));
            BigDecimal receiveTime = new BigDecimal(num(r, "receive_time_s"));
            boolean withRate = !near(sendTime, senderEdges) && !near(receiveTime, receiverEdges);
            Expected e = BudgetReference.of(t, sender, sendClock, receiver, withRate);
            assertEquals("delivered", r.get("status"), at);
            close(at + " doppler", num(r, "doppler"), e.doppler(), REL);
            close(at + " tx_frequency_hz", num(r, "tx_frequency_hz"), e.txHz(), REL);
            close(at + " rx_frequency_hz", num(r, "rx_frequency_hz"), e.rxHz(), REL);
            assertEquals(Boolean.toString(e.inRange()), r.get("in_tuning_range"), at + " in_tuning_range");
            if (e.dopplerRate() != null) {
                seen.rateCompared++;
                closeRate(at + " doppler_rate_hz_per_s", num(r, "doppler_rate_hz_per_s"), e.dopplerRate());
                assertEquals(e.withinRate().toString(), r.get("within_doppler_rate"), at + " within_doppler_rate");
                seen.rate |= e.withinRate() ? 1 : 2;
            }
            closeDb(at + " rx_power_dbw", num(r, "rx_power_dbw"), e.rxPowerDbw());
            close(at + " rx_data_rate_bps", num(r, "rx_data_rate_bps"), e.rxRateBps(), REL);
            closeDb(at + " margin_db", num(r, "margin_db"), e.marginDb());
            close(at + " max_data_rate_bps", num(r, "max_data_rate_bps"), e.maxRateBps(), REL);
            if (t.photonCounting()) {
                close(at + " rx_photon_rate_per_s", num(r, "rx_photon_rate_per_s"), e.photonRate(), REL);
                close(at + " photons_per_bit", num(r, "photons_per_bit"), e.photonsPerBit(), REL);
                assertTrue(!r.isMapped("cn0_dbhz") && !r.isMapped("ebn0_db"), at + ": no C/N0 columns on photon counting");
            } else {
                closeDb(at + " cn0_dbhz", num(r, "cn0_dbhz"), e.cn0DbHz());
                closeDb(at + " ebn0_db", num(r, "ebn0_db"), e.ebn0Db());
                assertTrue(!r.isMapped("rx_photon_rate_per_s") && !r.isMapped("photons_per_bit"),
                        at + ": no photon columns on a coherent link");
            }
            seen.inRange |= e.inRange() ? 1 : 2;
            seen.redShifted |= e.doppler().compareTo(BigDecimal.ONE) < 0;
            seen.blueShifted |= e.doppler().compareTo(BigDecimal.ONE) > 0;
        }
        assertTrue(seen.rateCompared >= rows.size() - 2, link + ": Doppler rates compared on most rows: " + seen);
        return seen;
    }

    /** Mission times of a craft's leg starts and ends (none for a station). */
    private static List<BigDecimal> boundaries(RefWorldline w) {
        List<BigDecimal> edges = new ArrayList<>();
        if (w instanceof RefCraft craft) {
            for (int i = 0; i < craft.legCount(); i++) {
                edges.add(craft.legStart(i)[0]);
                edges.add(craft.legEnd(i)[0]);
            }
        }
        return edges;
    }

    private static boolean near(BigDecimal t, List<BigDecimal> edges) {
        return edges.stream().anyMatch(e -> t.subtract(e).abs().compareTo(NEAR_BOUNDARY) <= 0);
    }

    private static double num(CSVRecord r, String column) {
        return Double.parseDouble(r.get(column));
    }

    private static void close(String what, double actual, BigDecimal expected, double tol) {
        BigDecimal diff = new BigDecimal(actual).subtract(expected).abs();
        double rel = diff.divide(expected.abs(), MathContext.DECIMAL64).doubleValue();
        assertTrue(rel <= tol, () -> what + ": got " + actual + ", reference " + expected.round(new MathContext(20))
                + " (relative error " + rel + " > " + tol + ")");
    }

    private static void closeDb(String what, double actual, BigDecimal expected) {
        double diff = new BigDecimal(actual).subtract(expected).abs().doubleValue();
        assertTrue(diff <= DB, () -> what + ": got " + actual + " dB, reference " + expected.round(new MathContext(20))
                + " dB (off by " + diff + " dB > " + DB + ")");
    }

    /** Relative to the reference rate; a rate that is zero in the reference (to its 100 digits) must print 0. */
    private static void closeRate(String what, double actual, BigDecimal expected) {
        if (expected.abs().compareTo(new BigDecimal("1e-40")) < 0) {
            assertEquals(0.0, actual, 0.0, what + ": reference rate " + expected.round(new MathContext(5)));
            return;
        }
        close(what, actual, expected, RATE_REL);
    }
}
