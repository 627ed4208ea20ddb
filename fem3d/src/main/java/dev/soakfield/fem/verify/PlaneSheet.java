package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;

/**
 * A plane sheet of thickness L, both faces held at c_s from t = 0, the other faces sealed: a thin
 * box behaves as the one-dimensional sheet of J. Crank, The Mathematics of Diffusion, 2nd ed.
 * (1975), §4.3.
 */
public final class PlaneSheet {
  private static final double L = 1.0;
  private static final double D = 1.0;
  private static final String UPTAKE_SOURCE = "Crank (1975) eq. 4.18, M_t/M_inf";
  private static final String CENTRE_SOURCE = "Crank (1975) eq. 4.17, centre c/c_s";
  // Crank (1975) eq. 4.18, fractional uptake at D t / L^2 (L the full thickness), series values
  private static final double[] TAU = {0.01, 0.02, 0.05, 0.1, 0.2};
  private static final double[] UPTAKE = {0.225676, 0.319154, 0.504088, 0.697882, 0.887403};
  // Crank (1975) eq. 4.17: centre concentration at D t / a^2 = 0.25, a = L/2
  private static final double CENTRE_TIME = 0.25 * (L / 2) * (L / 2) / D;
  private static final double CENTRE = 0.3145542;

  private PlaneSheet() {}

  /**
   * Runs the sheet with elements of the given order on nx cells through the thickness, with
   * Crank–Nicolson steps of dt, and checks uptake and centre value to the given tolerance.
   */
  public static List<Check> run(int order, int nx, double dt, double tolerance) {
    TetMesh mesh = StructuredMesher.box(L, 0.1 * L, 0.1 * L, nx, 1, 1, order);
    DiffusionModel model =
        UniformModels.model(
            mesh,
            new double[] {D},
            new double[] {1.0},
            new double[] {0.0},
            0.0,
            Map.of(
                "xmin", UniformModels.Condition.concentration(1.0),
                "xmax", UniformModels.Condition.concentration(1.0)));
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-12, 5000);
    double[] outputs = new double[TAU.length + 1];
    for (int i = 0; i < TAU.length; i++) {
      outputs[i] = TAU[i] * L * L / D;
    }
    outputs[TAU.length] = CENTRE_TIME;
    Arrays.sort(outputs);
    TimeSettings settings =
        new TimeSettings(outputs[outputs.length - 1], outputs, true, Double.NaN, dt, dt, dt);
    double[] phi0 = model.initialPhi();
    Recorder rec = new Recorder(stepper.amount(phi0));
    TransientRun.run(stepper, phi0, settings, rec);
    double volume = L * 0.01 * L * L;
    String label = (order == 1 ? "linear" : "quadratic") + " sheet";
    List<Check> checks = new ArrayList<>();
    for (int i = 0; i < TAU.length; i++) {
      double computed = rec.uptakeAt(TAU[i] * L * L / D) / volume;
      checks.add(
          new Check(
              label + ", uptake at Dt/L^2=" + TAU[i],
              UPTAKE_SOURCE,
              UPTAKE[i],
              computed,
              tolerance,
              true));
    }
    double[] phi = rec.phiAt(CENTRE_TIME);
    checks.add(
        new Check(
            label + ", centre at Dt/a^2=0.25",
            CENTRE_SOURCE,
            CENTRE,
            phi[nodeAt(mesh, L / 2, 0, 0)],
            tolerance,
            true));
    checks.add(
        Check.atMost(
            label + ", global balance", "conservation (exact)", 1e-10, rec.balanceRelative()));
    return checks;
  }

  static int nodeAt(TetMesh mesh, double x, double y, double z) {
    for (int v = 0; v < mesh.nodeCount(); v++) {
      if (Math.abs(mesh.coord(v, 0) - x) < 1e-12
          && Math.abs(mesh.coord(v, 1) - y) < 1e-12
          && Math.abs(mesh.coord(v, 2) - z) < 1e-12) {
        return v;
      }
    }
    throw new IllegalStateException("no node at (" + x + ", " + y + ", " + z + ")");
  }
}
