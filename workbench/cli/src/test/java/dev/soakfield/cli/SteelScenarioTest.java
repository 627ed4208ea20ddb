package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The steel scenario of the samples (demonstration data of our own) runs as the README walks
 * through it: the tube's permeation against the steady flux through a hollow cylinder, and the
 * plate's charge and TDS ramp with one peak per trap type.
 */
class SteelScenarioTest {
  @TempDir Path dir;

  private static final double R = 8.314462618; // J/(mol·K), CODATA 2018

  private Path sample(String name) throws IOException {
    try (InputStream in = SteelScenarioTest.class.getResourceAsStream("/samples/" + name)) {
      assertTrue(in != null, name + " on the class path");
      Files.copy(in, dir.resolve(name));
    }
    return dir.resolve(name);
  }

  @Test
  void theTubePassesTheSteadyFluxOfAHollowCylinder() throws IOException {
    sample("steel-pipe-h2.msh");
    Path kase = sample("steel-pipe-h2.case.json");
    CliRun r =
        CliRun.of("run", kase.toString(), "--out", dir.resolve("pipe").toString(), "--quiet");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    JsonNode outer =
        new ObjectMapper()
            .readTree(dir.resolve("pipe").resolve("summary.json").toFile())
            .path("permeation")
            .path("outer");
    // the bore's concentration: Sieverts' law on the fugacity of 10 MPa hydrogen at 293.15 K,
    // Abel–Noble f = p·exp(b·p/(R·T)), b = 15.84 cm³/mol (from memory)
    double t = 293.15;
    double f = 10e6 * Math.exp(15.84e-6 * 10e6 / (R * t));
    double c0 = 19 * Math.exp(-28.6e3 / (R * t)) * Math.sqrt(f);
    double d = 7.23e-8 * Math.exp(-5.69e3 / (R * t));
    // steady state through a hollow cylinder, outer face: J = D·c0/(r_o·ln(r_o/r_i)) (Crank, The
    // Mathematics of Diffusion, 2nd ed., §5.2, steady state in a cylinder: a logarithmic profile)
    double j = d * c0 / (0.014 * Math.log(14.0 / 10));
    assertEquals(j, outer.path("steady_flux").asDouble(), 0.01 * j);
    assertTrue(outer.path("time_lag").asDouble() > 0 && outer.path("breakthrough").asDouble() > 0);
    String report = Files.readString(dir.resolve("pipe").resolve("report.md"));
    assertTrue(report.contains("| dislocations | body |") && report.contains("## Permeation"));
  }

  @Test
  void thePlateChargedAndRampedShowsOnePeakPerTrapType() throws IOException {
    sample("steel-plate.msh");
    Path charge = sample("steel-plate-charge.case.json");
    Path tds = sample("steel-plate-tds.case.json");
    Path charged = dir.resolve("plate-charged");
    CliRun c = CliRun.of("run", charge.toString(), "--out", charged.toString(), "--quiet");
    assertEquals(ExitCodes.OK, c.exitCode(), c.err());
    CliRun r =
        CliRun.of(
            "tds",
            tds.toString(),
            "--from",
            charged.toString(),
            "--rest",
            "30min",
            "--rate",
            "10K/min",
            "--to",
            "800K",
            "--out",
            dir.resolve("plate-tds").toString(),
            "--json");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    JsonNode run = new ObjectMapper().readTree(r.out()).path("runs").get(0);
    JsonNode peaks = run.path("peaks");
    assertEquals(2, peaks.size(), run.toString());
    // the first-order peak temperatures of the two release energies, from Kissinger's peak
    // condition β·E/(R·T²) = ν·exp(−E/(R·T)) (Kissinger, Anal. Chem. 29 (1957) 1702): 339.3 K
    // and 496.5 K; retrapping and the way out through 1 mm of steel can only delay them
    double first = KissingerPeak.of(10.0 / 60, 40e3, 1e4);
    double second = KissingerPeak.of(10.0 / 60, 60e3, 1e4);
    double p1 = peaks.get(0).path("temperature").asDouble();
    double p2 = peaks.get(1).path("temperature").asDouble();
    assertTrue(p1 > first && p1 < first + 10, "dislocation peak " + p1 + " K against " + first);
    assertTrue(p2 > second && p2 < second + 10, "carbide peak " + p2 + " K against " + second);
    double charged0 = run.path("charged").asDouble();
    assertEquals(
        charged0,
        run.path("desorbed").asDouble() + run.path("remaining").asDouble(),
        1e-8 * charged0);
  }

  /** The first-order peak temperature at heating rate beta (K/s), by bisection. */
  private static final class KissingerPeak {
    static double of(double beta, double energy, double nu) {
      double lo = 100;
      double hi = 3000;
      for (int i = 0; i < 200; i++) {
        double t = 0.5 * (lo + hi);
        if (nu * Math.exp(-energy / (R * t)) > beta * energy / (R * t * t)) {
          hi = t;
        } else {
          lo = t;
        }
      }
      return 0.5 * (lo + hi);
    }
  }
}
