package dev.filmshear.validation.suite;

import dev.filmshear.solver.base.InvalidParameterException;
import dev.filmshear.solver.model.FilmCase;
import dev.filmshear.solver.model.FilmModel;
import dev.filmshear.solver.model.FilmResult;
import dev.filmshear.solver.model.FilmSolver;
import dev.filmshear.solver.model.FilmSummary;
import dev.filmshear.solver.model.GridSpec;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.validation.mms.GridConvergenceIndex;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.ToDoubleFunction;

/**
 * Solution verification of any case: how large the discretization error of a given run is, estimated from the
 * same case on three grids by Richardson extrapolation and Roache's Grid Convergence Index (P. J. Roache,
 * <i>Verification and Validation in Computational Science and Engineering</i>, Hermosa, 1998; ASME V&amp;V 20-2009,
 * <i>Standard for Verification and Validation in Computational Fluid Dynamics and Heat Transfer</i>; formulas in
 * {@link GridConvergenceIndex}, references.md 10.2).
 *
 * <p><b>The three grids</b> ({@link #plan}). From the case's n nodes: n, 2n - 1 and 4n - 3 (ratio r = 2, nodes
 * nested) while 4n - 3 stays within {@value #MAX_POINTS}; otherwise ratio 1.5 upwards (n, 1.5 (n-1) + 1,
 * 2.25 (n-1) + 1) while that fits; otherwise the case's grid is the finest and two coarser ones follow at ratio
 * 1.5, so the result is never coarser than the case asked for. Ratios come from the spacing of the grid's mapped
 * coordinate, (n_fine - 1)/(n_coarse - 1), so clustered grids refine the same way. The time step is refined with
 * the grid through the tolerance: with the error-per-step controller of the solver's TR-BDF2 (exponent 1/3) the
 * step goes like tol^(1/3) and the global time error like tol^(2/3), so tol_k = tol (h_k/h_case)^3 keeps the time
 * error falling like h^2, with the space error. A semi-infinite film's automatic truncation depth is fixed, at the
 * depth of the finest tolerance, for all three grids, so that only the spacing changes.
 *
 * <p><b>The estimate</b> ({@link #estimate}) of a result f (f3 coarsest, f1 finest, eps_ij = f_i - f_j):
 * <ul>
 *   <li>monotone convergence (0 &lt; eps21/eps32 &lt; 1): observed order p from Celik et al. (2008); when p lies
 *       within {@value #REASONABLE_ORDER_BAND} of the formal order 2 (10 %, the band of the code-verification
 *       suite) it is reasonable and GCI_fine = 1.25 |eps21/f1| / (r21^p - 1);</li>
 *   <li>otherwise, following Roache (Discussion, <i>J. Fluids Eng.</i> 133, 115501, 2011: Fs = 3 when the observed
 *       p is unreasonable), Fs = 3 with the order p clipped to [0.5, 2] when it was observed (a low observed order
 *       widens the band instead of the formal order narrowing it), or the formal order 2 for oscillatory or
 *       diverging values;</li>
 *   <li>when the two finest values agree to round-off ({@value #ROUND_OFF} of their size) the result is
 *       grid-independent: Fs = 3 with the formal order, which gives a band at round-off.</li>
 * </ul>
 * With it the Richardson extrapolate f_ext = (r21^p f1 - f2)/(r21^p - 1), the band |f1| GCI_fine around f1 in the
 * quantity's unit, and Roache's asymptotic-range ratio GCI_32 / (r21^p GCI_21), near 1 in the asymptotic range.
 */
