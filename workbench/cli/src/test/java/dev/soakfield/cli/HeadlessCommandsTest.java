package dev.soakfield.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.app.GraphicsServices;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The command line works with no window library: this module's class path has no LWJGL, as the
 * headless jar has none, and the run, check, fit, bake and export commands still give their values.
 */
class HeadlessCommandsTest {
  @TempDir Path dir;

  /** Drying sheet of our own, 1 mm thick, D = 1e-4·exp(−40 kJ/mol / RT) m²/s, both faces dry. */
  private Path dryingSheet(String time) throws Exception {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 40, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("sheet.case.json"),
        """
        { "mesh": "sheet.msh", "temperature": "25 degC",
          "materials": { "body": { "diffusivity": { "D0": 1e-4, "Q": "40 kJ/mol" } } },
          "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                     "xmax": { "kind": "concentration", "value": 0.0 } },
          "initial": 1.0, "time": { %s } }
        """
            .formatted(time));
  }

  private static double diffusivity(double kelvin) {
    return 1e-4 * Math.exp(-40000 / (8.314462618 * kelvin));
  }

  @Test
  void noWindowLibraryIsOnTheClassPath() {
    assertThrows(ClassNotFoundException.class, () -> Class.forName("org.lwjgl.Version"));
    assertTrue(GraphicsServices.window().isEmpty());
    assertTrue(GraphicsServices.pictures().isEmpty());
  }

  @Test
  void versionIsTheProjectVersion() {
    CliRun r = CliRun.of("--version");
    assertEquals(0, r.exitCode(), r.err());
    String built = System.getProperty("soakfield.version");
    assertTrue(built != null && !built.isBlank(), "the build passes the project version");
    assertEquals("soakfield " + built, r.out().strip());
  }

  @Test
  void withNoCommandAHeadlessBuildListsTheCommands() {
    CliRun none = CliRun.of();
    assertEquals(ExitCodes.OK, none.exitCode(), none.err());
    assertTrue(none.out().contains("Usage: soakfield"), none.out());
    assertTrue(none.out().contains("gui"), none.out());
  }

  @Test
  void theDemoCopyForTheWindowKeepsAnEditedCase() throws Exception {
    Path folder = dir.resolve("demo");
    Path demoCase = DemoFiles.copyInto(folder, true);
    assertEquals(folder.resolve("sensor-pod.case.json"), demoCase);
    String edited =
        java.nio.file.Files.readString(demoCase)
            .replace("\"threshold\": 0.5", "\"threshold\": 0.6");
    assertTrue(edited.contains("0.6"));
    java.nio.file.Files.writeString(demoCase, edited);
    DemoFiles.copyInto(folder, true);
    assertEquals(edited, java.nio.file.Files.readString(demoCase));
    assertTrue(java.nio.file.Files.isRegularFile(folder.resolve("sensor-pod.msh")));
    // the demo declares every exterior face group: nothing is sealed only by default
    CliRun check = CliRun.of("check", folder.resolve("sensor-pod.case.json").toString());
    assertEquals(ExitCodes.OK, check.exitCode(), check.err());
    assertTrue(!check.out().contains("sealed by default"), check.out());
    assertTrue(DemoFiles.windowCopy().startsWith(System.getProperty("user.home")));
    // the demo command restores the shipped case, moving the edited one aside, not over it
    java.util.List<String> said = new java.util.ArrayList<>();
    DemoFiles.copyInto(folder, false, said::add);
    assertEquals(
        edited, java.nio.file.Files.readString(folder.resolve("sensor-pod.case.json.edited")));
    assertTrue(java.nio.file.Files.readString(demoCase).contains("\"threshold\": 0.5"));
    assertEquals(1, said.size(), said.toString()); // only the changed file is moved aside
    DemoFiles.copyInto(folder, false, said::add);
    assertEquals(1, said.size(), "an unchanged copy is not moved again: " + said);
  }

  @Test
  void guiAndRenderSayThisBuildHasNoWindow() throws Exception {
    CliRun gui = CliRun.of("gui");
    assertEquals(ExitCodes.BAD_INPUT, gui.exitCode(), gui.err());
    assertTrue(gui.err().contains("this build has no window; use soakfield.jar"), gui.err());
    CliRun render = CliRun.of("render", dir.toString(), "--out", dir.resolve("p.png").toString());
    assertEquals(ExitCodes.BAD_INPUT, render.exitCode(), render.err());
    assertTrue(render.err().contains("this build has no window; use soakfield.jar"), render.err());
    assertTrue(!render.err().contains("\tat "), render.err());
  }

  @Test
  void checkRunAndExportGiveTheSheetsDrying() throws Exception {
    double d = diffusivity(298.15);
    double end = 0.05 * 1e-6 / d; // D t / l² = 0.05
    Path kase = dryingSheet("\"end\": " + end + ", \"tolerance\": 1e-5");

    CliRun check = CliRun.of("check", kase.toString());
    assertEquals(0, check.exitCode(), check.err());
    assertTrue(check.out().contains("no problems found"), check.out());
    assertTrue(check.out().contains("elements linear (4-node)"), check.out());

    Path out = dir.resolve("results");
    CliRun run = CliRun.of("run", kase.toString(), "--out", out.toString());
    assertEquals(0, run.exitCode(), run.err());
    assertTrue(run.err().contains("no field picture: this build has no window"), run.err());
    assertTrue(Files.isRegularFile(out.resolve("report.html")));
    Series series = Series.read(out.resolve("series.csv"));
    double[] amount = series.column("amount").orElseThrow();
    double[] time = series.column("time").orElseThrow();
    // against the initial content c0·V = 1 × 1e-11 m³ (the first row already has dry faces)
    double left = amount[amount.length - 1] / 1e-11;
    // Crank, The Mathematics of Diffusion (1975), eq. 4.18: the fraction left in a sheet of
    // thickness l after t is the sum over n of 8/((2n+1)²π²)·exp(−D(2n+1)²π²t/l²)
    double expected = 0;
    for (int n = 0; n < 200; n++) {
      double k = (2 * n + 1) * Math.PI;
      expected += 8 / (k * k) * Math.exp(-d * k * k * time[time.length - 1] / 1e-6);
    }
    assertEquals(expected, left, 0.01 * expected);

    Path csv = dir.resolve("export.csv");
    CliRun export = CliRun.of("export", out.toString(), "--csv", csv.toString());
    assertEquals(0, export.exitCode(), export.err());
    List<String> lines = Files.readAllLines(csv);
    assertEquals("time [s]", Series.split(lines.get(0)).get(0));
    assertEquals(
        Files.readAllLines(out.resolve("series.csv")).subList(1, lines.size()),
        lines.subList(1, lines.size()));
  }

  @Test
  void bakeFindsTheCentreBakeTime() throws Exception {
    Path kase = dryingSheet("\"end\": 1");
    CliRun r =
        CliRun.of(
            "bake", kase.toString(), "--temperature", "400", "--target", "max:body<0.1", "--json");
    assertEquals(0, r.exitCode(), r.err());
    JsonNode j = new ObjectMapper().readTree(r.out());
    // Crank (1975), eq. 4.17, first term at the centre of the sheet: c/c0 = 4/π·exp(−Dπ²t/l²)
    double expected = -Math.log(0.1 * Math.PI / 4) / (Math.PI * Math.PI) * 1e-6 / diffusivity(400);
    assertEquals(expected, j.get("bake_time").asDouble(), 0.01 * expected);
  }

  @Test
  void fitGivesBackTheWeighingDataDiffusivity() throws Exception {
    Path csv = dir.resolve("coupon-soak-weighing.csv");
    try (InputStream in = getClass().getResourceAsStream("/samples/coupon-soak-weighing.csv")) {
      Files.copy(in, csv);
    }
    CliRun r =
        CliRun.of("fit", csv.toString(), "--thickness", "1mm", "--edges", "40mm,40mm", "--json");
    assertEquals(0, r.exitCode(), r.err());
    JsonNode est = new ObjectMapper().readTree(r.out()).get("diffusivity");
    // the file's comment states D = 3.0e-12 m^2/s (synthetic data of our own)
    assertTrue(
        est.get("low").asDouble() <= 3.0e-12 && 3.0e-12 <= est.get("high").asDouble(),
        est.toString());
  }
}
