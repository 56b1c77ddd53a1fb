package org.kinduct.cli;

import picocli.CommandLine.IVersionProvider;

/** Version from the jar manifest (set by Maven), or "development" when run from classes. */
public final class Version implements IVersionProvider {

    public static String text() {
        String v = Version.class.getPackage().getImplementationVersion();
        return v == null ? "development" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"Kinduct " + text()};
    }
}