public final class SolutionVerification {
    /** Formal order of the solver in space and time. */
    public static final double FORMAL_ORDER = 2;
    /** Finest grid the study refines to (nodes). */
    public static final int MAX_POINTS = 2001;
    /** Observed orders within this of {@link #FORMAL_ORDER} are reasonable (10 % of 2). */
    public static final double REASONABLE_ORDER_BAND = 0.2;
    /** Relative changes between grids below this are round-off. */
    public static final double ROUND_OFF = 1e-12;
    /** Smallest order used for a band with Fs = 3. */
    static final double MIN_ORDER = 0.5;
    /** Factor of safety for an unreasonable or unconfirmed order (Roache 2011). */
    static final double SAFETY_FACTOR_UNCONFIRMED = 3;
    /** Tolerance limits of a case. */
    private static final double MIN_TOLERANCE = 1e-12;
    private static final double MAX_TOLERANCE = 1e-2;

    private SolutionVerification() {
    }

    /** The results the study estimates, where a case has them. */
    public enum Quantity {
        /** mu du/dy at the lower wall (Pa). */
        WALL_SHEAR_STRESS_LOWER("wall shear stress, lower wall", "Pa", FilmSummary::wallShearStressLower),
        /** mu du/dy at the upper wall (Pa); not for a semi-infinite film. */
        WALL_SHEAR_STRESS_UPPER("wall shear stress, upper wall", "Pa", FilmSummary::wallShearStressUpper),
        /** The film's highest temperature at the end (K); heated films only. */
        MAX_TEMPERATURE("highest temperature", "K", FilmSummary::maxTemperature);

        private final String label;
        private final String unit;
        private final ToDoubleFunction<FilmSummary> of;

        Quantity(String label, String unit, ToDoubleFunction<FilmSummary> of) {
            this.label = label;
            this.unit = unit;
            this.of = of;
        }

        /** In words, for tables. */
        public String label() {
            return label;
        }

        /** SI unit. */
        public String unit() {
            return unit;
        }

        /** The quantity in a run's summary. */
        public double of(FilmSummary summary) {
            return of.applyAsDouble(summary);
        }

        /** The quantities a case has: the upper wall's stress with an upper wall, the temperature when heated. */
        public static List<Quantity> of(FilmCase filmCase) {
            List<Quantity> out = new ArrayList<>();
            out.add(WALL_SHEAR_STRESS_LOWER);
            if (!filmCase.physics().isSemiInfinite()) {
                out.add(WALL_SHEAR_STRESS_UPPER);
            }
            if (filmCase.physics().isThermal()) {
                out.add(MAX_TEMPERATURE);
            }
            return out;
        }
    }

    /**
     * The three cases of a study, coarsest first.
     *
     * @param cases the case on each grid, with its tolerance
     */
    public record Plan(List<FilmCase> cases) {
        public Plan {
            cases = List.copyOf(cases);
            if (cases.size() != 3) {
                throw new InvalidParameterException("cases", cases.size() + " grids", "three");
            }
        }

        /** Nodes of each grid, coarsest first. */
        public int[] points() {
            return cases.stream().mapToInt(c -> c.grid().points()).toArray();
        }

        /** Tolerance of each grid, coarsest first. */
        public double[] tolerances() {
            return cases.stream().mapToDouble(FilmCase::tolerance).toArray();
        }

        /** The finest grid's case: the run whose results are reported. */
        public FilmCase finest() {
            return cases.get(2);
        }
    }

    /** How the three values behave. */
    public enum Behaviour {
        /** 0 &lt; eps21/eps32 &lt; 1: the usual case, with an observed order. */
        MONOTONE,
        /** eps21/eps32 &lt; 0: the values swing about the limit; no order is observed. */
        OSCILLATORY,
        /** |eps21| &gt;= |eps32| &gt; 0: the change does not shrink with refinement; no order is observed. */
        DIVERGENT,
        /** The two finest values agree to round-off. */
        GRID_INDEPENDENT
    }

