package org.nullpath.lightcone;

import java.util.List;
import java.util.Optional;

import org.nullpath.reference.RefCraft;
import org.nullpath.spacetime.Vec3;
import org.nullpath.worldline.Asymptote;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.Step;
import org.nullpath.worldline.StraightLineCraft;
import org.nullpath.worldline.Worldline;

/**
 * One invented flight built twice from the same numbers: as the product's craft and as the independent
 * 50-digit reference's ({@code org.nullpath.reference.RefCraft}, which never reads src/main). Burns for a
 * clock duration, until a speed or for ever, and coasts for a clock duration.
 */
public record TwinCraft(StraightLineCraft craft, RefCraft ref) {

    public static TwinCraft of(double[] start, double[] heading, double startTime, double startClock, double startSpeed,
                        LegSpec... legs) {
        RefCraft r = RefCraft.start(start, heading, startTime, startClock, startSpeed);
        for (LegSpec leg : legs) {
            r = withLeg(r, leg);
        }
        StraightLineCraft c = StraightLineCraft.of(vec(start), vec(heading), startTime, startClock, startSpeed,
                List.of(legs));
        return new TwinCraft(c, r);
    }

    private static RefCraft withLeg(RefCraft r, LegSpec leg) {
        if (leg instanceof LegSpec.Burn b) {
            double a = b.accelerationMetresPerSecond2();
            if (b.end() instanceof LegSpec.ClockDuration d) {
                return r.burnForClock(a, d.seconds());
            }
            if (b.end() instanceof LegSpec.UntilSpeed s) {
                return r.burnUntilSpeed(a, s.metresPerSecond());
            }
            if (b.end() instanceof LegSpec.Forever) {
                return r.burnForever(a);
            }
        }
        if (leg instanceof LegSpec.Coast c && c.end() instanceof LegSpec.ClockDuration d) {
            return r.coastForClock(d.seconds());
        }
        throw new IllegalArgumentException("no reference leg for " + leg);
    }

    static Vec3 vec(double[] v) {
        return Vec3.of(v[0], v[1], v[2]);
    }

    /**
     * The same craft known only through the {@link Worldline} interface, so that the light-cone solver cannot
     * use what it knows of straight-line craft and takes its general bracketed solve.
     */
    public Worldline opaque() {
        StraightLineCraft c = craft;
        return new Worldline() {
            @Override
            public State atClock(double clockSeconds) {
                return c.atClock(clockSeconds);
            }

            @Override
            public State atTime(double timeSeconds) {
                return c.atTime(timeSeconds);
            }

            @Override
            public Step advance(State from, double dtSeconds) {
                return c.advance(from, dtSeconds);
            }

            @Override
            public Step advanceClock(State from, double dClockSeconds) {
                return c.advanceClock(from, dClockSeconds);
            }

            @Override
            public double properAccelerationAt(double timeSeconds) {
                return c.properAccelerationAt(timeSeconds);
            }

            @Override
            public Optional<Asymptote> asymptote() {
                return c.asymptote();
            }
        };
    }
}
