package dev.soakfield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** The bundled demo scenario of our own: a moulded sensor pod around a die, and its variants. */
final class DemoFiles {
  static final String[] FILES = {
    "sensor-pod.msh",
    "sensor-pod.case.json",
    "sensor-pod-humid.case.json",
    "sensor-pod-bake.case.json"
  };

  /** The demo case itself (the others are variants beside it). */
  static final String CASE = FILES[1];

  private DemoFiles() {}

  /**
   * Copies the demo files into {@code folder}; with {@code keepEdited}, a file already there is
   * left as it is (the user may have edited it).
   */
  static Path copyInto(Path folder, boolean keepEdited) throws IOException {
    Files.createDirectories(folder);
    for (String name : FILES) {
      Path to = folder.resolve(name);
      if (keepEdited && Files.exists(to)) {
        continue;
      }
      try (InputStream in = DemoFiles.class.getResourceAsStream("/samples/" + name)) {
        if (in == null) {
          throw new IllegalStateException("the demo file " + name + " is missing from the jar");
        }
        Files.copy(in, to, StandardCopyOption.REPLACE_EXISTING);
      }
    }
    return folder.resolve(CASE);
  }

  /** Where the window's own copy of the demo lives: under the user's home, never in a checkout. */
  static Path windowCopy() {
    return Path.of(System.getProperty("user.home"), "soakfield", "demo");
  }
}
