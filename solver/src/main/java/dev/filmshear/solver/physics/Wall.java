package dev.filmshear.solver.physics;

import java.util.Objects;

/**
 * A wall bounding the film: how it moves, and its thermal condition when the energy equation is solved.
 *
 * @param motion the wall's velocity history
 * @param thermal the thermal condition; null for an isothermal film
 */
public record Wall(WallMotion motion, ThermalCondition thermal) {

    public Wall {
        Objects.requireNonNull(motion, "motion");
    }

    /** A wall of an isothermal film. */
    public static Wall isothermal(WallMotion motion) {
        return new Wall(motion, null);
    }

    /** A wall of an isothermal film moving at a constant velocity (m/s) from t = 0. */
    public static Wall moving(double velocity) {
        return new Wall(new WallMotion.Steady(velocity), null);
    }

    /** A wall at rest in an isothermal film. */
    public static Wall atRest() {
        return moving(0);
    }
}
