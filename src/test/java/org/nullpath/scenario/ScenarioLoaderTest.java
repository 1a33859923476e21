package org.nullpath.scenario;

import org.nullpath.mission.Cutoff;
import org.nullpath.mission.Exchange;
import org.nullpath.mission.Link;
import org.nullpath.mission.MessagePlan;
import org.nullpath.mission.Mission;
import org.nullpath.mission.WindowScan;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.link.Antenna;
import org.nullpath.link.LinkTerms;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Valid scenarios load with every value converted to SI.
 *
 * <p>Conversion factors checked here, with their sources:
 * c = 299 792 458 m/s exactly (SI Brochure, 9th ed., 2019);
 * g0 = 9.806 65 m/s^2 exactly (3rd CGPM, 1901);
 * Julian year = 365.25 d = 31 557 600 s exactly (IAU);
 * light year = c x Julian year = 9 460 730 472 580 800 m exactly (IAU);
 * decibel power: P[W] = 10^(dBW/10) (IEC 60027-3 logarithmic quantities; common practice).
 * The loader multiplies the decimal number by the unit's factor once, so the expected doubles below are
 * written as the same single product.
 */
class ScenarioLoaderTest {
    /** A full scenario (invented craft and stations) with radio and optical link terms. */
    static final String FULL = """
            title: Lark outbound trial
            epoch: 2061-03-01T00:00:00Z

            craft:
              lark:
                start-position: [0 ly, 0 ly, 0 ly]
                heading: [2, 0, 0]
                start-time: 0 s
                start-clock: 0 s
                start-speed: 0 c
                legs:
                  - burn: {acceleration: 1 g0, duration: 1 yr}
                  - coast: {duration: 2 yr}
                  - burn: {acceleration: -1 g0, until-speed: 0 c}
                  - burn: {acceleration: 1 g0, duration: forever}

            stations:
              home:
                position: [0 ly, 0 ly, 0 ly]
                velocity: [0 c, 0 c, 0 c]
                clock-offset: 0 s
              relay:
                position: [0 ly, 4.2 ly, 0 ly]
                velocity: [0 c, 0.5 c, 0 c]
                clock-offset: 1 h

            links:
              up:
                from: home
                to: lark
                carrier: 7.2 GHz
                precompensate: false
                transmitter: {power: 20 kW, antenna: {gain: 74 dBi}, losses: 1 dB}
                receiver:
                  antenna: {diameter: 4 m, efficiency: 0.6}
                  noise-temperature: 300 K
                  losses: 1 dB
                  tuning-range: [7.0 GHz, 7.4 GHz]
                  max-doppler-rate: 100 Hz/s
                  detection: coherent
                data-rate: 1 kbit/s
                required-eb-n0: 2.5 dB
              down: {from: lark, to: home}
              beam:
                from: relay
                to: lark
                wavelength: 1064 nm
                precompensate: true
                transmitter: {power: 43 dBW, antenna: {diameter: 1 m, efficiency: 0.8}}
                receiver:
                  antenna: {diameter: 0.5 m, efficiency: 0.7}
                  detection: photon-counting
                data-rate: 10 kbit/s
                required-photons-per-bit: 2

            messages:
              - {link: up, first: 0 d, last: 2 yr, every: 10 d}
              - {link: down, at: [1 d, 1 yr, 5 yr]}

            cutoffs:
              - {name: before-flip, link: up, arrive-by: 0.9 yr}

            exchanges:
              - {name: ping, query: up, reply: down, turnaround: 1 h, first: 0 d, last: 1 yr, every: 30 d}

            windows:
              - {link: up, from: 0 d, to: 1 yr}
            """;

    @Test
    void lightYearIsTheSpeedOfLightTimesTheJulianYear() {
        // IAU: 1 ly = c x 365.25 d; both factors exact, and the product is exactly representable.
        assertEquals(LY, C * YR);
    }

