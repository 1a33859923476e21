package org.nullpath.worldline;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;

import org.hipparchus.ode.DenseOutputModel;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.nullpath.testkit.Ode;

/**
 * The compact dense output reproduces Hipparchus' own: both handlers watch one Dormand–Prince 8(5,3)
 * integration of a five-component system shaped like a leg's, and at 2000 random points the barycentric
 * interpolant through 8 Chebyshev–Lobatto points of each step equals Hipparchus' {@link DenseOutputModel}
 * to 1e-13 of each component's size (the interpolant is the same degree-7 polynomial: Hairer, Nørsett &amp;
 * Wanner, Solving ODEs I, II.6; the rest is rounding, with a Lebesgue constant below 2: Berrut &amp;
 * Trefethen 2004; both citations and the constant from memory, the tolerance common practice for
 * double rounding of a well-conditioned interpolant). The system and its numbers are invented for the test.
 */
class StepStoreTest {
    @Test
    void theCompactDenseOutputIsTheIntegratorsOwnInterpolant() {
        OrdinaryDifferentialEquation ode = Ode.of(5, (u, y) -> new double[] {1e-7 * Math.sin(1e-5 * u) + 3e-8,
            Math.cosh(y[0]), Math.sinh(y[0]), Math.exp(-y[0]), Math.exp(y[0])});
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0, 1e6, 1e-20, 1e-13);
        DenseOutputModel reference = new DenseOutputModel();
        StepStore store = new StepStore(100_000);
        java.util.List<double[]> steps = new java.util.ArrayList<>(); // {start, end} of each step, as Hipparchus gives them
        integrator.addStepHandler(reference);
        integrator.addStepHandler(store);
        integrator.addStepHandler(interpolator -> steps.add(new double[] {interpolator.getPreviousState().getTime(),
            interpolator.getCurrentState().getTime()}));
        double end = 3e7;
        integrator.integrate(ode, new ODEState(0, new double[5]), end);
        assertTrue(store.steps() > 10, "steps " + store.steps());
        assertEquals(end, store.end());
        assertEquals(steps.size(), store.steps());
        double[] lastStep = steps.get(steps.size() - 1);
        assertEquals(lastStep[1] - lastStep[0], store.lastLength(), "the last step's length");
        // at the step ends themselves (where the binary search hits) and clamped outside the kept steps
        double[] exact = {steps.get(0)[1], steps.get(1)[1], steps.get(steps.size() / 2)[0], -1e6, end, 2 * end};
        for (double u : exact) {
            double[] want = reference.getInterpolatedState(Math.max(0, Math.min(end, u))).getPrimaryState();
            double[] got = store.at(u);
            for (int k = 0; k < 5; k++) {
                assertEquals(want[k], got[k], 1e-13 * Math.abs(want[k]) + 1e-300, "component " + k + " at " + u);
            }
        }
        Random random = new Random(42);
        double[] size = reference.getInterpolatedState(end).getPrimaryState();
        for (int i = 0; i < 2000; i++) {
            double u = i == 0 ? 0 : i == 1 ? end : random.nextDouble() * end;
            double[] want = reference.getInterpolatedState(u).getPrimaryState();
            double[] got = store.at(u);
            for (int k = 0; k < 5; k++) {
                assertEquals(want[k], got[k], 1e-13 * Math.abs(size[k]), "component " + k + " at " + u);
            }
        }
    }

    @Test
    void oneStepBeyondTheBudgetStopsTheIntegration() {
        OrdinaryDifferentialEquation ode = Ode.of(5, (u, y) -> new double[] {Math.cos(u), 1, 0, 1, 1});
        DormandPrince853Integrator integrator = new DormandPrince853Integrator(0, 0.01, 1e-20, 1e-13);
        StepStore store = new StepStore(50);
        integrator.addStepHandler(store);
        assertThrows(StepStore.Full.class, () -> integrator.integrate(ode, new ODEState(0, new double[5]), 100));
        assertEquals(50, store.steps());
    }
}
