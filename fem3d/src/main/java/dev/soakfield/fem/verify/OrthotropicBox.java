package dev.soakfield.fem.verify;

import dev.soakfield.fem.model.DiffusionModel;
import dev.soakfield.mesh.TetMesh;
import dev.soakfield.mesh.gen.StructuredMesher;
import java.util.Map;

/**
 * A manufactured solution with an orthotropic diffusivity whose principal axes are turned against
 * the coordinate axes, written for this test. A box of sides 1 × 0.6 × 0.4 along its own axes e₁,
 * e₂, e₃ (the columns of a rotation R) holds D = R·diag(1, 0.25, 0.05)·Rᵀ (anisotropy 20) and S =
 * 1.5, a constant source r = 0.5, its face s₁ = 0 held at c = r·t (a value that changes with time),
 * the other faces sealed. In the box's coordinates s = Rᵀx,
 *
 * <pre>c = r·t + e^(−λt)·sin(π s₁/(2L₁))·cos(π s₂/L₂)·cos(π s₃/L₃),
 * λ = π²·(d₁/(2L₁)² + d₂/L₂² + d₃/L₃²)</pre>
 *
 * solves ∂c/∂t = ∇·(D∇c) + r (each factor an eigenfunction along its principal axis: separation of
 * variables, e.g. J. Crank, The Mathematics of Diffusion, 2nd ed. (1975), ch. 2); its flux D∇c has
 * no normal part on the sealed faces, which are normal to principal axes. The assembled tensor has
 * all six entries, so a mistake in the off-diagonal ones shows.
 */
final class OrthotropicBox {
  private static final double[] L = {1.0, 0.6, 0.4};
  private static final double[] PRINCIPAL = {1.0, 0.25, 0.05};
  private static final double S = 1.5;
  private static final double SOURCE = 0.5;
  private static final double LAMBDA =
      Math.PI
          * Math.PI
          * (PRINCIPAL[0] / (4 * L[0] * L[0])
              + PRINCIPAL[1] / (L[1] * L[1])
              + PRINCIPAL[2] / (L[2] * L[2]));

  /** The rotation: 30° about z, then 40° about the new x (columns are the box's axes). */
  private static final double[][] R = rotation(Math.toRadians(30), Math.toRadians(40));

  private OrthotropicBox() {}

  private static double[][] rotation(double a, double b) {
    double ca = Math.cos(a);
    double sa = Math.sin(a);
    double cb = Math.cos(b);
    double sb = Math.sin(b);
    double[][] rz = {{ca, -sa, 0}, {sa, ca, 0}, {0, 0, 1}};
    double[][] rx = {{1, 0, 0}, {0, cb, -sb}, {0, sb, cb}};
    double[][] r = new double[3][3];
    for (int i = 0; i < 3; i++) {
      for (int j = 0; j < 3; j++) {
        for (int k = 0; k < 3; k++) {
          r[i][j] += rz[i][k] * rx[k][j];
        }
      }
    }
    return r;
  }

  /** The box's own coordinates s = Rᵀx. */
  private static double[] local(double x, double y, double z) {
    double[] s = new double[3];
    for (int k = 0; k < 3; k++) {
      s[k] = R[0][k] * x + R[1][k] * y + R[2][k] * z;
    }
    return s;
  }

  static ExactField at(double t) {
    double e = Math.exp(-LAMBDA * t);
    double[] k = {Math.PI / (2 * L[0]), Math.PI / L[1], Math.PI / L[2]};
    return new ExactField() {
      @Override
      public double value(double x, double y, double z) {
        double[] s = local(x, y, z);
        return SOURCE * t
            + e * Math.sin(k[0] * s[0]) * Math.cos(k[1] * s[1]) * Math.cos(k[2] * s[2]);
      }

      @Override
      public void gradient(double x, double y, double z, double[] g) {
        double[] s = local(x, y, z);
        double s0 = Math.sin(k[0] * s[0]);
        double c0 = Math.cos(k[0] * s[0]);
        double s1 = Math.sin(k[1] * s[1]);
        double c1 = Math.cos(k[1] * s[1]);
        double s2 = Math.sin(k[2] * s[2]);
        double c2 = Math.cos(k[2] * s[2]);
        double[] local = {
          e * k[0] * c0 * c1 * c2, -e * k[1] * s0 * s1 * c2, -e * k[2] * s0 * c1 * s2
        };
        for (int r = 0; r < 3; r++) {
          g[r] = R[r][0] * local[0] + R[r][1] * local[1] + R[r][2] * local[2];
        }
      }
    };
  }

  /** The turned box with (5m, 3m, 2m) cells (cells of 0.2/m), jittered. */
  static TetMesh mesh(int m, long seed) {
    TetMesh box = StructuredMesher.box(L[0], L[1], L[2], 5 * m, 3 * m, 2 * m, 1);
    double[] xyz = box.copyCoordinates();
    for (int v = 0; v < box.nodeCount(); v++) {
      double[] s = {xyz[3 * v], xyz[3 * v + 1], xyz[3 * v + 2]};
      for (int r = 0; r < 3; r++) {
        xyz[3 * v + r] = R[r][0] * s[0] + R[r][1] * s[1] + R[r][2] * s[2];
      }
    }
    TetMesh turned =
        new TetMesh.Builder()
            .nodes(xyz)
            .order(1)
            .tets(box.copyTets(), box.copyTetGroups())
            .faces(box.copyFaces(), box.copyFaceGroups())
            .volumeGroups(box.volumeGroups())
            .faceGroups(box.faceGroups())
            .build();
    return TestMeshes.jittered(turned, seed);
  }

  /** c = S·φ: the solubility per tetrahedron. */
  static double[] solubility(TetMesh mesh) {
    return UniformModels.filled(mesh.tetCount(), S);
  }

  /** The model on the turned box's mesh (either order), starting from the exact field at t = 0. */
  static DiffusionModel model(TetMesh mesh) {
    DiffusionModel m =
        UniformModels.model(
            mesh,
            new double[] {1},
            new double[] {S},
            new double[] {0},
            0,
            Map.of(
                "xmin",
                UniformModels.Condition.concentration(TwoPartWall.smooth(t -> SOURCE * t))));
    double[] k = new double[6 * mesh.tetCount()];
    // D·S = S·R·diag(d)·Rᵀ, stored (xx, yy, zz, xy, yz, zx)
    int[][] pairs = {{0, 0}, {1, 1}, {2, 2}, {0, 1}, {1, 2}, {2, 0}};
    double[] entries = new double[6];
    for (int p = 0; p < 6; p++) {
      int i = pairs[p][0];
      int j = pairs[p][1];
      for (int a = 0; a < 3; a++) {
        entries[p] += S * R[i][a] * PRINCIPAL[a] * R[j][a];
      }
    }
    for (int t = 0; t < mesh.tetCount(); t++) {
      System.arraycopy(entries, 0, k, 6 * t, 6);
    }
    m = UniformModels.withConductance(m, k);
    m = UniformModels.withConstantSource(m, new double[] {SOURCE});
    ExactField start = at(0);
    double[] phi0 = new double[mesh.nodeCount()];
    for (int v = 0; v < phi0.length; v++) {
      phi0[v] = start.value(mesh.coord(v, 0), mesh.coord(v, 1), mesh.coord(v, 2)) / S;
    }
    return UniformModels.startingFrom(m, phi0);
  }
}
