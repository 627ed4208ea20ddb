package dev.soakfield.fem.bake;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.fit.PlaneSheetUptake;
import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Drying targets on a wet sheet 1 mm thick (c = 6 kg/m³, density 1200 kg/m³, D = 1e-10 m²/s, both
 * faces held dry): the mean falls as 1 − M_t/M_∞ of Crank, The Mathematics of Diffusion (2nd ed.),
 * eq. 4.18, so the mean, the whole amount and the weight gain over the dry mass (100·c̄/ρ) reach
 * their levels at the same time.
 */
class BakeTargetsTest {
  private static final double D = 1e-10;
  private static final double L = 1e-3;
  private static final double VOLUME = L * 1e-4 * 1e-4;

  @TempDir Path dir;

  private Path wetSheet(String extra) throws IOException {
    MshWriter.write(
        dir.resolve("sheet.msh"), StructuredMesher.box(L, 1e-4, 1e-4, 40, 1, 1, 1), false);
    return Files.writeString(
        dir.resolve("part.json"),
        """
        { "mesh": "sheet.msh", "species": "water", "units": { "concentration": "kg/m^3" },
          "materials": { "body": { "diffusivity": 1e-10 %s } },
          "faces": { "xmin": { "kind": "concentration", "value": 0.0 },
                     "xmax": { "kind": "concentration", "value": 0.0 } },
          "initial": 6.0, "time": { "end": 1 } }
        """
            .formatted(extra));
  }

  private BakeSearch.Result bake(Path part, String kind, String name, double level, double longest)
      throws IOException {
    return BakeSearch.search(
        part,
        new BakeSearch.Oven(300, 0, 0, longest),
        new BakeSearch.Target(kind, name, level),
        1e-3,
        LawResolver.none(),
        dir);
  }

  /** The time the sheet's mean falls to {@code share} of its start (Crank eq. 4.18). */
  private static double meanTime(double share) {
    return new BrentSolver(1e-12)
            .solve(200, tau -> 1 - PlaneSheetUptake.fraction(tau) - share, 1e-5, 2)
        * L
        * L
        / D;
  }

  @Test
  void meanAmountAndWeightGainTargetsMeetCranksMeanCurve() throws IOException {
    Path part = wetSheet(", \"density\": 1200");
    double expected = meanTime(0.25); // mean 1.5 kg/m³ of 6
    BakeSearch.Result mean = bake(part, "mean", "body", 1.5, 1e5);
    assertTrue(mean.met());
    assertEquals("kg/m^3", mean.unit());
    assertEquals(expected, mean.time(), 0.02 * expected);
    BakeSearch.Result amount = bake(part, "amount", "", 1.5 * VOLUME, 1e5);
    assertEquals("kg", amount.unit());
    assertEquals(expected, amount.time(), 0.02 * expected);
    // 1.5 kg/m³ in 1200 kg/m³ of dry part is 0.125 % of its mass
    BakeSearch.Result gain = bake(part, "weight_gain", "", 0.125, 1e5);
    assertEquals("%", gain.unit());
    assertEquals(expected, gain.time(), 0.02 * expected);
    assertEquals(mean.time(), gain.time(), 2e-3 * expected);
  }

  @Test
  void aLevelNotReachedWithinTheLongestBakeIsSaid() throws IOException {
    BakeSearch.Result r = bake(wetSheet(""), "mean", "body", 1e-6, 200);
    assertFalse(r.met());
    assertTrue(Double.isNaN(r.time()));
    // the curve still ends below its start: the search ran, it only did not get there
    assertTrue(r.curveValues()[r.curveValues().length - 1] < 6);
  }

  @Test
  void targetsNameWhatExists() throws IOException {
    Path part = wetSheet("");
    IllegalArgumentException p =
        assertThrows(IllegalArgumentException.class, () -> bake(part, "mean", "bdy", 1, 10));
    assertTrue(p.getMessage().contains("expected one of body"), p.getMessage());
    IllegalArgumentException w =
        assertThrows(IllegalArgumentException.class, () -> bake(part, "weight_gain", "", 0.1, 10));
    assertTrue(w.getMessage().contains("density"), w.getMessage());
  }
}
