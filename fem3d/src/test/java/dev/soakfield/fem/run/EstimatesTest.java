package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseReader;
import dev.soakfield.fem.casefile.CaseSpec;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class EstimatesTest {
  @TempDir Path dir;

  @Test
  void theHeapEstimateGrowsWithTetsAndOrderAndRefusesBelowIt() {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 10, 10, 10, 1); // 6000 tets: 6 per cell, exact
    MemoryEstimate linear = MemoryEstimate.of(mesh, 1);
    MemoryEstimate quadratic = MemoryEstimate.of(mesh, 2);
    assertEquals(6000, linear.tets());
    assertEquals((long) (1.25 * ((32L << 20) + 400L * 6000)), linear.bytes());
    assertTrue(quadratic.bytes() > linear.bytes());
    linear.requireHeap(linear.bytes()); // exactly enough passes
    HeapTooSmallException e =
        assertThrows(HeapTooSmallException.class, () -> linear.requireHeap(linear.bytes() - 1));
    assertTrue(e.getMessage().contains("6000 linear tetrahedra"), e.getMessage());
  }

  @Test
  void fixedStepsAreCountedAndAdaptiveStepsGoWithTheDecadesSpanned() throws IOException {
    MshWriter.write(dir.resolve("b.msh"), StructuredMesher.box(1, 1, 1, 2, 2, 2, 1), false);
    String base =
        """
        { "mesh": "b.msh", "materials": { "body": { "diffusivity": 1 } },
          "time": { "end": 1000, "outputs": [500, 1000], %s } }
        """;
    CaseSpec fixed =
        CaseReader.read(Files.writeString(dir.resolve("f.json"), base.formatted("\"step\": 10")));
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 2, 2, 2, 1);
    assertEquals(100 + 2, RunTimeEstimate.of(fixed, mesh).steps());
    // first step 1e-6 of the end: six decades at 18 steps each, plus the two outputs
    CaseSpec adaptive =
        CaseReader.read(
            Files.writeString(dir.resolve("a.json"), base.formatted("\"tolerance\": 1e-3")));
    assertEquals(6 * 18 + 2, RunTimeEstimate.of(adaptive, mesh).steps());
    // a hundred times tighter: ten times the steps per decade
    CaseSpec tight =
        CaseReader.read(
            Files.writeString(dir.resolve("t.json"), base.formatted("\"tolerance\": 1e-5")));
    assertEquals(6 * 180 + 2, RunTimeEstimate.of(tight, mesh).steps());
  }
}
