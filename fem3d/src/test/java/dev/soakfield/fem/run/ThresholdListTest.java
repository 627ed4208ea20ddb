package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.fit.PlaneSheetUptake;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Thresholds both ways on a plane sheet of thickness L = 1 mm (both faces held), checked against
 * Crank, The Mathematics of Diffusion (2nd ed., 1975): the mean follows eq. 4.18 (M_t/M_∞), the
 * centre eq. 4.17 at x = 0: c/c₀ = (4/π) Σ (−1)ⁿ/(2n+1) exp(−D (2n+1)² π² t / L²) for drying.
 */
class ThresholdListTest {
  private static final double D = 1e-10;
  private static final double L = 1e-3;

  @TempDir Path dir;

  private Map<String, JsonNode> run(double start, double face, String thresholds)
      throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(L, 1e-5, 1e-5, 50, 1, 1, 1), false);
    Path c =
        Files.writeString(
            dir.resolve("sheet.json"),
            """
            { "mesh": "sheet.msh", "units": { "concentration": "mol/m^3" },
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": %s },
                         "xmax": { "kind": "concentration", "value": %s } },
              "initial": %s,
              "probes": { "centre": [5e-4, 5e-6, 5e-6] },
              "thresholds": [ %s ],
              "time": { "end": 2000, "step": 1, "scheme": "crank-nicolson" } }
            """
                .formatted(face, face, start, thresholds));
    RunPipeline.run(c, dir.resolve("out"), RunProgress.SILENT);
    JsonNode summary = new ObjectMapper().readTree(dir.resolve("out/summary.json").toFile());
    Map<String, JsonNode> byName = new HashMap<>();
    summary.path("thresholds").forEach(t -> byName.put(t.path("name").asText(), t));
    return byName;
  }

  /** Centre of a drying sheet over its start value (Crank eq. 4.17 at x = 0). */
  private static double centreDrying(double t) {
    double sum = 0;
    for (int n = 0; n < 200; n++) {
      int k = 2 * n + 1;
      sum +=
          (n % 2 == 0 ? 1 : -1)
              / (double) k
              * Math.exp(-D * k * k * Math.PI * Math.PI * t / (L * L));
    }
    return 4 / Math.PI * sum;
  }

  private static double meanHalfTime() {
    return new BrentSolver(1e-12).solve(200, tau -> PlaneSheetUptake.fraction(tau) - 0.5, 1e-4, 1)
        * L
        * L
        / D;
  }

  @Test
  void dryingIsTimedOnTheMeanAndTheCentreFallingBelowTheirLevels() throws IOException {
    Map<String, JsonNode> t =
        run(
            1,
            0,
            """
            {"name": "half dry", "level": 0.5, "where": "mean:body", "when": "falls"},
            {"name": "core dry", "level": 0.5, "where": "body", "when": "falls"},
            {"name": "probe dry", "level": 0.5, "where": "centre", "when": "falls"},
            {"name": "never", "level": 1e-9, "where": "mean:body", "when": "falls"}
            """);
    double half = meanHalfTime();
    assertEquals(492, half, 1); // τ½ = 0.0492 (Crank 1975, §4.3.1)
    assertEquals(half, t.get("half dry").path("time").asDouble(), 0.01 * half);
    double core = new BrentSolver(1e-9).solve(200, s -> centreDrying(s) - 0.5, 10, 2000);
    assertEquals(core, t.get("core dry").path("time").asDouble(), 0.01 * core);
    assertEquals(core, t.get("probe dry").path("time").asDouble(), 0.01 * core);
    // negative control: a level the run never reaches has no time
    assertTrue(t.get("never").path("time").isNull(), t.get("never").toString());
    assertEquals("falls", t.get("half dry").path("when").asText());
    assertEquals("mol/m^3", t.get("half dry").path("unit").asText());
  }

  @Test
  void uptakeIsTimedRisingAndTheHeldFacesDoNotCount() throws IOException {
    Map<String, JsonNode> t =
        run(
            0,
            1,
            """
            {"name": "half full", "level": 0.5, "where": "mean:body"},
            {"name": "core wet", "level": 0.5, "where": "centre", "when": "rises"},
            {"name": "anywhere", "level": 0.7, "where": "body", "when": "rises"}
            """);
    double half = meanHalfTime();
    assertEquals(half, t.get("half full").path("time").asDouble(), 0.01 * half);
    double core = new BrentSolver(1e-9).solve(200, s -> centreDrying(s) - 0.5, 10, 2000);
    assertEquals(core, t.get("core wet").path("time").asDouble(), 0.01 * core);
    // the faces hold 1 from the start; the first inner node, 20 µm in, reaches 0.7 when
    // erfc(x / (2 √(D t))) = 0.7 (semi-infinite solid, Crank 1975, eq. 2.45), not at t = 0
    double u = org.apache.commons.math3.special.Erf.erfcInv(0.7);
    double inner = Math.pow(20e-6 / (2 * u), 2) / D;
    assertEquals(inner, t.get("anywhere").path("time").asDouble(), 0.3 * inner);
  }

  @Test
  void aThresholdNamesWhatExists() throws IOException {
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () -> run(0, 1, "{\"name\": \"x\", \"level\": 1, \"where\": \"mean:bdy\"}"));
    assertTrue(e.getMessage().contains("thresholds[0].where"), e.getMessage());
    assertTrue(e.getMessage().contains("did you mean 'mean:body'"), e.getMessage());
    CaseInputException w =
        assertThrows(
            CaseInputException.class,
            () ->
                run(
                    0,
                    1,
                    "{\"name\": \"x\", \"level\": 1, \"where\": \"body\", \"when\": \"rise\"}"));
    assertTrue(w.getMessage().contains("thresholds[0].when"), w.getMessage());
  }
}
