package dev.soakfield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Properties;
import picocli.CommandLine;

/** Reports the project version, which the build writes into {@code version.properties}. */
final class VersionProvider implements CommandLine.IVersionProvider {
  @Override
  public String[] getVersion() {
    return new String[] {"soakfield " + version()};
  }

  /** The project version this command line was built as, e.g. 0.1.0-SNAPSHOT. */
  static String version() {
    try (InputStream in = VersionProvider.class.getResourceAsStream("version.properties")) {
      if (in == null) {
        throw new IllegalStateException("version.properties is missing from the build");
      }
      Properties p = new Properties();
      p.load(in);
      return p.getProperty("version");
    } catch (IOException e) {
      throw new UncheckedIOException(e);
    }
  }
}
