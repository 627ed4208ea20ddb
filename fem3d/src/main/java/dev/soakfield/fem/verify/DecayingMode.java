package dev.soakfield.fem.verify;

import dev.soakfield.fem.assembly.FeSpace;
import dev.soakfield.fem.element.TetBasis;
import dev.soakfield.fem.element.TetQuadrature;
import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.fem.model.FaceCondition;
import dev.soakfield.fem.model.FaceGroupMembers;
import dev.soakfield.fem.physics.FaceKind;
import dev.soakfield.fem.physics.TimeFunction;
import dev.soakfield.fem.time.ThetaStepper;
import dev.soakfield.fem.time.TimeSettings;
import dev.soakfield.fem.time.TransientRun;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import dev.soakfield.mesh.topo.MeshGeometry;
import java.util.ArrayList;
import java.util.List;

/**
 * Convergence rates against the exact solution u = exp(−3π²Dt)·sin(πx)·sin(πy)·sin(πz) of the
 * diffusion equation on the unit cube with u = 0 on its faces (separation of variables; Crank, The
 * Mathematics of Diffusion, 2nd ed. (1975), ch. 2 and 6), in the role of a manufactured solution.
 * Spatial: the L2 error at a fixed time should fall as h^(p+1) for elements of degree p (S. C.
 * Brenner and L. R. Scott, The Mathematical Theory of Finite Element Methods, ch. 4–5); temporal:
 * the difference to a run with very short steps on the same mesh should fall as dt for backward
 * Euler and dt² for Crank–Nicolson.
 */
public final class DecayingMode {
  private static final double D = 1.0;
  private static final String SPACE_SOURCE = "Brenner & Scott ch. 4-5, L2 rate p+1";
  private static final String TIME_SOURCE = "theta scheme order (common practice)";

  private DecayingMode() {}

  static double exact(double x, double y, double z, double t) {
    return Math.exp(-3 * Math.PI * Math.PI * D * t)
        * Math.sin(Math.PI * x)
        * Math.sin(Math.PI * y)
        * Math.sin(Math.PI * z);
  }

  private static DiffusionModel model(TetMesh mesh) {
    int tets = mesh.tetCount();
    double[] s = UniformModels.filled(tets, 1.0);
    double[] tensor = new double[6 * tets];
    for (int t = 0; t < tets; t++) {
      tensor[6 * t] = D;
      tensor[6 * t + 1] = D;
      tensor[6 * t + 2] = D;
    }
    List<FaceCondition> faces = new ArrayList<>();
    for (int g = 0; g < mesh.faceGroups().size(); g++) {
      int[] members = FaceGroupMembers.of(mesh, g);
      faces.add(
          new FaceCondition(
              g,
              mesh.faceGroups().get(g).name(),
              FaceKind.CONCENTRATION,
              TimeFunction.constant(0),
              TimeFunction.constant(0),
              members,
              UniformModels.filled(members.length, 1.0)));
    }
    double[] phi0 = new double[mesh.nodeCount()];
    for (int v = 0; v < phi0.length; v++) {
      phi0[v] = exact(mesh.coord(v, 0), mesh.coord(v, 1), mesh.coord(v, 2), 0);
    }
    return new DiffusionModel(
        FeSpace.of(mesh), s, tensor, new double[tets], new double[tets], faces, phi0);
  }

  /** The field at t_end from fixed steps dt, Crank–Nicolson or backward Euler. */
  private static double[] solve(TetMesh mesh, double end, double dt, boolean crank) {
    DiffusionModel m = model(mesh);
    ThetaStepper stepper = new ThetaStepper(m, false, 1e-13, 5000);
    TimeSettings s = new TimeSettings(end, new double[] {end}, crank, Double.NaN, dt, dt, dt);
    return TransientRun.run(stepper, m.initialPhi(), s, (t, h, out, output) -> {}).finalPhi();
  }

  /** ‖u_h − u‖ over the mesh by a degree-5 rule (u_h interpolated with the element's basis). */
  static double l2Error(TetMesh mesh, double[] uh, double t) {
    TetQuadrature q = TetQuadrature.DEGREE_5;
    int order = mesh.order();
    int per = mesh.nodesPerTet();
    double[] l = new double[4];
    double[] n = new double[per];
    double sum = 0;
    for (int e = 0; e < mesh.tetCount(); e++) {
      double vol = Math.abs(MeshGeometry.tetVolume(mesh, e));
      for (int k = 0; k < q.size(); k++) {
        double x = 0;
        double y = 0;
        double z = 0;
        for (int a = 0; a < 4; a++) {
          l[a] = q.bary(k, a);
          int v = mesh.tetNode(e, a);
          x += l[a] * mesh.coord(v, 0);
          y += l[a] * mesh.coord(v, 1);
          z += l[a] * mesh.coord(v, 2);
        }
        TetBasis.values(order, l, n);
        double value = 0;
        for (int i = 0; i < per; i++) {
          value += n[i] * uh[mesh.tetNode(e, i)];
        }
        double diff = value - exact(x, y, z, t);
        sum += q.weight(k) * vol * diff * diff;
      }
    }
    return Math.sqrt(sum);
  }

  private static double rate(double coarse, double fine, double ratio) {
    return Math.log(coarse / fine) / Math.log(ratio);
  }

  /** L2 rates on meshes of n and 2n cells per side (Crank–Nicolson with short steps). */
  public static Check spatialRate(int order, int n, double minimumRate) {
    double end = 0.02;
    double dt = 2.5e-4;
    double[] err = new double[2];
    for (int k = 0; k < 2; k++) {
      int cells = n << k;
      TetMesh mesh = StructuredMesher.box(1, 1, 1, cells, cells, cells, order);
      err[k] = l2Error(mesh, solve(mesh, end, dt, true), end);
    }
    double r = rate(err[0], err[1], 2);
    return Check.atLeast(
        (order == 1 ? "linear" : "quadratic") + " L2 rate, h=1/" + n + " to 1/" + (2 * n),
        SPACE_SOURCE,
        minimumRate,
        r);
  }

  /** Temporal rate from steps dt and dt/2 against a reference run with dt/32, same mesh. */
  public static Check temporalRate(boolean crank, double minimumRate) {
    TetMesh mesh = StructuredMesher.box(1, 1, 1, 4, 4, 4, 2);
    double end = 0.1;
    double dt = end / 8;
    double[] reference = solve(mesh, end, dt / 32, crank);
    double[] err = new double[2];
    for (int k = 0; k < 2; k++) {
      double[] u = solve(mesh, end, dt / (1 << k), crank);
      double max = 0;
      for (int i = 0; i < u.length; i++) {
        max = Math.max(max, Math.abs(u[i] - reference[i]));
      }
      err[k] = max;
    }
    return Check.atLeast(
        (crank ? "Crank-Nicolson" : "backward Euler") + " time rate, dt=T/8 to T/16",
        TIME_SOURCE,
        minimumRate,
        rate(err[0], err[1], 2));
  }
}
