package org.kinduct.cli;

import org.kinduct.report.Version;
import picocli.CommandLine.IVersionProvider;

/** {@code kinduct --version}. */
final class VersionText implements IVersionProvider {

    @Override
    public String[] getVersion() {
        return new String[] {"Kinduct " + Version.text()};
    }
}
