package org.nullpath.reference;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * An inertial station: position r(t) = r0 + v t (r0 at mission time 0), clock = t / gamma + offset, so the
 * clock reads {@code offset} at mission time 0. Test-only reference.
 */
public final class RefStation implements RefWorldline {

    private final BigDecimal[] position0;
    private final BigDecimal[] velocity;
    private final BigDecimal offset;
    /** gamma at each working precision used so far. */
    private final Map<Integer, BigDecimal> gammas = new ConcurrentHashMap<>();

    private RefStation(BigDecimal[] position0, BigDecimal[] velocity, BigDecimal offset) {
        this.position0 = position0;
        this.velocity = velocity;
        this.offset = offset;
        gamma(); // validates |v| < c
    }

    /**
     * @param position    position at mission time 0 (m); null means the origin
     * @param velocity    uniform velocity (m/s), |v| &lt; c; null means at rest
     * @param clockOffset clock reading at mission time 0 (s)
     */
    public static RefStation of(double[] position, double[] velocity, double clockOffset) {
        BigDecimal[] r = position == null ? zero() : RefMath.bd(position);
        BigDecimal[] v = velocity == null ? zero() : RefMath.bd(velocity);
        return new RefStation(r, v, RefMath.bd(clockOffset));
    }

    /** A station at rest at {@code position} with no clock offset. */
    public static RefStation atRest(double[] position) {
        return of(position, null, 0.0);
    }

    private static BigDecimal[] zero() {
        return new BigDecimal[] {BigDecimal.ZERO, BigDecimal.ZERO, BigDecimal.ZERO};
    }

    /** The Lorentz factor 1 / sqrt(1 - v^2/c^2) at the working precision. */
    public BigDecimal gamma() {
        return gammas.computeIfAbsent(RefMath.digits(), p -> RefState.gammaOf(velocity));
    }

    @Override
    public RefState atTime(BigDecimal t) {
        MathContext mc = RefMath.mc();
        BigDecimal[] r = RefMath.add(position0, RefMath.scale(velocity, t));
        BigDecimal gamma = gamma();
        BigDecimal clock = t.divide(gamma, mc).add(offset, mc);
        return new RefState(clock, t, r, velocity, gamma);
    }

    @Override
    public RefState atClock(BigDecimal clock) {
        BigDecimal gamma = gamma();
        BigDecimal t = clock.subtract(offset, RefMath.mc()).multiply(gamma, RefMath.mc());
        BigDecimal[] r = RefMath.add(position0, RefMath.scale(velocity, t));
        return new RefState(clock, t, r, velocity, gamma);
    }
}
