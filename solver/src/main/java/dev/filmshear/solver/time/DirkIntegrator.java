package dev.filmshear.solver.time;

import dev.filmshear.solver.base.NumericalFailureException;

/**
 * Advances an {@link ImplicitSystem} in time with a {@link DirkScheme}, one accepted step per call,
 * landing exactly on a requested stop time.
 *
 * <p>One step from (t, y) with step h, for a stiffly accurate ESDIRK scheme with s stages:
 * <ol>
 *   <li>K_0 = M^-1 F(y, t): the last stage rate of the previous step (first same as last), computed
 *       afresh only at the start or after {@link #restart}.</li>
 *   <li>For i = 1..s-1: Z_i = y + h sum_{j &lt; i} a_ij K_j; solve M(Y_i)(Y_i - Z_i) = a_ii h F(Y_i, t + c_i h)
 *       for Y_i by Newton (inside the system); K_i = (Y_i - Z_i) / (a_ii h).</li>
 *   <li>y_new = Y_(s-1).</li>
 *   <li>Error estimate e = h sum_j (b-hat_j - b_j) K_j, filtered by (M - a_ii h J)^-1 M for stiffness
 *       (Hosea and Shampine 1996), measured in the system's weighted RMS norm against the tolerance.</li>
 *   <li>Accept when the norm is at most 1; the next step follows a PI controller
 *       h_new = h * 0.9 * err^(-0.7 k) * err_prev^(0.4 k), k the scheme's controller exponent, limited to
 *       [0.2, 5] (K. Gustafsson, ACM TOMS 17 (1991) 533-554; E. Hairer and G. Wanner, <i>Solving ODEs II</i>,
 *       section IV.8). Reject otherwise (or when Newton fails) and retry with a smaller step.</li>
 * </ol>
 * Time is never accumulated by adding steps: a step that lands on the stop time sets t to the stop time
 * exactly, and fixed steps count from the last stop.
 *
 * <p>Allocation: all arrays are created in the constructor; {@link #step} allocates nothing.
 */
public final class DirkIntegrator {
    private static final double SAFETY = 0.9;
    private static final double MIN_FACTOR = 0.2;
    private static final double MAX_FACTOR = 5.0;
    private static final double NEWTON_FAILURE_FACTOR = 0.25;

    private final ImplicitSystem system;
    private final DirkScheme scheme;
    private final StepControl control;
    private final int n;
    private final double[][] k;
    private final double[] y;
    private final double[] z;
    private final double[] stage;
    private final double[] error;

    private double t;
    private boolean rateValid;
    private double nextStep;
    private double previousError = 1;
    private double minStep;
    private double lastStop;
    private long fixedCount;
    private long accepted;
    private long rejected;
    private long newtonIterations;
    private double lastStep;

    /**
     * @param system the equations
     * @param scheme the Runge–Kutta scheme
     * @param control adaptive or fixed steps
     */
    public DirkIntegrator(ImplicitSystem system, DirkScheme scheme, StepControl control) {
        this.system = system;
        this.scheme = scheme;
        this.control = control;
        this.n = system.size();
        int s = scheme.stages();
        k = new double[s][n];
        y = new double[n];
        z = new double[n];
        stage = new double[n];
        error = new double[n];
        system.setTolerance(control instanceof StepControl.Adaptive a ? a.tolerance()
                : ((StepControl.Fixed) control).newtonTolerance());
    }

    /**
     * Sets the initial state.
     *
     * @param t0 initial time (s)
     * @param y0 initial state (read only; copied)
     * @param firstStep the first step to try (s), used when the control does not fix one
     * @param smallestStep below this step size (s) the integrator gives up
     */
    public void start(double t0, double[] y0, double firstStep, double smallestStep) {
        System.arraycopy(y0, 0, y, 0, n);
        t = t0;
        lastStop = t0;
        fixedCount = 0;
        rateValid = false;
        previousError = 1;
        minStep = smallestStep;
        if (control instanceof StepControl.Adaptive a) {
            nextStep = Double.isNaN(a.initialStep()) ? firstStep : a.initialStep();
            nextStep = Math.min(nextStep, a.maxStep());
        } else {
            nextStep = ((StepControl.Fixed) control).step();
        }
    }

    /** Forgets the stored first-stage rate, e.g. after the system's forcing jumped at the current time. */
    public void restart() {
        rateValid = false;
    }

