package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.fit.PlaneSheetUptake;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.Grading;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A 1 mm sheet held at c = 1 on both faces (D = 1e-10 m²/s), looked at after 10 s, when the
 * diffusion length √(D·t) is 32 µm: a mesh of 0.1 mm elements fills its first layer at once and the
 * warning says so with the share of the uptake that is artefact; a mesh of 5 µm elements does not
 * warn (negative control). The uptake itself comes from Crank (1975), eq. 4.18.
 */
class NearSurfaceWarningTest {
  @TempDir Path dir;

  private RunSummary run(String name, int cells) throws IOException {
    return run(name, cells, Grading.NONE);
  }

  private RunSummary run(String name, int cells, Grading grading) throws IOException {
    MshWriter.write(
        dir.resolve(name + ".msh"),
        StructuredMesher.box(1e-3, 1e-5, 1e-5, cells, 1, 1, 1, grading),
        false);
    Path c =
        Files.writeString(
            dir.resolve(name + ".json"),
            """
            { "mesh": "%s.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 1.0 },
                         "xmax": { "kind": "concentration", "value": 1.0 } },
              "time": { "end": 10, "outputs": [10], "step": 0.05, "capacity": "lumped" } }
            """
                .formatted(name));
    return RunPipeline.run(c, dir.resolve(name), RunProgress.SILENT);
  }

  @Test
  void aCoarseFirstLayerIsWarnedAboutWithTheShareItAdds() throws IOException {
    RunSummary coarse = run("coarse", 10);
    List<String> w =
        coarse.warnings().stream().filter(s -> s.contains("diffusion length")).toList();
    assertEquals(2, w.size(), coarse.warnings().toString()); // xmin and xmax
    Matcher m = Pattern.compile("is about ([0-9.]+)× the").matcher(w.get(0));
    assertTrue(m.find(), w.get(0));
    double stated = Double.parseDouble(m.group(1));
    // h √π / (4 √(D t)) with h = 0.1 mm, D t = 1e-9 m²: 1.40
    assertEquals(1e-4 * Math.sqrt(Math.PI) / (4 * Math.sqrt(1e-9)), stated, 0.01);
    // the run's own uptake over the exact one is about what the warning states (the estimate
    // leaves out what the second node layer takes in; here that is 0.27 of the exact uptake)
    double volume = 1e-3 * 1e-5 * 1e-5;
    double exact = PlaneSheetUptake.fraction(1e-9 / 1e-6) * volume;
    double got = Series.read(dir.resolve("coarse/series.csv")).last("amount");
    assertEquals(stated, got / exact, 0.25 * stated);
    // negative control: 5 µm elements resolve the start; no warning, and the uptake is right
    RunSummary fine = run("fine", 200);
    assertTrue(
        fine.warnings().stream().noneMatch(s -> s.contains("diffusion length")),
        fine.warnings().toString());
    double fineGot = Series.read(dir.resolve("fine/series.csv")).last("amount");
    assertEquals(exact, fineGot, 0.1 * exact);
  }

  /**
   * The same ten cells graded toward both faces (ratio 1.8: the first is 22 µm deep, h₁ = L(r −
   * 1)/(rⁿ − 1) over each half) resolve the start: no warning, and the uptake follows the √t law,
   * M_t = 2 c₀ √(D t / π) per face (Crank 1975, eq. 4.22), where the even mesh read 1.4× it.
   */
  @Test
  void gradingTheSameCellsTowardTheFacesResolvesTheStart() throws IOException {
    RunSummary graded = run("graded", 10, Grading.of(Map.of("xmin", 1.8, "xmax", 1.8)));
    assertTrue(
        graded.warnings().stream().noneMatch(s -> s.contains("diffusion length")),
        graded.warnings().toString());
    double area = 1e-5 * 1e-5;
    double rootT = 2 * Math.sqrt(1e-10 * 10 / Math.PI) * area * 2; // two faces
    double got = Series.read(dir.resolve("graded/series.csv")).last("amount");
    assertEquals(rootT, got, 0.1 * rootT);
    run("even", 10);
    double even = Series.read(dir.resolve("even/series.csv")).last("amount");
    assertTrue(Math.abs(even - rootT) > 3 * Math.abs(got - rootT), even + " vs " + got);
  }
}
