package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A damp-heat soak at 85 °C, then a dry bake at 125 °C started from its final state. Under Henry's
 * law the solubility falls with temperature (ΔH < 0), so carrying the potential over would change
 * the amount by S(125 °C)/S(85 °C); the restart must carry the concentration (conservation), and
 * the chain must equal one run through the same history.
 */
class RestartAcrossTemperatureTest {
  private static final String MATERIAL =
      """
      "materials": { "body": { "diffusivity": { "D0": "4.7e-6 m^2/s", "Q": "42 kJ/mol" },
                               "solubility": { "S0": 4e-10, "dH": "-38 kJ/mol" } } },
      "faces": { "xmin": { "kind": "ambient" }, "xmax": { "kind": "ambient" } },
      """;
  private static final String SOAK =
      "{ \"duration\": \"24 h\", \"temperature\": \"85 degC\", \"humidity\": 0.85 }";
  private static final String BAKE =
      "{ \"duration\": \"10 h\", \"temperature\": \"125 degC\", \"humidity\": 0 }";

  @TempDir Path dir;

  private Path write(String name, String exposure, String initial) throws IOException {
    return Files.writeString(
        dir.resolve(name),
        """
        { "mesh": "sheet.msh", "law": "henry", %s
          "exposure": [ %s ],
          "initial": %s,
          "time": { "step": 600, "capacity": "lumped" } }
        """
            .formatted(MATERIAL, exposure, initial));
  }

  private JsonNode summary(String run) throws IOException {
    return new ObjectMapper().readTree(dir.resolve(run).resolve("summary.json").toFile());
  }

  @Test
  void theBakeStartsWithTheSoaksAmountAndTheChainEqualsOneRun() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
    RunPipeline.run(write("soak.json", SOAK, "0"), dir.resolve("soak"), RunProgress.SILENT);
    RunSummary bake =
        RunPipeline.run(
            write("bake.json", BAKE, "{ \"from\": \"soak\" }"),
            dir.resolve("bake"),
            RunProgress.SILENT);
    RunPipeline.run(
        write("both.json", SOAK + ", " + BAKE, "0"), dir.resolve("both"), RunProgress.SILENT);
    Series soak = Series.read(dir.resolve("soak/series.csv"));
    Series baked = Series.read(dir.resolve("bake/series.csv"));
    Series both = Series.read(dir.resolve("both/series.csv"));
    double soaked = soak.last("amount");
    assertTrue(soaked > 0);
    // conservation across the restart: the bake starts (before its dry faces empty their nodes)
    // with the amount the soak ended with
    double soakEnd = summary("soak").path("balance").path("amount_end").asDouble();
    double bakeStart = summary("bake").path("balance").path("amount_start").asDouble();
    assertEquals(soaked, soakEnd, 1e-12 * soaked);
    assertEquals(soakEnd, bakeStart, 1e-10 * soakEnd);
    // the check has teeth: the potential the bake starts from (its first frame, inside the
    // sheet) differs from the one the soak ended with by far more than 1e-10, so carrying the
    // potential over would have changed the amount beyond the check's tolerance
    double[] soakPhi = StateFile.read(dir.resolve("soak").resolve(StateFile.NAME)).phi();
    StoredRun bakeRun = StoredRun.open(dir.resolve("bake"));
    double[] bakePhi = bakeRun.field(0, "phi");
    int inside = 0;
    for (int i = 0; i < soakPhi.length; i++) {
      double x = bakeRun.mesh().coord(i, 0);
      if (x > 1e-5 && x < 1e-3 - 1e-5) {
        assertTrue(Math.abs(bakePhi[i] / soakPhi[i] - 1) > 0.5, "node " + i);
        inside++;
      }
    }
    assertTrue(inside > 0);
    // the chain and one run through the same history agree (same steps, same jump handling)
    assertEquals(both.last("amount"), baked.last("amount"), 1e-6 * soaked);
    // the restart across temperature is said where the user reads
    assertTrue(
        bake.warnings().stream().anyMatch(w -> w.contains("358.15 K") && w.contains("398.15 K")),
        bake.warnings().toString());
    // the humidity steps from 0.85 to 0 at the restart, and the run says so: the ambient potential
    // falls from RH·p_sat(85 °C) ≈ 0.85 · 57.87 kPa (IAPWS-IF97, from memory to 4 digits) to 0
    String step =
        bake.warnings().stream()
            .filter(w -> w.contains("ambient potential"))
            .findFirst()
            .orElseThrow(() -> new AssertionError(bake.warnings().toString()));
    assertTrue(step.contains("4.919e+04") && step.contains("under 0 Pa"), step);
  }
}
