package org.nullpath.bench;

import java.util.List;
import java.util.concurrent.TimeUnit;

import org.nullpath.lightcone.LightCone;
import org.nullpath.lightcone.SignalPath;
import org.nullpath.spacetime.Vec3;
import org.nullpath.units.Constants;
import org.nullpath.worldline.InertialWorldline;
import org.nullpath.worldline.LegSpec;
import org.nullpath.worldline.State;
import org.nullpath.worldline.StraightLineCraft;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;

/**
 * Light-cone solves: the closed form on the flight line (station behind a craft flying three legs),
 * the bracketed solve off it (a station 0.1 ly off the line), and the past cone used for cut-offs.
 * Send times step through half a year so branch prediction sees a realistic mix.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@org.openjdk.jmh.annotations.State(Scope.Thread)
public class SolverBench {
    private StraightLineCraft craft;
    private InertialWorldline onLine;
    private InertialWorldline offLine;
    private double t;

    @Setup
    public void setUp() {
        double yr = Constants.JULIAN_YEAR;
        craft = StraightLineCraft.of(Vec3.ZERO, Vec3.of(1, 0, 0), 0, 0, 0, List.of(
                new LegSpec.Burn(Constants.G0, new LegSpec.ClockDuration(1 * yr)),
                new LegSpec.Coast(new LegSpec.ClockDuration(1 * yr)),
                new LegSpec.Burn(-Constants.G0, new LegSpec.UntilSpeed(0))));
        onLine = InertialWorldline.atRest(Vec3.ZERO);
        offLine = InertialWorldline.atRest(Vec3.of(0, 0.1 * Constants.LIGHT_YEAR, 0));
        t = 0;
    }

    private double nextSendTime() {
        t += 86_400.0;
        if (t > 0.5 * Constants.JULIAN_YEAR) {
            t = 0;
        }
        return t;
    }

    @Benchmark
    public double closedFormFutureCone() {
        SignalPath p = LightCone.future(onLine.atTime(nextSendTime()), craft);
        return p.lightTimeSeconds();
    }

    @Benchmark
    public double offLineFutureCone() {
        SignalPath p = LightCone.future(offLine.atTime(nextSendTime()), craft);
        return p.lightTimeSeconds();
    }

    @Benchmark
    public double closedFormPastCone() {
        State arrival = craft.atClock(Constants.JULIAN_YEAR + nextSendTime());
        return LightCone.past(arrival, onLine).lightTimeSeconds();
    }
}