    /**
     * The discretization-error estimate of one result.
     *
     * @param values f on each grid, coarsest first
     * @param ratios r32 = h3/h2 and r21 = h2/h1
     * @param behaviour how the values converge
     * @param observedOrder p from the three values (Celik et al. 2008), NaN when none is observed
     * @param reasonable true when p is within {@link #REASONABLE_ORDER_BAND} of the formal order
     * @param orderUsed the order the extrapolation and the band use
     * @param safetyFactor Fs: 1.25 with a reasonable order, 3 otherwise
     * @param extrapolated Richardson's f_ext
     * @param gciFine GCI of the finest grid as a fraction of |f1| (NaN when f1 = 0)
     * @param band |f1| GCI_fine in the quantity's unit: the exact value is expected in f1 +- band
     * @param asymptoticRatio GCI_32 / (r21^p GCI_21), near 1 in the asymptotic range (NaN when f1 or f2 is 0)
     */
    public record Estimate(double[] values, double[] ratios, Behaviour behaviour, double observedOrder,
                           boolean reasonable, double orderUsed, double safetyFactor, double extrapolated,
                           double gciFine, double band, double asymptoticRatio) {
        public Estimate {
            values = values.clone();
            ratios = ratios.clone();
        }

        @Override
        public double[] values() {
            return values.clone();
        }

        @Override
        public double[] ratios() {
            return ratios.clone();
        }

        /** The finest grid's value f1. */
        public double finest() {
            return values[values.length - 1];
        }

        /** True when {@code exact} lies in f1 +- band. */
        public boolean brackets(double exact) {
            return Math.abs(exact - finest()) <= band;
        }
    }

    /**
     * The three grids and tolerances of a study of {@code base} (see the class comment).
     *
     * @throws InvalidParameterException when the case's grid has fewer than 5 nodes (a coarser grid would have
     *     fewer than 3)
     */
    public static Plan plan(FilmCase base) {
        Objects.requireNonNull(base, "base");
        int n = base.grid().points();
        if (n < 5) {
            throw new InvalidParameterException("points", Integer.toString(n), "at least 5 nodes for a three-grid study");
        }
        int[] points;
        if (4 * n - 3 <= MAX_POINTS) {
            points = new int[] {n, 2 * n - 1, 4 * n - 3};
        } else if (scaled(n, 2.25) <= MAX_POINTS) {
            points = new int[] {n, scaled(n, 1.5), scaled(n, 2.25)};
        } else {
            points = new int[] {scaled(n, 1 / 2.25), scaled(n, 1 / 1.5), n};
        }
        FilmPhysics physics = base.physics();
        double finestTolerance = tolerance(base, points[2]);
        if (physics.isSemiInfinite() && !base.isSteady()
                && Double.isNaN(((Domain.SemiInfinite) physics.domain()).depth())) {
            double depth = FilmModel.semiInfiniteDepth(physics, base.endTime(), finestTolerance);
            physics = physics.withDomain(new Domain.SemiInfinite(depth), null);
        }
        List<FilmCase> cases = new ArrayList<>();
        for (int points1 : points) {
            cases.add(base.withPhysics(physics).withGrid(new GridSpec(points1, base.grid().clustering()))
                    .withTolerance(tolerance(base, points1)));
        }
        return new Plan(cases);
    }

    /** (n - 1) factor + 1 nodes, rounded. */
    private static int scaled(int n, double factor) {
        return (int) Math.round((n - 1) * factor) + 1;
    }

    /** tol (h / h_case)^3 = tol ((n_case - 1)/(n - 1))^3, within the limits a case accepts. */
    private static double tolerance(FilmCase base, int points) {
        double ratio = (base.grid().points() - 1.0) / (points - 1.0);
        return Math.max(MIN_TOLERANCE, Math.min(MAX_TOLERANCE, base.tolerance() * ratio * ratio * ratio));
    }

