package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Steady permeation through a membrane whose faces are limited by surface kinetics, against the
 * closed form of surface and bulk resistances in series (standard practice for surface-limited
 * permeation). At steady state one flux J crosses the entry surface, the bulk and the exit surface:
 *
 * <pre>
 *   entry (dissociation − recombination):  J = k_d·p − k_r·c₀²
 *   bulk (Fick, linear profile):           J = D·(c₀ − c_L)/L
 *   exit (recombination into vacuum):      J = k_r·c_L²
 * </pre>
 *
 * so c_L = √(J/k_r), c₀ = c_L + J·L/D and p = (J + k_r·c₀²)/k_d: the pressure that drives a chosen
 * J in closed form. With a cathodic entry J = η·i/F − k_r·c₀² instead, J solves η·i/F = J +
 * k_r·(√(J/k_r) + J·L/D)², monotone in J. The gas pressure here (1 kPa) is so low that the fugacity
 * the law sees differs from it by 6e-6 (Abel–Noble, b·p/(R·T)), far below the tolerance.
 */
class SurfaceKineticsTest {
  @TempDir Path dir;

  private static final double L = 1e-3; // m
  private static final double D = 1e-9; // m²/s
  private static final double KR = 1e-6; // m⁴/(mol·s)
  private static final double KD = 5e-9; // mol/(m²·s·Pa)

  @BeforeEach
  void membrane() {
    CliRun mesh =
        CliRun.of(
            "mesh",
            "box",
            "--size",
            L + ",1e-4,1e-4",
            "--cells",
            "40,1,1",
            "--out",
            dir.resolve("membrane.msh").toString());
    assertEquals(ExitCodes.OK, mesh.exitCode(), mesh.err());
  }

  private JsonNode steady(String name, String entry) throws IOException {
    Path kase =
        Files.writeString(
            dir.resolve(name + ".json"),
            """
            { "mesh": "membrane.msh", "temperature": 300,
              "materials": { "body": { "diffusivity": %s } },
              "faces": { "xmin": %s,
                         "xmax": { "kind": "law", "law": "dissociation-recombination",
                                   "dissociation-rate": %s, "recombination-rate": %s } },
              "time": { "end": 30000, "tolerance": 1e-4 } }
            """
                .formatted(D, entry, KD, KR));
    CliRun r = CliRun.of("run", kase.toString(), "--out", dir.resolve(name).toString(), "--quiet");
    assertEquals(ExitCodes.OK, r.exitCode(), r.err());
    return new ObjectMapper()
        .readTree(dir.resolve(name).resolve("summary.json").toFile())
        .path("permeation");
  }

  @Test
  void bothFacesKineticLimitedGiveTheSeriesResistanceFlux() throws IOException {
    double j = 1e-6; // mol/(m²·s), the flux to drive
    double cL = Math.sqrt(j / KR);
    double c0 = cL + j * L / D;
    double p = (j + KR * c0 * c0) / KD;
    assertEquals(1000, p, 1e-9, "the case's pressure follows from the closed form");
    JsonNode perm =
        steady(
            "gas",
            """
            { "kind": "law", "law": "dissociation-recombination", "pressure": 1000,
              "dissociation-rate": %s, "recombination-rate": %s }"""
                .formatted(KD, KR));
    assertEquals(j, perm.path("xmax").path("steady_flux").asDouble(), 0.005 * j);
    assertEquals(j, perm.path("xmin").path("steady_flux").asDouble(), 0.005 * j);
    // negative control: with the surfaces in equilibrium (Sieverts, c₀ = √(k_d·p/k_r), c_L = 0)
    // the bulk alone would pass D·c₀/L, far outside the band
    double bulkOnly = D * Math.sqrt(KD * p / KR) / L;
    assertTrue(Math.abs(bulkOnly - perm.path("xmax").path("steady_flux").asDouble()) > 0.05 * j);
  }

  @Test
  void aCathodicEntryGivesTheFluxOfItsCurrentLessRecombination() throws IOException {
    double entry = 0.5 * 1.0 / 96485.33212; // η·i/F, η = 0.5, i = 1 A/m² (CODATA 2018 F)
    double lo = 0;
    double hi = entry;
    for (int k = 0; k < 200; k++) {
      double j = 0.5 * (lo + hi);
      double c0 = Math.sqrt(j / KR) + j * L / D;
      if (j + KR * c0 * c0 > entry) {
        hi = j;
      } else {
        lo = j;
      }
    }
    double j = 0.5 * (lo + hi);
    assertTrue(j < 0.9 * entry, "recombination takes back a real share: " + j / entry);
    JsonNode perm =
        steady(
            "cathodic",
            """
            { "kind": "law", "law": "cathodic-charging", "current-density": "0.1 mA/cm^2",
              "efficiency": 0.5, "recombination-rate": %s }"""
                .formatted(KR));
    assertEquals(j, perm.path("xmax").path("steady_flux").asDouble(), 0.005 * j);
  }
}
