package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.run.RunOptions;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A whole analysis through app's services, as the command line and the window run it. */
class CaseRunTest {
  @TempDir Path dir;

  /** A sealed 1 mm cube with S = 2 and a uniform start: nothing enters, nothing leaves. */
  private Path sealedCube() throws IOException {
    MshWriter.write(
        dir.resolve("cube.msh"), StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1), false);
    return Files.writeString(
        dir.resolve("cube.json"),
        """
        { "mesh": "cube.msh",
          "materials": { "body": { "diffusivity": 1e-10, "solubility": 2.0 } },
          "faces": { "xmin": { "kind": "sealed" }, "xmax": { "kind": "sealed" },
                     "ymin": { "kind": "sealed" }, "ymax": { "kind": "sealed" },
                     "zmin": { "kind": "sealed" }, "zmax": { "kind": "sealed" } },
          "initial": 0.5,
          "time": { "end": 100, "step": 10 } }
        """);
  }

  @Test
  void aRunGetsItsReportAndSaysWhyItHasNoPicturesWithoutARenderer() throws IOException {
    Path out = dir.resolve("out");
    CaseRun.Outcome o = CaseRun.run(sealedCube(), out, RunProgress.SILENT, RunOptions.defaults());
    assertEquals(10, o.summary().steps());
    assertTrue(o.noPictures().isPresent(), "app's tests have no renderer on the class path");
    assertTrue(Files.isRegularFile(out.resolve("report.html")));
    // amount = c·V = 0.5 · 1e-9 m³ (the case's initial value is a concentration), kept by the
    // sealed faces (exact geometry and conservation)
    Series s = Series.read(out.resolve("series.csv"));
    assertEquals(5e-10, s.last("amount"), 1e-21);
  }

  @Test
  void theStepMatrixOfASealedBodySumsToItsCapacity() throws IOException {
    Path out = dir.resolve("out");
    CaseRun.run(sealedCube(), out, RunProgress.SILENT, RunOptions.defaults());
    Path mtx = dir.resolve("step.mtx");
    String said =
        StepMatrixExport.write(
            out, Series.read(out.resolve("series.csv")), OptionalDouble.empty(), mtx);
    assertTrue(said.contains("27 x 27 matrix of step 1"), said);
    // 1ᵀ(M + θ·dt·K)1 = 1ᵀM1 = ∫S dV = 2 · 1e-9 m³: the stiffness annihilates constants
    // (common practice: the row sums of a conforming stiffness matrix vanish)
    double total = 0;
    List<String> lines = Files.readAllLines(mtx);
    boolean sizeSeen = false;
    for (String line : lines) {
      if (line.startsWith("%")) {
        continue;
      }
      String[] f = line.trim().split("\\s+", -1);
      if (!sizeSeen) {
        sizeSeen = true;
        continue;
      }
      double v = Double.parseDouble(f[2]);
      total += f[0].equals(f[1]) ? v : 2 * v; // lower triangle of a symmetric matrix
    }
    assertEquals(2e-9, total, 1e-20);
    assertThrows(
        ResultFolderException.class,
        () ->
            StepMatrixExport.write(
                out,
                Series.read(out.resolve("series.csv")),
                OptionalDouble.of(1e6),
                dir.resolve("late.mtx")));
  }
}
