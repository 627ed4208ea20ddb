package dev.soakfield.fem.bake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.physics.Arrhenius;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BakeSearchTest {
  @TempDir Path dir;

  /** A saturated sheet 1 mm thick, faces held dry, D Arrhenius (D0 = 1e-4 m²/s, Q = 40 kJ/mol). */
  private Path wetSheet() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("part.json"),
        """
        { "mesh": "sheet.msh", "temperature": 300,
          "materials": { "body": { "diffusivity": { "D0": 1e-4, "Q": 40000 } } },
          "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                     "xmax": { "kind": "concentration", "value": 0.0 } },
          "initial": 1.0,
          "time": { "end": 1 } }
        """);
  }

  @Test
  void bakeTimeAtTemperatureMatchesTheSeriesSolution() throws IOException {
    Path part = wetSheet();
    double kelvin = 400;
    BakeSearch.Result r =
        BakeSearch.search(
            part,
            new BakeSearch.Oven(kelvin, 0, 0, 1e6),
            new BakeSearch.Target("group", "body", 0.1),
            1e-3,
            LawResolver.none(),
            dir);
    assertTrue(r.met());
    double d = new Arrhenius(1e-4, 40000).at(kelvin);
    // centre of a sheet desorbing from c = 1 with both faces at 0: c/c0 = (4/π)·exp(−π² D t/L²)
    // once higher terms have died out (Crank, The Mathematics of Diffusion, eq. 4.17)
    double expected = -Math.log(0.1 * Math.PI / 4) / (Math.PI * Math.PI) * 1e-6 / d;
    assertEquals(expected, r.time(), 0.01 * expected);
    assertTrue(r.lowerBound() < r.time() && r.time() - r.lowerBound() <= 2e-3 * r.time());
    assertTrue(r.runs() > 1);
    try (var left = Files.list(dir)) {
      assertEquals(2, left.count(), "trial runs are cleaned up");
    }
  }

  @Test
  void aTargetOutOfReachSaysSo() throws IOException {
    Path part = wetSheet();
    BakeSearch.Result r =
        BakeSearch.search(
            part,
            new BakeSearch.Oven(300, 0, 0, 10),
            new BakeSearch.Target("group", "body", 0.1),
            1e-3,
            LawResolver.none(),
            dir);
    assertFalse(r.met());
  }
}
