package dev.soakfield.fem.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.casefile.CaseInputException;
import dev.soakfield.fem.fit.PlaneSheetUptake;
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
 * A part marked impermeable: a skin of thickness h on an impermeable insert, held at c = 1 on top,
 * takes up what a plane sheet of thickness 2h held on both faces takes up per face (Crank 1975, eq.
 * 4.18, by symmetry: the joint is a plane of no flux).
 */
class ImpermeablePartTest {
  @TempDir Path dir;

  private Path plate(String insert) throws IOException {
    MshWriter.write(
        dir.resolve("plate.msh"),
        StructuredMesher.layers(
            1e-4,
            1e-4,
            1,
            1,
            List.of(new Layer("insert", 5e-4, 4), new Layer("skin", 5e-4, 40)),
            2),
        false);
    return Files.writeString(
        dir.resolve("plate.json"),
        """
        { "mesh": "plate.msh",
          "materials": { "skin": { "diffusivity": 1e-10, "solubility": 1 }, "insert": %s },
          "faces": { "zmax": { "kind": "concentration", "value": 1.0 } },
          "initial": 0,
          "time": { "end": 250, "step": 1.25, "scheme": "crank-nicolson" } }
        """
            .formatted(insert));
  }

  @Test
  void anImpermeableInsertSealsTheSkinAndHoldsNothing() throws IOException {
    RunSummary s =
        RunPipeline.run(plate("{ \"impermeable\": true }"), dir.resolve("out"), RunProgress.SILENT);
    Series series = Series.read(dir.resolve("out").resolve("series.csv"));
    double h = 5e-4;
    double volume = 1e-4 * 1e-4 * h;
    // tau = D t / (2h)^2 = 1e-10 * 250 / 1e-6 = 0.025
    double expected = PlaneSheetUptake.fraction(0.025) * volume;
    assertEquals(expected, series.last("amount:skin"), 2e-3 * expected);
    assertEquals(0, series.last("amount:insert"), 0);
    // the joint is now an exterior face with no entry: sealed by default, and said so
    assertTrue(
        s.warnings().stream().anyMatch(w -> w.contains("'insert-skin'") && w.contains("sealed")),
        s.warnings().toString());
  }

  @Test
  void impermeableTakesTrueAloneAndNothingElse() throws IOException {
    CaseInputException e =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.prepare(plate("{ \"impermeable\": true, \"diffusivity\": 1e-12 }")));
    assertTrue(e.getMessage().contains("materials.insert"), e.getMessage());
    CaseInputException f =
        assertThrows(
            CaseInputException.class,
            () -> RunPipeline.prepare(plate("{ \"impermeable\": \"yes\" }")));
    assertTrue(f.getMessage().contains("materials.insert.impermeable"), f.getMessage());
  }
}
