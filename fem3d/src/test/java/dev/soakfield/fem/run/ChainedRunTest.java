package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A soak run, then a bake that starts from its final state and stops when the part is dry. */
class ChainedRunTest {
  @TempDir Path dir;

  private void sheet() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
  }

  @Test
  void bakeStartsFromTheSoakAndStopsWhenTheMaximumFallsBelowTheTarget() throws IOException {
    sheet();
    Path soak =
        Files.writeString(
            dir.resolve("soak.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                         "xmax": { "kind": "concentration", "value": 1.0 } },
              "time": { "end": 20000, "step": 100 } }
            """);
    RunPipeline.run(soak, dir.resolve("soak-run"), RunProgress.SILENT);
    StateFile.State soaked = StateFile.read(dir.resolve("soak-run").resolve(StateFile.NAME));
    assertEquals(20000, soaked.time(), 1e-9);
    Path bake =
        Files.writeString(
            dir.resolve("bake.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                         "xmax": { "kind": "concentration", "value": 0.0 } },
              "initial": { "from": "soak-run" },
              "time": { "end": 1e5, "step": 10, "stop": { "group": "body", "below": 0.1 } } }
            """);
    RunPipeline.run(bake, dir.resolve("bake-run"), RunProgress.SILENT);
    JsonNode summary =
        new ObjectMapper().readTree(dir.resolve("bake-run").resolve("summary.json").toFile());
    assertTrue(summary.get("stop").get("met").asBoolean());
    double stopped = summary.get("stop").get("time").asDouble();
    // desorption from a saturated sheet (c = 1 after 20000 s, D t/L² = 2: saturated to 1e-8):
    // the centre falls to 0.1 when 4/π·exp(−π² D t / L²) = 0.1 with L = 1 mm (Crank, The
    // Mathematics of Diffusion, eq. 4.17, first term at the centre), t = 2578 s
    double expected = -Math.log(0.1 * Math.PI / 4) / (Math.PI * Math.PI) * 1e-6 / 1e-10;
    assertEquals(2578, expected, 1);
    assertEquals(expected, stopped, 0.02 * expected);
    assertEquals(stopped, summary.get("solver").get("end_time").asDouble(), 1e-9);
  }

  @Test
  void anInitialStateFromAFolderWithoutAFinishedRunIsAClearError() throws IOException {
    sheet();
    Files.createDirectories(dir.resolve("empty"));
    Path bake =
        Files.writeString(
            dir.resolve("bake.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "initial": { "from": "empty" },
              "time": { "end": 100, "step": 10 } }
            """);
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.run(bake, dir.resolve("out"), RunProgress.SILENT));
    assertTrue(e.getMessage().contains("initial.from"), e.getMessage());
    assertTrue(e.getMessage().contains("no finished run"), e.getMessage());
  }
}
