package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.time.StepListener;
import dev.soakfield.fem.time.StepOutcome;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Two layers in series, c held at one face and zero at the other, run to steady state. The
 * potential is continuous at the joint while c jumps by the solubility ratio, and the steady flux
 * is the potential drop over the sum of the layers' resistances L_i / (D_i S_i) (J. Crank, The
 * Mathematics of Diffusion, 2nd ed. (1975), ch. 12 on composite media, steady state; cited from
 * memory). The piecewise-linear steady profile lies in the linear element space, so the finite
 * element values must match to solver precision.
 */
public final class CompositeWall {
  private static final double LA = 0.4;
  private static final double LB = 0.6;
  private static final double DA = 1.0;
  private static final double DB = 0.1;
  private static final double SA = 1.0;
  private static final double SB = 3.0;
  private static final double C0 = 1.0;
  private static final String SOURCE = "Crank (1975) ch. 12, series resistances (from memory)";

  private CompositeWall() {}

  public static List<Check> run() {
    TetMesh mesh =
        StructuredMesher.layers(
            0.1,
            0.1,
            1,
            1,
            List.of(new StructuredMesher.Layer("A", LA, 4), new StructuredMesher.Layer("B", LB, 6)),
            1);
    DiffusionModel model =
        UniformModels.model(
            mesh,
            new double[] {DA, DB},
            new double[] {SA, SB},
            new double[] {0, 0},
            0.0,
            Map.of(
                "zmin", UniformModels.Condition.concentration(C0),
                "zmax", UniformModels.Condition.concentration(0.0)));
    ThetaStepper stepper = new ThetaStepper(model, false, 1e-13, 5000);
    double end = 400;
    TimeSettings settings =
        new TimeSettings(end, new double[] {end}, false, 1e-4, Double.NaN, 1e-4, 20);
    double[] phi0 = model.initialPhi();
    Recorder rec = new Recorder(stepper.amount(phi0));
    int zmin = mesh.faceGroupIndex("zmin");
    double[] lastRate = {0};
    TransientRun.run(
        stepper,
        phi0,
        settings,
        new StepListener() {
          @Override
          public void started(StepOutcome initial) {
            rec.started(initial);
          }

          @Override
          public void accepted(double t, double dt, StepOutcome out, boolean output) {
            rec.accepted(t, dt, out, output);
            lastRate[0] = out.faceInflow()[zmin] / dt;
          }
        });
    double area = 0.1 * 0.1;
    double flux = C0 / SA / (LA / (DA * SA) + LB / (DB * SB));
    double phiJoint = C0 / SA - flux * LA / (DA * SA);
    double[] phi = rec.phiAt(end);
    int joint = PlaneSheet.nodeAt(mesh, 0, 0, LA);
    List<Check> checks = new ArrayList<>();
    checks.add(
        new Check("composite wall, steady flux", SOURCE, flux, lastRate[0] / area, 1e-6, true));
    checks.add(
        new Check(
            "composite wall, c at joint in A", SOURCE, SA * phiJoint, SA * phi[joint], 1e-6, true));
    checks.add(
        new Check(
            "composite wall, c at joint in B", SOURCE, SB * phiJoint, SB * phi[joint], 1e-6, true));
    checks.add(
        Check.atMost(
            "composite wall, global balance",
            "conservation (exact)",
            1e-10,
            rec.balanceRelative()));
    return checks;
  }
}
