package dev.filmshear.solver.physics;

import dev.filmshear.solver.base.InvalidParameterException;

/** The extent of the film across y: a finite gap between two walls, or one wall and unbounded fluid. */
public sealed interface Domain permits Domain.Gap, Domain.SemiInfinite {

    /**
     * A film between the lower wall (y = 0) and the upper wall (y = gap).
     *
     * @param gap film thickness (m)
     */
    record Gap(double gap) implements Domain {
        public Gap {
            InvalidParameterException.requirePositive("gap", gap, "m");
        }
    }

    /**
     * Fluid above the lower wall without bound (a Stokes layer). The solver truncates it at a depth
     * chosen from the penetration depths of momentum and heat, with no shear and no heat flux there.
     *
     * @param depth truncation depth (m), or NaN to let the solver choose it
     */
    record SemiInfinite(double depth) implements Domain {
        public SemiInfinite {
            if (!Double.isNaN(depth)) {
                InvalidParameterException.requirePositive("depth", depth, "m");
            }
        }

        /** A semi-infinite domain whose truncation depth the solver chooses. */
        public static SemiInfinite automatic() {
            return new SemiInfinite(Double.NaN);
        }
    }
}
