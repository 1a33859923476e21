package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleFunction;
import java.util.stream.Stream;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.nullpath.spacetime.Vec3;
import static org.nullpath.testkit.Si.C;
import static org.nullpath.testkit.Si.G0;
import static org.nullpath.testkit.Si.LY;
import static org.nullpath.testkit.Si.YR;

/**
 * Multi-leg craft against an independent numerical integration with Apache Commons Math 3.6.1
 * ({@link DormandPrince853Integrator}, an 8th-order embedded Runge-Kutta method, tolerances 1e-14
 * relative) of the equations of motion in proper time u (Rindler 2006, hyperbolic motion; MTW 1973, ch. 6):
 * <pre>
 *   d(eta)/du = a / c,   dt/du = cosh(eta),   ds/du = c sinh(eta)
 * </pre>
 * Leg ends that are not craft-clock durations (mission duration, until-speed, until-distance) are found
 * by the integrator's own event location. t, s and eta are compared at every leg end and mid-leg to
 * 1e-10 relative (eta, which passes through zero, to 1e-10 of the largest rapidity of the flight).
 */
class IndependentIntegrationTest {
    private static final double TOL = 1e-10;

    /** y = (eta, t, s) as functions of proper time, at constant proper acceleration a. */
    private record Motion(double a) implements FirstOrderDifferentialEquations {
        @Override
        public int getDimension() {
            return 3;
        }

        @Override
        public void computeDerivatives(double u, double[] y, double[] yDot) {
            yDot[0] = a / C;
            yDot[1] = Math.cosh(y[0]);
            yDot[2] = C * Math.sinh(y[0]);
        }
    }

    /** Stops the integration where g(y) = target. */
    record Stop(ToDoubleFunction<double[]> quantity, double target) implements EventHandler {
        @Override
        public void init(double t0, double[] y0, double t) {
        }

        @Override
        public double g(double u, double[] y) {
            return quantity.applyAsDouble(y) - target;
        }

        @Override
        public Action eventOccurred(double u, double[] y, boolean increasing) {
            return Action.STOP;
        }

        @Override
        public void resetState(double u, double[] y) {
        }
    }

    private static FirstOrderIntegrator integrator() {
        double[] abs = {1e-16, 1e-9, 1e-1};
        double[] rel = {1e-14, 1e-14, 1e-14};
        return new DormandPrince853Integrator(1e-12, 1e7, abs, rel);
    }

    /** Integrates from (u0, y0) to u1, or to the event, whichever comes first; returns the final u. */
    private static double integrate(double a, double u0, double[] y, double u1, Stop stop) {
        FirstOrderIntegrator ode = integrator();
        if (stop != null) {
            ode.addEventHandler(stop, 1e5, 1e-8, 1000);
        }
        return ode.integrate(new Motion(a), u0, y, u1, y);
    }

    static Stream<Arguments> flights() {
        return Stream.of(
                Arguments.of("burn, coast, reverse burn to rest", 0.0, List.of(
                        new LegSpec.Burn(G0, new LegSpec.ClockDuration(YR)),
                        new LegSpec.Coast(new LegSpec.ClockDuration(0.5 * YR)),
                        new LegSpec.Burn(-G0, new LegSpec.UntilSpeed(0)))),
                Arguments.of("moving start, mission-time legs, reverse through zero", 0.3 * C, List.of(
                        new LegSpec.Burn(0.5 * G0, new LegSpec.MissionDuration(2 * YR)),
                        new LegSpec.Coast(new LegSpec.MissionDuration(YR)),
                        new LegSpec.Burn(-2 * G0, new LegSpec.UntilSpeed(-0.2 * C)))),
                Arguments.of("hard burn to rapidity ~20, coast a distance, brake", 0.0, List.of(
                        new LegSpec.Burn(10 * G0, new LegSpec.ClockDuration(2 * YR)),
                        new LegSpec.Coast(new LegSpec.UntilDistance(5e8 * LY)),
                        new LegSpec.Burn(-10 * G0, new LegSpec.UntilSpeed(0.5 * C)))),
                Arguments.of("until-distance burns and a faint push", -0.1 * C, List.of(
                        new LegSpec.Burn(G0, new LegSpec.UntilDistance(3 * LY)),
                        new LegSpec.Burn(1e-6, new LegSpec.ClockDuration(10 * YR)),
                        new LegSpec.Burn(-0.25 * G0, new LegSpec.UntilSpeed(0.01 * C)))));
    }

