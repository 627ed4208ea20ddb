package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import dev.soakfield.fem.results.Series;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A bake start: a sheet at c = 1 whose faces are held at 0. Without sources the solution must stay
 * in [0, 1] (the maximum principle, Evans, Partial Differential Equations, §7.1.4). Backward Euler
 * with the consistent capacity breaks the discrete bound when Δt is small against h²/(6D) (a
 * property of the consistent mass matrix, from memory: Thomée, Galerkin Finite Element Methods for
 * Parabolic Problems, ch. 15); with the lumped capacity on these non-obtuse elements it holds.
 */
class RangeWatchTest {
  @TempDir Path dir;

  private RunSummary bake(String capacity) throws IOException {
    return bake(capacity, 1);
  }

  private RunSummary bake(String capacity, int order) throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(1e-3, 1e-4, 1e-4, 20, 1, 1, order), false);
    // h = 50 µm, h²/D = 25 s; steps of 0.25 s are 1 % of it
    Path c =
        Files.writeString(
            dir.resolve(capacity + order + ".json"),
            """
            { "mesh": "sheet.msh",
              "materials": { "body": { "diffusivity": 1e-10 } },
              "faces": { "xmin": { "kind": "concentration", "value": 0 },
                         "xmax": { "kind": "concentration", "value": 0 } },
              "initial": 1,
              "time": { "end": 5, "step": 0.25, "capacity": "%s" } }
            """
                .formatted(capacity));
    return RunPipeline.run(c, dir.resolve(capacity + order), RunProgress.SILENT);
  }

  private static List<String> overshoots(RunSummary s) {
    return s.warnings().stream().filter(w -> w.contains("left the range")).toList();
  }

  @Test
  void theConsistentCapacitysOvershootAtABakeStartIsWarnedAbout() throws IOException {
    RunSummary s = bake("consistent");
    List<String> w = overshoots(s);
    assertTrue(w.size() == 1 && w.get(0).contains("above it"), s.warnings().toString());
    assertTrue(w.get(0).contains("\"capacity\": \"lumped\""), w.get(0));
    // the part's maximum in the series shows it too: above the start value 1
    Series series = Series.read(s.outputFolder().resolve("series.csv"));
    assertTrue(series.max("max:body") > 1.0001, "max " + series.max("max:body"));
    assertTrue(
        Files.readString(s.outputFolder().resolve("run.log"))
            .contains("warning: the solution left"));
  }

  @Test
  void theLumpedCapacityStaysInRangeAndIsNotWarnedAbout() throws IOException {
    RunSummary s = bake("lumped");
    assertTrue(overshoots(s).isEmpty(), s.warnings().toString());
    Series series = Series.read(s.outputFolder().resolve("series.csv"));
    // in range to the solves' accuracy (1e-11 of the right-hand side): the conservative shift after
    // each solve moves every free value by that much at most (measured 2.7e-12 here)
    assertTrue(series.max("max:body") <= 1 + 1e-11, "max " + series.max("max:body"));
    assertTrue(
        new ObjectMapper()
            .readTree(s.outputFolder().resolve("summary.json").toFile())
            .path("range_excursions")
            .isMissingNode());
  }

  @Test
  void quadraticElementsOvershootEvenLumpedAndTheWarningSaysSo() throws IOException {
    // HRZ lumping makes the capacity diagonal but the quadratic stiffness still has positive
    // off-diagonal entries, so the discrete maximum principle does not hold (see the class note)
    RunSummary s = bake("lumped", 2);
    List<String> w = overshoots(s);
    assertTrue(w.size() == 1, s.warnings().toString());
    assertTrue(w.get(0).contains("quadratic elements keep no such bound"), w.get(0));
    assertTrue(w.get(0).contains("This is the lumped capacity"), w.get(0));
    // the excursion is real, not round-off: a visible share of the range [0, 1]
    var excursions =
        new ObjectMapper()
            .readTree(s.outputFolder().resolve("summary.json").toFile())
            .path("range_excursions");
    assertTrue(excursions.size() >= 1, excursions.toString());
    assertTrue(excursions.get(0).path("share_of_range").asDouble() > 1e-4, excursions.toString());
  }
}
