package org.nullpath.lightcone;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nullpath.worldline.LineState;
import org.nullpath.worldline.StraightLineCraft;

/**
 * The off-line cone's root finder on its own, fed the walk of hyperbolic motion from rest at proper
 * acceleration alpha (Rindler 2006, ch. 3; in null coordinates U = c t - s and V = c t + s:
 * U = k (1 - e^-eta), V = k (e^eta - 1), eta = alpha tau / c, k = c^2 / alpha). The cone condition
 * (a0 + U)(V - a0) = rho^2 then becomes, with x = e^eta and p = a0 + k, the quadratic
 * k p x^2 - (p^2 + k^2 + rho^2) x + k p = 0, whose larger root gives tau = (c / alpha) ln x exactly; its
 * discriminant is formed as (a0^2 + rho^2)((p + k)^2 + rho^2) and x - 1 from a0^2 + rho^2 plus its root, so
 * neither cancels (tau = (c / alpha) log1p(x - 1)). Checked: the
 * root against that closed form, and the cost: Newton's method on ln(A / rho) + ln(B / rho) from the
 * inertial guess converges quadratically, so a solve takes a handful of walks, not the fifty-odd that
 * bisection would need for 1e-15 relative.
 */
class OffLineRootTest {
    private static final double C = 299_792_458.0; // m/s, exact (SI)

    private static StraightLineCraft.LineWalk hyperbolic(double alpha, double tau) {
        double k = C * C / alpha;
        double eta = alpha * tau / C;
        double dU = -k * Math.expm1(-eta);
        double dV = k * Math.expm1(eta);
        double dt = k / C * Math.sinh(eta);
        double dAlong = 0.5 * (dV - dU);
        return new StraightLineCraft.LineWalk(dt, tau, dAlong, dU, dV, new LineState(tau, dt, dAlong, eta, 0, tau));
    }

    private static double closedForm(double alpha, double a0, double rho) {
        double k = C * C / alpha;
        double p = a0 + k;
        double below = a0 * a0 + rho * rho; // (p^2 + k^2 + rho^2) - 2 k p = (p - k)^2 + rho^2, p - k = a0
        double disc = Math.sqrt(below * ((p + k) * (p + k) + rho * rho));
        double xMinusOne = (below + disc) / (2 * k * p);
        return C / alpha * Math.log1p(xMinusOne);
    }

    @Test
    void theRootMeetsTheClosedFormInAFewWalks() {
        List<String> seen = new ArrayList<>();
        int most = 0;
        int total = 0;
        for (double alpha : new double[] {1e-3, 9.80665, 1e3}) {
            double k = C * C / alpha;
            for (double rho : new double[] {1e6, 1e11, 1e14, 1e16}) {
                for (double f : new double[] {-0.9, -0.3, 0, 0.3, 3}) {
                    double a0 = f * Math.min(rho, k); // keeps p = a0 + k > 0: the signal arrives
                    double guess = Math.hypot(rho, a0) / C; // the light time to a craft at rest
                    int[] walks = {0};
                    StraightLineCraft.LineWalk w = LightCone.offLineRoot(du -> {
                        walks[0]++;
                        return hyperbolic(alpha, du);
                    }, a0, 1, rho, guess);
                    double expected = closedForm(alpha, a0, rho);
                    String where = "alpha " + alpha + " rho " + rho + " a0 " + a0;
                    // 1e-15 relative (LightCone.RELATIVE_ACCURACY) plus the closed form's own rounding
                    assertEquals(expected, w.dClock(), 2e-13 * expected, where);
                    most = Math.max(most, walks[0]);
                    total += walks[0];
                    seen.add(walks[0] + " " + where);
                }
            }
        }
        // at most 12 walks a solve (the most these cases take is 10; bisection alone would take about 50)
        assertTrue(most <= 12, "walks per solve: " + seen);
        // and about four on average (these 59 cases take 3.8): the stop on quadratic convergence saves the
        // last confirming walk of most solves (a count of walks, deterministic; the time is SolverBench's)
        assertTrue(total <= 4.0 * seen.size(), "walks in all: " + total + " for " + seen.size() + " solves");
    }

    @Test
    void aGuessThatIsNoUseStillFindsTheRoot() {
        for (double guess : new double[] {0, -5, Double.NaN, Double.POSITIVE_INFINITY, 1e30}) {
            StraightLineCraft.LineWalk w = LightCone.offLineRoot(du -> hyperbolic(9.80665, du), 0, 1, 1e13, guess);
            double expected = closedForm(9.80665, 0, 1e13);
            assertEquals(expected, w.dClock(), 2e-13 * expected, "guess " + guess);
        }
    }
}
