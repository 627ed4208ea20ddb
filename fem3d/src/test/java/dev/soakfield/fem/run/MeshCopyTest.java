package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import dev.soakfield.mesh.msh.MshWriter;
import dev.soakfield.mesh.vtk.VtuEncoding;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * mesh.msh in a result folder is the user's file, byte for byte; what the run did to the mesh
 * (parts taken out, mid-edge nodes added) is redone by whoever reads the folder back, so frames and
 * mesh still fit. The frames' encoding (Float32, Float64, zlib) reads back to the same numbers
 * within the precision chosen.
 */
class MeshCopyTest {
  @TempDir Path dir;

  private Path plate(String insert, String elements) throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"),
        StructuredMesher.layers(
            1e-4, 1e-4, 1, 1, List.of(new Layer("insert", 5e-4, 2), new Layer("skin", 5e-4, 4)), 1),
        false);
    return Files.writeString(
        dir.resolve("plate.json"),
        """
        { "mesh": "plate.msh", %s
          "materials": { "skin": { "diffusivity": 1e-10, "solubility": 1 }, "insert": %s },
          "faces": { "zmax": { "kind": "concentration", "value": 1.0 } },
          "initial": 0,
          "time": { "end": 100, "step": 25, "outputs": [50, 100] } }
        """
            .formatted(elements, insert));
  }

  @Test
  void theCopyIsTheUsersFileAndReadersRebuildTheRunsMesh() throws IOException {
    Path c = plate("{ \"impermeable\": true }", "\"elements\": \"quadratic\",");
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    assertEquals(-1L, Files.mismatch(dir.resolve("plate.msh"), out.resolve("mesh.msh")));
    TetMesh asRun = RunPipeline.prepare(c).mesh();
    // negative control: the run's mesh written anew is another file, so the check above can fail
    Path rewritten = dir.resolve("rewritten.msh");
    MshWriter.write(rewritten, asRun, false);
    assertNotEquals(-1L, Files.mismatch(dir.resolve("plate.msh"), rewritten));
    String summary = Files.readString(out.resolve("summary.json"), StandardCharsets.UTF_8);
    assertTrue(summary.contains("\"removed_parts\" : [ \"insert\" ]"), summary);
    StoredRun r = StoredRun.open(out);
    assertEquals(2, r.mesh().order());
    assertEquals(asRun.nodeCount(), r.mesh().nodeCount());
    assertEquals(asRun.tetCount(), r.mesh().tetCount());
    assertEquals(r.mesh().nodeCount(), r.frame(r.frameCount() - 1).pointCount());
    ModelFromResults m = ModelFromResults.from(out);
    assertEquals(asRun.nodeCount(), m.mesh().nodeCount());
    assertEquals(asRun.tetCount(), m.mesh().tetCount());
  }

  @Test
  void aFolderWhoseCopyIsTheRunsMeshAlreadyStillOpens() throws IOException {
    // folders of earlier versions: mesh.msh is the mesh as run, parts out and promoted
    Path c = plate("{ \"impermeable\": true }", "\"elements\": \"quadratic\",");
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    TetMesh asRun = RunPipeline.prepare(c).mesh();
    MshWriter.write(out.resolve("mesh.msh"), asRun, true);
    StoredRun r = StoredRun.open(out);
    assertEquals(asRun.nodeCount(), r.mesh().nodeCount());
    assertEquals(asRun.tetCount(), r.mesh().tetCount());
  }

  @Test
  void compressedAndSinglePrecisionFramesHoldTheDoubleRunsNumbers() throws IOException {
    Path c = plate("{ \"diffusivity\": 1e-11 }", "");
    Path wide = dir.resolve("wide");
    Path zip = dir.resolve("zip");
    RunPipeline.run(
        c,
        wide,
        RunProgress.SILENT,
        RunOptions.defaults().withFrameEncoding(VtuEncoding.DEFAULT.withDoubleFields(true)));
    RunPipeline.run(
        c,
        zip,
        RunProgress.SILENT,
        RunOptions.defaults().withFrameEncoding(VtuEncoding.DEFAULT.withZlib(true)));
    String frame = Files.readString(zip.resolve("fields/c_0001.vtu"), StandardCharsets.UTF_8);
    assertTrue(frame.contains("compressor=\"vtkZLibDataCompressor\""));
    assertTrue(frame.contains("<DataArray type=\"Float32\" Name=\"c\""));
    StoredRun a = StoredRun.open(wide);
    StoredRun b = StoredRun.open(zip);
    assertEquals(a.frameCount(), b.frameCount());
    int last = a.frameCount() - 1;
    double[] ca = a.field(last, "c");
    double[] cb = b.field(last, "c");
    double worst = 0;
    double moved = 0;
    for (int i = 0; i < ca.length; i++) {
      // binary32 rounds to nearest: relative error at most 2^-24 (IEEE 754, unit roundoff)
      assertEquals(ca[i], cb[i], Math.abs(ca[i]) * 0x1p-24, "node " + i);
      worst = Math.max(worst, Math.abs(ca[i] - cb[i]));
      moved = Math.max(moved, Math.abs(ca[i]));
    }
    assertTrue(moved > 0.1, "the field is not all zero, so the comparison means something");
    assertTrue(worst > 0, "negative control: Float32 does round some values");
  }
}
