package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.special.Erf;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The first time a part reaches the threshold is the first time a node inside it does: the nodes of
 * a face held at c = 1 hold it from the start and say nothing. For a 1 mm sheet held on both faces,
 * the first inner node (25 µm in) reaches 0.5 when erfc(x / (2 √(D t))) = 0.5 (the semi-infinite
 * solid, Crank 1975, eq. 2.45; the other face is 1 mm away and has no effect yet).
 */
class ThresholdArrivalTest {
  @TempDir Path dir;

  @Test
  void theHeldFacesNodesDoNotCountAsArrival() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-5, 1e-5, 40, 1, 1, 1), false);
    Path c =
        Files.writeString(
            dir.resolve("sheet.json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                         "xmax": { "kind": "concentration", "value": 1.0 } },
              "time": { "end": 40, "step": 0.02, "capacity": "lumped" },
              "threshold": 0.5 }
            """);
    RunPipeline.run(c, dir.resolve("out"), RunProgress.SILENT);
    JsonNode summary = new ObjectMapper().readTree(dir.resolve("out/summary.json").toFile());
    double first =
        summary.path("threshold").path("first_time").path("volume_groups").path("body").asDouble();
    // erfc(u) = 0.5 at u = erfcInv(0.5) = 0.476936; t = (x / (2 u))² / D
    double u = Erf.erfcInv(0.5);
    double expected = Math.pow(25e-6 / (2 * u), 2) / 1e-10;
    assertEquals(6.87, expected, 0.01);
    assertTrue(first > 0, "a held face's value is not an arrival: " + first);
    assertEquals(expected, first, 0.3 * expected);
  }
}
