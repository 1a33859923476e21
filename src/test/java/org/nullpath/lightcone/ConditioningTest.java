package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.nullpath.testkit.Si.C;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.State;

/**
 * The relative condition number of a light time, kappa = (|t_e| |dT/dt_e| + |r_e| |dT/dr_e|) / T (floored at
 * 1), for two bodies in uniform motion along x: sender A at u t, receiver B at L + v t ahead of it. The photon
 * from (t_e, x_e) meets B after T = (L + v t_e - x_e) / (c - v) (special relativity, elementary), so along A
 * (x_e = u t_e) dT/dt_e = (v - u) / (c - v), and |dT/dr_e| = 1 / (c - v).
 */
class ConditioningTest {

    @ParameterizedTest(name = "u = {0} c, v = {1} c, L = {2} m, t_e = {3} s")
    @CsvSource({
        "-0.3, 0.5, 1e12, 1e8",     // kappa about 1.4
        "0.9, -0.5, 1e13, -2e8",    // a sender running ahead, sent before mission time 0
        "0.0, 0.99, 1e10, 3e7",     // a receiver fleeing at 0.99 c: kappa about 1
        "0.2, 0.2, 1e9, 5e7",       // same velocities: the light time does not depend on t_e
    })
    void theConditionNumberIsTheLogDerivativeOfTheLightTime(double u, double v, double l, double te) {
        InertialWorldline a = InertialWorldline.of(Vec3.ZERO, Vec3.of(u * C, 0, 0), 0);
        InertialWorldline b = InertialWorldline.of(Vec3.of(l, 0, 0), Vec3.of(v * C, 0, 0), 0);
        SignalPath p = LightCone.future(a.atTime(te), b);
        double cMinusV = C - v * C;
        double t = (l + (v - u) * C * te) / cMinusV;
        double kappa = (Math.abs(te) * Math.abs((v - u) * C / cMinusV) + Math.abs(u * C * te) / cMinusV) / t;
        double expected = Math.max(1.0, kappa);
        assertEquals(expected, Conditioning.ofLightTime(p), 1e-12 * expected);
        Vec3 k = p.path().unit();
        assertEquals(expected, Conditioning.ofLightTime(p, MotionFactor.of(p.send(), k), MotionFactor.of(p.receive(), k)),
                1e-12 * expected, "from the factors");
    }

    @Test
    void aSignalThatTakesNoTimeOrNeverArrivesHasConditionOne() {
        // nothing to be sensitive about: 1 by definition (Conditioning's contract)
        InertialWorldline here = InertialWorldline.atRest(Vec3.of(1e9, 0, 0));
        State send = here.atTime(1e7);
        SignalPath none = LightCone.future(send, here);
        SignalPath never = SignalPath.never(send);
        MotionFactor still = MotionFactor.of(send, Vec3.of(1, 0, 0));
        for (SignalPath p : new SignalPath[] {none, never}) {
            assertEquals(1.0, Conditioning.ofLightTime(p), 0.0);
            assertEquals(1.0, Conditioning.ofLightTime(p, still, still), 0.0);
        }
    }
}
