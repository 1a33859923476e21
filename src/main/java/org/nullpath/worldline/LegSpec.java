package org.nullpath.worldline;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

import org.nullpath.units.Constants;

/**
 * One leg of a straight-line craft, as planned. Each kind of leg knows its name in the scenario file,
 * how it flies from a start state ({@link #fly}: a closed form, or an acceleration law integrated with
 * dense output) and which end conditions the scenario format offers for it; the end condition
 * ({@link LegEnd}) is then found on that flight, whatever its kind (docs/legs.md, "End conditions").
 */
public sealed interface LegSpec {

    /** The leg's kind: its key in the scenario file, its diagram label and the end keys it offers. */
    LegKind kind();

    /** The leg's key in the scenario file ({@code burn}, {@code coast}, {@code rocket}, ...), also its kind in summaries. */
    default String key() {
        return kind().key();
    }

    /** The leg's label on the spacetime diagram (a word; a constant-thrust rocket is told apart there). */
    default String label() {
        return kind().label();
    }

    /** The end-condition keys the scenario format offers for this kind of leg. */
    default List<String> endKeys() {
        return kind().endKeys();
    }

    /** Proper acceleration along the heading at the leg start, m/s^2 (0 for a coast; NaN where it depends on the state). */
    double accelerationMetresPerSecond2();

    /** How the leg ends. */
    LegEnd end();

    /**
     * The leg's own figures for summaries, in order, named in snake case with their unit (empty for
     * burns and coasts).
     */
    default Map<String, Double> figures() {
        return Map.of();
    }

    /**
     * How the leg flies from {@code start}, up to its own physical limit (propellant spent, beam-off
     * front, last sample; none for burns and coasts).
     *
     * @throws WorldlineException naming the leg when it cannot be flown from there
     */
    LegFlight fly(LegStart start);

