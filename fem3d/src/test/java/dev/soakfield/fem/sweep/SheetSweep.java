package dev.soakfield.fem.sweep;

import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Cases of our own for sweep tests: a plane sheet 1 mm thick (50 cells across, one cell deep in the
 * other directions) with both faces held at 1, so that it is Crank's plane sheet; a threshold on
 * its mean at 0.5 times half-uptake.
 */
final class SheetSweep {
  static final double L = 1e-3;

  private SheetSweep() {}

  /** sheet.msh and sheet.json in {@code dir}; {@code time} is the case's time object. */
  static Path writeCase(Path dir, int cells, String time) throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(L, 1e-5, 1e-5, cells, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("sheet.json"),
        """
        { "mesh": "sheet.msh",
          // plain diffusion, both faces held: Crank's plane sheet
          "materials": { "body": { "diffusivity": 1e-10, "solubility": 1 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1 },
                     "xmax": { "kind": "concentration", "value": 1 } },
          "probes": { "centre": [5e-4, 5e-6, 5e-6] },
          "thresholds": [ { "name": "half", "level": 0.5, "where": "mean:body" } ],
          "time": %s }
        """
            .formatted(time));
  }

  static Path writeSweep(Path dir, String body) throws IOException {
    return Files.writeString(dir.resolve("sweep.json"), body);
  }
}
