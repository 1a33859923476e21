package org.nullpath.link;

import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.worldline.State;

/**
 * How an antenna is pointed and how its gain falls off its boresight (docs/link-budget.md, "Pointing").
 * The main lobe follows the parabolic rule of common link-budget practice (no single source is named here;
 * it is the Gaussian-beam approximation of a main lobe, cited from memory):
 * <pre>
 *   G(theta) = G0 - 12 (theta / theta_3dB)^2  dB,   never below the sidelobe level, never above G0
 * </pre>
 * so that theta = theta_3dB / 2 is 3 dB down (theta_3dB the full half-power width). A circular aperture of
 * diameter D has the default width 70 lambda / D degrees at its own frequency (common practice for a
 * parabolic reflector, cited from memory).
 *
 * @param boresight            where the antenna points
 * @param fixed                the boresight's unit vector in the node's rest-frame axes ({@link Boresight#FIXED}), else null
 * @param beamwidthRadians     full half-power width; NaN for the aperture's default
 * @param pointingErrorRadians a tracking antenna's residual error (0 for the others)
 * @param sidelobeDbi          the gain's floor off the main lobe
 */
public record Pointing(Boresight boresight, Vec3 fixed, double beamwidthRadians, double pointingErrorRadians,
                       double sidelobeDbi) {

    /** Where an antenna's boresight points. */
    public enum Boresight {
        /** Along the signal (aim for a transmitter, look for a receiver), to within the pointing error. */
        TRACKING,
        /** Along the craft's heading. */
        FORWARD,
        /** Against the craft's heading. */
        AFT,
        /** A fixed direction in the node's rest-frame axes. */
        FIXED
    }

    /** The default sidelobe level, dBi. */
    public static final double DEFAULT_SIDELOBE_DBI = -10;

    /** An antenna aimed exactly along the signal: no pointing loss. */
    public static final Pointing EXACT = new Pointing(Boresight.TRACKING, null, Double.NaN, 0, DEFAULT_SIDELOBE_DBI);

    /** The default full half-power width of a circular aperture: 70 lambda / D degrees (common practice). */
    public static double defaultBeamwidthRadians(double diameterMetres, double hz) {
        return Math.toRadians(70 * (Constants.C / hz) / diameterMetres);
    }

    /**
     * The angle between the signal's direction {@code signal} (aim or look, a unit vector in the body's rest
     * frame) and this antenna's boresight, for the body in state {@code s} (a craft's direction is its heading):
     * the pointing error for a tracking antenna.
     */
    public double offBoresightRadians(Vec3 signal, State s) {
        return switch (boresight) {
            case TRACKING -> pointingErrorRadians;
            case FORWARD -> Directions.angle(signal, s.direction());
            case AFT -> Directions.angle(signal, s.direction().times(-1));
            case FIXED -> Directions.angle(signal, fixed);
        };
    }

    /** The full half-power width at frequency {@code hz} for {@code antenna}: the one given, or the aperture's default. */
    public double beamwidthRadians(Antenna antenna, double hz) {
        if (!Double.isNaN(beamwidthRadians)) {
            return beamwidthRadians;
        }
        return antenna instanceof Antenna.Aperture a ? defaultBeamwidthRadians(a.diameterMetres(), hz) : Double.NaN;
    }

    /**
     * The loss off boresight, dB (not negative): G0 minus the pattern's gain at {@code theta} off boresight,
     * for on-axis gain {@code g0Dbi}, full half-power width {@code beamwidth} and this antenna's sidelobe level.
     * Exactly 0 on boresight.
     */
    public double lossDb(double g0Dbi, double theta, double beamwidth) {
        if (theta == 0) {
            return 0;
        }
        double r = theta / beamwidth;
        double gain = Math.min(g0Dbi, Math.max(g0Dbi - 12 * r * r, sidelobeDbi));
        return g0Dbi - gain;
    }
}