    /** Named figures in the order given: name, value, name, value, ... */
    private static Map<String, Double> figuresOf(Object... namesAndValues) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < namesAndValues.length; i += 2) {
            m.put((String) namesAndValues[i], (Double) namesAndValues[i + 1]);
        }
        return java.util.Collections.unmodifiableMap(m);
    }

    /** A constant proper acceleration burn ({@code acceleration} signed along the heading, not 0). */
    record Burn(double accelerationMetresPerSecond2, LegEnd end) implements LegSpec {
        public Burn {
            if (!Double.isFinite(accelerationMetresPerSecond2) || accelerationMetresPerSecond2 == 0) {
                throw new IllegalArgumentException("a burn needs a finite non-zero acceleration");
            }
            Objects.requireNonNull(end, "end");
        }

        @Override
        public LegKind kind() {
            return LegKind.BURN;
        }

        @Override
        public LegFlight fly(LegStart start) {
            return LegFlight.closedForm(start, accelerationMetresPerSecond2, Double.POSITIVE_INFINITY, "");
        }
    }

    /** Unpowered flight. */
    record Coast(LegEnd end) implements LegSpec {
        public Coast {
            Objects.requireNonNull(end, "end");
        }

        @Override
        public LegKind kind() {
            return LegKind.COAST;
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return 0;
        }

        @Override
        public LegFlight fly(LegStart start) {
            return LegFlight.closedForm(start, 0.0, Double.POSITIVE_INFINITY, "");
        }
    }

    /**
     * A rocket at constant proper acceleration until its propellant is spent: the relativistic rocket
     * equation (Ackeret 1946) gives the rapidity budget (v_ex / c) ln(mass ratio), so the leg lasts
     * v_ex ln(mass ratio) / |a| of craft clock, unless {@code end} ends it earlier.
     */
    record Rocket(double accelerationMetresPerSecond2, double exhaustSpeedMetresPerSecond, double massRatio,
                  LegEnd end) implements LegSpec {
        public Rocket {
            if (!(massRatio > 1) || !Double.isFinite(massRatio)) {
                throw new IllegalArgumentException("the mass ratio must be greater than 1");
            }
            if (!(exhaustSpeedMetresPerSecond > 0 && exhaustSpeedMetresPerSecond <= Constants.C)) {
                throw new IllegalArgumentException("the exhaust speed must be above 0 and at most c");
            }
            if (!(accelerationMetresPerSecond2 != 0) || !Double.isFinite(accelerationMetresPerSecond2)) {
                throw new IllegalArgumentException("a rocket needs a finite non-zero acceleration");
            }
            Objects.requireNonNull(end, "end");
        }

        /** A rocket that burns until its propellant is spent. */
        public Rocket(double accelerationMetresPerSecond2, double exhaustSpeedMetresPerSecond, double massRatio) {
            this(accelerationMetresPerSecond2, exhaustSpeedMetresPerSecond, massRatio,
                    new ClockDuration(exhaustSpeedMetresPerSecond * Math.log(massRatio)
                            / Math.abs(accelerationMetresPerSecond2)));
        }

        /** Rapidity the propellant buys, (v_ex / c) ln(mass ratio). */
        public double rapidityBudget() {
            return exhaustSpeedMetresPerSecond / Constants.C * Math.log(massRatio);
        }

        /** Craft-clock time until the propellant is spent, v_ex ln(mass ratio) / |a|. */
        public double burnTime() {
            return exhaustSpeedMetresPerSecond * Math.log(massRatio) / Math.abs(accelerationMetresPerSecond2);
        }

        @Override
        public LegKind kind() {
            return LegKind.ROCKET;
        }

        @Override
        public Map<String, Double> figures() {
            return figuresOf("mass_ratio", massRatio, "exhaust_speed_c", exhaustSpeedMetresPerSecond / Constants.C,
                    "rapidity_budget", rapidityBudget());
        }

        @Override
        public LegFlight fly(LegStart start) {
            return LegFlight.closedForm(start, accelerationMetresPerSecond2, burnTime(), "the propellant is spent");
        }
    }

    /**
     * A rocket at constant thrust F (signed along the heading) burning propellant at dm/du = -|F| / v_ex
     * from the initial to the burnout mass, unless {@code end} ends it earlier; proper acceleration F / m(u).
     */
    record ThrustRocket(double thrustNewtons, double initialMassKg, double burnoutMassKg,
                        double exhaustSpeedMetresPerSecond, LegEnd end) implements LegSpec {
        public ThrustRocket {
            if (!(burnoutMassKg > 0) || !(initialMassKg > burnoutMassKg) || !Double.isFinite(initialMassKg)) {
                throw new IllegalArgumentException("the burnout mass must be positive and below the initial mass");
            }
            if (!(thrustNewtons != 0) || !Double.isFinite(thrustNewtons)) {
                throw new IllegalArgumentException("the thrust must be finite and non-zero");
            }
            if (!(exhaustSpeedMetresPerSecond > 0 && exhaustSpeedMetresPerSecond <= Constants.C)) {
                throw new IllegalArgumentException("the exhaust speed must be above 0 and at most c");
            }
            Objects.requireNonNull(end, "end");
        }

        /** A constant-thrust rocket that burns until its propellant is spent. */
        public ThrustRocket(double thrustNewtons, double initialMassKg, double burnoutMassKg,
                            double exhaustSpeedMetresPerSecond) {
            this(thrustNewtons, initialMassKg, burnoutMassKg, exhaustSpeedMetresPerSecond,
                    new ClockDuration((initialMassKg - burnoutMassKg) * exhaustSpeedMetresPerSecond
                            / Math.abs(thrustNewtons)));
        }

        @Override
        public LegKind kind() {
            return LegKind.THRUST_ROCKET;
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return thrustNewtons / initialMassKg;
        }

        /** Craft-clock burn time (m0 - m1) v_ex / |F|. */
        public double burnTime() {
            return (initialMassKg - burnoutMassKg) * exhaustSpeedMetresPerSecond / Math.abs(thrustNewtons);
        }

        @Override
        public Map<String, Double> figures() {
            return figuresOf("mass_ratio", initialMassKg / burnoutMassKg, "exhaust_speed_c",
                    exhaustSpeedMetresPerSecond / Constants.C, "propellant_kg", initialMassKg - burnoutMassKg,
                    "burn_time_s", burnTime());
        }

        @Override
        public LegFlight fly(LegStart start) {
            double f = thrustNewtons;
            double m0 = initialMassKg;
            double rate = Math.abs(f) / exhaustSpeedMetresPerSecond;
            return LegFlight.integrated(start, LegIntegration.throughKnots(start.state(),
                    (u, eta) -> f / (m0 - rate * u), new double[] {0, burnTime()}), "the propellant is spent");
        }
    }

    /**
     * A sail pushed by a beam from a station on the flight line behind it: proper acceleration
     * (1 + R) P D^2 / (m c), D the beam's Doppler factor at the sail (Kulkarni, Lubin &amp; Zhang,
     * AJ 155:155, 2018). The beam is switched off at {@code beamOffClock} on the station's clock; the
     * leg ends where that switch-off's light reaches the sail, unless {@code end} ends it earlier.
     */
    record Sail(InertialWorldline beamStation, double beamPowerWatts, double massKg, double reflectivity,
                double beamOffClock, LegEnd end) implements LegSpec {
        public Sail {
            if (!(beamPowerWatts > 0) || !(massKg > 0) || !(reflectivity >= 0 && reflectivity <= 1)
                    || !Double.isFinite(beamPowerWatts) || !Double.isFinite(massKg)) {
                throw new IllegalArgumentException("a sail needs positive beam power and mass and a reflectivity in [0, 1]");
            }
            Objects.requireNonNull(beamStation, "beamStation");
            Objects.requireNonNull(end, "end");
        }

        /** A sail pushed until the beam's switch-off reaches it. */
        public Sail(InertialWorldline beamStation, double beamPowerWatts, double massKg, double reflectivity,
                    double beamOffClock) {
            this(beamStation, beamPowerWatts, massKg, reflectivity, beamOffClock, new BeamOff());
        }

        @Override
        public LegKind kind() {
            return LegKind.SAIL;
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return Double.NaN;
        }

        @Override
        public Map<String, Double> figures() {
            return figuresOf("beam_power_w", beamPowerWatts, "sail_mass_kg", massKg, "reflectivity", reflectivity);
        }

        @Override
        public LegFlight fly(LegStart start) {
            BeamFront beam = BeamFront.of(start, beamStation, beamOffClock);
            double k = (1 + reflectivity) * beamPowerWatts / (massKg * Constants.C);
            double etaStation = beam.stationRapidity();
            return LegFlight.integrated(start, LegIntegration.untilU(start.state(),
                    (u, eta) -> k * Math.exp(-2 * (eta - etaStation)), beam.switchOffU(), beam.switchOffU() / Constants.C),
                    "the beam's switch-off reaches the sail");
        }
    }

    /** A tabulated proper acceleration against the leg's own clock, linear between samples. */
    record Profile(double[] clockSeconds, double[] accelerationsMetresPerSecond2, LegEnd end) implements LegSpec {
        public Profile {
            if (clockSeconds.length < 2 || clockSeconds.length != accelerationsMetresPerSecond2.length) {
                throw new IllegalArgumentException("a profile needs at least two samples");
            }
            if (clockSeconds[0] != 0) {
                throw new IllegalArgumentException("a profile's first sample must be at clock 0 (the leg start)");
            }
            for (int i = 1; i < clockSeconds.length; i++) {
                if (!(clockSeconds[i] > clockSeconds[i - 1])) {
                    throw new IllegalArgumentException("a profile's clock values must increase strictly");
                }
            }
            Objects.requireNonNull(end, "end");
            clockSeconds = clockSeconds.clone();
            accelerationsMetresPerSecond2 = accelerationsMetresPerSecond2.clone();
        }

        /** A profile flown to its last sample. */
        public Profile(double[] clockSeconds, double[] accelerationsMetresPerSecond2) {
            this(clockSeconds, accelerationsMetresPerSecond2,
                    new ClockDuration(clockSeconds.length == 0 ? Double.NaN : clockSeconds[clockSeconds.length - 1]));
        }

        @Override
        public LegKind kind() {
            return LegKind.PROFILE;
        }

        @Override
        public double[] clockSeconds() {
            return clockSeconds.clone();
        }

        @Override
        public double[] accelerationsMetresPerSecond2() {
            return accelerationsMetresPerSecond2.clone();
        }

        /** Linear interpolation of the samples at leg clock {@code u} (held at the ends). */
        public double at(double u) {
            return Samples.linear(clockSeconds, accelerationsMetresPerSecond2, u);
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return accelerationsMetresPerSecond2[0];
        }

        @Override
        public LegFlight fly(LegStart start) {
            // linear between samples: the acceleration changes sign at most once between knots
            return LegFlight.integrated(start, LegIntegration.throughKnots(start.state(), (u, eta) -> at(u), clockSeconds),
                    "the profile's last sample");
        }

        @Override
        public boolean equals(Object o) {
            if (o == null || o.getClass() != Profile.class) {
                return false;
            }
            Profile p = (Profile) o;
            return java.util.Arrays.equals(clockSeconds, p.clockSeconds)
                    && java.util.Arrays.equals(accelerationsMetresPerSecond2, p.accelerationsMetresPerSecond2)
                    && end.equals(p.end);
        }

        @Override
        public int hashCode() {
            return 31 * (31 * java.util.Arrays.hashCode(clockSeconds) + java.util.Arrays.hashCode(accelerationsMetresPerSecond2))
                    + end.hashCode();
        }

        @Override
        public String toString() {
            return "Profile[" + clockSeconds.length + " samples over " + clockSeconds[clockSeconds.length - 1] + " s, "
                    + end + "]";
        }
    }

    /**
     * Where a leg ends. An end combines with any kind of leg: it asks the leg's {@link LegFlight} for
     * the proper time at which it is met (closed forms on constant legs, root finding on the dense
     * output of integrated ones), and the flight refuses an end it never meets before its own limit.
     */
    sealed interface LegEnd {
        /**
         * Proper time from the leg start to this end on {@code flight}; +infinity for an open end.
         *
         * @throws WorldlineException naming the leg when the end is never met
         */
        double properTime(LegFlight flight);

        /** Whether the leg lasts for ever. */
        default boolean openEnded() {
            return false;
        }
    }

    /** Where the light of a beam's switch-off reaches the craft: the sail's own end. */
    record BeamOff() implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.atLimit();
        }
    }

    /** After this much craft-clock time. */
    record ClockDuration(double seconds) implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.afterClock(seconds);
        }
    }

    /** After this much mission time. */
    record MissionDuration(double seconds) implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.afterMission(seconds);
        }
    }

    /** When the speed, signed along the heading, reaches {@code metresPerSecond}. */
    record UntilSpeed(double metresPerSecond) implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.untilSpeed(metresPerSecond);
        }
    }

    /** When the displacement along the heading during this leg first reaches {@code metres}. */
    record UntilDistance(double metres) implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.untilDistance(metres);
        }
    }

    /** Never: the leg lasts for ever (last leg only). */
    record Forever() implements LegEnd {
        @Override
        public double properTime(LegFlight flight) {
            return flight.forever();
        }

        @Override
        public boolean openEnded() {
            return true;
        }
    }
}
