package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.results.ResultUnits;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.gen.StructuredMesher.Layer;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Concentrations in the trade's units. A steel plate soaked to equilibrium holds the face's level
 * everywhere, so its amount and weight gain follow from the level by hand conversion: mass fraction
 * w, density ρ, molar mass M of hydrogen 1.008 g/mol (IUPAC conventional atomic weight): n/V =
 * w·ρ/M. For ml/100 g the gas volume counts H₂ at 0 °C and 101.325 kPa, 22.414 L/mol (from memory),
 * two atoms a molecule; the trade's rule of thumb 1 ml/100 g ≈ 0.9 wppm (from memory) is the same
 * number.
 */
class DeclaredUnitsTest {
  private static final double RHO = 7850; // kg/m³, carbon steel (common practice)
  private static final double SIDE = 1e-3;
  private static final double VOLUME = SIDE * SIDE * 2e-4;
  private static final double M_H = 1.008e-3;

  @TempDir Path dir;

  /** A 0.2 mm plate held on both faces at {@code level} for D·t/L² = 5: equilibrium to 1e-12. */
  private Path soakedPlate(String units, String level) throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"), StructuredMesher.box(SIDE, SIDE, 2e-4, 1, 1, 8, 1), false);
    return Files.writeString(
        dir.resolve("plate.json"),
        """
        { "mesh": "plate.msh", "species": "hydrogen", %s
          "materials": { "body": { "diffusivity": 1e-10, "density": "7850 kg/m^3" } },
          "faces": { "zmin": { "kind": "concentration", "value": %s },
                     "zmax": { "kind": "concentration", "value": %s } },
          "time": { "end": 2000, "step": 10 } }
        """
            .formatted(units, level, level));
  }

  private Series run(Path c) throws IOException {
    RunPipeline.run(c, dir.resolve("out"), RunProgress.SILENT);
    return Series.read(dir.resolve("out").resolve("series.csv"));
  }

  @Test
  void wppmOfHydrogenWeighsAsAMassFraction() throws IOException {
    Series s = run(soakedPlate("\"units\": { \"concentration\": \"wppm\" },", "2"));
    // 2 wppm = 2e-4 wt%; amount in kg: 2e-6 · ρ · V
    assertEquals(2.0, s.last("max:body"), 1e-9);
    assertEquals(2e-6 * RHO * VOLUME, s.last("amount"), 1e-9 * 2e-6 * RHO * VOLUME);
    assertEquals(2e-4, s.last("weight_gain_percent"), 1e-12);
    JsonNode units =
        new ObjectMapper().readTree(dir.resolve("out/summary.json").toFile()).path("units");
    assertEquals("wppm", units.path("concentration").asText());
    assertEquals("kg", units.path("amount").asText());
    // every exported column says its unit
    Series.copyWithUnits(
        dir.resolve("out/series.csv"),
        dir.resolve("export.csv"),
        ResultUnits.of(dir.resolve("out")));
    String header = Files.readAllLines(dir.resolve("export.csv")).get(0);
    for (String col :
        List.of(
            "time [s]",
            "amount [kg]",
            "max:body [wppm]",
            "inflow_rate:zmin [kg/s]",
            "balance_error [kg]",
            "temperature [K]",
            "weight_gain_percent [%]")) {
      assertTrue(header.contains(col), header);
    }
    for (String cell : Series.split(header)) {
      assertTrue(cell.contains("["), cell + " has no unit in " + header);
    }
    // the field frames say theirs too
    try (var files = Files.walk(dir.resolve("out"))) {
      Path frame = files.filter(p -> p.toString().endsWith(".vtu")).findFirst().orElseThrow();
      String vtu = Files.readString(frame, java.nio.charset.StandardCharsets.ISO_8859_1);
      assertTrue(
          vtu.contains("Name=\"c\" NumberOfComponents=\"1\" units=\"wppm\""), frame.toString());
    }
  }

  @Test
  void molPerCubicMetreWeighsWithTheMolarMassNotAsKilograms() throws IOException {
    Series s = run(soakedPlate("\"units\": { \"concentration\": \"mol/m^3\" },", "10"));
    // 10 mol/m³ of H: 10 · M / ρ of the mass, in percent
    double expected = 100 * 10 * M_H / RHO;
    assertEquals(expected, s.last("weight_gain_percent"), 1e-9 * expected);
    // negative control: taking the mol as kg would read 1000× more (the old behaviour)
    assertTrue(s.last("weight_gain_percent") < 100 * 10 / RHO / 500);
  }

  @Test
  void mlPer100gCountsHydrogenGasAtStandardConditions() throws IOException {
    Series s = run(soakedPlate("\"units\": { \"concentration\": \"ml/100g\" },", "1"));
    // 1 ml H₂ per 100 g: 1e-6 m³ / 22.414e-3 m³/mol per 0.1 kg, ×2 atoms → mol H per kg
    double molPerKg = 1e-6 / 22.414e-3 / 0.1 * 2;
    assertEquals(molPerKg * RHO * VOLUME, s.last("amount"), 1e-9 * molPerKg * RHO * VOLUME);
    double wppm = molPerKg * M_H * 1e6;
    assertEquals(0.90, wppm, 0.01); // the rule of thumb (from memory)
    assertEquals(wppm * 1e-4, s.last("weight_gain_percent"), 1e-9 * wppm * 1e-4);
    assertEquals(1.0, s.last("max:body"), 1e-9);
  }

  /**
   * Two sealed parts of equal volume V, densities 1000 and 2000 kg/m³ and equal solubility in wt%:
   * what the first holds spreads until both hold the same mass fraction w, so the amounts stand 1 :
   * 2 and w = m / ((ρ₁ + ρ₂)·V) (a mass balance). Solving in wt% as if it were an amount per volume
   * would share the amount 1 : 1.
   */
  @Test
  void massFractionsShareOutByDensity() throws IOException {
    MshWriter.write(
        dir.resolve("pair.msh"),
        StructuredMesher.layers(
            1e-4, 1e-4, 1, 1, List.of(new Layer("light", 1e-4, 4), new Layer("dense", 1e-4, 4)), 1),
        false);
    Path c =
        Files.writeString(
            dir.resolve("pair.json"),
            """
            { "mesh": "pair.msh", "species": "water", "units": { "concentration": "wt%" },
              "materials": { "light": { "diffusivity": 1e-9, "density": 1000 },
                             "dense": { "diffusivity": 1e-9, "density": 2000 } },
              "initial": { "light": 1, "dense": 0 },
              "time": { "end": 200, "step": 2 } }
            """);
    Series s = run(c);
    double kg = s.column("amount").orElseThrow()[0];
    // 1 wt% of 1e-12 m³ at 1000 kg/m³, less the shared nodes' share (they start at the dense
    // side's 0): between 3/4 and all of it
    assertTrue(kg > 0.75e-2 * 1000 * 1e-12 && kg <= 1e-2 * 1000 * 1e-12, "start " + kg);
    double w = 100 * kg / ((1000 + 2000) * 1e-12);
    assertEquals(w, s.last("max:light"), 1e-6 * w);
    assertEquals(w, s.last("max:dense"), 1e-6 * w);
    assertEquals(kg, s.last("amount"), 1e-9 * kg);
    assertEquals(2 * s.last("amount:light"), s.last("amount:dense"), 1e-6 * kg);
  }

  @Test
  void unitsAreCheckedWhereTheyStand() throws IOException {
    soakedPlate("\"units\": { \"concentration\": \"ppb\" },", "1");
    CaseInputException bad =
        assertThrows(
            CaseInputException.class, () -> RunPipeline.prepare(dir.resolve("plate.json")));
    assertTrue(bad.getMessage().contains("units.concentration"), bad.getMessage());
    assertTrue(bad.getMessage().contains("wppm"), bad.getMessage());
    Path water =
        Files.writeString(
            dir.resolve("water.json"),
            Files.readString(dir.resolve("plate.json"))
                .replace("\"hydrogen\"", "\"water\"")
                .replace("ppb", "ml/100g"));
    CaseInputException gas =
        assertThrows(CaseInputException.class, () -> RunPipeline.prepare(water));
    assertTrue(gas.getMessage().contains("hydrogen"), gas.getMessage());
    Path noDensity =
        Files.writeString(
            dir.resolve("nodensity.json"),
            Files.readString(dir.resolve("plate.json"))
                .replace(", \"density\": \"7850 kg/m^3\"", "")
                .replace("ppb", "wppm"));
    CaseInputException rho =
        assertThrows(CaseInputException.class, () -> RunPipeline.prepare(noDensity));
    assertTrue(rho.getMessage().contains("materials.body"), rho.getMessage());
    assertTrue(rho.getMessage().contains("density"), rho.getMessage());
  }

  @Test
  void anUndeclaredUnitIsSaidWhenWeightGainRestsOnIt() throws IOException {
    RunSummary s = RunPipeline.run(soakedPlate("", "1"), dir.resolve("out"), RunProgress.SILENT);
    assertTrue(
        s.warnings().stream().anyMatch(w -> w.contains("units.concentration is not declared")),
        s.warnings().toString());
    RunSummary declared =
        RunPipeline.run(
            soakedPlate("\"units\": { \"concentration\": \"kg/m^3\" },", "1"),
            dir.resolve("out2"),
            RunProgress.SILENT);
    assertFalse(
        declared.warnings().stream().anyMatch(w -> w.contains("units.concentration")),
        declared.warnings().toString());
  }
}
