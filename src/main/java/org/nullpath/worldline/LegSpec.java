package org.nullpath.worldline;

/**
 * One leg of a straight-line craft, as planned: a burn at signed constant proper acceleration or a
 * coast, each with a rule for where it ends, or a profiled leg (rocket, constant-thrust rocket,
 * beam-pushed sail, tabulated acceleration) whose own physics ends it.
 */
public sealed interface LegSpec {

    /** Proper acceleration along the heading at the leg start, m/s^2 (0 for a coast; NaN where it depends on the state). */
    double accelerationMetresPerSecond2();

    /** How the leg ends. */
    LegEnd end();

    /** A constant proper acceleration burn ({@code acceleration} signed along the heading, not 0). */
    record Burn(double accelerationMetresPerSecond2, LegEnd end) implements LegSpec {
        public Burn {
            if (!Double.isFinite(accelerationMetresPerSecond2) || accelerationMetresPerSecond2 == 0) {
                throw new IllegalArgumentException("a burn needs a finite non-zero acceleration");
            }
        }
    }

    /** Unpowered flight. */
    record Coast(LegEnd end) implements LegSpec {
        @Override
        public double accelerationMetresPerSecond2() {
            return 0;
        }
    }

    /**
     * A rocket at constant proper acceleration until its propellant is spent: the relativistic rocket
     * equation (Ackeret 1946) gives the rapidity budget (v_ex / c) ln(mass ratio), so the leg lasts
     * v_ex ln(mass ratio) / |a| of craft clock.
     */
    record Rocket(double accelerationMetresPerSecond2, double exhaustSpeedMetresPerSecond, double massRatio)
            implements LegSpec {
        public Rocket {
            if (!(massRatio > 1) || !Double.isFinite(massRatio)) {
                throw new IllegalArgumentException("the mass ratio must be greater than 1");
            }
            if (!(exhaustSpeedMetresPerSecond > 0 && exhaustSpeedMetresPerSecond <= org.nullpath.units.Constants.C)) {
                throw new IllegalArgumentException("the exhaust speed must be above 0 and at most c");
            }
            if (!(accelerationMetresPerSecond2 != 0) || !Double.isFinite(accelerationMetresPerSecond2)) {
                throw new IllegalArgumentException("a rocket needs a finite non-zero acceleration");
            }
        }

        /** Rapidity the propellant buys, (v_ex / c) ln(mass ratio). */
        public double rapidityBudget() {
            return exhaustSpeedMetresPerSecond / org.nullpath.units.Constants.C * Math.log(massRatio);
        }

        @Override
        public LegEnd end() {
            return new ClockDuration(exhaustSpeedMetresPerSecond * Math.log(massRatio)
                    / Math.abs(accelerationMetresPerSecond2));
        }
    }

    /**
     * A rocket at constant thrust F (signed along the heading) burning propellant at dm/du = -|F| / v_ex
     * from the initial to the burnout mass; proper acceleration F / m(u).
     */
    record ThrustRocket(double thrustNewtons, double initialMassKg, double burnoutMassKg,
                        double exhaustSpeedMetresPerSecond) implements LegSpec {
        public ThrustRocket {
            if (!(burnoutMassKg > 0) || !(initialMassKg > burnoutMassKg) || !Double.isFinite(initialMassKg)) {
                throw new IllegalArgumentException("the burnout mass must be positive and below the initial mass");
            }
            if (!(thrustNewtons != 0) || !Double.isFinite(thrustNewtons)) {
                throw new IllegalArgumentException("the thrust must be finite and non-zero");
            }
            if (!(exhaustSpeedMetresPerSecond > 0 && exhaustSpeedMetresPerSecond <= org.nullpath.units.Constants.C)) {
                throw new IllegalArgumentException("the exhaust speed must be above 0 and at most c");
            }
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
        public LegEnd end() {
            return new ClockDuration(burnTime());
        }
    }

    /**
     * A sail pushed by a beam from a station on the flight line behind it: proper acceleration
     * (1 + R) P D^2 / (m c), D the beam's Doppler factor at the sail (Kulkarni, Lubin &amp; Zhang,
     * AJ 155:155, 2018). The beam is switched off at {@code beamOffClock} on the station's clock; the
     * leg ends where that switch-off's light reaches the sail.
     */
    record Sail(InertialWorldline beamStation, double beamPowerWatts, double massKg, double reflectivity,
                double beamOffClock) implements LegSpec {
        public Sail {
            if (!(beamPowerWatts > 0) || !(massKg > 0) || !(reflectivity >= 0 && reflectivity <= 1)
                    || !Double.isFinite(beamPowerWatts) || !Double.isFinite(massKg)) {
                throw new IllegalArgumentException("a sail needs positive beam power and mass and a reflectivity in [0, 1]");
            }
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return Double.NaN;
        }

        @Override
        public LegEnd end() {
            return new BeamOff();
        }
    }

    /** A tabulated proper acceleration against the leg's own clock, linear between samples. */
    record Profile(double[] clockSeconds, double[] accelerationsMetresPerSecond2) implements LegSpec {
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
            clockSeconds = clockSeconds.clone();
            accelerationsMetresPerSecond2 = accelerationsMetresPerSecond2.clone();
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
            int n = clockSeconds.length;
            if (u <= clockSeconds[0]) {
                return accelerationsMetresPerSecond2[0];
            }
            if (u >= clockSeconds[n - 1]) {
                return accelerationsMetresPerSecond2[n - 1];
            }
            int i = java.util.Arrays.binarySearch(clockSeconds, u);
            if (i >= 0) {
                return accelerationsMetresPerSecond2[i];
            }
            int hi = -i - 1;
            int lo = hi - 1;
            double w = (u - clockSeconds[lo]) / (clockSeconds[hi] - clockSeconds[lo]);
            return accelerationsMetresPerSecond2[lo] + w * (accelerationsMetresPerSecond2[hi] - accelerationsMetresPerSecond2[lo]);
        }

        @Override
        public double accelerationMetresPerSecond2() {
            return accelerationsMetresPerSecond2[0];
        }

        @Override
        public LegEnd end() {
            return new ClockDuration(clockSeconds[clockSeconds.length - 1]);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Profile p && java.util.Arrays.equals(clockSeconds, p.clockSeconds)
                    && java.util.Arrays.equals(accelerationsMetresPerSecond2, p.accelerationsMetresPerSecond2);
        }

        @Override
        public int hashCode() {
            return 31 * java.util.Arrays.hashCode(clockSeconds) + java.util.Arrays.hashCode(accelerationsMetresPerSecond2);
        }

        @Override
        public String toString() {
            return "Profile[" + clockSeconds.length + " samples over " + clockSeconds[clockSeconds.length - 1] + " s]";
        }
    }

    /** Where a leg ends. */
    sealed interface LegEnd {
    }

    /** Where the light of a beam's switch-off reaches the craft (sail legs). */
    record BeamOff() implements LegEnd {
    }

    /** After this much craft-clock time. */
    record ClockDuration(double seconds) implements LegEnd {
    }

    /** After this much mission time. */
    record MissionDuration(double seconds) implements LegEnd {
    }

    /** When the speed, signed along the heading, reaches {@code metresPerSecond}. */
    record UntilSpeed(double metresPerSecond) implements LegEnd {
    }

    /** When the displacement along the heading during this leg first reaches {@code metres}. */
    record UntilDistance(double metres) implements LegEnd {
    }

    /** Never: the leg lasts for ever (last leg only). */
    record Forever() implements LegEnd {
    }
}
