package org.nullpath.spacetime;

/** A mission-frame 3-vector (metres, or metres per second, or dimensionless, as its name says). */
public record Vec3(double x, double y, double z) {
    public static final Vec3 ZERO = new Vec3(0, 0, 0);

    public static Vec3 of(double x, double y, double z) {
        return new Vec3(x, y, z);
    }

    public Vec3 plus(Vec3 o) {
        return new Vec3(x + o.x, y + o.y, z + o.z);
    }

    public Vec3 minus(Vec3 o) {
        return new Vec3(x - o.x, y - o.y, z - o.z);
    }

    public Vec3 times(double k) {
        return new Vec3(k * x, k * y, k * z);
    }

    public double dot(Vec3 o) {
        return x * o.x + y * o.y + z * o.z;
    }

    public Vec3 cross(Vec3 o) {
        return new Vec3(y * o.z - z * o.y, z * o.x - x * o.z, x * o.y - y * o.x);
    }

    /**
     * Euclidean length, without overflow for large components: hypot(hypot(x, y), z). A zero component adds
     * nothing and is skipped, which gives the same bits (hypot(a, +-0) is |a| exactly, for every a), so a vector
     * along an axis (a flight line along x, a station at the origin) takes no hypot at all.
     */
    public double norm() {
        if (z == 0) {
            return y == 0 ? Math.abs(x) : x == 0 ? Math.abs(y) : Math.hypot(x, y);
        }
        if (x == 0 && y == 0) {
            return Math.abs(z);
        }
        return Math.hypot(Math.hypot(x, y), z);
    }

    public double normSquared() {
        return x * x + y * y + z * z;
    }

    public boolean isZero() {
        return x == 0 && y == 0 && z == 0;
    }

    /** This vector scaled to unit length. */
    public Vec3 unit() {
        double n = norm();
        if (n == 0 || !Double.isFinite(n)) {
            throw new IllegalArgumentException("cannot normalise " + this);
        }
        return new Vec3(x / n, y / n, z / n);
    }

    public boolean isFinite() {
        return Double.isFinite(x) && Double.isFinite(y) && Double.isFinite(z);
    }
}
