package dev.filmshear.cli.fit;

/** How the data's viscosities were turned into the law's quantity before fitting. */
public enum Conversion {
    /** The data are already in the law's quantity. */
    NONE,
    /** Kinematic data, dynamic law: mu = nu * rho(T). */
    TO_DYNAMIC,
    /** Dynamic data, kinematic law (walther): nu = mu / rho(T). */
    TO_KINEMATIC
}
