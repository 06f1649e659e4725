package dev.filmshear.solver.model;

/**
 * Profiles across the film at one time. Immutable: arrays are copied in and out.
 *
 * @param time s (+infinity for a steady solution)
 * @param y node positions (m)
 * @param velocity m/s
 * @param temperature K
 * @param viscosity Pa s
 */
public record Snapshot(double time, double[] y, double[] velocity, double[] temperature, double[] viscosity) {

    public Snapshot {
        y = y.clone();
        velocity = velocity.clone();
        temperature = temperature.clone();
        viscosity = viscosity.clone();
    }

    /** Takes the profiles of the current state. */
    public static Snapshot of(FilmState state) {
        int n = state.points();
        double[] y = new double[n];
        double[] u = new double[n];
        double[] t = new double[n];
        double[] mu = new double[n];
        for (int i = 0; i < n; i++) {
            y[i] = state.y(i);
            u[i] = state.velocity(i);
            t[i] = state.temperature(i);
            mu[i] = state.viscosity(i);
        }
        return new Snapshot(state.time(), y, u, t, mu);
    }

    /** A copy with another time (a steady solution is stamped +infinity). */
    Snapshot at(double newTime) {
        return new Snapshot(newTime, y, velocity, temperature, viscosity);
    }

    /** Number of nodes. */
    public int points() {
        return y.length;
    }

    @Override
    public double[] y() {
        return y.clone();
    }

    @Override
    public double[] velocity() {
        return velocity.clone();
    }

    @Override
    public double[] temperature() {
        return temperature.clone();
    }

    @Override
    public double[] viscosity() {
        return viscosity.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Snapshot s && Double.compare(time, s.time) == 0
                && java.util.Arrays.equals(y, s.y) && java.util.Arrays.equals(velocity, s.velocity)
                && java.util.Arrays.equals(temperature, s.temperature)
                && java.util.Arrays.equals(viscosity, s.viscosity);
    }

    @Override
    public int hashCode() {
        return Double.hashCode(time) * 31 + java.util.Arrays.hashCode(velocity);
    }

    @Override
    public String toString() {
        return "Snapshot[time=" + time + " s, points=" + y.length + "]";
    }
}
