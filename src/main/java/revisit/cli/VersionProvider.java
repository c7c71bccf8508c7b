package revisit.cli;

import picocli.CommandLine;

/** Reports the version from the jar manifest, or "development" when run from classes. */
final class VersionProvider implements CommandLine.IVersionProvider {

    @Override
    public String[] getVersion() {
        String v = Main.class.getPackage().getImplementationVersion();
        return new String[]{"revisit " + (v == null ? "0.1.0 (development build)" : v),
                "Java " + System.getProperty("java.version")};
    }
}