    /**
     * The estimate for one result.
     *
     * @param values f on the three grids, coarsest first
     * @param points nodes of the three grids, coarsest first
     */
    public static Estimate estimate(double[] values, int[] points) {
        if (values.length != 3 || points.length != 3) {
            throw new InvalidParameterException("values", values.length + " values on " + points.length + " grids",
                    "three of each");
        }
        for (double v : values) {
            InvalidParameterException.requireFinite("value", v, "");
        }
        double f3 = values[0];
        double f2 = values[1];
        double f1 = values[2];
        double r32 = (points[1] - 1.0) / (points[0] - 1.0);
        double r21 = (points[2] - 1.0) / (points[1] - 1.0);
        double eps21 = f2 - f1;
        double eps32 = f3 - f2;
        double size = Math.max(Math.abs(f1), Math.max(Math.abs(f2), Math.abs(f3)));
        Behaviour behaviour;
        if (Math.abs(eps21) <= ROUND_OFF * size) {
            behaviour = Behaviour.GRID_INDEPENDENT;
        } else if (eps21 * eps32 < 0) {
            behaviour = Behaviour.OSCILLATORY;
        } else if (Math.abs(eps21) >= Math.abs(eps32)) {
            behaviour = Behaviour.DIVERGENT;
        } else {
            behaviour = Behaviour.MONOTONE;
        }
        double observed = Double.NaN;
        if (behaviour == Behaviour.MONOTONE) {
            try {
                observed = GridConvergenceIndex.observedOrder(f1, f2, f3, r21, r32);
            } catch (IllegalStateException noRoot) {
                // the order equation of Celik et al. has no root in (1e-6, 20): no order observed
                observed = Double.NaN;
            }
        }
        boolean reasonable = Math.abs(observed - FORMAL_ORDER) <= REASONABLE_ORDER_BAND;
        double order = reasonable ? observed : Double.isNaN(observed) ? FORMAL_ORDER
                : Math.max(MIN_ORDER, Math.min(FORMAL_ORDER, observed));
        double safety = reasonable ? GridConvergenceIndex.SAFETY_FACTOR_THREE_GRIDS : SAFETY_FACTOR_UNCONFIRMED;
        double band = safety * Math.abs(eps21) / (Math.pow(r21, order) - 1);
        double extrapolated = GridConvergenceIndex.extrapolate(f1, f2, r21, order);
        double gciFine = f1 != 0 ? GridConvergenceIndex.gciFine(f1, f2, r21, order, safety) : Double.NaN;
        double gci32 = f2 != 0 ? GridConvergenceIndex.gciFine(f2, f3, r32, order, safety) : Double.NaN;
        double asymptotic = gciFine > 0 ? gci32 / (Math.pow(r21, order) * gciFine) : Double.NaN;
        return new Estimate(values, new double[] {r32, r21}, behaviour, observed, reasonable, order, safety,
                extrapolated, gciFine, band, asymptotic);
    }

    /**
     * A finished study.
     *
     * @param plan the grids
     * @param results the run on each grid, coarsest first
     * @param estimates the estimate of each quantity the case has
     */
    public record Study(Plan plan, List<FilmResult> results, Map<Quantity, Estimate> estimates) {
        public Study {
            results = List.copyOf(results);
            estimates = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(estimates));
        }
    }

    /** Runs {@code base} on the three grids of {@link #plan} and estimates every quantity it has. */
    public static Study run(FilmCase base) {
        Plan plan = plan(base);
        List<FilmResult> results = new ArrayList<>();
        for (FilmCase c : plan.cases()) {
            results.add(FilmSolver.solve(c));
        }
        return new Study(plan, results, estimates(plan, results.stream().map(FilmResult::summary).toList()));
    }

    /** The estimates of every quantity of the plan's case from the three runs' summaries (coarsest first). */
    public static Map<Quantity, Estimate> estimates(Plan plan, List<FilmSummary> summaries) {
        if (summaries.size() != 3) {
            throw new InvalidParameterException("summaries", summaries.size() + " runs", "three");
        }
        Map<Quantity, Estimate> out = new LinkedHashMap<>();
        for (Quantity q : Quantity.of(plan.finest())) {
            double[] values = new double[3];
            for (int k = 0; k < 3; k++) {
                values[k] = q.of(summaries.get(k));
            }
            out.put(q, estimate(values, plan.points()));
        }
        return out;
    }
}
