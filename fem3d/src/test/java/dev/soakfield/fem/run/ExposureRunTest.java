package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.physics.HydrogenFugacity;
import dev.soakfield.fem.physics.WaterVapour;
import dev.soakfield.fem.results.StateFile;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Environments of the trade: ambient faces under Henry's and Sieverts' laws, temperature steps. */
class ExposureRunTest {
  @TempDir Path dir;

  private void box() throws IOException {
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(1e-3, 1e-3, 1e-3, 4, 4, 4, 1), false);
  }

  private static final String ALL_AMBIENT =
      """
      "faces": { "xmin": {"kind": "ambient"}, "xmax": {"kind": "ambient"},
                 "ymin": {"kind": "ambient"}, "ymax": {"kind": "ambient"},
                 "zmin": {"kind": "ambient"}, "zmax": {"kind": "ambient"} },
      """;

  private StateFile.State run(String json) throws IOException {
    Path caseFile = Files.writeString(dir.resolve("case.json"), json);
    RunPipeline.run(caseFile, dir.resolve("out"), RunProgress.SILENT);
    return StateFile.read(dir.resolve("out").resolve(StateFile.NAME));
  }

  private static double[] range(double[] v) {
    double lo = Double.POSITIVE_INFINITY;
    double hi = Double.NEGATIVE_INFINITY;
    for (double x : v) {
      lo = Math.min(lo, x);
      hi = Math.max(hi, x);
    }
    return new double[] {lo, hi};
  }

  @Test
  void moistureSaturatesAtHenrysLawWithTheSaturationPressureOfWater() throws IOException {
    box();
    // a 1 mm cube of our own, D = 1e-11 m²/s: L²/D = 1e5 s; 1e6 s saturates it fully
    double s = 4e-3; // kg/(m³·Pa), demo value
    StateFile.State end =
        run(
            """
            { "mesh": "box.msh", "law": "henry",
              "exposure": [ { "duration": "277.78 h", "temperature": "85 degC", "humidity": "85 %%" } ],
              "materials": { "body": { "diffusivity": 1e-11, "solubility": %s } },
              %s
              "initial": 0 }
            """
                .formatted(s, ALL_AMBIENT));
    double pv = 0.85 * WaterVapour.saturationPressure(358.15);
    // p_sat(85 °C) = 57.87 kPa (steam tables, from memory): the IF97 equation gives it
    assertEquals(57.87e3, WaterVapour.saturationPressure(358.15), 10);
    double[] phi = range(end.phi());
    assertEquals(pv, phi[0], 1e-3 * pv);
    assertEquals(pv, phi[1], 1e-3 * pv);
    JsonNode summary = summary();
    double volume = 1e-9;
    double amount = summary.get("balance").get("amount_end").asDouble();
    assertEquals(s * pv * volume, amount, 1e-3 * s * pv * volume);
  }

  @Test
  void hydrogenSaturatesAtSievertsLawWithTheFugacity() throws IOException {
    box();
    double s = 2e-3; // mol/(m³·√Pa), demo value
    StateFile.State end =
        run(
            """
            { "mesh": "box.msh", "law": "sieverts",
              "exposure": [ { "duration": 1e6, "temperature": 300, "pressure": "10 MPa" } ],
              "materials": { "body": { "diffusivity": "0.036 mm^2/h", "solubility": %s } },
              %s
              "initial": 0 }
            """
                .formatted(s, ALL_AMBIENT));
    double f = HydrogenFugacity.fugacity(1e7, 300);
    // Abel–Noble at 10 MPa, 300 K: f/p = exp(b p /(R T)) = exp(15.84e-6·1e7/(8.314462618·300))
    assertEquals(Math.exp(15.84e-6 * 1e7 / (8.314462618 * 300)), f / 1e7, 1e-9);
    double[] phi = range(end.phi());
    assertEquals(Math.sqrt(f), phi[0], 1e-3 * Math.sqrt(f));
    assertEquals(Math.sqrt(f), phi[1], 1e-3 * Math.sqrt(f));
    double amount = summary().get("balance").get("amount_end").asDouble();
    assertEquals(s * Math.sqrt(f) * 1e-9, amount, 1e-3 * s * Math.sqrt(f) * 1e-9);
  }

  @Test
  void temperatureStepsAndRampsConserveTheAmountAcrossTwoMaterials() throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"),
        StructuredMesher.layers(
            1e-3,
            1e-3,
            2,
            2,
            List.of(
                new StructuredMesher.Layer("mould", 1e-3, 4),
                new StructuredMesher.Layer("die", 0.5e-3, 2)),
            1),
        false);
    // sealed part: solubilities with different heats of solution and Arrhenius diffusivities
    Path caseFile =
        Files.writeString(
            dir.resolve("case.json"),
            """
            { "mesh": "plate.msh",
              "exposure": [ { "duration": 2000, "temperature": 300 },
                            { "duration": 500, "temperature": [300, 400] },
                            { "duration": 2000, "temperature": 350 } ],
              "materials": {
                "mould": { "diffusivity": { "D0": 1e-6, "Q": "30 kJ/mol" },
                           "solubility": { "S0": 0.5, "dH": -1e4 } },
                "die":   { "diffusivity": { "D0": 1e-7, "Q": 2e4 },
                           "solubility": { "S0": 2, "dH": -5e3 } } },
              "initial": { "mould": 1.0, "die": 0.1 },
              "probes": { "inside": [0.0005, 0.0005, 0.0005] } }
            """);
    RunPipeline.run(caseFile, dir.resolve("out"), RunProgress.SILENT);
    JsonNode b = summary().get("balance");
    double start = b.get("amount_start").asDouble();
    double end = b.get("amount_end").asDouble();
    assertEquals(start, end, 1e-10 * start, "sealed: the amount stays while S changes");
    // the series' balance error column stays at round-off in every row
    List<String> lines = Files.readAllLines(dir.resolve("out").resolve("series.csv"));
    List<String> header = List.of(lines.get(0).split(",", -1));
    int col = header.indexOf("balance_error");
    int temp = header.indexOf("temperature");
    int probe = header.indexOf("probe:inside");
    int max = header.indexOf("max:mould");
    double hottest = 0;
    for (String line : lines.subList(1, lines.size())) {
      String[] v = line.split(",", -1);
      assertTrue(Math.abs(Double.parseDouble(v[col])) <= 1e-10 * start, line);
      hottest = Math.max(hottest, Double.parseDouble(v[temp]));
      // the probe reads c = S(T)·φ in the mould: never above the mould's largest nodal value
      assertTrue(Double.parseDouble(v[probe]) <= Double.parseDouble(v[max]) * (1 + 1e-12), line);
    }
    assertEquals(400.0, hottest, 1e-9, "the ramp's end is a step end");
  }

  private JsonNode summary() throws IOException {
    return new ObjectMapper().readTree(dir.resolve("out").resolve("summary.json").toFile());
  }
}
