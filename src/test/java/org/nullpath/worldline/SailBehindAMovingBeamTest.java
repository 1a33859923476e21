package org.nullpath.worldline;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.spacetime.Vec3;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.DAY;

/**
 * A sail leg that is not the craft's first, on a diagonal flight line, pushed by a beam station that moves
 * along the line. The push is (1 + R) P D^2 / (m c) with D = e^-(eta - eta_station) the beam's Doppler factor
 * at the sail (Kulkarni, Lubin &amp; Zhang, AJ 155:155, 2018; Doppler factor of a recession at relative
 * rapidity, Einstein 1905), so d eta / d tau = (k / c) e^(-2 (eta - eta_s)) with k = (1 + R) P / (m c), whose
 * solution is e^(2 (eta - eta_s)) = e^(2 (eta_0 - eta_s)) + 2 k tau / c (integrated here by hand). The leg
 * ends where the light of the switch-off reaches the sail: on the null line c (t - t_off) = s - s_station(t_off).
 * The craft and the beam station are invented.
 */
class SailBehindAMovingBeamTest {
    static final double INTEGRATED_TOL = 1e-10;
    static final double N = Math.sqrt(0.5);
    static final Vec3 HEADING = Vec3.of(1, 1, 0);
    static final double BEHIND = -3e12;
    static final double STATION_BETA = 0.1;
    static final double CRAFT_BETA = 0.2;
    static final double POWER = 1e9;
    static final double MASS = 1.0;
    static final double BEAM_OFF = 30 * DAY;

    static InertialWorldline station(double sidewaysMetres, double sidewaysSpeed) {
        return InertialWorldline.of(Vec3.of(BEHIND * N - sidewaysMetres * N, BEHIND * N + sidewaysMetres * N, 0),
                Vec3.of(STATION_BETA * C * N - sidewaysSpeed * N, STATION_BETA * C * N + sidewaysSpeed * N, 0), 0);
    }

    /** Coasts 5 d of its clock at 0.2 c from the origin, then sails until the switch-off's light arrives. */
    static StraightLineCraft craft(InertialWorldline station, double beamOffClock) {
        return StraightLineCraft.of(Vec3.ZERO, HEADING, 0, 0, CRAFT_BETA * C, List.of(
                new LegSpec.Coast(new LegSpec.ClockDuration(5 * DAY)),
                new LegSpec.Sail(station, POWER, MASS, 1.0, beamOffClock)));
    }

    @Test
    void aSecondLegSailFollowsTheClosedFormOfItsMovingBeamAndStopsOnTheSwitchOffsLight() {
        StraightLineCraft c = craft(station(0, 0), BEAM_OFF);
        LegSpan sail = c.legs().get(1);
        double etaS = 0.5 * Math.log((1 + STATION_BETA) / (1 - STATION_BETA)); // atanh 0.1
        double eta0 = 0.5 * Math.log((1 + CRAFT_BETA) / (1 - CRAFT_BETA));
        assertEquals(eta0, sail.start().rapidity(), 1e-15, "the coast keeps the start speed");
        assertEquals(5 * DAY, sail.start().clock(), 1e-6);
        double k = 2 * POWER / (MASS * C);
        for (double u : new double[] {0.5 * DAY, 3 * DAY, 20 * DAY}) {
            double expected = etaS + 0.5 * Math.log(Math.exp(2 * (eta0 - etaS)) + 2 * k * u / C);
            double got = c.lineAtClock(5 * DAY + u).rapidity();
            assertEquals(expected, got, INTEGRATED_TOL * expected, "rapidity " + u / DAY + " d into the sail");
        }
        // the end lies on the switch-off's light: station clock = t / gamma_s, so t_off = gamma_s x 30 d
        LineState end = sail.end();
        double tOff = BEAM_OFF / Math.sqrt(1 - STATION_BETA * STATION_BETA);
        double stationAlong = BEHIND + STATION_BETA * C * tOff;
        double light = C * (end.timeSeconds() - tOff);
        assertEquals(light, end.along() - stationAlong, INTEGRATED_TOL * light, "on the null line of the switch-off");
        double expected = etaS + 0.5 * Math.log(Math.exp(2 * (eta0 - etaS)) + 2 * k * (end.clock() - 5 * DAY) / C);
        assertEquals(expected, end.rapidity(), INTEGRATED_TOL * expected, "rapidity at the end");
        assertEquals(0.0, c.properAccelerationAt(end.timeSeconds() + DAY), "coasting after the beam is off");
    }

    @ParameterizedTest(name = "station {0} m and {1} m/s off the line")
    @CsvSource({
        "1000, 0",
        "0,    1",
    })
    void aBeamStationOffTheLineOrMovingAcrossItIsRefused(double sideways, double sidewaysSpeed) {
        WorldlineException e = assertThrows(WorldlineException.class, () -> craft(station(sideways, sidewaysSpeed), BEAM_OFF));
        assertEquals("the beam station must sit (and move, if it moves) on the craft's flight line", e.getMessage());
        assertEquals(1, e.legIndex());
    }

    @Test
    void aBeamStationAheadOrSwitchedOffTooEarlyIsRefused() {
        InertialWorldline ahead = InertialWorldline.of(Vec3.of(1e9, 0, 0), Vec3.ZERO, 0);
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(new LegSpec.Sail(ahead, POWER, MASS, 0.5, DAY))));
        assertTrue(e.getMessage().endsWith("on its flight line at the start of the leg; it is 1.0E9 m ahead"),
                e.getMessage());
        // switched off at the station's clock 0, 3e12 m behind: its light (1e4 s) passed the sail long before
        // the sail leg starts (after 5 d)
        WorldlineException early = assertThrows(WorldlineException.class, () -> craft(station(0, 0), 0));
        assertEquals("the beam is switched off before its light reaches the sail at the start of the leg",
                early.getMessage());
        // the light of a switch-off just after the leg start is still behind the sail: accepted, a short leg
        double t0 = 5 * DAY / Math.sqrt(1 - CRAFT_BETA * CRAFT_BETA);
        double sailAlong = CRAFT_BETA * C * t0;
        // the switch-off whose light reaches the sail at t0 + 100 s, emitted at t with c (t0 + 100 - t) = s - s_st(t)
        double arrive = t0 + 100;
        double sailThen = sailAlong + CRAFT_BETA * C * 100; // to first order (the push over 100 s is small)
        double tOff = (C * arrive - sailThen + BEHIND) / (C - STATION_BETA * C);
        StraightLineCraft shortLeg = craft(station(0, 0), tOff * Math.sqrt(1 - STATION_BETA * STATION_BETA));
        double legTime = shortLeg.legs().get(1).end().timeSeconds() - t0;
        assertEquals(100, legTime, 1, "about 100 s of mission time");
    }
}