    /**
     * Takes one accepted step towards {@code stop}, never beyond it; when the step reaches it, the time is
     * set to {@code stop} exactly.
     *
     * @return true when the step landed on {@code stop}
     * @throws NumericalFailureException when the step size falls below the smallest step
     */
    public boolean step(double stop) {
        if (!(stop > t)) {
            throw new IllegalArgumentException("stop time " + stop + " s is not after the current time " + t + " s");
        }
        if (!rateValid) {
            system.rate(t, y, k[0]);
            rateValid = true;
        }
        int s = scheme.stages();
        boolean adaptive = control instanceof StepControl.Adaptive;
        while (true) {
            double remaining = stop - t;
            double h;
            double tNew;
            boolean landing;
            if (adaptive) {
                h = Math.min(nextStep, ((StepControl.Adaptive) control).maxStep());
                if (h >= remaining * (1 - 1e-10)) {
                    landing = true;
                } else {
                    landing = false;
                    if (h > 0.5 * remaining) {
                        h = 0.5 * remaining; // split the rest evenly rather than leave a sliver
                    }
                }
                tNew = landing ? stop : t + h;
            } else {
                double step = ((StepControl.Fixed) control).step();
                double candidate = lastStop + (fixedCount + 1) * step;
                landing = candidate >= stop - 1e-10 * step;
                tNew = landing ? stop : candidate;
            }
            h = tNew - t;

            int failedStage = attempt(h, s);
            if (failedStage >= 0) {
                rejected++;
                if (!adaptive) {
                    throw new NumericalFailureException("Newton iteration did not converge at a fixed step of "
                            + h + " s", t, accepted, -1, null);
                }
                nextStep = h * NEWTON_FAILURE_FACTOR;
                checkStep(nextStep);
                continue;
            }

            double err = 0;
            if (adaptive) {
                for (int i = 0; i < n; i++) {
                    double sum = 0;
                    for (int j = 0; j < s; j++) {
                        sum += (scheme.bHat(j) - scheme.b(j)) * k[j][i];
                    }
                    error[i] = h * sum;
                }
                system.filterError(error);
                err = system.errorNorm(error, y, stage);
                if (!(err <= 1)) {
                    rejected++;
                    double factor = Double.isNaN(err) ? MIN_FACTOR
                            : Math.max(MIN_FACTOR, SAFETY * Math.pow(err, -scheme.controllerExponent()));
                    nextStep = h * factor;
                    checkStep(nextStep);
                    continue;
                }
            }

            // accept
            System.arraycopy(stage, 0, y, 0, n);
            double[] last = k[s - 1];
            k[s - 1] = k[0];
            k[0] = last;
            t = tNew;
            accepted++;
            lastStep = h;
            if (adaptive) {
                double e = Math.max(err, 1e-10);
                double exponent = scheme.controllerExponent();
                double factor = SAFETY * Math.pow(e, -0.7 * exponent) * Math.pow(previousError, 0.4 * exponent);
                factor = Math.min(MAX_FACTOR, Math.max(MIN_FACTOR, factor));
                double proposed = h * factor;
                // a step shortened to land on a stop says little about the step the solution allows
                nextStep = landing ? Math.max(proposed, nextStep) : proposed;
                previousError = e;
            } else {
                fixedCount++;
            }
            if (landing) {
                lastStop = stop;
                fixedCount = 0;
            }
            return landing;
        }
    }

    /** Runs the implicit stages for step h; returns -1 on success or the index of the stage whose Newton failed. */
    private int attempt(double h, int s) {
        for (int i = 1; i < s; i++) {
            for (int r = 0; r < n; r++) {
                double sum = 0;
                for (int j = 0; j < i; j++) {
                    sum += scheme.a(i, j) * k[j][r];
                }
                z[r] = y[r] + h * sum;
            }
            if (i == 1) {
                System.arraycopy(y, 0, stage, 0, n);
            }
            double g = scheme.a(i, i) * h;
            double stageTime = i == s - 1 ? t + h : t + scheme.c(i) * h;
            int iterations = system.solveStage(stageTime, g, z, stage);
            if (iterations < 0) {
                newtonIterations += -iterations;
                return i;
            }
            newtonIterations += iterations;
            double[] ki = k[i];
            double inverse = 1 / g;
            for (int r = 0; r < n; r++) {
                ki[r] = (stage[r] - z[r]) * inverse;
            }
        }
        return -1;
    }

    private void checkStep(double h) {
        // below a few units in the last place of t, t + h no longer differs from t
        if (!(h >= minStep) || !(h >= 64 * Math.ulp(t))) {
            throw new NumericalFailureException("step size collapsed to " + h + " s (smallest allowed "
                    + minStep + " s)", t, accepted, -1, null);
        }
    }

    /** Current time (s). */
    public double time() {
        return t;
    }

    /** Component {@code i} of the current state. */
    public double state(int i) {
        return y[i];
    }

    /** Copies the current state into {@code out}. */
    public void copyState(double[] out) {
        System.arraycopy(y, 0, out, 0, n);
    }

    /** Component {@code i} of the rate M^-1 F at the current state (valid after the first step). */
    public double rate(int i) {
        return k[0][i];
    }

    /** Size of the last accepted step (s). */
    public double lastStep() {
        return lastStep;
    }

    /** The step the controller proposes next (s). */
    public double nextStep() {
        return nextStep;
    }

    /** Accepted steps so far. */
    public long acceptedSteps() {
        return accepted;
    }

    /** Rejected step attempts so far (error too large or Newton failed). */
    public long rejectedSteps() {
        return rejected;
    }

    /** Newton iterations summed over every stage solve. */
    public long newtonIterations() {
        return newtonIterations;
    }

    /** The scheme in use. */
    public DirkScheme scheme() {
        return scheme;
    }
}
