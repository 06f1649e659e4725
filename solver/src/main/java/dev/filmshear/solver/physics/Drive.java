package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

import java.util.Arrays;

/**
 * The force per unit wall area (Pa) that drives a free wall along x: constant, a history in time, or a
 * curve against the wall's own speed (a motor's torque-speed curve turned into a force per area). The film's
 * shear stress brakes the wall; zero drive lets it coast down on film friction alone.
 */
public sealed interface Drive permits Drive.Constant, Drive.TimeTable, Drive.SpeedCurve {

    /** Driving force per unit area (Pa) at time {@code t} (s) with the wall at speed {@code u} (m/s). */
    double force(double t, double u);

    /** d force / d u (Pa s/m): nonzero only for a speed curve. */
    double forceDerivative(double t, double u);

    /** Times (s) where the drive's history has a corner. */
    double[] corners();

    /** The largest |force| (Pa) the drive can give. */
    double maxForce();

    /**
     * A constant force per area.
     *
     * @param force Pa (0 for a coast-down)
     */
    record Constant(double force) implements Drive {
        public Constant {
            InvalidParameterException.requireFinite("force", force, "Pa");
        }

        @Override
        public double force(double t, double u) {
            return force;
        }

        @Override
        public double forceDerivative(double t, double u) {
            return 0;
        }

        @Override
        public double[] corners() {
            return new double[0];
        }

        @Override
        public double maxForce() {
            return Math.abs(force);
        }
    }

    /**
     * A force history, linear between points and held at the end values (for example a drive that switches
     * off: [0 s, 2 s, 2.01 s] -> [F, F, 0]).
     *
     * @param times s, strictly increasing
     * @param forces Pa
     */
    record TimeTable(double[] times, double[] forces) implements Drive {
        public TimeTable {
            checkTable("times", times, forces);
            times = times.clone();
            forces = forces.clone();
        }

        @Override
        public double[] times() {
            return times.clone();
        }

        @Override
        public double[] forces() {
            return forces.clone();
        }

        @Override
        public double force(double t, double u) {
            return interpolate(times, forces, t);
        }

        @Override
        public double forceDerivative(double t, double u) {
            return 0;
        }

        @Override
        public double[] corners() {
            return times.clone();
        }

        @Override
        public double maxForce() {
            return Arrays.stream(forces).map(Math::abs).max().orElse(0);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof TimeTable t && Arrays.equals(times, t.times) && Arrays.equals(forces, t.forces);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(times) + Arrays.hashCode(forces);
        }

        @Override
        public String toString() {
            return "TimeTable[times=" + Arrays.toString(times) + ", forces=" + Arrays.toString(forces) + "]";
        }
    }

    /**
     * A force against the wall's speed, linear between points and held beyond the ends: a motor curve.
     *
     * @param speeds m/s, strictly increasing
     * @param forces Pa
     */
    record SpeedCurve(double[] speeds, double[] forces) implements Drive {
        public SpeedCurve {
            checkTable("speeds", speeds, forces);
            speeds = speeds.clone();
            forces = forces.clone();
        }

        @Override
        public double[] speeds() {
            return speeds.clone();
        }

        @Override
        public double[] forces() {
            return forces.clone();
        }

        @Override
        public double force(double t, double u) {
            return interpolate(speeds, forces, u);
        }

        @Override
        public double forceDerivative(double t, double u) {
            // the slope of the segment at and to the right of u (held constant beyond the last point)
            if (u < speeds[0] || u >= speeds[speeds.length - 1]) {
                return 0;
            }
            int hi = 1;
            while (speeds[hi] <= u) {
                hi++;
            }
            return (forces[hi] - forces[hi - 1]) / (speeds[hi] - speeds[hi - 1]);
        }

        @Override
        public double[] corners() {
            return new double[0];
        }

        @Override
        public double maxForce() {
            return Arrays.stream(forces).map(Math::abs).max().orElse(0);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof SpeedCurve c && Arrays.equals(speeds, c.speeds) && Arrays.equals(forces, c.forces);
        }

        @Override
        public int hashCode() {
            return 31 * Arrays.hashCode(speeds) + Arrays.hashCode(forces);
        }

        @Override
        public String toString() {
            return "SpeedCurve[speeds=" + Arrays.toString(speeds) + ", forces=" + Arrays.toString(forces) + "]";
        }
    }

    private static void checkTable(String name, double[] x, double[] f) {
        if (x.length < 2 || x.length != f.length) {
            throw new InvalidParameterException(name, x.length + " points and " + f.length + " forces",
                    "at least two points and one force per point");
        }
        for (int i = 0; i < x.length; i++) {
            InvalidParameterException.requireFinite(name, x[i], "");
            InvalidParameterException.requireFinite("values", f[i], "Pa");
            if (i > 0 && !(x[i] > x[i - 1])) {
                throw new InvalidParameterException(name + "[" + i + "]", x[i - 1] + " then " + x[i],
                        "strictly increasing values");
            }
        }
    }

    private static double interpolate(double[] x, double[] f, double at) {
        if (at <= x[0]) {
            return f[0];
        }
        int last = x.length - 1;
        if (at >= x[last]) {
            return f[last];
        }
        int hi = 1;
        while (x[hi] < at) {
            hi++;
        }
        double w = (at - x[hi - 1]) / (x[hi] - x[hi - 1]);
        return f[hi - 1] + w * (f[hi] - f[hi - 1]);
    }
}
