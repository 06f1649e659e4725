package dev.filmshear.cli.output;

/** The build's version, from the jar manifest (or "development" when run from classes). */
public final class Version {
    private Version() {
    }

    /** The version string. */
    public static String get() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }
}