    private static void assertClose(double expected, double actual, double scale, String what) {
        assertEquals(expected, actual, TOL * scale, what);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("flights")
    void legEndsAndMidLegsAgreeWithAnIndependentIntegration(String name, double startSpeed, List<LegSpec> legs) {
        StraightLineCraft craft = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, startSpeed, legs);
        double eta0 = 0.5 * Math.log((C + startSpeed) / (C - startSpeed));
        double[] y = {eta0, 0, 0};
        double u = 0;
        double peakEta = Math.abs(eta0);
        List<String> checked = new ArrayList<>();
        for (int i = 0; i < legs.size(); i++) {
            LegSpec leg = legs.get(i);
            double a = leg.accelerationMetresPerSecond2();
            double[] start = y.clone();
            double uStart = u;
            double uEnd;
            if (leg.end() instanceof LegSpec.ClockDuration d) {
                uEnd = integrate(a, u, y, u + d.seconds(), null);
            } else if (leg.end() instanceof LegSpec.MissionDuration d) {
                uEnd = integrate(a, u, y, u + 1e3 * YR, new Stop(v -> v[1], start[1] + d.seconds()));
            } else if (leg.end() instanceof LegSpec.UntilSpeed s) {
                double target = 0.5 * Math.log((C + s.metresPerSecond()) / (C - s.metresPerSecond()));
                uEnd = integrate(a, u, y, u + 1e3 * YR, new Stop(v -> v[0], target));
            } else if (leg.end() instanceof LegSpec.UntilDistance d) {
                uEnd = integrate(a, u, y, u + 1e3 * YR, new Stop(v -> v[2], start[2] + d.metres()));
            } else {
                throw new AssertionError("no finite end");
            }
            peakEta = Math.max(peakEta, Math.max(Math.abs(y[0]), Math.abs(start[0])));
            LineState end = craft.legs().get(i).end();
            double tScale = Math.max(Math.abs(y[1]), 1.0);
            double sScale = Math.max(Math.abs(y[2]), Math.abs(start[2]));
            assertClose(uEnd, end.clock(), uEnd, name + ": leg " + i + " end clock");
            assertClose(y[1], end.timeSeconds(), tScale, name + ": leg " + i + " end t");
            assertClose(y[2], end.along(), sScale, name + ": leg " + i + " end s");
            assertClose(y[0], end.rapidity(), peakEta, name + ": leg " + i + " end eta");

            // mid-leg: integrate again from the leg start to half the integrated duration
            double[] mid = start.clone();
            double uMid = uStart + 0.5 * (uEnd - uStart);
            integrate(a, uStart, mid, uMid, null);
            LineState m = craft.lineAtClock(uMid);
            assertClose(mid[1], m.timeSeconds(), Math.abs(mid[1]), name + ": leg " + i + " mid t");
            assertClose(mid[2], m.along(), Math.max(Math.abs(mid[2]), Math.abs(start[2])), name + ": leg " + i + " mid s");
            assertClose(mid[0], m.rapidity(), peakEta, name + ": leg " + i + " mid eta");
            u = uEnd;
            checked.add("leg " + i);
        }
        assertTrue(checked.size() == legs.size());
        // after the last finite leg the craft coasts for ever: compare one year on
        double[] after = y.clone();
        integrate(0, u, after, u + YR, null);
        LineState later = craft.lineAtClock(u + YR);
        assertClose(after[1], later.timeSeconds(), Math.abs(after[1]), name + ": final coast t");
        assertClose(after[2], later.along(), Math.abs(after[2]), name + ": final coast s");
    }
}
