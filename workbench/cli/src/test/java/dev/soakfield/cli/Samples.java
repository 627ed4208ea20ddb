package dev.soakfield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Copies the bundled sample case and mesh into a test folder. */
final class Samples {
  static final String CASE = "sensor-pod.case.json";
  static final String MESH = "sensor-pod.msh";

  private Samples() {}

  /** The sample case copied into {@code dir}, with its mesh beside it. */
  static Path copyTo(Path dir) throws IOException {
    for (String f : new String[] {CASE, MESH}) {
      try (InputStream in = Samples.class.getResourceAsStream("/samples/" + f)) {
        if (in == null) {
          throw new IllegalStateException("sample " + f + " missing from the class path");
        }
        Files.copy(in, dir.resolve(f), StandardCopyOption.REPLACE_EXISTING);
      }
    }
    return dir.resolve(CASE);
  }
}
