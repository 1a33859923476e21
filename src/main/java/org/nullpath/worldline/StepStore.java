package org.nullpath.worldline;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.sampling.ODEStateInterpolator;
import org.hipparchus.ode.sampling.ODEStepHandler;

/**
 * The dense output of an integrated leg in a compact form: each accepted step of the Dormand–Prince
 * 8(5,3) integrator is kept as its interpolated state at {@value #NODES} Chebyshev–Lobatto points of the
 * step. The integrator's own interpolant is a polynomial of degree 7 in the step fraction (Hairer, Nørsett
 * &amp; Wanner, Solving ODEs I, II.6, the dense output of DOP853), so the barycentric Lagrange interpolant
 * through these points is the same polynomial, up to rounding (Berrut &amp; Trefethen, SIAM Review 46:501,
 * 2004; the Lebesgue constant of 8 such points is below 2; citations and constant from memory, the
 * agreement itself is checked against Hipparchus' own dense output in StepStoreTest). A step costs {@value #NODES} x 5 + 1 doubles
 * (328 bytes) instead of the integrator's own interpolator objects (above 1 KB a step, measured with a class
 * histogram), and at most {@link #maxSteps} steps are kept: one more stops the integration
 * ({@link Full}).
 */
final class StepStore implements ODEStepHandler {
    /** Points kept per step: the degree of the integrator's interpolant plus one. */
    static final int NODES = 8;
    private static final int DIM = 5;
    private static final int PER_STEP = NODES * DIM;
    private static final int CHUNK_STEPS = 4096;
    private static final double[] THETA = new double[NODES];
    private static final double[] WEIGHT = new double[NODES];

    static {
        for (int j = 0; j < NODES; j++) {
            THETA[j] = j == 0 ? 0.0 : j == NODES - 1 ? 1.0 : 0.5 * (1 - Math.cos(Math.PI * j / (NODES - 1)));
            WEIGHT[j] = ((j & 1) == 0 ? 1.0 : -1.0) * (j == 0 || j == NODES - 1 ? 0.5 : 1.0);
        }
    }

    /** Thrown from the step handler when one more step than allowed is offered. */
    static final class Full extends RuntimeException {
        Full() {
            super("step budget spent", null, false, false);
        }
    }

    private final int maxSteps;
    private double[] ends = new double[64];
    private final List<double[]> chunks = new ArrayList<>();
    private double first = Double.NaN;
    private int steps;

    StepStore(int maxSteps) {
        this.maxSteps = maxSteps;
    }

    /** Steps kept. */
    int steps() {
        return steps;
    }

    /** Proper time where the kept steps end (where they start when none is kept: NaN). */
    double end() {
        return steps == 0 ? first : ends[steps - 1];
    }

    /** Length of the last step kept (at least one must be). */
    double lastLength() {
        return ends[steps - 1] - (steps == 1 ? first : ends[steps - 2]);
    }

    @Override
    public void handleStep(ODEStateInterpolator interpolator) {
        double t0 = interpolator.getPreviousState().getTime();
        double t1 = interpolator.getCurrentState().getTime();
        if (!(t1 > t0)) {
            return; // an empty step at an event or a restart holds nothing
        }
        if (steps >= maxSteps) {
            throw new Full();
        }
        if (steps == 0) {
            first = t0;
        }
        if (steps == ends.length) {
            ends = Arrays.copyOf(ends, ends.length * 2);
        }
        if (steps % CHUNK_STEPS == 0) {
            chunks.add(new double[CHUNK_STEPS * PER_STEP]);
        }
        double[] chunk = chunks.get(steps / CHUNK_STEPS);
        int base = (steps % CHUNK_STEPS) * PER_STEP;
        for (int j = 0; j < NODES; j++) {
            ODEStateAndDerivative s = j == 0 ? interpolator.getPreviousState()
                    : j == NODES - 1 ? interpolator.getCurrentState()
                    : interpolator.getInterpolatedState(t0 + THETA[j] * (t1 - t0));
            System.arraycopy(s.getPrimaryState(), 0, chunk, base + j * DIM, DIM);
        }
        ends[steps] = t1;
        steps++;
    }

    /** The state at proper time {@code u}, clamped to the kept steps (at least one must be kept). */
    double[] at(double u) {
        int k = Arrays.binarySearch(ends, 0, steps, u);
        if (k < 0) {
            k = Math.min(-k - 1, steps - 1);
        }
        double t0 = k == 0 ? first : ends[k - 1];
        double t1 = ends[k];
        double theta = Math.max(0.0, Math.min(1.0, (u - t0) / (t1 - t0)));
        double[] chunk = chunks.get(k / CHUNK_STEPS);
        int base = (k % CHUNK_STEPS) * PER_STEP;
        double[] y = new double[DIM];
        double den = 0;
        for (int j = 0; j < NODES; j++) {
            double d = theta - THETA[j];
            if (d == 0) {
                System.arraycopy(chunk, base + j * DIM, y, 0, DIM);
                return y;
            }
            double w = WEIGHT[j] / d;
            den += w;
            for (int i = 0; i < DIM; i++) {
                y[i] += w * chunk[base + j * DIM + i];
            }
        }
        for (int i = 0; i < DIM; i++) {
            y[i] /= den;
        }
        return y;
    }
}
