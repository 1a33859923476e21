package org.nullpath.schedule;

import java.util.PriorityQueue;
import java.util.function.DoubleUnaryOperator;

import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Globally adaptive Gauss-Legendre quadrature: each piece is integrated by the {@value #POINTS}-point rule on
 * itself and on its two halves; the difference of the two is that piece's error estimate (an overestimate of
 * the error of the halves' sum, which is what is kept). The piece with the largest estimate is halved until
 * the estimates sum to at most {@code relative} of the integral's magnitude. Nodes and weights come from
 * Hipparchus' {@link GaussIntegratorFactory}.
 */
final class Quadrature {
    /** Points of the Gauss-Legendre rule on each piece. */
    static final int POINTS = 10;
    /** Pieces after which the integral is given up as not converging (NaN). */
    static final int MAX_PIECES = 1000;

    private static final GaussIntegrator RULE = new GaussIntegratorFactory().legendre(POINTS);

    private Quadrature() {
    }

    /** The integral of f over [a, b] to {@code relative} (estimated); NaN when f is NaN or infinite somewhere or it does not converge. */
    static double integrate(DoubleUnaryOperator f, double a, double b, double relative) {
        if (!(b > a)) {
            return 0.0;
        }
        PriorityQueue<Piece> pieces = new PriorityQueue<>((p, q) -> Double.compare(q.error, p.error));
        Piece whole = Piece.of(f, a, b, rule(f, a, b));
        pieces.add(whole);
        double total = whole.fine;
        double error = whole.error;
        while (!(error <= relative * Math.abs(total))) {
            if (!Double.isFinite(total) || pieces.size() >= MAX_PIECES) {
                return Double.NaN;
            }
            Piece p = pieces.poll();
            double m = p.a + 0.5 * (p.b - p.a);
            if (!(m > p.a && m < p.b)) {
                return Double.NaN; // halved down to adjacent doubles without converging
            }
            Piece left = Piece.of(f, p.a, m, p.left);
            Piece right = Piece.of(f, m, p.b, p.right);
            pieces.add(left);
            pieces.add(right);
            total = 0;
            error = 0;
            for (Piece q : pieces) { // re-summed, not updated, so rounding does not accumulate
                total += q.fine;
                error += q.error;
            }
        }
        return Double.isFinite(total) ? total : Double.NaN;
    }

    private static double rule(DoubleUnaryOperator f, double a, double b) {
        double half = 0.5 * (b - a);
        double mid = a + half;
        double s = 0;
        for (int i = 0; i < POINTS; i++) {
            s += RULE.getWeight(i) * f.applyAsDouble(mid + half * RULE.getPoint(i));
        }
        return s * half;
    }

    /** A piece [a, b]: the rule on the whole ({@code coarse}) and on each half. */
    private record Piece(double a, double b, double left, double right, double fine, double error) {
        static Piece of(DoubleUnaryOperator f, double a, double b, double coarse) {
            double m = a + 0.5 * (b - a);
            double l = rule(f, a, m);
            double r = rule(f, m, b);
            double fine = l + r;
            return new Piece(a, b, l, r, fine, Math.abs(fine - coarse));
        }
    }
}
