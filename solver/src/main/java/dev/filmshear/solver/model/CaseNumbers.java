package dev.filmshear.solver.model;

import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.WallMotion;

/**
 * The derived numbers of a case that can be known before solving it: properties at the initial
 * temperature, time scales, Reynolds number, penetration depths. Computed by {@link #of(FilmCase)}.
 *
 * @param referenceTemperature temperature of the properties below (K)
 * @param density kg/m^3
 * @param viscosity Pa s
 * @param kinematicViscosity m^2/s
 * @param gap film thickness (m), NaN for a semi-infinite film
 * @param depth extent of the grid (m): the gap, or the truncation depth of a semi-infinite film
 * @param relativeSpeed largest wall speed difference (m/s)
 * @param reynoldsNumber relativeSpeed * gap / nu for a film in a gap; relativeSpeed * penetrationDepth / nu
 *     for a semi-infinite film
 * @param momentumTimeScale 1 / smallest eigenvalue of the discrete momentum diffusion operator (s);
 *     NaN for a semi-infinite film
 * @param momentumTimeScaleAnalytic gap^2 / (pi^2 nu) (s), the continuous value for constant viscosity
 * @param thermalTimeScale gap^2 / alpha (s); NaN for an isothermal film
 * @param prandtlNumber nu / alpha; NaN for an isothermal film
 * @param penetrationDepth semi-infinite film only: sqrt(nu t_end), or the Stokes-layer depth sqrt(2 nu / omega)
 *     of an oscillating wall if larger (m); NaN for a film in a gap and for a steady case
 * @param viscosityTemperatureCoefficient beta = -(d mu / dT) / mu at the reference temperature (1/K)
 * @param nahmeNumber Na = beta mu U^2 / k, how strongly shear heating thins the oil (R. Nahme, Ing.-Arch. 11
 *     (1940) 191, from memory; definition as in the project's reference sheet, section 7(g)); NaN when isothermal
 * @param brinkmanNumber Br = mu U^2 / (k |T_upper - T_lower|) for walls at two fixed temperatures (R. B. Bird,
 *     W. E. Stewart, E. N. Lightfoot, <i>Transport Phenomena</i>, 2nd ed., 2002, section 10.4); NaN otherwise
 * @param shearHeatingRise the temperature rise shear heating would cause at constant viscosity: mu U^2 / (8 k)
 *     when both walls take heat away, mu U^2 / (2 k) when only one does (BSL section 10.4) (K); NaN when
 *     isothermal
 * @param drivenWallTimeScale for a driven wall: its mass per area times the gap over the viscosity (s), the
 *     time constant of a coast-down on a quasi-steady film of constant viscosity (I c / (mu A R^2) for a
 *     journal); NaN without a driven wall
 */
