package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.app.FieldKind;
import dev.soakfield.app.Scene;
import dev.soakfield.app.Study;
import dev.soakfield.app.ViewSettings;
import dev.soakfield.fem.results.StoredRun;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The window and {@code render} colour by the per-element error estimate the frames carry: each
 * surface triangle flat in the value of the tetrahedron it bounds, with the colour range that
 * field's own, so a user sees where a finer mesh would help.
 */
class ErrorIndicatorViewTest {
  @TempDir Path dir;

  @Test
  void theErrorIndicatorIsOfferedAndColoursEachTriangleByItsTetrahedron() throws Exception {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1e-3,1e-3,1e-3",
            "--cells",
            "6,6,6",
            "--out",
            dir.resolve("cube.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
    Path kase =
        Files.writeString(
            dir.resolve("cube.json"),
            """
            { "mesh": "cube.msh",
              "materials": { "body": { "diffusivity": 1e-9 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1 } },
              "initial": 0,
              "time": { "end": 100, "step": 10, "outputs": [20, 100] } }
            """);
    Path out = dir.resolve("out");
    CliRun run = CliRun.of("run", kase.toString(), "--out", out.toString(), "--quiet");
    assertEquals(ExitCodes.OK, run.exitCode(), run.err());

    StoredRun stored = StoredRun.open(out);
    assertTrue(FieldKind.of(stored).contains(FieldKind.ERROR_INDICATOR), "offered in Colour by");
    int frame = 1; // t = 20 s: the front is inside the cube, so the estimate varies
    double[] perTet = stored.cellField(frame, "error_indicator");
    assertEquals(6 * 6 * 6 * 6, perTet.length, "one value per tetrahedron");

    ViewSettings settings = new ViewSettings();
    settings.frame(frame);
    settings.field(Optional.of(FieldKind.parse("error_indicator")));
    Scene scene = new Scene(Study.open(out), settings);
    double lo = Arrays.stream(perTet).min().orElseThrow();
    double hi = Arrays.stream(perTet).max().orElseThrow();
    assertTrue(hi > 2 * lo, "the estimate varies over the cube: " + lo + " .. " + hi);
    assertEquals(lo, scene.low(), 1e-12 * hi, "the colour range is the element values'");
    assertEquals(hi, scene.high(), 1e-12 * hi);

    Scene.Mesh surface = scene.surfaceMesh();
    int flatAndRight = 0;
    int varying = 0;
    for (int t = 0; t < surface.triangleCount(); t++) {
      double expected = (perTet[scene.surface().tet(t)] - lo) / (hi - lo);
      boolean all = true;
      for (int k = 0; k < 3; k++) {
        all &= Math.abs(surface.ramp[3 * t + k] - expected) < 1e-6;
      }
      flatAndRight += all ? 1 : 0;
      varying += expected > 0.05 && expected < 0.95 ? 1 : 0;
    }
    assertEquals(surface.triangleCount(), flatAndRight, "each triangle in its tetrahedron's value");
    assertTrue(varying > 10, "not one colour: " + varying + " triangles inside the range");

    // negative control: coloured by the nodal concentration, the triangles are not flat
    settings.field(Optional.of(FieldKind.CONCENTRATION));
    scene.update();
    int notFlat = 0;
    for (int t = 0; t < scene.surfaceMesh().triangleCount(); t++) {
      float[] r = scene.surfaceMesh().ramp;
      notFlat += r[3 * t] != r[3 * t + 1] || r[3 * t] != r[3 * t + 2] ? 1 : 0;
    }
    assertTrue(notFlat > 10, "a nodal field varies inside triangles: " + notFlat);
  }
}
