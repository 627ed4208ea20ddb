package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class BakeCommandTest {
  @TempDir Path dir;

  /** A wet sheet 1 mm thick of our own, D = 1e-4·exp(−40 kJ/mol / RT) m²/s, faces dry. */
  private Path wetSheet() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("part.json"),
        """
        { "mesh": "sheet.msh", "temperature": "25 degC",
          "materials": { "body": { "diffusivity": { "D0": 1e-4, "Q": "40 kJ/mol" } } },
          "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                     "xmax": { "kind": "concentration", "value": 0.0 } },
          "initial": 1.0, "time": { "end": 1 } }
        """);
  }

  @Test
  void jsonGivesTheBakeTimeAndItsCurve() throws IOException {
    Path part = wetSheet();
    CliRun r =
        CliRun.of(
            "bake",
            part.toString(),
            "--temperature",
            "126.85 degC",
            "--target",
            "max:body<0.1",
            "--json");
    assertEquals(0, r.exitCode(), r.err());
    JsonNode j = new ObjectMapper().readTree(r.out());
    assertTrue(j.get("met").asBoolean());
    // Crank, The Mathematics of Diffusion, eq. 4.17 (first term at the centre of the sheet)
    double d = 1e-4 * Math.exp(-40000 / (8.314462618 * 400));
    double expected = -Math.log(0.1 * Math.PI / 4) / (Math.PI * Math.PI) * 1e-6 / d;
    assertEquals(expected, j.get("bake_time").asDouble(), 0.01 * expected);
    assertEquals(400.0, j.get("temperature").asDouble(), 1e-9);
    assertTrue(j.get("curve").get("time").size() > 2);
  }

  @Test
  void aMalformedTargetIsABadInput() throws IOException {
    Path part = wetSheet();
    CliRun r = CliRun.of("bake", part.toString(), "--temperature", "400", "--target", "body<0.1");
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("--target: found 'body<0.1'"), r.err());
    assertFalse(r.err().contains("\tat "), r.err());
  }

  @Test
  void theMeanAndTheWholeAmountAreTargetsToo() throws IOException {
    Path part = wetSheet();
    CliRun mean =
        CliRun.of(
            "bake",
            part.toString(),
            "--temperature",
            "400",
            "--target",
            "mean:body<0.25",
            "--json");
    assertEquals(0, mean.exitCode(), mean.err());
    JsonNode j = new ObjectMapper().readTree(mean.out());
    // the sheet's mean falls to 1/4 at τ = D t / L² where 1 − M_t/M_∞ = 0.25 (Crank eq. 4.18):
    // τ = −ln(0.25 π² / 8) / π² = 0.0213 once the higher terms have died out
    double d = 1e-4 * Math.exp(-40000 / (8.314462618 * 400));
    double expected = -Math.log(0.25 * Math.PI * Math.PI / 8) / (Math.PI * Math.PI) * 1e-6 / d;
    assertEquals(expected, j.get("bake_time").asDouble(), 0.02 * expected);
    assertEquals("c", j.get("unit").asText()); // the case declares no unit
    CliRun amount =
        CliRun.of("bake", part.toString(), "--temperature", "400", "--target", "amount < 2.5e-12");
    assertEquals(0, amount.exitCode(), amount.err());
    assertTrue(amount.out().contains("brings amount < 2.5e-12 [c*m^3]"), amount.out());
    CliRun gain =
        CliRun.of("bake", part.toString(), "--temperature", "400", "--target", "weight_gain<0.1");
    assertEquals(2, gain.exitCode());
    assertTrue(gain.err().contains("without a density"), gain.err());
    assertFalse(gain.err().contains("\tat "), gain.err());
  }

  @Test
  void anUnknownGroupNamesTheChoices() throws IOException {
    Path part = wetSheet();
    CliRun r =
        CliRun.of("bake", part.toString(), "--temperature", "400", "--target", "max:bdy<0.1");
    assertEquals(2, r.exitCode());
    assertTrue(r.err().contains("expected one of body"), r.err());
  }

  @Test
  void aPartWithEquilibriumTrapsBakesAtItsEffectiveDiffusivity() throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, 1), false);
    Path part =
        Files.writeString(
            dir.resolve("trapped.json"),
            """
            { "mesh": "sheet.msh", "temperature": "25 degC",
              "materials": { "body": { "diffusivity": 1e-9,
                "source": { "law": "trap-equilibrium", "trap-density": "1e23",
                            "lattice-density": 5.1e29, "binding-energy": 6e4 } } },
              "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                         "xmax": { "kind": "concentration", "value": 0.0 } },
              "initial": 1.0, "time": { "end": 1 } }
            """);
    CliRun r =
        CliRun.of(
            "bake", part.toString(), "--temperature", "400", "--target", "max:body<0.1", "--json");
    assertEquals(0, r.exitCode(), r.err());
    double bake = new ObjectMapper().readTree(r.out()).get("bake_time").asDouble();
    // Oriani (1970), dilute limit: D_eff = D / (1 + (N_T / N_L) exp(E_b / R T)); the sheet's
    // centre then falls as in Crank's eq. 4.17 with D_eff
    double k = 1 / 5.1e6 * Math.exp(6e4 / (8.314462618 * 400)); // N_T/N_L = 1e23/5.1e29
    double dEff = 1e-9 / (1 + k);
    double expected = -Math.log(0.1 * Math.PI / 4) / (Math.PI * Math.PI) * 1e-6 / dEff;
    assertTrue(k > 5, "traps matter here: K = " + k);
    assertEquals(expected, bake, 0.03 * expected);
  }
}