public record CaseNumbers(double referenceTemperature, double density, double viscosity, double kinematicViscosity,
                          double gap, double depth, double relativeSpeed, double reynoldsNumber,
                          double momentumTimeScale, double momentumTimeScaleAnalytic, double thermalTimeScale,
                          double prandtlNumber, double penetrationDepth, double viscosityTemperatureCoefficient,
                          double nahmeNumber, double brinkmanNumber, double shearHeatingRise,
                          double drivenWallTimeScale) {

    /**
     * Reynolds number U c / nu (full gap, full wall-speed difference) above which a plane Couette film
     * may not stay laminar: turbulence is sustained from Re = 324 +- 1 on the half-gap and half-speed
     * (Y. Duguet, P. Schlatter, D. S. Henningson, J. Fluid Mech. 650 (2010) 119-129), that is U c / nu of
     * about 4 x 324 = 1300.
     */
    public static final double LAMINAR_REYNOLDS_LIMIT = 1300;

    /** Computes the numbers of a case (builds its grid and discrete operator; solves nothing). */
    public static CaseNumbers of(FilmCase filmCase) {
        return of(filmCase, new FilmModel(filmCase, SolverOptions.defaults()));
    }

    /** Computes the numbers of a case from a model of it built at t = 0. */
    static CaseNumbers of(FilmCase filmCase, FilmModel model) {
        FilmPhysics physics = filmCase.physics();
        Fluid fluid = physics.fluid();
        double t0 = physics.referenceTemperature();
        double rho = fluid.density().density(t0);
        double mu = fluid.viscosity().mu(t0);
        double nu = mu / rho;
        double end = filmCase.endTime();
        double horizon = Double.isFinite(end) ? end : Double.MAX_VALUE;
        double speed = physics.lower().motion().maxSpeed(horizon)
                + (physics.upper() == null ? 0 : physics.upper().motion().maxSpeed(horizon));
        if (physics.upper() != null && physics.lower().motion().isAtRest()) {
            speed = physics.upper().motion().maxSpeed(horizon);
        }
        // how far momentum diffuses: meaningful for a semi-infinite film only (a gap is crossed in microseconds)
        double penetration = Double.isFinite(end) && physics.isSemiInfinite() ? Math.sqrt(nu * end) : Double.NaN;
        for (var wall : new dev.filmshear.solver.physics.Wall[] {physics.lower(), physics.upper()}) {
            if (wall != null && physics.isSemiInfinite() && wall.motion() instanceof WallMotion.Sine s) {
                double stokes = Math.sqrt(2 * nu / s.angularFrequency());
                penetration = Double.isNaN(penetration) ? stokes : Math.max(penetration, stokes);
            }
        }
        double gap = physics.gap();
        double depth = model.grid().depth();
        double reynolds = speed * (physics.isSemiInfinite() ? penetration : gap) / nu;
        double tm = model.momentumTimeScale();
        double tmAnalytic = physics.isSemiInfinite() ? Double.NaN : gap * gap / (Math.PI * Math.PI * nu);
        double alpha = physics.isThermal() ? fluid.thermalDiffusivity(t0) : Double.NaN;
        double thermal = physics.isThermal() && !physics.isSemiInfinite() ? gap * gap / alpha : Double.NaN;
        double prandtl = physics.isThermal() ? nu / alpha : Double.NaN;
        double beta = -fluid.viscosity().dMuDT(t0) / mu;
        double nahme = Double.NaN;
        double brinkman = Double.NaN;
        double rise = Double.NaN;
        if (physics.isThermal()) {
            double k = fluid.conductivity().value(t0);
            nahme = beta * mu * speed * speed / k;
            if (physics.upper() != null
                    && physics.lower().thermal() instanceof ThermalCondition.FixedTemperature lowerT
                    && physics.upper().thermal() instanceof ThermalCondition.FixedTemperature upperT
                    && lowerT.temperature() != upperT.temperature()) {
                brinkman = mu * speed * speed / (k * Math.abs(upperT.temperature() - lowerT.temperature()));
            }
            int sinks = 0;
            for (var wall : new dev.filmshear.solver.physics.Wall[] {physics.lower(), physics.upper()}) {
                if (wall != null && !(wall.thermal() instanceof ThermalCondition.HeatFlux)) {
                    sinks++;
                }
            }
            rise = sinks == 2 ? mu * speed * speed / (8 * k) : sinks == 1 ? mu * speed * speed / (2 * k)
                    : Double.POSITIVE_INFINITY;
        }
        double drivenTime = Double.NaN;
        for (var wall : new dev.filmshear.solver.physics.Wall[] {physics.lower(), physics.upper()}) {
            if (wall != null && wall.motion() instanceof WallMotion.Driven d && !physics.isSemiInfinite()) {
                drivenTime = d.massPerArea() * gap / mu;
            }
        }
        return new CaseNumbers(t0, rho, mu, nu, gap, depth, speed, reynolds, tm, tmAnalytic, thermal, prandtl,
                penetration, beta, nahme, brinkman, rise, drivenTime);
    }

    /** True when the Reynolds number of a film in a gap is above {@link #LAMINAR_REYNOLDS_LIMIT}. */
    public boolean laminarFlowDoubtful() {
        return !Double.isNaN(gap) && reynoldsNumber > LAMINAR_REYNOLDS_LIMIT;
    }
}
