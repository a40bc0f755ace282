package org.strandbook.app.cli;

import picocli.CommandLine;

/** The version printed by {@code --version}: the jar's Implementation-Version, else "development". */
final class StrandbookVersion implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = StrandbookVersion.class.getPackage().getImplementationVersion();
        return new String[] {"strandbook " + (v == null ? "development" : v)};
    }
}
