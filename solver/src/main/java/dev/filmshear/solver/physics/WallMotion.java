package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.Arrays;
import java.util.OptionalDouble;

/**
 * How a wall moves along x: its velocity as a prescribed function of time.
 *
 * <p>A wall velocity is applied for t &gt; 0; the fluid's initial velocity may differ from it, which is
 * an impulsive start at t = 0. Histories with corners (a ramp's start and end, the points of a table)
 * report them, and the time stepper lands on each corner exactly so that no step straddles a kink.
 */
public sealed interface WallMotion
        permits WallMotion.Steady, WallMotion.Ramp, WallMotion.Sine, WallMotion.Table, WallMotion.Driven {

    /** Wall velocity (m/s) at time {@code t} (s), for t &gt;= 0 (the value just after a jump at t = 0). */
    double velocity(double t);

    /** Times (s) where the velocity history has a corner, in increasing order. */
    double[] corners();

    /** The velocity the wall settles at, or empty when it never settles (an oscillation). */
    OptionalDouble settledVelocity();

    /** The largest speed |velocity| reached at any time up to {@code end} (s). */
    double maxSpeed(double end);

    /** True when the wall never moves. */
    default boolean isAtRest() {
        return this instanceof Steady s && s.velocity() == 0;
    }

    /** True when the velocity is prescribed; false for a driven wall, whose velocity is solved for. */
    default boolean isPrescribed() {
        return !(this instanceof Driven);
    }

    /**
     * A free wall with inertia, driven by a force and braked by the film's shear stress:
     * massPerArea dU/dt = drive(t, U) - (shear stress of the film on the wall). Its velocity is an unknown of
     * the equations, solved with the film inside each implicit step. For a journal bearing the cli turns a
     * rotor inertia I and torque Q on a shaft of radius R and film area A into massPerArea = I / (R^2 A) and
     * force = Q / (R A).
     *
     * <p>{@link #velocity(double)} gives the initial velocity only; {@link #maxSpeed(double)} is an estimate
     * for error scaling, supplied when the wall is built.
     *
     * @param massPerArea kg/m^2, above zero
     * @param drive the driving force per unit area
     * @param initialVelocity m/s at t = 0
     * @param speedEstimate an estimate of the largest speed reached (m/s), for error scaling
     * @param coastDownFraction the fraction of the initial speed whose time of passage a coast-down reports
     */
    record Driven(double massPerArea, Drive drive, double initialVelocity, double speedEstimate,
                  double coastDownFraction) implements WallMotion {
        public Driven {
            InvalidParameterException.requirePositive("mass", massPerArea, "kg/m^2");
            java.util.Objects.requireNonNull(drive, "drive");
            InvalidParameterException.requireFinite("initial", initialVelocity, "m/s");
            InvalidParameterException.requireNonNegative("speed_estimate", speedEstimate, "m/s");
            if (!(coastDownFraction > 0 && coastDownFraction < 1)) {
                throw new InvalidParameterException("coast_down_fraction", Double.toString(coastDownFraction),
                        "a fraction between 0 and 1");
            }
        }

        @Override
        public double velocity(double t) {
            return initialVelocity;
        }

        @Override
        public double[] corners() {
            return drive.corners();
        }

        @Override
        public OptionalDouble settledVelocity() {
            return OptionalDouble.empty();
        }

        @Override
        public double maxSpeed(double end) {
            return Math.max(Math.abs(initialVelocity), speedEstimate);
        }
    }

    /**
     * A wall moving at one velocity for all t &gt; 0.
     *
     * @param velocity m/s
     */
    record Steady(double velocity) implements WallMotion {
        public Steady {
            InvalidParameterException.requireFinite("velocity", velocity, "m/s");
        }

        @Override
        public double velocity(double t) {
            return velocity;
        }

        @Override
        public double[] corners() {
            return new double[0];
        }

        @Override
        public OptionalDouble settledVelocity() {
            return OptionalDouble.of(velocity);
        }

        @Override
        public double maxSpeed(double end) {
            return Math.abs(velocity);
        }
    }

    /**
     * A linear change from {@code from} to {@code to} between {@code start} and {@code start + duration},
     * constant before and after.
     *
     * @param from m/s
     * @param to m/s
     * @param start s
     * @param duration s, above zero
     */
    record Ramp(double from, double to, double start, double duration) implements WallMotion {
        public Ramp {
            InvalidParameterException.requireFinite("from", from, "m/s");
            InvalidParameterException.requireFinite("to", to, "m/s");
            InvalidParameterException.requireNonNegative("start", start, "s");
            InvalidParameterException.requirePositive("duration", duration, "s");
        }

        @Override
        public double velocity(double t) {
            if (t <= start) {
                return from;
            }
            if (t >= start + duration) {
                return to;
            }
            return from + (to - from) * (t - start) / duration;
        }

        @Override
        public double[] corners() {
            return start > 0 ? new double[] {start, start + duration} : new double[] {start + duration};
        }

        @Override
        public OptionalDouble settledVelocity() {
            return OptionalDouble.of(to);
        }

        @Override
        public double maxSpeed(double end) {
            return Math.max(Math.abs(from), Math.abs(velocity(end)));
        }
    }

    /**
     * An oscillation: velocity = mean + amplitude sin(2 pi frequency t + phase).
     *
     * @param mean m/s
     * @param amplitude m/s
     * @param frequency Hz, above zero
     * @param phase rad
     */
    record Sine(double mean, double amplitude, double frequency, double phase) implements WallMotion {
        public Sine {
            InvalidParameterException.requireFinite("mean", mean, "m/s");
            InvalidParameterException.requireFinite("amplitude", amplitude, "m/s");
            InvalidParameterException.requirePositive("frequency", frequency, "Hz");
            InvalidParameterException.requireFinite("phase", phase, "rad");
        }

        /** Angular frequency omega = 2 pi f (rad/s). */
        public double angularFrequency() {
            return 2 * Math.PI * frequency;
        }

        @Override
        public double velocity(double t) {
            return mean + amplitude * Math.sin(2 * Math.PI * frequency * t + phase);
        }

        @Override
        public double[] corners() {
            return new double[0];
        }

        @Override
        public OptionalDouble settledVelocity() {
            return amplitude == 0 ? OptionalDouble.of(mean) : OptionalDouble.empty();
        }

        @Override
        public double maxSpeed(double end) {
            return Math.abs(mean) + Math.abs(amplitude);
        }
    }

    /**
     * A piecewise-linear history through measured or planned points, held at the first value before the
     * first time and at the last value after the last time.
     *
     * @param times s, strictly increasing, at least two
     * @param values m/s, one per time
     */
    record Table(double[] times, double[] values) implements WallMotion {
        public Table {
            if (times.length < 2 || times.length != values.length) {
                throw new InvalidParameterException("times", times.length + " times and " + values.length
                        + " values", "at least two times and one value per time");
            }
            for (int i = 0; i < times.length; i++) {
                InvalidParameterException.requireNonNegative("times", times[i], "s");
                InvalidParameterException.requireFinite("values", values[i], "m/s");
                if (i > 0 && !(times[i] > times[i - 1])) {
                    throw new InvalidParameterException("times", times[i - 1] + " s then " + times[i] + " s",
                            "strictly increasing times");
                }
            }
            times = times.clone();
            values = values.clone();
        }

        @Override
        public double[] times() {
            return times.clone();
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public double velocity(double t) {
            if (t <= times[0]) {
                return values[0];
            }
            int last = times.length - 1;
            if (t >= times[last]) {
                return values[last];
            }
            int k = Arrays.binarySearch(times, t);
            if (k >= 0) {
                return values[k];
            }
            int hi = -k - 1;
            int lo = hi - 1;
            double w = (t - times[lo]) / (times[hi] - times[lo]);
            return values[lo] + w * (values[hi] - values[lo]);
        }

        @Override
        public double[] corners() {
            return times[0] > 0 ? times.clone() : Arrays.copyOfRange(times, 1, times.length);
        }

        @Override
        public OptionalDouble settledVelocity() {
            return OptionalDouble.of(values[values.length - 1]);
        }

        @Override
        public double maxSpeed(double end) {
            double max = Math.abs(values[0]);
            for (int i = 1; i < times.length && times[i - 1] < end; i++) {
                max = Math.max(max, Math.abs(velocity(Math.min(end, times[i]))));
            }
            return max;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Table t && Arrays.equals(times, t.times) && Arrays.equals(values, t.values);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(times) + Arrays.hashCode(values);
        }

        @Override
        public String toString() {
            return "Table[times=" + Arrays.toString(times) + ", values=" + Arrays.toString(values) + "]";
        }
    }
}
