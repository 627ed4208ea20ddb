package dev.soakfield.cli;

import picocli.CommandLine;

/** Reports the version from the jar manifest (or "development" when run from classes). */
final class VersionProvider implements CommandLine.IVersionProvider {
  @Override
  public String[] getVersion() {
    String v = SoakfieldCli.class.getPackage().getImplementationVersion();
    return new String[] {"soakfield " + (v == null ? "development build" : v)};
  }
}
