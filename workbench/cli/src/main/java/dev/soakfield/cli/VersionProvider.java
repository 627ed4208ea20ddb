package dev.soakfield.cli;

import picocli.CommandLine;

/** Reports the version from the jar manifest (or "development" when run from classes). */
final class VersionProvider implements CommandLine.IVersionProvider {
  @Override
  public String[] getVersion() {
    return new String[] {"soakfield " + version()};
  }

  /** The version from the jar manifest, or "development build". */
  static String version() {
    String v = SoakfieldCli.class.getPackage().getImplementationVersion();
    return v == null ? "development build" : v;
  }
}
