package org.nullpath.mission;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * A trade study over one scenario, as read from a sweep file: a grid of values for some scenario keys
 * (every combination, the first key varying slowest), optionally {@code draws} random points per grid
 * point for other keys, from a fixed seed. Point numbers run from 1; point {@code p}'s values depend only on
 * the sweep and {@code p}, so the points are the same on any machine and in any order of computing them.
 *
 * @param scenario the scenario file's name as the sweep file gives it (for the files written)
 * @param grid     the grid keys, slowest first; empty for a study of random draws only
 * @param draws    random points per grid point (0: none, the grid alone)
 * @param seed     the seed of the draws
 * @param random   the randomly drawn keys
 */
// Serializable: a study computed on other machines (the Spark engine) carries its sweep inside the job
public record Sweep(String scenario, List<Axis> grid, int draws, long seed, List<Draw> random) implements Serializable {
    public Sweep {
        Objects.requireNonNull(scenario, "scenario");
        grid = List.copyOf(grid);
        random = List.copyOf(random);
        if (draws < 0 || draws > 0 && random.isEmpty() || draws == 0 && !random.isEmpty()) {
            throw new IllegalArgumentException("draws must be positive exactly when keys are drawn at random");
        }
    }

    /**
     * One value a key takes: the scalar written into the scenario ({@code "9.80665 m/s^2"}) and its number in
     * sweep.csv (SI base units; decibels stay decibels), NaN for a word, which sweep.csv gives as written.
     */
    public record Value(String scenarioText, double number) implements Serializable {
        /** A word rather than a number ({@code forever}, {@code tracking}). */
        public boolean word() {
            return Double.isNaN(number);
        }
    }

    /** A grid key and its values, in order. */
    public record Axis(String key, List<Value> values) implements Serializable {
        public Axis {
            values = List.copyOf(values);
            if (values.isEmpty()) {
                throw new IllegalArgumentException("a grid key needs at least one value");
            }
        }
    }

    /** How a key is drawn: normal (mean, standard deviation) or uniform (low, high), in its own units. */
    public enum Law { NORMAL, UNIFORM }

    /**
     * A randomly drawn key.
     *
     * @param key      the scenario key
     * @param law      the distribution
     * @param a        mean (normal) or low end (uniform), in the quantity's sweep units (SI, or dB)
     * @param b        standard deviation (normal) or high end (uniform)
     * @param unit     the unit written after the drawn number in the scenario ("m/s", "dB", "" for a plain number)
     */
    public record Draw(String key, Law law, double a, double b, String unit) implements Serializable {
    }

    /** Number of grid points (1 for a study of draws alone). */
    public long gridPoints() {
        long n = 1;
        for (Axis ax : grid) {
            n = Math.multiplyExact(n, ax.values().size());
        }
        return n;
    }

    /** Number of points in the study. */
    public long points() {
        return Math.multiplyExact(gridPoints(), Math.max(1, draws));
    }

    /** Every varied key in column order: the grid keys, then the drawn keys. */
    public List<String> keys() {
        List<String> keys = new ArrayList<>();
        grid.forEach(ax -> keys.add(ax.key()));
        random.forEach(d -> keys.add(d.key()));
        return keys;
    }

    /** The values of point {@code p} (1-based), key by key in column order. */
    public Map<String, Value> point(long p) {
        if (p < 1 || p > points()) {
            throw new IllegalArgumentException("no point " + p);
        }
        int[] index = gridIndex(p);
        Map<String, Value> values = new LinkedHashMap<>();
        for (int k = 0; k < grid.size(); k++) {
            values.put(grid.get(k).key(), grid.get(k).values().get(index[k]));
        }
        if (!random.isEmpty()) {
            Draws r = new Draws(seed, p);
            for (Draw d : random) {
                double x = switch (d.law()) {
                    case NORMAL -> d.a() + d.b() * r.normal();
                    case UNIFORM -> d.a() + (d.b() - d.a()) * r.uniform();
                };
                values.put(d.key(), number(x, d.unit()));
            }
        }
        return values;
    }

    /** Which value of each grid key point {@code p} (1-based) takes, in grid order: the first key varies slowest. */
    public int[] gridIndex(long p) {
        long g = (p - 1) / Math.max(1, draws);
        int[] index = new int[grid.size()];
        long stride = gridPoints();
        for (int k = 0; k < grid.size(); k++) {
            int n = grid.get(k).values().size();
            stride /= n;
            index[k] = (int) (g / stride % n);
        }
        return index;
    }

    /** The value {@code x} in {@code unit}, written for the scenario in digits that read back to {@code x}. */
    public static Value number(double x, String unit) {
        String digits = Double.toString(x);
        return new Value(unit.isEmpty() ? digits : digits + " " + unit, x);
    }

    /**
     * The random numbers of one point: SplitMix64 (Steele, Lea &amp; Flood, OOPSLA 2014) seeded from the sweep's
     * seed and the point number, uniforms from its top 53 bits, normals by the Box-Muller transform with
     * StrictMath (so the same on every Java and machine).
     */
    static final class Draws {
        private long state;
        private double spare = Double.NaN;

        Draws(long seed, long point) {
            state = mix(seed ^ mix(point * 0x9E3779B97F4A7C15L));
        }

        private static long mix(long z) {
            z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
            z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
            return z ^ (z >>> 31);
        }

        long next() {
            state += 0x9E3779B97F4A7C15L;
            return mix(state);
        }

        /** Uniform on [0, 1). */
        double uniform() {
            return (next() >>> 11) * 0x1.0p-53;
        }

        /** Standard normal. */
        double normal() {
            if (!Double.isNaN(spare)) {
                double s = spare;
                spare = Double.NaN;
                return s;
            }
            double u1 = 1.0 - uniform(); // (0, 1]: the logarithm stays finite
            double u2 = uniform();
            double r = StrictMath.sqrt(-2.0 * StrictMath.log(u1));
            spare = r * StrictMath.sin(2 * StrictMath.PI * u2);
            return r * StrictMath.cos(2 * StrictMath.PI * u2);
        }
    }
}
