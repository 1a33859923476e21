package org.nullpath.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import org.nullpath.mission.Sweep;
import org.nullpath.scenario.ScenarioDocument;
import org.nullpath.scenario.ScenarioException;
import org.nullpath.scenario.ScenarioLoader;
import org.nullpath.schedule.StudyFigures;
import org.nullpath.schedule.SweepRow;
import org.nullpath.testkit.ScenarioText;

/**
 * A swept acceleration a of an open-ended burn from rest at the station: the last send that ever reaches the
 * craft leaves the station at t = c / a on its clock. Rindler's horizon of uniform acceleration (e.g. Misner,
 * Thorne and Wheeler, Gravitation, section 6.2; Rindler, Relativity: Special, General, and Cosmological,
 * section 3.8): the craft's hyperbola x + c^2/a = sqrt((c^2/a)^2 + (c t)^2) has the asymptote
 * x = c t - c^2/a, which a signal sent from x = 0 at t_s meets only if t_s < c / a. The point is computed as
 * the sweep computes it (the loaded document with the key's value replaced). Invented craft and station.
 */
class SweptHorizonPropertyTest {
    private static final double C = 299_792_458.0; // m/s, exact (SI definition of the metre)

    private static final String TEXT = ScenarioText.titled("Swept horizon").station("yard", "{}")
            .craft("skua", "heading: [1, 0, 0]", "burn: {acceleration: 1 g0, duration: forever}")
            .link("up", "yard", "skua")
            .message("{link: up, first: 0 d, last: 400 d, every: 40 d}")
            .yaml();

    @Property(tries = 60)
    void theLastSendIsCOverAForAnySweptAcceleration(
            @ForAll @DoubleRange(min = -4, max = 3) double log10a) throws ScenarioException {
        double a = Math.pow(10, log10a); // 1e-4 to 1e3 m/s^2
        List<String> names = StudyFigures.names(ScenarioLoader.load(TEXT, "swept.yaml"));
        Sweep sweep = new Sweep("swept.yaml", List.of(new Sweep.Axis("craft.skua.legs[0].burn.acceleration",
                List.of(Sweep.number(a, "m/s^2")))), 0, 0, List.of());
        SweepRow row = SweepPoints.compute(ScenarioDocument.of(TEXT, "swept.yaml"), sweep, 1, names.size());
        assertTrue(row.valid(), row.problem());
        double lastSend = row.figure(names.indexOf("up.last_send_clock_s"));
        // closed form on both sides: a few ulps of double arithmetic (the stated relative tolerance)
        assertEquals(C / a, lastSend, 1e-13 * (C / a), "a = " + a + " m/s^2");
    }
}
