package org.kinduct.report;

/** Kinduct's version from the jar manifest (set by Maven), or "development" when run from classes. */
public final class Version {

    private Version() {
    }

    public static String text() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }
}