    @Test
    void fullScenarioLoadsWithTitleEpochAndNodesInFileOrderStationsFirst() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        assertEquals("Lark outbound trial", s.title());
        assertEquals(Instant.parse("2061-03-01T00:00:00Z"), s.epoch().orElseThrow());
        assertEquals(Path.of("lark.yaml"), s.source().file());
        // The craft section comes first in the file, but stations are listed first.
        assertEquals(List.of("home", "relay", "lark"), List.copyOf(s.nodes().keySet()));
        assertFalse(s.nodes().get("home").isCraft());
        assertTrue(s.nodes().get("lark").isCraft());
        assertEquals(List.of("up", "down", "beam"), List.copyOf(s.links().keySet()));
    }

    @Test
    void stationQuantitiesAreConvertedToSi() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        InertialWorldline relay = assertInstanceOf(InertialWorldline.class, s.nodes().get("relay").worldline());
        assertEquals(4.2 * LY, relay.positionAtZero().y()); // IAU light year
        assertEquals(0.0, relay.positionAtZero().x());
        assertEquals(149_896_229.0, relay.velocity().y()); // 0.5 c, SI 2019 value of c
        assertEquals(3600.0, relay.clockOffset());
        assertFalse(s.nodes().get("relay").isCraft());
        InertialWorldline home = assertInstanceOf(InertialWorldline.class, s.nodes().get("home").worldline());
        assertTrue(home.atRest());
    }

    @Test
    void craftLegsAreConvertedToSiLegSpecs() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        List<LegSpec> legs = s.craft("lark").orElseThrow().legs();
        assertEquals(List.of(
                new LegSpec.Burn(1 * G0, new LegSpec.ClockDuration(1 * YR)),
                new LegSpec.Coast(new LegSpec.ClockDuration(2 * YR)),
                new LegSpec.Burn(-1 * G0, new LegSpec.UntilSpeed(0 * C)),
                new LegSpec.Burn(1 * G0, new LegSpec.Forever())), legs);
        StraightLineCraft lark = assertInstanceOf(StraightLineCraft.class, s.nodes().get("lark").worldline());
        // The heading [2, 0, 0] is normalised.
        assertEquals(1.0, lark.heading().x());
        // Hyperbolic motion from rest (Rindler 2006): v = c tanh(a tau / c). After 1 yr of craft clock at
        // 1 g0 the speed is 0.774 827 c (docs/physics.md, check values: computed there
        // from that formula at 50 digits).
        assertEquals(0.774_827, lark.atClock(YR).beta(), 5e-7);
        // The open-ended last burn gives the craft a horizon.
        assertTrue(lark.asymptote().isPresent());
    }

    @Test
    void radioLinkTermsAreConvertedToSi() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        Link up = s.links().get("up");
        assertEquals("home", up.from().name());
        assertEquals("lark", up.to().name());
        LinkTerms t = up.terms().orElseThrow();
        assertEquals(7.2e9, t.carrierHz());
        assertFalse(t.precompensate());
        assertEquals(20_000.0, t.txPowerWatts());
        assertEquals(new Antenna.FixedGain(74.0), t.txAntenna()); // dBi kept in dB
        assertEquals(1.0, t.txLossDb());
        assertEquals(new Antenna.Aperture(4.0, 0.6), t.rxAntenna());
        assertEquals(300.0, t.noiseTemperatureKelvin());
        assertEquals(1.0, t.rxLossDb());
        assertEquals(7.0e9, t.tuningMinHz());
        assertEquals(7.4e9, t.tuningMaxHz());
        assertEquals(100.0, t.maxDopplerRateHzPerS());
        assertEquals(LinkTerms.Detection.COHERENT, t.detection());
        assertEquals(1000.0, t.dataRateBps());
        assertEquals(2.5, t.requiredEbN0Db());
        assertTrue(Double.isNaN(t.requiredPhotonsPerBit()));
        assertTrue(s.links().get("down").terms().isEmpty());
    }

    @Test
    void opticalLinkTermsTakeTheCarrierFromTheWavelengthAndDefaultTheirLosses() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        LinkTerms t = s.links().get("beam").terms().orElseThrow();
        // f = c / lambda, c from the SI Brochure (2019): 299 792 458 / 1.064e-6 m.
        assertEquals(C / (1064 * 1e-9), t.carrierHz());
        // 281 759 828 947 368.421... Hz, computed independently to 40 digits (Python decimal).
        assertEquals(2.8175982894736842e14, t.carrierHz(), 2.8e14 * 1e-15);
        assertTrue(t.precompensate());
        // 43 dBW = 10^4.3 W (decibel definition) = 19 952.623 149 688 796 01... W, computed independently
        // to 40 digits (Python decimal).
        assertEquals(19_952.623149688796, t.txPowerWatts(), 19_952.6 * 1e-15);
        assertEquals(new Antenna.Aperture(1.0, 0.8), t.txAntenna());
        assertEquals(0.0, t.txLossDb());
        assertEquals(0.0, t.rxLossDb());
        assertEquals(LinkTerms.Detection.PHOTON_COUNTING, t.detection());
        assertEquals(2.0, t.requiredPhotonsPerBit());
        assertTrue(Double.isNaN(t.requiredEbN0Db()));
        assertTrue(Double.isNaN(t.noiseTemperatureKelvin()));
        assertFalse(t.hasTuningRange());
        assertFalse(t.hasDopplerRateLimit());
        assertEquals(10_000.0, t.dataRateBps());
    }

    @Test
    void messagePlansCutoffsExchangesAndWindowsAreConvertedToSi() throws Exception {
        Mission s = ScenarioLoader.load(FULL, "lark.yaml");
        assertEquals(List.of(
                new MessagePlan.Series(s.links().get("up"), 0.0, 2 * YR, 10 * 86_400.0),
                new MessagePlan.At(s.links().get("down"), List.of(1 * 86_400.0, 1 * YR, 5 * YR))), s.messages());
        // 0, 10 d, ..., while <= 730.5 d: 74 sends.
        assertEquals(74, s.messages().get(0).count());
        assertEquals(List.of(new Cutoff("before-flip", s.links().get("up"), 0.9 * YR)), s.cutoffs());
        assertEquals(List.of(new Exchange("ping", s.links().get("up"), s.links().get("down"), 3600.0, 0.0, 1 * YR, 30 * 86_400.0)),
                s.exchanges());
        assertEquals(List.of(new WindowScan(s.links().get("up"), 0.0, 1 * YR)), s.windows());
    }

    @Test
    void defaultsApplyWhenKeysAreLeftOut() throws Exception {
        Mission s = ScenarioLoader.load("""
                stations:
                  base: {}
                craft:
                  wren:
                    heading: [0, 1, 0]
                """, "dir/defaults.yaml");
        assertEquals("defaults.yaml", s.title()); // default title: the file name
        assertTrue(s.epoch().isEmpty());
        InertialWorldline base = assertInstanceOf(InertialWorldline.class, s.nodes().get("base").worldline());
        assertTrue(base.atRest());
        assertEquals(0.0, base.positionAtZero().norm());
        assertEquals(0.0, base.clockOffset());
        StraightLineCraft wren = assertInstanceOf(StraightLineCraft.class, s.nodes().get("wren").worldline());
        assertEquals(0.0, wren.origin().norm());
        assertEquals(0.0, wren.atTime(0).clock());
        assertEquals(0.0, wren.atTime(0).beta());
        assertTrue(s.craft("wren").orElseThrow().legs().isEmpty());
        assertTrue(s.links().isEmpty());
        assertTrue(s.messages().isEmpty());
    }

    @Test
    void aStationGivenWithNoValueTakesEveryDefault() throws Exception {
        Mission s = ScenarioLoader.load("stations:\n  home:\n", "bare.yaml");
        InertialWorldline home = assertInstanceOf(InertialWorldline.class, s.nodes().get("home").worldline());
        assertTrue(home.atRest());
        assertEquals(0.0, home.positionAtZero().norm());
    }

    @Test
    void otherLegEndsAreAccepted() throws Exception {
        Mission s = ScenarioLoader.load("""
                craft:
                  wren:
                    heading: [1, 0, 0]
                    start-speed: 0.1 c
                    legs:
                      - coast: {duration-mission: 3 yr}
                      - coast: {until-distance: 1 ly}
                      - burn: {acceleration: 0.5 m/s^2, until-distance: 2 au}
                      - burn: {acceleration: -2 g0, duration-mission: 1 d}
                """, "ends.yaml");
        assertEquals(List.of(
                new LegSpec.Coast(new LegSpec.MissionDuration(3 * YR)),
                new LegSpec.Coast(new LegSpec.UntilDistance(1 * LY)),
                new LegSpec.Burn(0.5, new LegSpec.UntilDistance(2 * 149_597_870_700.0)), // au: IAU 2012 B2
                new LegSpec.Burn(-2 * G0, new LegSpec.MissionDuration(86_400.0))), s.craft("wren").orElseThrow().legs());
    }

    @Test
    void lastBeforeFirstIsAPlanOfZeroMessages() throws Exception {
        Mission s = ScenarioLoader.load("""
                stations:
                  home: {}
                  away: {position: [1 au, 0 au, 0 au]}
                links:
                  out: {from: home, to: away}
                messages:
                  - {link: out, first: 2 d, last: 1 d, every: 1 h}
                  - {link: out, at: []}
                """, "empty-plans.yaml");
        assertEquals(0, s.messages().get(0).count());
        assertEquals(0, s.messages().get(1).count());
    }

    @Test
    void aliasesMayShareLinkTerms() throws Exception {
        Mission s = ScenarioLoader.load("""
                stations:
                  home: {}
                  away: {position: [1 au, 0 au, 0 au]}
                links:
                  out:
                    from: home
                    to: away
                    carrier: 8.4 GHz
                    transmitter: &tx {power: 1 kW, antenna: {gain: 60 dBi}}
                    receiver: &rx {antenna: {gain: 60 dBi}, noise-temperature: 30 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 3 dB
                  back:
                    from: away
                    to: home
                    carrier: 8.4 GHz
                    transmitter: *tx
                    receiver: *rx
                    data-rate: 1 kbit/s
                    required-eb-n0: 3 dB
                """, "aliases.yaml");
        assertEquals(new Antenna.FixedGain(60.0), s.links().get("back").terms().orElseThrow().txAntenna());
        assertEquals(30.0, s.links().get("back").terms().orElseThrow().noiseTemperatureKelvin());
    }

    @Test
    void loadingFromAPathNamesTheFileAsGivenAndDefaultsTheTitleToItsName(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("trial.yaml");
        Files.writeString(file, "stations:\n  home: {}\n", StandardCharsets.UTF_8);
        Mission s = ScenarioLoader.load(file);
        assertEquals(file, s.source().file());
        assertEquals("trial.yaml", s.title());
    }

    @Test
    void aByteOrderMarkAtTheStartIsIgnored(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("bom.yaml");
        Files.write(file, "\uFEFFtitle: marked\nstations:\n  home: {}\n".getBytes(StandardCharsets.UTF_8));
        assertEquals("marked", ScenarioLoader.load(file).title());
    }
}
