package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.ResultFolderException;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.MeshInputException;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A run's folder read back through the one typed view that reports, export and the window use. */
class StoredRunTest {
  @TempDir Path dir;

  /** A sheet 1 mm thick along x at c = 1 on both faces, D = 1e-10 m²/s: L²/D = 1e4 s. */
  private Path run() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 40, 1, 1, 2), false);
    Path c =
        Files.writeString(
            dir.resolve("sheet.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10, "solubility": 1.0 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                         "xmax": { "kind": "concentration", "value": 1.0 } },
              "initial": 0.0,
              "time": { "end": 1000, "outputs": [500, 1000], "step": 2.5 },
              "threshold": 0.5 }
            """);
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    return out;
  }

  @Test
  void framesSeriesAndMeshComeBackAsTheRunWroteThem() throws IOException {
    StoredRun r = StoredRun.open(run());
    assertEquals(3, r.frameCount()); // t = 0 and the two outputs
    assertEquals(500.0, r.time(1));
    assertEquals(2, r.frameNear(990));
    assertEquals(0.5, r.threshold().orElseThrow());
    double[] c = r.field(2, "c");
    assertEquals(r.mesh().nodeCount(), c.length);
    // the faces are held at c = 1; the mid-plane, the lowest point, follows Crank (1975) eq. 4.17
    // at x = 0: c/c_s = 1 − (4/π) Σ (−1)ⁿ/(2n+1) exp(−(2n+1)² π² D t / (4 a²)), a = 0.5 mm
    double tau = 1e-10 * 1000 / (0.5e-3 * 0.5e-3);
    double sum = 0;
    for (int k = 0; k < 20; k++) {
      sum +=
          Math.pow(-1, k)
              / (2 * k + 1)
              * Math.exp(-(2 * k + 1) * (2 * k + 1) * Math.PI * Math.PI * tau / 4);
    }
    double centre = 1 - 4 / Math.PI * sum;
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double v : c) {
      lo = Math.min(lo, v);
      hi = Math.max(hi, v);
    }
    assertEquals(1.0, hi, 1e-12);
    assertEquals(centre, lo, 2e-3, "lowest c"); // 40 linear cells, backward Euler at dt = 2.5 s
    Series s = r.series().orElseThrow();
    assertEquals(1000.0, s.last("time"));
    assertTrue(s.has("amount:body"));
    assertThrows(MeshInputException.class, () -> r.field(0, "no-such-field"));
  }

  @Test
  void theRunsMeshInMemoryIsTakenOnlyWhenTheFramesFitIt() throws IOException {
    Path out = run();
    StoredRun fromDisk = StoredRun.open(out);
    StoredRun given = StoredRun.open(out, fromDisk.mesh());
    assertEquals(fromDisk.frameCount(), given.frameCount());
    org.junit.jupiter.api.Assertions.assertArrayEquals(fromDisk.field(2, "c"), given.field(2, "c"));
    // a mesh of another size is refused, naming the frame file and both sizes
    MeshInputException e =
        assertThrows(
            MeshInputException.class,
            () -> StoredRun.open(out, StructuredMesher.box(1e-3, 1e-4, 1e-4, 4, 1, 1, 1)));
    assertTrue(e.getMessage().contains("c_0000.vtu"), e.getMessage());
    assertTrue(e.getMessage().contains("tetrahedra of the run's mesh in memory"), e.getMessage());
  }

  @Test
  void aBadCellInTheSeriesIsALocatedErrorWhenTheFolderIsOpened() throws IOException {
    Path out = run();
    Path series = out.resolve(ResultFiles.SERIES);
    String text = Files.readString(series);
    int secondRow = text.indexOf('\n', text.indexOf('\n') + 1) + 1;
    Files.writeString(series, text.substring(0, secondRow) + "x" + text.substring(secondRow + 1));
    ResultFolderException e = assertThrows(ResultFolderException.class, () -> StoredRun.open(out));
    assertTrue(e.getMessage().contains("line 3, column 'time'"), e.getMessage());
    assertFalse(e.getMessage().contains("Exception"), e.getMessage());
  }
}
