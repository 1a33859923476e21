package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;

/**
 * Each leg kind names itself through its LegKind: its scenario key (also its kind in summary.json), its label on the
 * spacetime diagram, the end keys it takes and its summary figures. The names are the project's own
 * (docs/scenario-format.md); the labels are those the outputs printed before legs named themselves
 * (a constant-thrust rocket is "rocket" in the summary and "thrustrocket" on the diagram), kept so
 * the outputs stay byte-identical. Invented values.
 */
class LegKindsTest {
    private static final double C = 299_792_458.0;

    @Test
    void everyKindKnowsItsKeyLabelAndEnds() {
        LegSpec.LegEnd end = new LegSpec.ClockDuration(10);
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        List<LegSpec> legs = List.of(new LegSpec.Burn(1, end), new LegSpec.Coast(end),
                new LegSpec.Rocket(1, 0.1 * C, 2), new LegSpec.ThrustRocket(1e3, 10, 5, 0.1 * C),
                new LegSpec.Sail(home, 1e9, 1, 1, 100), new LegSpec.Profile(new double[] {0, 1}, new double[] {1, 1}));
        assertEquals(List.of("burn", "coast", "rocket", "rocket", "sail", "profile"),
                legs.stream().map(LegSpec::key).toList());
        assertEquals(List.of("burn", "coast", "rocket", "thrustrocket", "sail", "profile"),
                legs.stream().map(LegSpec::label).toList());
        List<String> limited = List.of("until-speed", "until-distance");
        assertEquals(List.of(List.of("duration", "duration-mission", "until-speed", "until-distance"),
                List.of("duration", "duration-mission", "until-distance"), limited, limited, limited, limited),
                legs.stream().map(LegSpec::endKeys).toList());
    }

    @Test
    void figuresComeInTheSummaryOrder() {
        // Ackeret's rapidity budget (v_ex / c) ln(mass ratio) = 0.1 ln 2
        assertEquals(List.of("mass_ratio", "exhaust_speed_c", "rapidity_budget"),
                List.copyOf(new LegSpec.Rocket(1, 0.1 * C, 2).figures().keySet()));
        assertEquals(0.1 * Math.log(2), new LegSpec.Rocket(1, 0.1 * C, 2).figures().get("rapidity_budget"), 1e-17);
        // burn time (m0 - m1) v_ex / |F| = 5 kg * 0.1 c / 1 kN
        Map<String, Double> thrust = new LegSpec.ThrustRocket(1e3, 10, 5, 0.1 * C).figures();
        assertEquals(List.of("mass_ratio", "exhaust_speed_c", "propellant_kg", "burn_time_s"), List.copyOf(thrust.keySet()));
        assertEquals(5 * 0.1 * C / 1e3, thrust.get("burn_time_s"), 1e-9);
        assertEquals(List.of("beam_power_w", "sail_mass_kg", "reflectivity"), List.copyOf(
                new LegSpec.Sail(InertialWorldline.atRest(Vec3.ZERO), 1e9, 1, 0.5, 100).figures().keySet()));
        assertEquals(Map.of(), new LegSpec.Burn(1, new LegSpec.Forever()).figures());
    }
}
