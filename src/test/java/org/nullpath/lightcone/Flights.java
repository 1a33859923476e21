package org.nullpath.lightcone;

import java.util.ArrayList;
import java.util.List;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.RandomDistribution;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.StraightLineCraft;

/**
 * Generators of invented demo flights for the property tests: craft on straight lines with up to three
 * finite legs (burns of 0.05 to 2 g0 either way, coasts), optionally an open-ended last burn, and
 * stations anywhere within a few light years moving at up to 0.9 c. Rapidities stay below about 12, where
 * absolute mission-frame coordinates keep far more than 12 digits. Values are drawn uniformly (not biased
 * towards zero), so that light times and distances are typical of real missions.
 */
public final class Flights {
    public static final double C = org.nullpath.testkit.Si.C;
    public static final double G0 = org.nullpath.testkit.Si.G0;
    public static final double YR = org.nullpath.testkit.Si.YR;
    public static final double LY = org.nullpath.testkit.Si.LY;

    private Flights() {
    }

    /** A craft plan, kept so that a failing example prints what it was. */
    public record Plan(Vec3 start, Vec3 heading, double startTime, double startClock, double startSpeed,
                       List<LegSpec> legs) {
        public StraightLineCraft craft() {
            return StraightLineCraft.of(start, heading, startTime, startClock, startSpeed, legs);
        }
    }

    public static Arbitrary<Vec3> unitish() {
        Arbitrary<Double> d = Arbitraries.doubles().between(-1, 1).ofScale(9).withDistribution(RandomDistribution.uniform());
        return Combinators.combine(d, d, d).as(Vec3::of).filter(v -> v.norm() > 0.2);
    }

    public static Arbitrary<Vec3> positionWithin(double metres) {
        Arbitrary<Double> d = Arbitraries.doubles().between(-metres, metres).ofScale(9).withDistribution(RandomDistribution.uniform());
        return Combinators.combine(d, d, d).as(Vec3::of);
    }

    /** A velocity of speed below {@code maxBeta} c in any direction. */
    public static Arbitrary<Vec3> velocityBelow(double maxBeta) {
        return Combinators.combine(unitish(), Arbitraries.doubles().between(0, maxBeta).ofScale(9).withDistribution(RandomDistribution.uniform()))
                .as((u, b) -> u.unit().times(b * C));
    }

    private static Arbitrary<LegSpec> finiteLeg() {
        Arbitrary<Double> g = Arbitraries.doubles().between(0.05, 2.0).ofScale(9).withDistribution(RandomDistribution.uniform());
        Arbitrary<Boolean> sign = Arbitraries.of(true, false);
        Arbitrary<Double> years = Arbitraries.doubles().between(0.05, 1.5).ofScale(9).withDistribution(RandomDistribution.uniform());
        Arbitrary<LegSpec> burn = Combinators.combine(g, sign, years)
                .as((a, plus, y) -> new LegSpec.Burn((plus ? a : -a) * G0, new LegSpec.ClockDuration(y * YR)));
        Arbitrary<LegSpec> coast = years.map(y -> new LegSpec.Coast(new LegSpec.ClockDuration(y * YR)));
        return Arbitraries.frequencyOf(net.jqwik.api.Tuple.of(3, burn), net.jqwik.api.Tuple.of(1, coast));
    }

    private static Arbitrary<List<LegSpec>> legs(boolean open) {
        Arbitrary<List<LegSpec>> finite = finiteLeg().list().ofMinSize(0).ofMaxSize(3);
        if (!open) {
            return finite;
        }
        Arbitrary<Double> g = Arbitraries.doubles().between(0.05, 2.0).ofScale(9).withDistribution(RandomDistribution.uniform());
        Arbitrary<Boolean> sign = Arbitraries.of(true, false);
        return Combinators.combine(finite, g, sign).as((f, a, plus) -> {
            List<LegSpec> all = new ArrayList<>(f);
            all.add(new LegSpec.Burn((plus ? a : -a) * G0, new LegSpec.Forever()));
            return all;
        });
    }

    /** Craft with or without an open-ended last burn (half each). */
    public static Arbitrary<Plan> plans() {
        return Arbitraries.of(true, false).flatMap(Flights::plans);
    }

    /** Craft whose last leg is an open-ended burn ({@code open}) or a finite leg followed by the final coast. */
    public static Arbitrary<Plan> plans(boolean open) {
        return Combinators.combine(positionWithin(2 * LY), unitish(),
                        Arbitraries.doubles().between(-YR, YR).ofScale(9).withDistribution(RandomDistribution.uniform()), Arbitraries.doubles().between(-YR, YR).ofScale(9).withDistribution(RandomDistribution.uniform()),
                        Arbitraries.doubles().between(-0.9, 0.9).ofScale(9).withDistribution(RandomDistribution.uniform()), legs(open))
                .as((p, n, t0, c0, b0, l) -> new Plan(p, n, t0, c0, b0 * C, l));
    }

    /** A station plan, kept so that a failing example prints what it was. */
    public record Station(Vec3 position, Vec3 velocity, double clockOffset) {
        public InertialWorldline worldline() {
            return InertialWorldline.of(position, velocity, clockOffset);
        }
    }

    /** A station anywhere within 3 ly, moving at up to 0.9 c, with a clock offset of up to a year. */
    public static Arbitrary<Station> stations() {
        return Combinators.combine(positionWithin(3 * LY), velocityBelow(0.9),
                        Arbitraries.doubles().between(-YR, YR).ofScale(9).withDistribution(RandomDistribution.uniform()))
                .as(Station::new);
    }

    /** A craft and a station: the station off the flight line, or on it (at rest or moving along it). */
    public record Pair(Plan plan, Station station) {
        public StraightLineCraft craft() {
            return plan.craft();
        }

        public InertialWorldline home() {
            return station.worldline();
        }
    }

    /** Craft with a station placed anywhere (in practice always off the flight line). */
    public static Arbitrary<Pair> offLine(Arbitrary<Plan> plans) {
        return Combinators.combine(plans, stations()).as(Pair::new);
    }

    /** Craft with a station on the flight line, within 3 ly of the start, at rest or moving along the line. */
    public static Arbitrary<Pair> onLine(Arbitrary<Plan> plans) {
        return Combinators.combine(plans, Arbitraries.doubles().between(-3, 3).ofScale(9).withDistribution(RandomDistribution.uniform()),
                        Arbitraries.doubles().between(-0.9, 0.9).ofScale(9).withDistribution(RandomDistribution.uniform()), Arbitraries.of(true, false),
                        Arbitraries.doubles().between(-YR, YR).ofScale(9).withDistribution(RandomDistribution.uniform()))
                .as((plan, alongLy, beta, moving, offset) -> {
                    Vec3 n = plan.heading().unit();
                    Vec3 at = plan.start().plus(n.times(alongLy * LY));
                    Vec3 v = moving ? n.times(beta * C) : Vec3.ZERO;
                    // position at mission time 0 such that the station passes through 'at' at the craft's start time
                    Vec3 atZero = at.minus(v.times(plan.startTime()));
                    return new Pair(plan, new Station(atZero, v, offset));
                });
    }
}
