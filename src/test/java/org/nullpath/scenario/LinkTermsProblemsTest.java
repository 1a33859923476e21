package org.nullpath.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.onlyProblemOf;
import static org.nullpath.scenario.ProblemAssertions.problemsOf;

import java.util.List;

import org.junit.jupiter.api.Test;

/** Link budget terms (docs/scenario-format.md and docs/link-budget.md) that are incomplete or inconsistent. */
class LinkTermsProblemsTest {

    /** Lines 1-6; the link's own keys follow from line 7, indented by four spaces. */
    private static final String HEAD = """
            stations:
              home: {}
              away: {position: [1 au, 0 au, 0 au]}
            links:
              out:
                from: home
            """;

    /** The rest of a complete coherent link, lines 7-11 after {@code to}. */
    private static String coherent(String carrierLine) {
        return HEAD + "    to: away\n" + carrierLine
                + "    transmitter: {power: 20 kW, antenna: {gain: 74 dBi}}\n"
                + "    receiver: {antenna: {diameter: 34 m, efficiency: 0.6}, noise-temperature: 20 K}\n"
                + "    data-rate: 1 kbit/s\n"
                + "    required-eb-n0: 2.5 dB\n";
    }

    @Test
    void aCompleteCoherentLinkLoads() throws Exception {
        Scenario s = ScenarioLoader.load(coherent("    carrier: 8.4 GHz\n"), "ok.yaml");
        assertEquals(8.4e9, s.links().get("out").terms().orElseThrow().carrierHz());
    }

    @Test
    void linkTermsNeedACarrierOrAWavelength() {
        Problem p = onlyProblemOf(coherent(""));
        assertProblem(p, 6, 5, "links.out.carrier", "missing required key 'carrier'", "or a wavelength");
    }

    @Test
    void aCarrierAndAWavelengthTogetherAreRejected() {
        Problem p = onlyProblemOf(coherent("    carrier: 8.4 GHz\n    wavelength: 1064 nm\n"));
        assertProblem(p, 9, 5, "links.out.wavelength", "the carrier is given twice", "'carrier' and 'wavelength'");
    }

    @Test
    void aCarrierMustBeAFrequency() {
        Problem p = onlyProblemOf(coherent("    carrier: 8.4 km\n"));
        assertProblem(p, 8, 14, "links.out.carrier", "expected a frequency, got a length ('8.4 km')");
    }

    @Test
    void aLinkWithOnlyACarrierNeedsTheRestOfItsTerms() {
        List<Problem> all = problemsOf(HEAD + "    to: away\n    carrier: 8.4 GHz\n");
        assertEquals(List.of("links.out.transmitter", "links.out.receiver", "links.out.data-rate",
                "links.out.required-eb-n0"), all.stream().map(Problem::key).toList());
        for (Problem p : all) {
            assertProblem(p, 6, 5, p.key(), "missing required key");
        }
    }

    @Test
    void coherentDetectionNeedsANoiseTemperature() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {gain: 74 dBi}}
                    receiver: {antenna: {gain: 68 dBi}}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 10, 15, "links.out.receiver.noise-temperature", "missing required key 'noise-temperature'",
                "coherent detection");
    }

    @Test
    void photonsPerBitWithCoherentDetectionIsRejected() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    wavelength: 1064 nm
                    transmitter: {power: 20 W, antenna: {diameter: 1 m, efficiency: 0.8}}
                    receiver: {antenna: {diameter: 10 m, efficiency: 0.8}, noise-temperature: 300 K, detection: coherent}
                    data-rate: 1 kbit/s
                    required-photons-per-bit: 2
                """);
        assertProblem(p, 12, 5, "links.out.required-photons-per-bit", "for photon-counting detection",
                "this receiver is coherent");
    }

    @Test
    void anUnknownDetectionIsReportedWithDidYouMean() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    wavelength: 1064 nm
                    transmitter: {power: 20 W, antenna: {diameter: 1 m, efficiency: 0.8}}
                    receiver: {antenna: {diameter: 10 m, efficiency: 0.8}, detection: photon-countng}
                    data-rate: 1 kbit/s
                    required-photons-per-bit: 2
                """);
        assertProblem(p, 10, 71, "links.out.receiver.detection", "unknown detection 'photon-countng'",
                "did you mean 'photon-counting'?");
    }

    @Test
    void anAntennaWithAGainAndADiameterIsRejected() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {gain: 74 dBi, diameter: 70 m, efficiency: 0.6}}
                    receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 9, 57, "links.out.transmitter.antenna.diameter", "either a gain or a diameter");
    }

    @Test
    void anApertureEfficiencyAboveOneIsRejected() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {diameter: 70 m, efficiency: 1.2}}
                    receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 9, 71, "links.out.transmitter.antenna.efficiency", "(0, 1]", "got 1.2");
    }

    @Test
    void aTuningRangeMustRunFromLowToHigh() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {gain: 74 dBi}}
                    receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K, tuning-range: [8.5 GHz, 8.3 GHz]}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 10, 80, "links.out.receiver.tuning-range", "low edge must be below its high edge");
    }

    @Test
    void negativeLossesAreRejected() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 20 kW, antenna: {gain: 74 dBi}, losses: -1 dB}
                    receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 9, 66, "links.out.transmitter.losses", "losses must not be negative");
    }

    @Test
    void aZeroPowerIsRejected() {
        Problem p = onlyProblemOf(HEAD + """
                    to: away
                    carrier: 8.4 GHz
                    transmitter: {power: 0 W, antenna: {gain: 74 dBi}}
                    receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K}
                    data-rate: 1 kbit/s
                    required-eb-n0: 2.5 dB
                """);
        assertProblem(p, 9, 26, "links.out.transmitter.power", "power must be positive");
    }

    @Test
    void precompensateMustBeABoolean() {
        Problem p = onlyProblemOf(coherent("    carrier: 8.4 GHz\n    precompensate: maybe\n"));
        assertProblem(p, 9, 20, "links.out.precompensate", "expected true or false", "'maybe'");
    }
}
