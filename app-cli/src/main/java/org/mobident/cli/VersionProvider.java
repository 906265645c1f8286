package org.mobident.cli;

import picocli.CommandLine;

/** Reports the version from the jar manifest (or "development" when run from classes). */
final class VersionProvider implements CommandLine.IVersionProvider {
    static String version() {
        String v = VersionProvider.class.getPackage().getImplementationVersion();
        return v == null ? "development build" : v;
    }

    @Override
    public String[] getVersion() {
        return new String[] {"mobident " + version(), "Java " + System.getProperty("java.version"),
            "License GPL-3.0-or-later"};
    }
}
