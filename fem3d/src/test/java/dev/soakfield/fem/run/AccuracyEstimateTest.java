package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every run states its accuracy: summary.json's {@code accuracy} (uptake and probes relative,
 * threshold times in seconds) must bracket the true error within a factor of 3. The truth: a plane
 * sheet 1 mm thick held at c = 1 on both faces, D = 1e-10 m²/s (L²/D = 1e4 s), against Crank, The
 * Mathematics of Diffusion, 2nd ed. (1975): eq. 4.18 for the uptake, eq. 4.17 for c at a point
 * (here a probe a quarter of the thickness in) and, by bisection on it, the time c there reaches
 * 0.3.
 */
class AccuracyEstimateTest {
  @TempDir Path dir;

  private static double uptake(double tau) {
    double s = 0;
    for (int n = 0; n < 4000; n++) {
      double k = (2 * n + 1) * Math.PI;
      s += 8 / (k * k) * Math.exp(-k * k * tau);
    }
    return 1 - s;
  }

  /** Eq. 4.17 at distance x from the centre of the sheet of half-thickness 0.5 (units of L). */
  private static double concentration(double x, double tau) {
    double s = 0;
    for (int n = 0; n < 4000; n++) {
      int k = 2 * n + 1;
      s +=
          (n % 2 == 0 ? 1 : -1)
              / (double) k
              * Math.exp(-k * k * Math.PI * Math.PI * tau)
              * Math.cos(k * Math.PI * x);
    }
    return 1 - 4 / Math.PI * s;
  }

  private static double crossing(double x, double level) {
    double lo = 1e-9;
    double hi = 1;
    for (int i = 0; i < 200; i++) {
      double m = 0.5 * (lo + hi);
      if (concentration(x, m) < level) {
        lo = m;
      } else {
        hi = m;
      }
    }
    return 0.5 * (lo + hi);
  }

  private record Outcome(JsonNode summary, Series series, Path folder) {}

  private Outcome run(String name, int cells, int order, double tauEnd, String step, double level)
      throws IOException {
    Path d = Files.createDirectories(dir.resolve(name));
    MshWriter.write(
        d.resolve("s.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, cells, 1, 1, order), false);
    Files.writeString(
        d.resolve("c.json"),
        """
        { "mesh": "s.msh", "materials": { "body": { "diffusivity": 1e-10 } },
          "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                     "xmax": { "kind": "concentration", "value": 1.0 } },
          "initial": 0.0,
          "time": { "end": %s, "outputs": [%s], %s },
          "probes": { "quarter": [0.00025, 0.00005, 0.00005] },
          "thresholds": [ { "name": "quarter at 0.3", "level": 0.3, "where": "quarter" } ],
          "accuracy": %s }
        """
            .formatted(tauEnd * 1e4, tauEnd * 1e3, step, level));
    RunPipeline.run(d.resolve("c.json"), d.resolve("out"), RunProgress.SILENT);
    JsonNode s = new ObjectMapper().readTree(d.resolve("out/summary.json").toFile());
    return new Outcome(s, Series.read(d.resolve("out/series.csv")), d.resolve("out"));
  }

  private static void assertBrackets(double estimate, double truth, String what) {
    double ratio = estimate / truth;
    assertTrue(ratio >= 1.0 / 3 && ratio <= 3, what + ": estimate " + estimate + ", true " + truth);
  }

  /** Uptake and probe at the end, and the threshold time when crossed. */
  private static void assertBracketsAll(Outcome o, double tauEnd) {
    JsonNode a = o.summary().get("accuracy");
    double vol = 1e-3 * 1e-4 * 1e-4;
    double exact = uptake(tauEnd);
    double trueUptake = Math.abs(o.series().last("amount") / vol - exact) / exact;
    assertBrackets(a.get("amount").asDouble(), trueUptake, "uptake");
    double c = concentration(0.25, tauEnd);
    double trueProbe = Math.abs(o.series().last("probe:quarter") - c) / c;
    assertBrackets(a.get("probes").get("quarter").asDouble(), trueProbe, "probe");
    JsonNode when = o.summary().get("thresholds").get(0).get("time");
    if (!when.isNull()) {
      double exactTime = crossing(0.25, 0.3) * 1e4;
      assertBrackets(
          a.get("thresholds").get("quarter at 0.3").asDouble(),
          Math.abs(when.asDouble() - exactTime),
          "threshold time");
    }
  }

  @Test
  void aCoarseMeshWhoseFirstLayerFillsAtOnceSaysSoAndWarns() throws IOException {
    // 10 linear cells, D t/L² = 0.02 (√(Dt) = 0.14 mm against cells of 0.1 mm): the uptake is
    // about 5 % high (measured), the estimate about 8 %
    Outcome o = run("coarse", 10, 1, 0.02, "\"tolerance\": 1e-3", 0.01);
    assertBracketsAll(o, 0.02);
    assertTrue(
        o.summary().get("warnings").toString().contains("accuracy: the uptake's estimated"),
        o.summary().get("warnings").toString());
    // the frames say where: the first output's largest indicator lies next to a held face
    StoredRun r = StoredRun.open(o.folder());
    double[] e = r.frame(1).cellField("error_indicator");
    TetMesh mesh = r.mesh();
    int worst = 0;
    for (int t = 0; t < e.length; t++) {
      worst = e[t] > e[worst] ? t : worst;
    }
    double x = 0;
    for (int k = 0; k < 4; k++) {
      x += mesh.coord(mesh.tetNode(worst, k), 0) / 4;
    }
    assertTrue(x < 1e-4 || x > 9e-4, "largest indicator at x = " + x);
  }

  @Test
  void estimatesBracketTheTrueErrorsForOtherMeshesAndSteps() throws IOException {
    // quadratic elements with adaptive steps; fine linear elements with fixed steps of 10 s
    assertBracketsAll(run("quadratic", 10, 2, 0.1, "\"tolerance\": 1e-4", 0.5), 0.1);
    assertBracketsAll(run("fixed", 40, 1, 0.1, "\"step\": 10", 0.5), 0.1);
  }

  @Test
  void noWarningBelowTheCasesLevelAndTheEstimateFollowsTheMesh() throws IOException {
    Outcome coarse = run("loose", 10, 1, 0.02, "\"tolerance\": 1e-3", 0.2);
    assertFalse(coarse.summary().get("warnings").toString().contains("accuracy:"));
    // negative control of the bracket: the coarse run's estimate does not bracket the error of a
    // run on four times finer cells, so an estimate blind to the mesh would fail the checks above
    Outcome fine = run("finer", 40, 1, 0.02, "\"tolerance\": 1e-3", 0.2);
    double vol = 1e-3 * 1e-4 * 1e-4;
    double exact = uptake(0.02);
    double fineError = Math.abs(fine.series().last("amount") / vol - exact) / exact;
    assertTrue(coarse.summary().get("accuracy").get("amount").asDouble() > 3 * fineError);
    assertEquals(
        3, coarse.summary().get("accuracy").size()); // amount, probes, thresholds: the contract
  }
}
