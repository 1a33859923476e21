package org.nullpath.scenario;

import org.nullpath.mission.Mission;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.scenario.ProblemAssertions.assertProblem;
import static org.nullpath.scenario.ProblemAssertions.assertOnlyProblem;
import static org.nullpath.scenario.ProblemAssertions.problemsOf;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Link budget terms (docs/scenario-format.md and docs/link-budget.md) that are incomplete or inconsistent. */
class LinkTermsProblemsTest {

    /** Lines 1-6; the link's own keys follow from line 7, indented by four spaces. */
    private static final String HEAD = org.nullpath.testkit.ScenarioText.home()
            .station("away", "{position: [1 au, 0 au, 0 au]}")
            .then("links:\n  out:\n    from: home")
            .yaml();

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
        Mission s = ScenarioLoader.load(coherent("    carrier: 8.4 GHz\n"), "ok.yaml");
        assertEquals(8.4e9, s.links().get("out").terms().orElseThrow().carrierHz());
    }

    /**
     * One thing wrong in a link's terms, one problem at its place. The text is link out's body after
     * {@code to: away} (line 7), one key a line from line 8; {@code @TX} stands for a 20 kW transmitter with a
     * 74 dBi antenna, {@code @RXD} for a 34 m receive aperture at 20 K, {@code @RXG} for a 68 dBi receive
     * antenna at 20 K and {@code @RATE} for the two lines of a 1 kbit/s data rate needing 2.5 dB.
     */
    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', quoteCharacter = '"', textBlock = """
        no carrier or wavelength        | "@TX\n@RXD\n@RATE" | 6 | 5 | links.out.carrier | missing required key 'carrier' ~ or a wavelength
        carrier and wavelength          | "carrier: 8.4 GHz\nwavelength: 1064 nm\n@TX\n@RXD\n@RATE" | 9 | 5 | links.out.wavelength | the carrier is given twice ~ 'carrier' and 'wavelength'
        carrier not a frequency         | "carrier: 8.4 km\n@TX\n@RXD\n@RATE" | 8 | 14 | links.out.carrier | expected a frequency, got a length ('8.4 km')
        coherent without noise          | "carrier: 8.4 GHz\n@TX\nreceiver: {antenna: {gain: 68 dBi}}\n@RATE" | 10 | 15 | links.out.receiver.noise-temperature | missing required key 'noise-temperature' ~ coherent detection
        photons per bit when coherent   | "wavelength: 1064 nm\ntransmitter: {power: 20 W, antenna: {diameter: 1 m, efficiency: 0.8}}\nreceiver: {antenna: {diameter: 10 m, efficiency: 0.8}, noise-temperature: 300 K, detection: coherent}\ndata-rate: 1 kbit/s\nrequired-photons-per-bit: 2" | 12 | 5 | links.out.required-photons-per-bit | for photon-counting detection ~ this receiver is coherent
        unknown detection               | "wavelength: 1064 nm\ntransmitter: {power: 20 W, antenna: {diameter: 1 m, efficiency: 0.8}}\nreceiver: {antenna: {diameter: 10 m, efficiency: 0.8}, detection: photon-countng}\ndata-rate: 1 kbit/s\nrequired-photons-per-bit: 2" | 10 | 71 | links.out.receiver.detection | unknown detection 'photon-countng' ~ did you mean 'photon-counting'?
        antenna with gain and diameter  | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {gain: 74 dBi, diameter: 70 m, efficiency: 0.6}}\n@RXG\n@RATE" | 9 | 57 | links.out.transmitter.antenna.diameter | either a gain or a diameter
        aperture efficiency above one   | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 70 m, efficiency: 1.2}}\n@RXG\n@RATE" | 9 | 71 | links.out.transmitter.antenna.efficiency | (0, 1] ~ got 1.2
        tuning range high to low        | "carrier: 8.4 GHz\n@TX\nreceiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K, tuning-range: [8.5 GHz, 8.3 GHz]}\n@RATE" | 10 | 80 | links.out.receiver.tuning-range | low edge must be below its high edge
        negative losses                 | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {gain: 74 dBi}, losses: -1 dB}\n@RXG\n@RATE" | 9 | 66 | links.out.transmitter.losses | losses must not be negative
        zero power                      | "carrier: 8.4 GHz\ntransmitter: {power: 0 W, antenna: {gain: 74 dBi}}\n@RXG\n@RATE" | 9 | 26 | links.out.transmitter.power | power must be positive
        precompensate not a boolean     | "carrier: 8.4 GHz\nprecompensate: maybe\n@TX\n@RXD\n@RATE" | 9 | 20 | links.out.precompensate | expected true or false ~ 'maybe'
        directions not a boolean        | "directions: always" | 8 | 17 | links.out.directions | expected true or false ~ 'always'
        directions not a boolean, terms | "carrier: 8.4 GHz\n@TX\n@RXD\n@RATE\ndirections: 1" | 13 | 17 | links.out.directions | expected true or false
        forward on a station            | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {gain: 74 dBi, boresight: forward, beamwidth: 1 deg}}\n@RXG\n@RATE" | 9 | 68 | links.out.transmitter.antenna.boresight | follows a craft's heading ~ on a station
        zero boresight                  | "carrier: 8.4 GHz\n@TX\nreceiver: {antenna: {diameter: 4 m, efficiency: 0.6, boresight: [0, 0, 0]}, noise-temperature: 20 K}\n@RATE" | 10 | 69 | links.out.receiver.antenna.boresight | must not be zero
        unknown boresight               | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, boresight: trackng}}\n@RXG\n@RATE" | 9 | 87 | links.out.transmitter.antenna.boresight | unknown boresight 'trackng' ~ did you mean 'tracking'?
        non-finite boresight            | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, boresight: [1.5e308, 1.5e308, 0]}}\n@RXG\n@RATE" | 9 | 87 | links.out.transmitter.antenna.boresight | too long to normalise
        zero beamwidth                  | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, beamwidth: 0 deg}}\n@RXG\n@RATE" | 9 | 87 | links.out.transmitter.antenna.beamwidth | (0, 360 deg]
        beamwidth not an angle          | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, beamwidth: 2 m}}\n@RXG\n@RATE" | 9 | 87 | links.out.transmitter.antenna.beamwidth | expected an angle
        negative pointing error         | "carrier: 8.4 GHz\n@TX\nreceiver: {antenna: {diameter: 4 m, efficiency: 0.6, pointing-error: -1 mrad}, noise-temperature: 20 K}\n@RATE" | 10 | 74 | links.out.receiver.antenna.pointing-error | [0, 180 deg]
        pointing error on a fixed boresight | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, boresight: [1, 0, 0], pointing-error: 1 mrad}}\n@RXG\n@RATE" | 9 | 98 | links.out.transmitter.antenna.pointing-error | tracking antenna's residual error
        gain only, fixed, no beamwidth  | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {gain: 74 dBi, boresight: [1, 0, 0]}}\n@RXG\n@RATE" | 9 | 42 | links.out.transmitter.antenna | no diameter to take a beamwidth from
        sidelobe level beyond range     | "carrier: 8.4 GHz\ntransmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6, sidelobe-level: 400 dBi}}\n@RXG\n@RATE" | 9 | 92 | links.out.transmitter.antenna.sidelobe-level | beyond what nullpath budgets
        """)
    void oneMistakeInTheTermsGivesOneProblemAtItsPlace(String mistake, String body, int line, int column, String key,
                                                       String gists) {
        String keys = body.replace("@TX", "transmitter: {power: 20 kW, antenna: {gain: 74 dBi}}")
                .replace("@RXD", "receiver: {antenna: {diameter: 34 m, efficiency: 0.6}, noise-temperature: 20 K}")
                .replace("@RXG", "receiver: {antenna: {gain: 68 dBi}, noise-temperature: 20 K}")
                .replace("@RATE", "data-rate: 1 kbit/s\\nrequired-eb-n0: 2.5 dB")
                .replace("\\n", "\n");
        StringBuilder yaml = new StringBuilder(HEAD).append("    to: away\n");
        keys.lines().forEach(l -> yaml.append("    ").append(l).append('\n'));
        assertOnlyProblem(yaml.toString(), line, column, key, gists);
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
}
