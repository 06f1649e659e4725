package dev.filmshear.validation.heating;

import dev.filmshear.solver.model.Snapshot;
import dev.filmshear.solver.physics.DensityLaw;
import dev.filmshear.solver.physics.Domain;
import dev.filmshear.solver.physics.FilmPhysics;
import dev.filmshear.solver.physics.Fluid;
import dev.filmshear.solver.physics.PropertyLaw;
import dev.filmshear.solver.physics.ThermalCondition;
import dev.filmshear.solver.physics.ViscosityLaw;
import dev.filmshear.solver.physics.Wall;
import dev.filmshear.solver.physics.WallMotion;

import java.util.function.DoubleUnaryOperator;

/**
 * The heated oil film shared by the heating checks: gap 100 um, rho = 870 kg/m^3, cp = 1950 J/(kg K),
 * k = 0.13 W/(m K), mu = 0.04 Pa s at 313.15 K (typical mineral oil, references.md 6.1; "typical" values).
 */
final class HeatedFilms {
    static final double GAP = 1e-4;
    static final double DENSITY = 870;
    static final double SPECIFIC_HEAT = 1950;
    static final double CONDUCTIVITY = 0.13;
    static final double VISCOSITY = 0.04;
    static final double WALL_TEMPERATURE = 313.15;
    /** Thermal diffusion time h^2 / alpha (s), about 0.13 s. */
    static final double THERMAL_TIME = GAP * GAP * DENSITY * SPECIFIC_HEAT / CONDUCTIVITY;
    static final ThermalCondition AT_WALL_TEMPERATURE = new ThermalCondition.FixedTemperature(WALL_TEMPERATURE);

    private HeatedFilms() {
    }

    /** The oil with viscosity law {@code law}, constant density, specific heat and conductivity. */
    static Fluid oil(ViscosityLaw law) {
        return new Fluid(DensityLaw.constant(DENSITY), law, PropertyLaw.constant(SPECIFIC_HEAT),
                PropertyLaw.constant(CONDUCTIVITY));
    }

    /** Plane Couette flow: lower wall at rest, upper wall moving at {@code speed} from t = 0, fluid at rest at T0. */
    static FilmPhysics couette(ViscosityLaw law, double speed, ThermalCondition lower, ThermalCondition upper) {
        return new FilmPhysics(new Domain.Gap(GAP), oil(law), new Wall(new WallMotion.Steady(0), lower),
                new Wall(new WallMotion.Steady(speed), upper), 0, 0, WALL_TEMPERATURE, null, null);
    }

    /** max_i |T_i - exact(y_i)| over the nodes of a snapshot (K). */
    static double maxTemperatureError(Snapshot s, DoubleUnaryOperator exact) {
        double[] y = s.y();
        double[] t = s.temperature();
        double max = 0;
        for (int i = 0; i < y.length; i++) {
            max = Math.max(max, Math.abs(t[i] - exact.applyAsDouble(y[i])));
        }
        return max;
    }

    /** Index of the hottest node. */
    static int hottestNode(Snapshot s) {
        double[] t = s.temperature();
        int best = 0;
        for (int i = 1; i < t.length; i++) {
            if (t[i] > t[best]) {
                best = i;
            }
        }
        return best;
    }

    /** Observed order log2(e_coarse / e_fine) for grids refined by a factor 2. */
    static double order(double coarse, double fine) {
        return Math.log(coarse / fine) / Math.log(2);
    }
}
