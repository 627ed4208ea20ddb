package dev.soakfield.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.results.ResultFiles;
import dev.soakfield.fem.results.RunManifest;
import dev.soakfield.fem.results.Series;
import dev.soakfield.fem.results.StoredRun;
import dev.soakfield.fem.run.RunPipeline;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A moisture uptake in kg/m³ with a density: the report states the units it reads, weighs the
 * uptake and lists the thresholds; its field pictures go to the output of widest spread.
 */
class UnitsInReportTest {
  @TempDir Path dir;

  private Path soak() throws Exception {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 80, 1, 1, 1), false);
    Path c =
        Files.writeString(
            dir.resolve("sheet.json"),
            """
            { "mesh": "sheet.msh", "species": "water", "units": { "concentration": "kg/m^3" },
              "materials": { "body": { "diffusivity": 1e-10, "density": "1200 kg/m^3" } },
              "faces": { "xmin": { "kind": "concentration", "value": 6 },
                         "xmax": { "kind": "concentration", "value": 6 } },
              "thresholds": [ { "name": "half", "level": 3, "where": "mean:body" } ],
              "time": { "end": "3 h", "outputs": ["5 min", "30 min", "1 h", "2 h", "3 h"] } }
            """);
    Path out = dir.resolve("out");
    RunPipeline.run(c, out, RunProgress.SILENT);
    return out;
  }

  @Test
  void theReportWeighsTheUptakeInTheDeclaredUnits() throws Exception {
    Path out = soak();
    ReportWriter.write(out);
    String md = Files.readString(out.resolve("report.md"));
    assertTrue(md.contains("## Weight gain"), md);
    assertTrue(md.contains("report-weight-gain.png"), md);
    assertTrue(md.contains("amount [kg]"), md);
    assertTrue(md.contains("max. concentration now [kg/m^3]"), md);
    assertTrue(md.contains("units: concentrations in kg/m^3, amounts in kg"), md);
    assertTrue(md.contains("| half | mean:body | rises 3.000 kg/m^3 |"), md);
    // the last weight gain row is the series' own, 100 · amount / (ρ V)
    Series s = Series.read(out.resolve(ResultFiles.SERIES));
    double w = 100 * s.last("amount") / (1200 * 1e-11);
    assertEquals(w, s.last("weight_gain_percent"), 1e-9 * w);
    assertTrue(
        md.contains("| 3.00 h | " + String.format(Locale.ROOT, "%.4g", w) + " |"),
        md + " lacks " + w);
    assertEquals(RunManifest.Status.FINISHED, RunManifest.readFrom(out).orElseThrow().status());
  }

  @Test
  void picturesGoToTheOutputWhereTheFieldSpreadsMost() throws Exception {
    Path out = soak();
    StoredRun r = StoredRun.open(out);
    // frames at 0, 5 min, 30 min, 1 h, 2 h, 3 h; the sheet (τ = D t / L² = 1.08 at 3 h) is near
    // even at the end, has only its faces' nodes set at t = 0, and is most uneven in between
    int widest = FieldPictures.widestSpread(r);

    assertTrue(widest > 0 && widest < r.frameCount() - 1, "frame " + widest);
  }
}
