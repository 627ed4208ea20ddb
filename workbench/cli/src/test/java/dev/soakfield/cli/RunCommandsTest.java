package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.sweep.SweepFile;
import dev.soakfield.fem.sweep.SweepPlan;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RunCommandsTest {
  @TempDir Path dir;

  @Test
  void demoRunsTheBundledCaseAndClosesItsBalance() throws Exception {
    CliRun r = CliRun.of("demo", "--out", dir.resolve("demo").toString());
    assertEquals(0, r.exitCode(), r.err());
    assertTrue(r.out().contains("results in"), r.out());
    assertTrue(r.out().contains("caution:"), r.out());
    Path results = dir.resolve("demo/results");
    JsonNode summary = new ObjectMapper().readTree(results.resolve("summary.json").toFile());
    // conservation is exact for linear elements up to solver round-off (common practice: 1e-10)
    assertTrue(summary.get("balance").get("relative").asDouble() < 1e-10, summary.toString());
    assertTrue(Files.readAllLines(results.resolve("series.csv")).size() > 10);
    // the sweep scenario beside it reads against the copied base case: 2 temperatures x 6 lots
    SweepPlan sweep = SweepPlan.of(SweepFile.read(dir.resolve("demo/case/sensor-pod-sweep.json")));
    assertEquals(12, sweep.cases().size());
  }

  @Test
  void aMisspelledKeyIsBadInputWithItsLine() throws Exception {
    Path mesh = dir.resolve("b.msh");
    assertEquals(
        0,
        CliRun.of("mesh", "box", "--size", "1,1,1", "--cells", "2,2,2", "--out", mesh.toString())
            .exitCode());
    Path c =
        Files.writeString(
            dir.resolve("c.json"),
            """
            { "mesh": "b.msh",
              "materials": { "body": { "difusivity": 1e-9 } },
              "time": { "end": 10 } }
            """);
    CliRun r = CliRun.of("run", c.toString(), "--out", dir.resolve("out").toString());
    assertEquals(ExitCodes.BAD_INPUT, r.exitCode());
    assertTrue(r.err().contains("line 2"), r.err());
    assertTrue(r.err().contains("diffusivity"), r.err());
    assertFalse(r.err().contains("at dev.soakfield"), r.err());
    assertFalse(Files.exists(dir.resolve("out")));
  }

  @Test
  void verifyPassesEveryCheck() {
    CliRun r = CliRun.of("verify");
    assertEquals(0, r.exitCode(), r.out());
    assertTrue(r.out().contains("Crank (1975)"), r.out());
    // every case of Verification.all(): published solutions, conservation (the run's own and
    // the gradient flux), the maximum principle and its control, orders in space (round parts,
    // manufactured) and time, adaptive steps, the damped start, the accuracy estimates (41: space
    // 21, threshold parts 16, time 4)
    assertTrue(r.out().contains("102 passed, 0 failed"), r.out());
    assertTrue(r.out().contains("Crank-Nicolson (damped start), time order"), r.out());
    assertTrue(r.out().contains("adaptive steps: order of the error in the tolerance"), r.out());
    assertTrue(r.out().contains("estimate/true error"), r.out());
    // the observed orders beside the expected ones: sphere and finite cylinder, linear and
    // quadratic, L² and H¹
    assertTrue(r.out().contains("observed  expected  allowed"), r.out());
    // quadratic, L² and H¹: 8 orders, each a row of the table and a line of the orders' list
    assertEquals(
        16,
        r.out()
            .lines()
            .filter(l -> l.contains("jittered, L2 order") || l.contains("jittered, H1 order"))
            .count(),
        r.out());
  }
}
