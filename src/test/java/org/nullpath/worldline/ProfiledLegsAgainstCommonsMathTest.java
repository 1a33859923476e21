package org.nullpath.worldline;

import java.util.List;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.nonstiff.GraggBulirschStoerIntegrator;
import org.junit.jupiter.api.Test;
import org.nullpath.spacetime.Vec3;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;

/**
 * Profiled legs against closed forms where they exist and against an independent integration with
 * Apache Commons Math 3.6.1's Gragg–Bulirsch–Stoer integrator (a different method and library from the
 * Dormand–Prince integration in Hipparchus that the worldline uses) of
 * d(eta)/du = a/c, dt/du = cosh(eta), ds/du = c sinh(eta).
 */
class ProfiledLegsAgainstCommonsMathTest {
    /** A proper acceleration law a(u, eta). */
    interface Law {
        double at(double u, double eta);
    }

    /** [eta, t, s] after integrating from rest at the origin through the knots, to u. */
    /** d/du of [eta, t, s] for proper acceleration {@code law}: eta' = a / c, t' = cosh eta, s' = c sinh eta. */
    static FirstOrderDifferentialEquations equations(Law law) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 3;
            }

            @Override
            public void computeDerivatives(double x, double[] yy, double[] dot) {
                dot[0] = law.at(x, yy[0]) / C;
                dot[1] = Math.cosh(yy[0]);
                dot[2] = C * Math.sinh(yy[0]);
            }
        };
    }

    static double[] commonsMath(Law law, double[] knots, double u) {
        double[] y = {0, 0, 0};
        FirstOrderDifferentialEquations ode = equations(law);
        double x = 0;
        for (int i = 1; i < knots.length && x < u; i++) {
            double end = Math.min(knots[i], u);
            GraggBulirschStoerIntegrator gbs = new GraggBulirschStoerIntegrator(1e-12, end - x,
                    new double[] {1e-20, 1e-12, 1e-4}, new double[] {1e-14, 1e-14, 1e-14});
            gbs.integrate(ode, x, y, end, y);
            x = end;
        }
        return y;
    }

    private static StraightLineCraft fly(LegSpec leg) {
        return StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0, List.of(leg));
    }

    private static void assertRelative(double expected, double actual, double tol, String what) {
        assertEquals(expected, actual, tol * Math.abs(expected), what);
    }

    private static void assertMatchesCommonsMath(StraightLineCraft craft, Law law, double[] knots, double u) {
        LineState s = craft.lineAtClock(u);
        double[] ref = commonsMath(law, knots, u);
        assertRelative(ref[0], s.rapidity(), 1e-10, "rapidity at u = " + u);
        assertRelative(ref[1], s.timeSeconds(), 1e-10, "mission time at u = " + u);
        assertRelative(ref[2], s.along(), 1e-10, "distance at u = " + u);
    }

    @Test
    void aPropellantLimitedRocketGainsAckeretsRapidityBudget() {
        // Ackeret (1946): delta eta = (v_ex / c) ln(mass ratio); beta = (MR^(2 v_ex / c) - 1) / (MR^(2 v_ex / c) + 1)
        StraightLineCraft craft = fly(new LegSpec.Rocket(G0, 0.5 * C, 10));
        LegSpan leg = craft.legs().get(0);
        assertRelative(0.5 * Math.log(10), leg.end().rapidity(), 1e-15, "rapidity budget");
        assertRelative(9.0 / 11.0, Math.tanh(leg.end().rapidity()), 1e-15, "final speed / c");
        assertRelative(0.5 * C * Math.log(10) / G0, leg.end().clock(), 1e-15, "burn time on the craft clock");
    }

    @Test
    void aConstantThrustRocketFollowsTheRocketEquationAndTheIndependentIntegration() {
        double f = 2e6;
        double m0 = 1e5;
        double m1 = 2e4;
        double ve = 0.1 * C;
        StraightLineCraft craft = fly(new LegSpec.ThrustRocket(f, m0, m1, ve));
        double burn = (m0 - m1) * ve / f;
        assertRelative(burn, craft.legs().get(0).end().clock(), 1e-15, "burn time");
        Law law = (u, eta) -> f / (m0 - f / ve * u);
        double[] knots = {0, burn};
        for (double frac : new double[] {0.01, 0.3, 0.77, 1.0}) {
            double u = frac * burn;
            // relativistic rocket equation (Ackeret 1946): eta(u) = (v_ex / c) ln(m0 / m(u))
            double closed = ve / C * Math.log(m0 / (m0 - f / ve * u));
            assertRelative(closed, craft.lineAtClock(u).rapidity(), 1e-12, "rapidity at " + frac);
            assertMatchesCommonsMath(craft, law, knots, u);
        }
    }

    @Test
    void aSailFollowsItsClosedFormAndEndsWhereTheSwitchOffLightArrives() {
        double p = 1e11;
        double m = 0.01;
        double r = 1;
        InertialWorldline home = InertialWorldline.atRest(Vec3.ZERO);
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(1e6, 0, 0), Vec3.of(1, 0, 0), 0, 0, 0,
                List.of(new LegSpec.Sail(home, p, m, r, 600)));
        double k = (1 + r) * p / (m * C);
        LegSpan leg = craft.legs().get(0);
        for (double frac : new double[] {0.001, 0.2, 0.6, 1.0}) {
            double u = frac * leg.end().clock();
            // beam from directly behind (issue text; cf. Kulkarni, Lubin & Zhang 2018): exp(2 eta) = 1 + 2 (1 + R) P u / (m c^2)
            double closed = 0.5 * Math.log1p(2 * k * u / C);
            assertRelative(closed, craft.lineAtClock(u).rapidity(), 1e-12, "rapidity at " + frac);
            assertMatchesCommonsMath(craft, (uu, eta) -> k * Math.exp(-2 * eta), new double[] {0, leg.end().clock()}, u);
        }
        // the switch-off at home clock 600 s travels along U = c t - x = c 600 (x from the origin)
        double x = 1e6 + leg.end().along();
        assertRelative(C * 600, C * leg.end().timeSeconds() - x, 1e-12, "leg ends on the switch-off's light front");
    }

    @Test
    void aSailAfterACoastWhoseBeamStationMovesAlongTheLineFollowsTheClosedFormInTheStationsFrame() {
        // The beam station moves along the line at 0.3 c and the craft starts beside its motion at the same speed,
        // 1000 km ahead, coasts 100 s of its clock, then sails. In the station's frame that is the sail from rest
        // of the test above (the law depends only on the beam's Doppler factor D = exp(-(eta - eta_station)),
        // docs/legs.md), so by the principle of relativity (Einstein 1905) the rapidity gained from the sail's start
        // follows exp(2 (eta - eta_station)) = 1 + 2 (1 + R) P (u - u0) / (m c^2); and the leg ends on the light
        // front of the switch-off, sent at station clock 600 s, i.e. at mission time 600 gamma_s from x = v t.
        double p = 1e11;
        double m = 0.01;
        double r = 0.8;
        double beta = 0.3;
        double etaStation = 0.5 * Math.log((1 + beta) / (1 - beta));
        InertialWorldline station = InertialWorldline.of(Vec3.ZERO, Vec3.of(beta * C, 0, 0), 0);
        StraightLineCraft craft = StraightLineCraft.of(Vec3.of(1e6, 0, 0), Vec3.of(1, 0, 0), 0, 0, beta * C,
                List.of(new LegSpec.Coast(new LegSpec.ClockDuration(100)), new LegSpec.Sail(station, p, m, r, 600)));
        double k = (1 + r) * p / (m * C);
        LegSpan sail = craft.legs().get(1);
        assertEquals(100, sail.start().clock(), 0.0, "the sail starts after the coast");
        assertRelative(etaStation, sail.start().rapidity(), 1e-12, "still beside the station when the sail starts");
        for (double frac : new double[] {0.001, 0.3, 0.7, 1.0}) {
            double u = 100 + frac * (sail.end().clock() - 100);
            double closed = etaStation + 0.5 * Math.log1p(2 * k * (u - 100) / C);
            assertRelative(closed, craft.lineAtClock(u).rapidity(), 1e-12, "rapidity at " + frac);
        }
        double gamma = 1 / Math.sqrt(1 - beta * beta);
        double tOff = 600 * gamma;
        double x = 1e6 + sail.end().along();
        assertRelative(C * tOff - beta * C * tOff, C * sail.end().timeSeconds() - x, 1e-12,
                "the leg ends on the switch-off's light front");
    }

    @Test
    void aTabulatedProfileMatchesItsPiecewiseRapidityAndTheIndependentIntegration() {
        double[] clocks = {0, 86_400, 864_000, 1_728_000};
        double[] accel = {0, 5, 10, 0};
        LegSpec.Profile profile = new LegSpec.Profile(clocks, accel);
        StraightLineCraft craft = fly(profile);
        // rapidity is (1/c) times the integral of the linear pieces: trapezoids
        double area = 0.5 * 5 * 86_400 + 0.5 * (5 + 10) * (864_000 - 86_400) + 0.5 * 10 * (1_728_000 - 864_000);
        assertRelative(area / C, craft.legs().get(0).end().rapidity(), 1e-12, "rapidity at the end");
        for (double u : new double[] {1000, 86_400, 400_000, 1_728_000}) {
            assertMatchesCommonsMath(craft, (uu, eta) -> profile.at(uu), clocks, u);
        }
        // after the table the craft coasts
        LineState after = craft.lineAtClock(2_000_000);
        assertEquals(craft.legs().get(0).end().rapidity(), after.rapidity(), 0.0);
    }

    @Test
    void badProfiledLegsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> new LegSpec.Rocket(G0, 0.5 * C, 1.0));
        assertThrows(IllegalArgumentException.class, () -> new LegSpec.ThrustRocket(1e6, 10, 10, 0.1 * C));
        assertThrows(IllegalArgumentException.class, () -> new LegSpec.Profile(new double[] {0, 5, 3}, new double[] {1, 2, 3}));
        InertialWorldline ahead = InertialWorldline.atRest(Vec3.of(1e9, 0, 0));
        WorldlineException e = assertThrows(WorldlineException.class, () -> StraightLineCraft.of(Vec3.ZERO,
                Vec3.of(1, 0, 0), 0, 0, 0, List.of(new LegSpec.Sail(ahead, 1e9, 1, 1, 100))));
        assertEquals(0, e.legIndex());
    }
}
