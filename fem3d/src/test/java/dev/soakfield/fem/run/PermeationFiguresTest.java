package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import dev.soakfield.fem.results.SummaryFile;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * summary.json's permeation figures of a trap-free membrane of thickness L held at c0 on its entry
 * face and at 0 on its exit face, against Crank, The Mathematics of Diffusion, 2nd ed. (1975),
 * §4.3.2: the outflow Q_t = D·c0·t/L − L·c0/6 − (2·L·c0/π²)·Σ (−1)ⁿ/n²·exp(−D·n²·π²·t/L²) (eq.
 * 4.24a), so the steady flux is D·c0/L and the time lag L²/(6·D); the outflow rate is (D·c0/L)·(1 +
 * 2·Σ (−1)ⁿ·exp(−D·n²·π²·t/L²)) (its derivative), whose first reaching of 10 % is the breakthrough
 * time.
 */
class PermeationFiguresTest {
  private static final double L = 1e-3; // m
  private static final double D = 1e-9; // m²/s
  private static final double C0 = 2.0;

  @TempDir Path dir;

  @BeforeEach
  void mesh() throws IOException {
    MshWriter.write(
        dir.resolve("membrane.msh"), StructuredMesher.box(L, 1e-4, 1e-4, 40, 1, 1, 1), false);
  }

  private JsonNode run(String name, double diffusivity, double end, String extra)
      throws IOException {
    Path kase =
        Files.writeString(
            dir.resolve(name + ".json"),
            """
            { "mesh": "membrane.msh",
              "materials": { "body": { "diffusivity": %s } },
              "faces": { "xmin": { "kind": "concentration", "value": %s },
                         "xmax": { "kind": "concentration", "value": 0 } },
              "time": { "end": %s, "step": 0.5 } %s }
            """
                .formatted(diffusivity, C0, end, extra));
    Path out = dir.resolve(name);
    RunPipeline.run(kase, out, RunProgress.SILENT);
    return SummaryFile.readOrMissing(out).path("permeation");
  }

  /** The first time the outflow rate of eq. 4.24a's derivative reaches {@code share}·D·c0/L. */
  private static double crankBreakthrough(double share) {
    double lo = 0;
    double hi = L * L / D;
    for (int k = 0; k < 200; k++) {
      double mid = 0.5 * (lo + hi);
      double sum = 1;
      for (int n = 1; n < 200; n++) {
        sum += 2 * (n % 2 == 0 ? 1 : -1) * Math.exp(-D * n * n * Math.PI * Math.PI * mid / (L * L));
      }
      if (sum >= share) {
        hi = mid;
      } else {
        lo = mid;
      }
    }
    return hi;
  }

  @Test
  void aTrapFreeMembraneHasCranksTimeLagSteadyFluxAndBreakthrough() throws IOException {
    JsonNode p = run("plain", D, 2500, "");
    JsonNode exit = p.path("xmax");
    assertEquals("out", exit.path("direction").asText());
    double lag = L * L / (6 * D); // Crank eq. 4.24a
    assertEquals(lag, exit.path("time_lag").asDouble(), 0.005 * lag);
    double flux = D * C0 / L;
    assertEquals(flux, exit.path("steady_flux").asDouble(), 0.005 * flux);
    double breakthrough = crankBreakthrough(0.1);
    assertEquals(breakthrough, exit.path("breakthrough").asDouble(), 0.02 * breakthrough);
    assertEquals(1e-8, exit.path("area").asDouble(), 1e-20);
    // the entry face: at steady state the membrane holds c0·L/2, so the inflow is the outflow of
    // eq. 4.24a plus c0·L/2 and its intercept lies at −L²/(3·D) (from eq. 4.24a, derived here)
    JsonNode entry = p.path("xmin");
    assertEquals("in", entry.path("direction").asText());
    assertEquals(-2 * lag, entry.path("time_lag").asDouble(), 0.005 * 2 * lag);
    assertEquals(flux, entry.path("steady_flux").asDouble(), 0.005 * flux);
    // breakthrough belongs to the exit face: the entry face's flux starts at its largest
    assertTrue(entry.path("breakthrough").isNull(), entry.toString());
    // sealed faces carry nothing and have no figures
    assertTrue(p.path("ymin").isMissingNode(), p.toString());
  }

  @Test
  void aDiffusivityTwoPercentOffMissesTheTimeLagCheck() throws IOException {
    // negative control of the check above: the 0.5 % band tells a 2 % change of D apart
    JsonNode exit = run("off", 1.02 * D, 2500, "").path("xmax");
    double lag = L * L / (6 * D);
    assertTrue(Math.abs(exit.path("time_lag").asDouble() - lag) > 0.005 * lag);
  }

  @Test
  void aRunStoppedBeforeSteadyStateHasNoSteadyFluxTimeLagOrBreakthrough() throws IOException {
    JsonNode exit =
        run("short", D, 150, ", \"permeation\": {\"breakthrough_share\": 0.05}").path("xmax");
    assertTrue(exit.path("steady_flux").isNull(), exit.toString());
    assertTrue(exit.path("time_lag").isNull());
    assertTrue(exit.path("breakthrough").isNull());
    assertEquals(0.05, exit.path("breakthrough_share").asDouble(), 0);
  }
}
