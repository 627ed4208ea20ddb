package dev.soakfield.fem.tds;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.model.LawResolver;
import dev.soakfield.fem.model.LawUse;
import dev.soakfield.fem.run.RunProgress;
import dev.soakfield.law.api.LawPoint;
import dev.soakfield.law.api.RateSink;
import dev.soakfield.law.api.SourceLaw;
import dev.soakfield.law.api.StateView;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.msh.MshWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A TDS ramp of a thin plate whose traps release first-order without retrapping, dθ/dt = −ν·exp(−E/
 * (R·T))·θ, and whose lattice lets the hydrogen out at once (L²/D far below the release time): the
 * desorption peak then lies where Kissinger's peak condition β·E/(R·T_p²) = ν·exp(−E/(R·T_p)) holds
 * (Kissinger, Anal. Chem. 29 (1957) 1702), and desorbed + remaining = charged.
 */
class TdsRunTest {
  @TempDir Path dir;

  private static final double R = KissingerFit.GAS_CONSTANT;
  private static final double E = 100e3;
  private static final double NU = 1e11;

  /** First-order release, the occupancy integrated by backward Euler: θ₁ = θ₀/(1 + dt·p). */
  private static final class FirstOrderRelease implements SourceLaw {
    @Override
    public List<String> stateNames() {
      return List.of("occupancy");
    }

    @Override
    public void initialState(double concentration, double temperature, double[] state) {
      state[0] = 1.0;
    }

    private static double p(double kelvin) {
      return NU * Math.exp(-E / (R * kelvin));
    }

    @Override
    public void rate(LawPoint at, StateView start, RateSink out) {
      double p = p(at.temperature());
      out.set(start.get(0) * p / (1 + at.dt() * p), 0);
    }

    @Override
    public void advance(LawPoint at, StateView start, double[] end) {
      end[0] = start.get(0) / (1 + at.dt() * p(at.temperature()));
    }

    @Override
    public double trappedAmount(StateView state, double temperature) {
      return state.get(0);
    }
  }

  private static double kissingerPeak(double beta) {
    double lo = 100;
    double hi = 3000;
    for (int i = 0; i < 200; i++) {
      double t = 0.5 * (lo + hi);
      if (NU * Math.exp(-E / (R * t)) > beta * E / (R * t * t)) {
        hi = t;
      } else {
        lo = t;
      }
    }
    return 0.5 * (lo + hi);
  }

  @Test
  void firstOrderReleasePeaksWhereKissingerSaysAndTheAmountCloses() throws Exception {
    MshWriter.write(
        dir.resolve("plate.msh"), StructuredMesher.box(2e-4, 1e-4, 1e-4, 10, 1, 1, 1), false);
    Path kase =
        Files.writeString(
            dir.resolve("plate.json"),
            """
            { "mesh": "plate.msh", "temperature": 300,
              "materials": { "body": { "diffusivity": 1e-8, "density": 7850,
                                       "source": { "law": "first-order-test" } } },
              "faces": { "xmin": { "kind": "concentration", "value": 0 },
                         "xmax": { "kind": "concentration", "value": 0 } },
              "initial": 0.5, "time": { "end": 1 } }
            """);
    LawResolver laws =
        (caseName, material, source) -> {
          assertEquals("first-order-test", source.id());
          return new LawUse(source.id(), "a test", new FirstOrderRelease());
        };
    double beta = 10.0 / 60;
    TdsRamp ramp = new TdsRamp(300, 60, beta, 600, TdsRamp.DEFAULT_STEP_CHANGE);
    TdsRun.Result r =
        TdsRun.run(kase, ramp, Optional.empty(), laws, dir.resolve("run"), RunProgress.SILENT);
    assertEquals(1, r.peaks().size(), r.peaks().toString());
    double expected = kissingerPeak(beta);
    assertEquals(expected, r.peaks().get(0).temperature(), 1.0);
    // negative control: the peak at 12 K/min lies more than 1 K away
    assertTrue(Math.abs(kissingerPeak(12.0 / 60) - r.peaks().get(0).temperature()) > 1.0);
    TdsCurve c = r.curve();
    // charged: 0.5 in the lattice and 1 in the traps per m³ of the plate
    assertEquals(1.5 * 2e-12, c.charged(), 1e-12 * 1.5 * 2e-12);
    assertEquals(0, c.closure(), 1e-8);
    assertEquals(2e-8, c.area(), 1e-20);
    assertEquals(7850 * 2e-12, c.mass(), 1e-12 * 7850 * 2e-12);
    assertEquals(60, c.time()[c.rampIndex()], 1e-9, "the ramp starts after the rest");
    c.write(dir.resolve(TdsCurve.FILE));
    List<String> lines = Files.readAllLines(dir.resolve(TdsCurve.FILE));
    assertEquals(c.time().length + 1, lines.size());
    assertTrue(lines.get(0).startsWith("time [s],temperature [K],desorption_rate_per_area"));
  }

  @Test
  void anUnchargedSpecimenAndABackwardRampAreRefused() throws Exception {
    assertThrows(IllegalArgumentException.class, () -> new TdsRamp(300, 0, 0.1, 250, 0.5));
    assertThrows(IllegalArgumentException.class, () -> new TdsRamp(300, -1, 0.1, 600, 0.5));
    assertThrows(IllegalArgumentException.class, () -> new TdsRamp(300, 0, 0, 600, 0.5));
    assertThrows(IllegalArgumentException.class, () -> new TdsRamp(300, 0, 0.1, 600, 0));
    assertThrows(IllegalArgumentException.class, () -> new TdsRamp(0, 0, 0.1, 600, 0.5));
    TdsRamp ramp = new TdsRamp(300, 10, 0.5, 400, 0.5);
    assertEquals(210, ramp.end(), 1e-12);
    assertEquals(1.0, ramp.maxStep(), 1e-12);
    assertEquals(0.25, ramp.atRate(0.25).rate(), 0);
    MshWriter.write(
        dir.resolve("box.msh"), StructuredMesher.box(1e-3, 1e-3, 1e-3, 2, 2, 2, 1), false);
    Path empty =
        Files.writeString(
            dir.resolve("empty.json"),
            """
            { "mesh": "box.msh", "materials": { "body": { "diffusivity": 1e-9 } },
              "faces": { "xmin": { "kind": "concentration", "value": 0 } },
              "initial": 0, "time": { "end": 1 } }
            """);
    IllegalArgumentException e =
        assertThrows(
            IllegalArgumentException.class,
            () ->
                TdsRun.run(
                    empty,
                    ramp,
                    Optional.empty(),
                    LawResolver.none(),
                    dir.resolve("e"),
                    RunProgress.SILENT));
    assertTrue(e.getMessage().contains("holding nothing at the start"), e.getMessage());
  }
}
