package dev.soakfield.fem.run;

import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** A small case of our own for tests of the run's plumbing: a 1 mm cube held at 1 on top. */
final class BoxCase {
  private BoxCase() {}

  /** Writes box.msh and box.json into {@code dir} with {@code time} as the case's time control. */
  static Path write(Path dir, String time) throws IOException {
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1), false);
    return Files.writeString(
        dir.resolve("box.json"),
        """
        { "mesh": "box.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "zmax": { "kind": "concentration", "value": 1 } },
          "time": %s }
        """
            .formatted(time));
  }
}
