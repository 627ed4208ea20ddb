package dev.soakfield.app;

import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * A real result folder for the view's tests: a 10 x 10 x 4 mm box, its xmin face held at c = 1,
 * every other face sealed, one hour of diffusion (penetration depth sqrt(D t) = 3 mm). A scenario
 * of our own; the values are not checked here, only that the view shows them the right way round.
 */
public final class SoakedBox {
  private SoakedBox() {}

  /** Writes the mesh and case into {@code dir} and runs it; returns the result folder. */
  public static Path make(Path dir) throws IOException {
    Path mesh = dir.resolve("box.msh");
    MshWriter.write(mesh, StructuredMesher.box(0.01, 0.01, 0.004, 10, 10, 4, 1), false);
    Path caseFile = dir.resolve("box.case.json");
    Files.writeString(
        caseFile,
        """
        { "mesh": "box.msh",
          "materials": { "body": { "diffusivity": 2.5e-9, "solubility": 1.0 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                     "xmax": { "kind": "sealed" }, "ymin": { "kind": "sealed" },
                     "ymax": { "kind": "sealed" }, "zmin": { "kind": "sealed" },
                     "zmax": { "kind": "sealed" } },
          "initial": 0.0,
          "time": { "end": 3600, "outputs": [600, 3600], "step": 300 },
          "threshold": 0.5 }
        """,
        StandardCharsets.UTF_8);
    Path out = dir.resolve("results");
    RunPipeline.run(caseFile, out, (t, end, steps, rejected) -> {});
    return out;
  }
}
