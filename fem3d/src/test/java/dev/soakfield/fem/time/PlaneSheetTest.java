package dev.soakfield.fem.time;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import dev.soakfield.fem.physics.DiffusionModel;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.HashMap;
import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * A plane sheet of thickness L with both faces held at c_s and the other faces sealed behaves as
 * the one-dimensional sheet of J. Crank, The Mathematics of Diffusion, 2nd ed. (1975), §4.3.
 */
class PlaneSheetTest {
  private static final double L = 1.0;
  private static final double D = 1.0;
  // Crank (1975) eq. 4.18, fractional uptake M_t/M_inf at D t / L^2 (L full thickness)
  private static final double[] TAU = {0.01, 0.02, 0.05, 0.1, 0.2};
  private static final double[] UPTAKE = {0.225676, 0.319154, 0.504088, 0.697882, 0.887403};
  // Crank (1975) eq. 4.17: centre concentration c/c_s at D t / a^2 = 0.25, a = L/2
  private static final double CENTRE_TAU = 0.25;
  private static final double CENTRE = 0.3145542;

  private record Result(double[] uptake, double centre, double balance) {}

  private static Result run(int order, int nx, double dt) {
    TetMesh mesh = StructuredMesher.box(L, 0.1, 0.1, nx, 1, 1, order);
    DiffusionModel model =
        SheetModels.uniform(
            mesh,
            D,
            1.0,
            0.0,
            Map.of(
                "xmin", new SheetModels.Condition(FaceKind.CONCENTRATION, 1.0, 0),
                "xmax", new SheetModels.Condition(FaceKind.CONCENTRATION, 1.0, 0)));
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-12, 2000);
    double centreTime = CENTRE_TAU * (L / 2) * (L / 2) / D;
    double[] outputs = new double[TAU.length + 1];
    for (int i = 0; i < TAU.length; i++) {
      outputs[i] = TAU[i] * L * L / D;
    }
    outputs[TAU.length] = centreTime;
    java.util.Arrays.sort(outputs);
    TimeSettings settings =
        new TimeSettings(0.25, outputs, true, Double.NaN, dt, dt, dt);
    double[] phi0 = model.initialPhi();
    double amount0 = stepper.amount(phi0);
    double volume = L * 0.1 * 0.1;
    Map<Double, Double> uptakeAt = new HashMap<>();
    double[] centre = {Double.NaN};
    int centreNode = nodeAt(mesh, L / 2, 0, 0);
    double[] balance = {0, 0};
    double[] previousAmount = {amount0};
    TransientRun.run(
        stepper,
        phi0,
        settings,
        (t, h, out, isOutput) -> {
          double inflow = 0;
          for (double v : out.faceInflow()) {
            inflow += v;
          }
          balance[0] += out.amount() - previousAmount[0] - inflow - out.sourceAmount();
          balance[1] += Math.abs(inflow);
          previousAmount[0] = out.amount();
          if (isOutput) {
            uptakeAt.put(t, (out.amount() - amount0) / volume);
            if (Math.abs(t - centreTime) < 1e-12) {
              centre[0] = out.phi()[centreNode];
            }
          }
        });
    double[] uptake = new double[TAU.length];
    for (int i = 0; i < TAU.length; i++) {
      uptake[i] = uptakeAt.get(TAU[i] * L * L / D);
    }
    return new Result(uptake, centre[0], Math.abs(balance[0]) / balance[1]);
  }

  private static int nodeAt(TetMesh mesh, double x, double y, double z) {
    for (int v = 0; v < mesh.nodeCount(); v++) {
      if (Math.abs(mesh.coord(v, 0) - x) < 1e-12
          && Math.abs(mesh.coord(v, 1) - y) < 1e-12
          && Math.abs(mesh.coord(v, 2) - z) < 1e-12) {
        return v;
      }
    }
    throw new IllegalStateException("no node at " + x);
  }

  @Test
  void quadraticElementsMatchCranksUptakeAndCentreWithinATenthOfAPercent() {
    Result r = run(2, 40, 2.5e-4);
    for (int i = 0; i < TAU.length; i++) {
      double rel = Math.abs(r.uptake()[i] - UPTAKE[i]) / UPTAKE[i];
      assertTrue(rel < 1e-3, "D t/L^2 = " + TAU[i] + ": " + r.uptake()[i] + " vs " + UPTAKE[i]);
    }
    assertEquals(CENTRE, r.centre(), 1e-3 * CENTRE);
    assertTrue(r.balance() < 1e-10, "balance " + r.balance());
  }

  @Test
  void linearElementsMatchCranksUptakeWithinOnePercent() {
    Result r = run(1, 80, 2.5e-4);
    for (int i = 0; i < TAU.length; i++) {
      double rel = Math.abs(r.uptake()[i] - UPTAKE[i]) / UPTAKE[i];
      assertTrue(rel < 1e-2, "D t/L^2 = " + TAU[i] + ": " + r.uptake()[i] + " vs " + UPTAKE[i]);
    }
    assertEquals(CENTRE, r.centre(), 1e-2 * CENTRE);
    assertTrue(r.balance() < 1e-10, "balance " + r.balance());
  }
}
