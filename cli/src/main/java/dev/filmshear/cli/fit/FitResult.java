package dev.filmshear.cli.fit;

import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.WaltherViscosity;

import java.util.List;
import java.util.NoSuchElementException;

/**
 * A fitted viscosity law: its parameters with standard errors, the measured and fitted values at every
 * point, and the solver's law record it stands for.
 *
 * <p>Values are in the law's own quantity: dynamic viscosity (Pa s) for exponential, vogel, power and
 * sutherland, kinematic viscosity (m^2/s) for walther. The relative residual of a point is
 * fitted / measured - 1 (how far the law lies from the measurement, as a fraction of the measurement).
 *
 * <p>Immutable: arrays are copied in and out. A final class rather than a record because it keeps the
 * fitted law, whose walther form needs a density only when it is turned into a dynamic viscosity.
 */
public final class FitResult {
    private final FitLaw law;
    private final List<FittedParameter> parameters;
    private final double[][] correlation;
    private final double[] temperatures;
    private final double[] measured;
    private final double[] fitted;
    private final int degreesOfFreedom;
    private final int iterations;
    private final List<String> notes;
    /** The fitted record; for walther its density is a nominal constant and only its kinematic viscosity is used. */
    private final ViscosityLaw fittedLaw;

    /**
     * @param law the law fitted
     * @param parameters every parameter of the law in case-file order, fixed ones included
     * @param correlation correlation matrix of the adjusted parameters (in the order they appear in
     *     {@code parameters}, fixed ones left out); NaN entries where not determined
     * @param temperatures the points' temperatures (K)
     * @param measured measured values at the points (Pa s, or m^2/s for walther)
     * @param fitted the law's values at the points, same unit
     * @param degreesOfFreedom points minus adjusted parameters
     * @param iterations iterations the optimizer took (0 for the walther line, a direct solution)
     * @param notes remarks on the fit (a parameter at the end of its range), one sentence each
     * @param fittedLaw the solver's law record; for walther a {@link WaltherViscosity} whose density is a
     *     nominal constant, of which only the kinematic viscosity is used
     */
    FitResult(FitLaw law, List<FittedParameter> parameters, double[][] correlation, double[] temperatures,
              double[] measured, double[] fitted, int degreesOfFreedom, int iterations, List<String> notes,
              ViscosityLaw fittedLaw) {
        this.law = law;
        this.parameters = List.copyOf(parameters);
        this.correlation = deepCopy(correlation);
        this.temperatures = temperatures.clone();
        this.measured = measured.clone();
        this.fitted = fitted.clone();
        this.degreesOfFreedom = degreesOfFreedom;
        this.iterations = iterations;
        this.notes = List.copyOf(notes);
        this.fittedLaw = fittedLaw;
    }

    private static double[][] deepCopy(double[][] m) {
        double[][] copy = new double[m.length][];
        for (int i = 0; i < m.length; i++) {
            copy[i] = m[i].clone();
        }
        return copy;
    }

    public FitLaw law() {
        return law;
    }

    /** Every parameter in case-file order, fixed ones (a reference temperature) included. */
    public List<FittedParameter> parameters() {
        return parameters;
    }

    /** The parameter with case-file key {@code name}. */
    public FittedParameter parameter(String name) {
        return parameters.stream().filter(p -> p.name().equals(name)).findFirst()
                .orElseThrow(() -> new NoSuchElementException("no parameter " + name + " in the " + law.key() + " fit"));
    }

    /** Correlation matrix of the adjusted parameters (a copy). */
    public double[][] correlation() {
        return deepCopy(correlation);
    }

    /** The points' temperatures (K), a copy. */
    public double[] temperatures() {
        return temperatures.clone();
    }

    /** Measured values (Pa s; m^2/s for walther), a copy. */
    public double[] measured() {
        return measured.clone();
    }

    /** The fitted law's values at the points (Pa s; m^2/s for walther), a copy. */
    public double[] fitted() {
        return fitted.clone();
    }

    /** Number of points. */
    public int size() {
        return temperatures.length;
    }

    /** fitted / measured - 1 at point {@code i}. */
    public double relativeResidual(int i) {
        return fitted[i] / measured[i] - 1;
    }

    /** Root mean square of the relative residuals. */
    public double rmsRelativeResidual() {
        double sum = 0;
        for (int i = 0; i < size(); i++) {
            sum += relativeResidual(i) * relativeResidual(i);
        }
        return Math.sqrt(sum / size());
    }

    /** Index of the point with the largest relative residual in magnitude. */
    public int largestResidualIndex() {
        int worst = 0;
        for (int i = 1; i < size(); i++) {
            if (Math.abs(relativeResidual(i)) > Math.abs(relativeResidual(worst))) {
                worst = i;
            }
        }
        return worst;
    }

    /** The largest relative residual in magnitude. */
    public double maxRelativeResidual() {
        return Math.abs(relativeResidual(largestResidualIndex()));
    }

    /** Points minus adjusted parameters. */
    public int degreesOfFreedom() {
        return degreesOfFreedom;
    }

    /** Iterations of the optimizer (0 for the walther line). */
    public int iterations() {
        return iterations;
    }

    /** Remarks on the fit, one sentence each. */
    public List<String> notes() {
        return notes;
    }

    /** Lowest measured temperature (K): the law's valid_from. */
    public double validFrom() {
        double low = Double.POSITIVE_INFINITY;
        for (double t : temperatures) {
            low = Math.min(low, t);
        }
        return low;
    }

    /** Highest measured temperature (K): the law's valid_to. */
    public double validTo() {
        double high = Double.NEGATIVE_INFINITY;
        for (double t : temperatures) {
            high = Math.max(high, t);
        }
        return high;
    }

    /** The fitted law's value at temperature {@code t} (K): Pa s, or m^2/s for walther. */
    public double value(double t) {
        return fittedLaw instanceof WaltherViscosity line ? line.kinematicViscosity(t) : fittedLaw.mu(t);
    }

    /**
     * The solver's law record the fit stands for. For walther, the ASTM D341 line with the given density
     * (which turns its kinematic viscosity into mu); the dynamic laws ignore {@code density}.
     */
    public ViscosityLaw solverLaw(DensityLaw density) {
        if (fittedLaw instanceof WaltherViscosity line) {
            return new WaltherViscosity(line.a(), line.b(), density, line.validFrom(), line.validTo());
        }
        return fittedLaw;
    }
}
