package dev.soakfield.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Test cases: the bundled sample copied into a test folder, and a small sealed cube. */
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

  /**
   * A sealed 1 mm cube (the mesh command's 2×2×2 box) of one material, D = 1e-9 m²/s, S = 1, with
   * {@code source} as its source object and {@code initial} as the initial value, run for 1000 s in
   * 5 s steps; the case file in {@code dir}.
   */
  static Path sealedCube(Path dir, String source, String initial) throws IOException {
    CliRun m =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1e-3,1e-3,1e-3",
            "--cells",
            "2,2,2",
            "--out",
            dir.resolve("cube.msh").toString());
    if (m.exitCode() != ExitCodes.OK) {
      throw new IllegalStateException("mesh box failed: " + m.err());
    }
    return Files.writeString(
        dir.resolve("case.json"),
        """
        { "mesh": "cube.msh",
          "materials": { "body": { "diffusivity": 1e-9, "solubility": 1.0,
                                   "source": %s } },
          "initial": %s,
          "time": { "end": 1000, "step": 5 } }
        """
            .formatted(source, initial));
  }
}
