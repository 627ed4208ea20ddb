package dev.soakfield.app;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class CaseOverviewTest {
  @TempDir Path dir;

  @Test
  void namesEveryFaceGroupsKindAndSealsTheUnassignedOnes() throws IOException {
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1), false);
    Path c =
        Files.writeString(
            dir.resolve("box.json"),
            """
            { "mesh": "box.msh",
              "materials": { "body": { "diffusivity": 2e-12, "solubility": 1.0,
                                       "source": { "kind": "first-order", "rate": -1e-6 } } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                         "xmax": { "kind": "flux", "value": 1e-6 },
                         "ymin": { "kind": "exchange", "coefficient": 1e-7, "value": 1.0 } },
              "initial": 0.0,
              "time": { "end": 7200, "outputs": [3600, 7200], "step": 600 },
              "probes": { "core": [0.0005, 0.0005, 0.0005] },
              "threshold": 0.5 }
            """);
    String text = CaseOverview.of(RunPipeline.prepare(c), 1L << 30);
    // a 2×2×2-cell box, six tetrahedra per cell: 27 nodes, 48 tetrahedra (exact count)
    assertTrue(text.contains("27 nodes, 48 tetrahedra; elements linear (4-node)"), text);
    assertTrue(text.contains("D = 2.000e-12 m²/s, S = 1.000, source first-order -1.000e-06 1/s"));
    assertTrue(text.matches("(?s).*xmin\\s+exterior\\s+concentration 1.000\n.*"), text);
    assertTrue(text.matches("(?s).*xmax\\s+exterior\\s+flux 1.000e-06 amount/.*"), text);
    assertTrue(text.contains("exchange with environment 1.000, coefficient 1.000e-07 m/s"));
    assertTrue(text.contains("unassigned exterior groups, sealed: ymax, zmin, zmax"), text);
    assertTrue(text.contains("time: 0 to 2.00 h (7200 s), backward-euler, fixed steps of"), text);
    assertTrue(text.contains("outputs: fields at 60.0 min, 2.00 h; series.csv every step"), text);
    assertTrue(text.contains("probes core; threshold 0.5000"), text);
    assertTrue(text.contains("1.0 GB available"), text);
  }

  @Test
  void materialsAreShownAtEachSegmentsTemperatureWithTheSaturationLevel() throws IOException {
    for (String f : new String[] {"sensor-pod.msh", "sensor-pod-humid.case.json"}) {
      try (var in = CaseOverviewTest.class.getResourceAsStream("/samples/" + f)) {
        Files.copy(in, dir.resolve(f));
      }
    }
    String text =
        CaseOverview.of(RunPipeline.prepare(dir.resolve("sensor-pod-humid.case.json")), 1L << 30);
    // pre-factors are named as such, never as values
    assertTrue(text.contains("D0 = 4.700e-06 m²/s (Q = 42.00 kJ/mol)"), text);
    // 85 °C: S = 4e-10 · exp(38000 / (8.314462618 · 358.15)) = 1.393e-4 (Pa⁻¹), and with
    // RH 0.85 of p_sat(85 °C) = 57.87 kPa (IAPWS-IF97 saturation pressure, from memory to 4
    // digits) the saturation level is 1.393e-4 · 0.85 · 57868 = 6.85 kg/m³
    double s85 = 4e-10 * Math.exp(38000 / (8.314462618 * 358.15));
    assertEquals(1.393e-4, s85, 1e-7);
    java.util.regex.Matcher m =
        java.util.regex.Pattern.compile(
                "segment 1, 0 s to 7 d, 85.0 °C:\\n\\s+body\\s+D = ([0-9.e+-]+) m²/s, S = ([0-9.e+-]+) \\(kg/m\\^3\\)/Pa, saturation c = ([0-9.e+-]+) kg/m\\^3")
            .matcher(text);
    assertTrue(m.find(), text);
    assertEquals(s85, Double.parseDouble(m.group(2)), 1e-3 * s85);
    assertEquals(s85 * 0.85 * 57868, Double.parseDouble(m.group(3)), 2e-3 * 6.85);
    // D = 4.7e-6 · exp(-42000 / (8.314462618 · 358.15)) (the Arrhenius law itself)
    assertEquals(
        4.7e-6 * Math.exp(-42000 / (8.314462618 * 358.15)), Double.parseDouble(m.group(1)), 1e-15);
    // the sample declares its unit and species, and check says so
    assertTrue(
        text.contains(
            "units: concentrations in kg/m^3, amounts in kg, species water (18.02 g/mol)"),
        text);
    // the dry bake drives towards nothing
    assertTrue(text.contains("125.0 °C:"), text);
  }
}
