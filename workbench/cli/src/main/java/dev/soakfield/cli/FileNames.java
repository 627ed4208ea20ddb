package dev.soakfield.cli;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import picocli.CommandLine;

/**
 * File names from the command line and from case files, where the system's locale decides which
 * characters a name may hold. Under the POSIX ("C") locale the JVM encodes file names in ASCII, so
 * {@code résultats} cannot be opened and its accents arrive as replacement characters; the user
 * needs to hear that, and how to run under a UTF-8 locale, not a conversion error.
 */
final class FileNames {
  private FileNames() {}

  /** picocli's converter for every {@link Path} option and parameter. */
  static Path path(String name) {
    try {
      return Path.of(name);
    } catch (InvalidPathException e) {
      throw new CommandLine.TypeConversionException(explain(name));
    }
  }

  /** Why a name cannot be a file name here, and what to do. */
  static String explain(String name) {
    String encoding = System.getProperty("sun.jnu.encoding", "unknown");
    boolean undecodable = name.indexOf('\uFFFD') >= 0;
    return "'"
        + name
        + "' cannot be a file name under this system's locale (file names in "
        + encoding
        + ")"
        + (undecodable ? ": some of its bytes are not characters of that encoding" : "")
        + "; run under a UTF-8 locale, e.g. LC_ALL=C.UTF-8 (the soakfield launcher switches to"
        + " one itself when the system has it), or rename the file with plain ASCII letters";
  }
}
