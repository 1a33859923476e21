package org.nullpath.testkit;

import org.hipparchus.ode.OrdinaryDifferentialEquation;

/**
 * A system of ordinary differential equations for Hipparchus' integrators, given by its dimension and its
 * right-hand side, so that a test states only its equations.
 */
public final class Ode {
    /** dy/dt at ({@code t}, {@code y}). */
    @FunctionalInterface
    public interface RightHandSide {
        double[] at(double t, double[] y);
    }

    private Ode() {
    }

    /** The system dy/dt = {@code f}(t, y) of {@code dimension} components. */
    public static OrdinaryDifferentialEquation of(int dimension, RightHandSide f) {
        return new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return dimension;
            }

            @Override
            public double[] computeDerivatives(double t, double[] y) {
                return f.at(t, y);
            }
        };
    }
}
