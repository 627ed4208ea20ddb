package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ProgressRelayTest {
  @TempDir Path dir;

  @Test
  void progressHearsEveryAcceptedAndRejectedStep() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 2), false);
    // a first step far too long for the tolerance: the controller must reject and retry
    Path c =
        Files.writeString(
            dir.resolve("a.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 } },
              "time": { "end": 2000, "tolerance": 1e-5, "initial_step": 500 } }
            """);
    int[] last = {0, 0};
    double[] time = {0};
    RunSummary s =
        RunPipeline.run(
            c,
            dir.resolve("out"),
            (t, end, steps, rejected) -> {
              assertTrue(steps == last[0] + 1, "one call per accepted step");
              last[0] = steps;
              last[1] = rejected;
              time[0] = t;
              assertEquals(2000, end);
            });
    assertTrue(s.rejectedSteps() > 0, "the case was meant to reject steps");
    assertEquals(s.steps(), last[0]);
    assertEquals(s.rejectedSteps(), last[1]);
    assertEquals(2000, time[0], 1e-9);
  }
}
