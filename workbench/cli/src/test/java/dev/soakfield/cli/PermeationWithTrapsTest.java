package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The time lag of a membrane with traps in local equilibrium. In the dilute limit of Oriani (Acta
 * Metall. 18 (1970) 147) the traps hold c_T = k·c with k = (N_T/N_L)·exp(E_b/(R·T)), so the lattice
 * concentration diffuses with D_eff = D/(1 + k) and the time lag of Crank, The Mathematics of
 * Diffusion, 2nd ed., eq. 4.24a becomes L²/(6·D_eff); the steady flux D·c0/L is the trap-free one.
 */
class PermeationWithTrapsTest {
  @TempDir Path dir;

  private static final double R = 8.314462618; // J/(mol·K), CODATA 2018
  private static final double L = 1e-3;
  private static final double D = 1e-9;
  private static final double C0 = 1e15; // per m³: dilute, c/N_L·exp(E_b/RT) ~ 3e-10

  private JsonNode permeation(String name, String source) throws Exception {
    Path kase =
        Files.writeString(
            dir.resolve(name + ".json"),
            """
            { "mesh": "membrane.msh", "temperature": 300,
              "materials": { "body": { "diffusivity": %s %s } },
              "faces": { "xmin": { "kind": "concentration", "value": %s },
                         "xmax": { "kind": "concentration", "value": 0 } },
              "time": { "end": 11000, "step": 5 } }
            """
                .formatted(D, source, C0));
    CliRun r = CliRun.of("run", kase.toString(), "--out", dir.resolve(name).toString(), "--quiet");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    JsonNode p = new ObjectMapper().readTree(dir.resolve(name).resolve("summary.json").toFile());
    String report = Files.readString(dir.resolve(name).resolve("report.md"));
    assertTrue(report.contains("## Permeation") && report.contains("| xmax | exit"), report);
    return p.path("permeation").path("xmax");
  }

  @Test
  void equilibriumTrapsLengthenTheTimeLagByOneAndTheTrapSlope() throws Exception {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            "1e-3,1e-4,1e-4",
            "--cells",
            "40,1,1",
            "--out",
            dir.resolve("membrane.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
    double k = Double.parseDouble("1e25") / 5.1e29 * Math.exp(30e3 / (R * 300));
    assertTrue(k > 3, "a trap slope that matters: " + k);
    JsonNode exit =
        permeation(
            "trapped",
            """
            , "source": { "law": "trap-equilibrium", "trap-density": "1e25",
                          "lattice-density": 5.1e29, "binding-energy": "30 kJ/mol" }""");
    double lag = L * L * (1 + k) / (6 * D);
    assertEquals(lag, exit.path("time_lag").asDouble(), 0.01 * lag);
    double flux = D * C0 / L;
    assertEquals(flux, exit.path("steady_flux").asDouble(), 0.01 * flux);
    // negative control: the trap-free time lag L²/(6·D) lies far outside the 1 % band
    assertTrue(Math.abs(L * L / (6 * D) - exit.path("time_lag").asDouble()) > 0.01 * lag);
  }
}
