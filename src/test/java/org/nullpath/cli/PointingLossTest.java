package org.nullpath.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.function.BiConsumer;

import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nullpath.testkit.PlanRun;
import org.nullpath.testkit.ScenarioText;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;

/**
 * End to end: antenna pointing in the budget. Links with one geometry (a station and a craft receding along its
 * flight line, invented) that differ only in their antennas' pointing, each against the link whose antennas
 * track exactly. Expected losses from the stated rules, worked in the test from the plan's own frequencies:
 * G(theta) = G0 - 12 (theta / theta_3dB)^2 dB floored at the sidelobe level (common practice), theta_3dB =
 * 70 lambda / D degrees (common practice, cited from memory), aperture gain e (pi D f / c)^2 (Balanis,
 * <i>Antenna Theory</i>); the loss comes off the received power and everything that follows from it in dB.
 */
class PointingLossTest {
    @TempDir
    static Path tmp;

    private static Map<String, List<CSVRecord>> rows;

    private static final String TX = "transmitter: {power: 20 kW, antenna: {diameter: 34 m, efficiency: 0.6%s}}";
    private static final String RX = "receiver: {antenna: {diameter: 4 m, efficiency: 0.6%s}, noise-temperature: 20 K}";

    private static String terms(String txPointing, String rxPointing) {
        return "carrier: 8.4 GHz\n" + TX.formatted(txPointing) + "\n" + RX.formatted(rxPointing)
                + "\ndata-rate: 1 kbit/s\nrequired-eb-n0: 2.5 dB";
    }

    @BeforeAll
    static void plan() throws IOException {
        ScenarioText s = ScenarioText.homeAndCraft("swift", "burn: {acceleration: 0.5 g0, duration: 1 yr}");
        String[][] links = {
            {"base", "home", "swift", "", ""},
            {"errors", "home", "swift", ", pointing-error: 0.01 deg", ", pointing-error: 0.05 deg"},
            {"aftrx", "home", "swift", "", ", boresight: aft"},
            {"fwdrx", "home", "swift", "", ", boresight: forward"},
            {"sideways", "home", "swift", ", boresight: [0, 1, 0], beamwidth: 100 deg", ""},
            {"downbase", "swift", "home", "", ""},
            {"downaft", "swift", "home", ", boresight: aft", ""},
        };
        for (String[] l : links) {
            s.link(l[0], l[1], l[2], terms(l[3], l[4]));
            s.message("{link: " + l[0] + ", first: 1 d, last: 1.5 yr, every: 40 d}");
        }
        Path out = PlanRun.plan(tmp, "aim", s.yaml());
        rows = new java.util.HashMap<>();
        for (String[] l : links) {
            rows.put(l[0], PlanRun.csv(out.resolve(l[0] + ".csv")));
        }
    }

    private static double num(CSVRecord r, String c) {
        return Double.parseDouble(r.get(c));
    }

    private static double apertureGainDb(double diameter, double hz) {
        double x = Math.PI * diameter * hz / C;
        return 10 * Math.log10(0.6 * x * x);
    }

    private static double beamwidthDeg(double diameter, double hz) {
        return 70 * (C / hz) / diameter;
    }

    /** Each row of {@code link} against the same row of {@code base}: the budget lower by the expected loss. */
    private static void lowerByTheLoss(String link, String base, BiConsumer<CSVRecord, double[]> expectedLoss) {
        List<CSVRecord> got = rows.get(link);
        List<CSVRecord> ref = rows.get(base);
        assertEquals(ref.size(), got.size());
        assertTrue(got.size() > 10);
        for (int i = 0; i < got.size(); i++) {
            CSVRecord g = got.get(i);
            CSVRecord b = ref.get(i);
            double[] loss = new double[1];
            expectedLoss.accept(g, loss);
            String row = link + " row " + (i + 1);
            assertEquals(loss[0], num(g, "pointing_loss_db"), 1e-12 * Math.max(1, loss[0]), "pointing loss " + row);
            for (String c : new String[] {"rx_power_dbw", "cn0_dbhz", "ebn0_db", "margin_db"}) {
                assertEquals(num(b, c) - loss[0], num(g, c), 1e-11, c + " " + row);
            }
            assertEquals(num(b, "max_data_rate_bps") * Math.pow(10, -loss[0] / 10), num(g, "max_data_rate_bps"),
                    1e-11 * num(g, "max_data_rate_bps"), "max_data_rate_bps " + row);
            for (String c : new String[] {"doppler", "tx_frequency_hz", "rx_frequency_hz", "aim_x", "look_x"}) {
                assertEquals(b.get(c), g.get(c), c + " is not touched by pointing, " + row);
            }
        }
    }

    @Test
    void antennasTrackingExactlyLoseNothing() {
        for (CSVRecord r : rows.get("base")) {
            assertEquals("0", r.get("pointing_loss_db"));
            assertEquals("0", r.get("tx_off_boresight_deg"));
            assertEquals("0", r.get("rx_off_boresight_deg"));
        }
    }

    @Test
    void aTrackingAntennasLossIsItsPointingErrorTermAlone() {
        lowerByTheLoss("errors", "base", (r, loss) -> {
            assertEquals(0.01, num(r, "tx_off_boresight_deg"), 1e-15);
            assertEquals(0.05, num(r, "rx_off_boresight_deg"), 1e-15);
            double tx = 0.01 / beamwidthDeg(34, num(r, "tx_frequency_hz"));
            double rx = 0.05 / beamwidthDeg(4, num(r, "rx_frequency_hz"));
            loss[0] = 12 * tx * tx + 12 * rx * rx;
        });
    }

    @Test
    void aBodyFixedAftAntennaKeepsAStationBehindOnTheLineAtZeroDegrees() {
        lowerByTheLoss("aftrx", "base", (r, loss) -> assertEquals("0", r.get("rx_off_boresight_deg")));
        lowerByTheLoss("downaft", "downbase", (r, loss) -> assertEquals("0", r.get("tx_off_boresight_deg")));
    }

    @Test
    void aForwardAntennaFacingAwayFromTheStationGetsTheSidelobeLevel() {
        lowerByTheLoss("fwdrx", "base", (r, loss) -> {
            assertEquals("180", r.get("rx_off_boresight_deg"));
            loss[0] = apertureGainDb(4, num(r, "rx_frequency_hz")) - (-10);
        });
    }

    @Test
    void aFixedBoresightAtRightAnglesWithAGivenBeamwidthIsOnTheMainLobe() {
        // the station at rest aims along +x; its boresight is +y: 90 deg off, 100 deg beamwidth: 12 (0.9)^2 dB
        lowerByTheLoss("sideways", "base", (r, loss) -> {
            assertEquals(90, num(r, "tx_off_boresight_deg"), 1e-13);
            loss[0] = 12 * 0.9 * 0.9;
        });
    }
}
